import type { CodeEntryDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';

/**
 * `GET /api/codes/:code?make=`: the catalogue entry, this make's meaning where it has its own.
 * 400 for a string that is not a code (the reason names the position), 404 for a valid code
 * the catalogue does not hold (its decoded structure is in the error's details).
 */
export function getCode(code: string, make: string | undefined, { signal }: { signal?: AbortSignal } = {}): Promise<CodeEntryDto> {
  return api.get<CodeEntryDto>(`/codes/${encodeURIComponent(code)}`, { signal, params: { make } });
}

export function getCodeQueryOptions(code: string, make?: string) {
  return queryOptions({
    queryKey: ['codes', 'entry', code, make ?? null] as const,
    queryFn: ({ signal }) => getCode(code, make, { signal }),
    staleTime: 5 * 60 * 1000,
    // A 400 or 404 is an answer, not a hiccup: asking again would give the same.
    retry: (count, error) => !(isApiError(error) && (error.status === 400 || error.status === 404)) && count < 2,
  });
}

export function useCode(code: string, make?: string) {
  return useQuery(getCodeQueryOptions(code, make));
}
