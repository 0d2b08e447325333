import type { CodeEntryDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { KNOWLEDGE_QUERY_KEY } from './get-parts';

/** `GET /api/codes/:code`: the catalogue entry a moderator edits. */
export function getCode(code: string, { signal }: { signal?: AbortSignal } = {}): Promise<CodeEntryDto> {
  return api.get<CodeEntryDto>(`/codes/${encodeURIComponent(code)}`, { signal });
}

export function getCodeQueryOptions(code: string) {
  return queryOptions({ queryKey: [...KNOWLEDGE_QUERY_KEY, 'code', code] as const, queryFn: ({ signal }) => getCode(code, { signal }) });
}

export function useCode(code: string, enabled: boolean) {
  return useQuery({ ...getCodeQueryOptions(code), enabled: enabled && code !== '' });
}
