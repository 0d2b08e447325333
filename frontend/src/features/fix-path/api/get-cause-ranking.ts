import type { CauseRankingDto, VehicleScopeQuery } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/codes/:code/causes`: the possible causes, ranked, with their intervals, evidence and costs. */
export function getCauseRanking(code: string, vehicle: VehicleScopeQuery, { signal }: { signal?: AbortSignal } = {}): Promise<CauseRankingDto> {
  return api.get<CauseRankingDto>(`/codes/${encodeURIComponent(code)}/causes`, {
    signal,
    params: { make: vehicle.make, model: vehicle.model, engine: vehicle.engine, year: vehicle.year },
  });
}

export function getCauseRankingQueryOptions(code: string, vehicle: VehicleScopeQuery) {
  return queryOptions({
    queryKey: ['causes', 'ranking', code, vehicle] as const,
    queryFn: ({ signal }) => getCauseRanking(code, vehicle, { signal }),
    placeholderData: keepPreviousData,
  });
}

export function useCauseRanking(code: string, vehicle: VehicleScopeQuery) {
  return useQuery(getCauseRankingQueryOptions(code, vehicle));
}
