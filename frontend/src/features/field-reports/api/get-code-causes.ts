import type { PossibleCauseRowDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/causes?code=`: the stored possible causes of one code, every vehicle scope. */
export function getCodeCauses(code: string, { signal }: { signal?: AbortSignal } = {}): Promise<PossibleCauseRowDto[]> {
  return api.get<PossibleCauseRowDto[]>('/causes', { signal, params: { code } });
}

export function getCodeCausesQueryOptions(code: string) {
  return queryOptions({
    queryKey: ['knowledge', 'causes', code] as const,
    queryFn: ({ signal }) => getCodeCauses(code, { signal }),
    staleTime: 5 * 60_000,
  });
}

/** Only asks once the code reads as a valid code (`null` otherwise). */
export function useCodeCauses(code: string | null) {
  return useQuery({ ...getCodeCausesQueryOptions(code ?? ''), enabled: code !== null });
}
