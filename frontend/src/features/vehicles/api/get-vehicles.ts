import type { Page, VehicleDto } from '@causeway/shared';
import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { api } from '@/lib/api-client';
import type { VehicleListParams } from '../utils/list-params';

export const VEHICLES_QUERY_KEY = ['vehicles'] as const;

/** `GET /api/vehicles`: one page of the shop's vehicles, searched and sorted on the server. */
export function getVehicles(params: VehicleListParams, { signal }: { signal?: AbortSignal } = {}): Promise<Page<VehicleDto>> {
  return api.get<Page<VehicleDto>>('/vehicles', {
    signal,
    params: {
      page: params.page,
      pageSize: params.pageSize,
      q: params.q,
      sort: params.sort,
      order: params.sort ? params.order : undefined,
    },
  });
}

export function getVehiclesQueryOptions(params: VehicleListParams) {
  return queryOptions({
    queryKey: [...VEHICLES_QUERY_KEY, 'list', params] as const,
    queryFn: ({ signal }) => getVehicles(params, { signal }),
    // Keep the rows on screen while the next page or order loads.
    placeholderData: keepPreviousData,
  });
}

export function useVehicles(params: VehicleListParams) {
  return useQuery(getVehiclesQueryOptions(params));
}
