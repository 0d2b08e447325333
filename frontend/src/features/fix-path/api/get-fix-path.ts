import type { FixPathDto, VehicleScopeQuery } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/codes/:code/fix-path`: the fix path for the vehicle at the shop's labour rate, with its baselines. */
export function getFixPath(code: string, vehicle: VehicleScopeQuery, { signal }: { signal?: AbortSignal } = {}): Promise<FixPathDto> {
  return api.get<FixPathDto>(`/codes/${encodeURIComponent(code)}/fix-path`, {
    signal,
    params: { make: vehicle.make, model: vehicle.model, engine: vehicle.engine, year: vehicle.year },
  });
}

export function getFixPathQueryOptions(code: string, vehicle: VehicleScopeQuery) {
  return queryOptions({
    queryKey: ['fix-path', code, vehicle] as const,
    queryFn: ({ signal }) => getFixPath(code, vehicle, { signal }),
    // Keep the previous vehicle's path on screen while the next one loads.
    placeholderData: keepPreviousData,
  });
}

export function useFixPath(code: string, vehicle: VehicleScopeQuery) {
  return useQuery(getFixPathQueryOptions(code, vehicle));
}
