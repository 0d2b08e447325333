import type { PublicEstimateDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api, isApiError } from '@/lib/api-client';

export function publicEstimateQueryKey(token: string) {
  return ['public-estimate', token] as const;
}

/** `GET /api/public/estimates/:token` (no account): 404 for an unknown link, 410 once it has expired. */
export function getPublicEstimate(token: string, { signal }: { signal?: AbortSignal } = {}): Promise<PublicEstimateDto> {
  return api.get<PublicEstimateDto>(`/public/estimates/${encodeURIComponent(token)}`, { signal, signOutOnUnauthorized: false });
}

export function getPublicEstimateQueryOptions(token: string) {
  return queryOptions({
    queryKey: publicEstimateQueryKey(token),
    queryFn: ({ signal }) => getPublicEstimate(token, { signal }),
    // An unknown or expired link stays so; a network hiccup is worth one more try.
    retry: (count, error) => !(isApiError(error) && error.status >= 400 && error.status < 500) && count < 1,
  });
}

export function usePublicEstimate(token: string) {
  return useQuery(getPublicEstimateQueryOptions(token));
}
