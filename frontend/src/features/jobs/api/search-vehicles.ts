import type { Page, VehicleDto } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';

/** `GET /api/vehicles?q=`: vehicles to pick for a job or a filter, by VIN, plate or owner. */
export function searchVehicles(q: string, { signal }: { signal?: AbortSignal } = {}): Promise<Page<VehicleDto>> {
  return api.get<Page<VehicleDto>>('/vehicles', { signal, params: { q: q.trim(), pageSize: 20, sort: 'updatedAt', order: 'desc' } });
}

export function searchVehiclesQueryOptions(q: string) {
  return queryOptions({
    queryKey: ['vehicles', 'search', q.trim()] as const,
    queryFn: ({ signal }) => searchVehicles(q, { signal }),
    placeholderData: keepPreviousData,
  });
}

export function useVehicleSearch(q: string) {
  return useQuery(searchVehiclesQueryOptions(q));
}
