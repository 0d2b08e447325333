import type { PossibleCauseRowDto } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { KNOWLEDGE_QUERY_KEY } from './get-parts';

/** `GET /api/causes?code=`: the stored possible-cause rows (of one code, or of every code). */
export function getCauses(code: string, { signal }: { signal?: AbortSignal } = {}): Promise<PossibleCauseRowDto[]> {
  return api.get<PossibleCauseRowDto[]>('/causes', { signal, params: { code: code || undefined } });
}

export function getCausesQueryOptions(code: string) {
  return queryOptions({
    queryKey: [...KNOWLEDGE_QUERY_KEY, 'causes', code] as const,
    queryFn: ({ signal }) => getCauses(code, { signal }),
    placeholderData: keepPreviousData,
  });
}

export function useCauses(code: string) {
  return useQuery(getCausesQueryOptions(code));
}
