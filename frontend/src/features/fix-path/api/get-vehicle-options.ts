import type { PossibleCauseRowDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { vehicleOptions, type MakeOption } from '../utils/vehicle';

/** `GET /api/causes`: every curated possible-cause row; the vehicle picker offers the vehicles they name. */
export function getCauseRows({ signal }: { signal?: AbortSignal } = {}): Promise<PossibleCauseRowDto[]> {
  return api.get<PossibleCauseRowDto[]>('/causes', { signal });
}

export function getVehicleOptionsQueryOptions() {
  return queryOptions({
    queryKey: ['causes', 'rows'] as const,
    queryFn: ({ signal }) => getCauseRows({ signal }),
    staleTime: 30 * 60 * 1000,
    select: (rows): MakeOption[] => vehicleOptions(rows),
  });
}

export function useVehicleOptions() {
  return useQuery(getVehicleOptionsQueryOptions());
}
