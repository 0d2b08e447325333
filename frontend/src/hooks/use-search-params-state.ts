import { useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';

/**
 * A list's state kept in the address: read with `parse`, written back (replacing the search)
 * with `toSearch`, so a reload, a shared link or the back button shows the same rows.
 */
export function useSearchParamsState<P>(parse: (search: URLSearchParams) => P, toSearch: (params: P) => URLSearchParams): [P, (next: P) => void] {
  const [searchParams, setSearchParams] = useSearchParams();
  const params = useMemo(() => parse(searchParams), [parse, searchParams]);
  return [params, (next: P) => setSearchParams(toSearch(next))];
}
