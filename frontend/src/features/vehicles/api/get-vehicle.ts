import type { VehicleDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import { VEHICLES_QUERY_KEY } from './get-vehicles';

/** `GET /api/vehicles/:id`: one vehicle of the shop (another shop's is a 404). */
export function getVehicle(id: string, { signal }: { signal?: AbortSignal } = {}): Promise<VehicleDto> {
  return api.get<VehicleDto>(`/vehicles/${encodeURIComponent(id)}`, { signal });
}

export function vehicleQueryKey(id: string) {
  return [...VEHICLES_QUERY_KEY, 'detail', id] as const;
}

export function getVehicleQueryOptions(id: string) {
  return queryOptions({
    queryKey: vehicleQueryKey(id),
    queryFn: ({ signal }) => getVehicle(id, { signal }),
  });
}

export function useVehicle(id: string | undefined) {
  return useQuery({ ...getVehicleQueryOptions(id ?? ''), enabled: Boolean(id) });
}
