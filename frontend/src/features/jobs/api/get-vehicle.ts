import type { VehicleDto } from '@causeway/shared';
import { queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/vehicles/:id`: the vehicle a filter or a new job names. */
export function getVehicle(id: string, { signal }: { signal?: AbortSignal } = {}): Promise<VehicleDto> {
  return api.get<VehicleDto>(`/vehicles/${encodeURIComponent(id)}`, { signal });
}

export function getVehicleQueryOptions(id: string) {
  return queryOptions({
    queryKey: ['vehicles', 'detail', id] as const,
    queryFn: ({ signal }) => getVehicle(id, { signal }),
  });
}

export function useVehicleById(id: string | undefined) {
  return useQuery({ ...getVehicleQueryOptions(id ?? ''), enabled: Boolean(id) });
}
