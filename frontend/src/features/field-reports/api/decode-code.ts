import type { DecodeResponse } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/dtc/decode?input=`: the code's structure and, when the catalogue has it, its title. */
export function decodeCode(code: string, { signal }: { signal?: AbortSignal } = {}): Promise<DecodeResponse> {
  return api.get<DecodeResponse>('/dtc/decode', { signal, params: { input: code } });
}

export function decodeCodeQueryOptions(code: string) {
  return queryOptions({ queryKey: ['dtc', 'decode', code] as const, queryFn: ({ signal }) => decodeCode(code, { signal }), staleTime: 10 * 60_000 });
}

/** Only asks for a code the shared codec already accepted (`null` otherwise). */
export function useDecodedCode(code: string | null) {
  return useQuery({ ...decodeCodeQueryOptions(code ?? ''), enabled: code !== null });
}
