import { VEHICLE_SORTS, type VehicleSort } from '@causeway/shared';
import { readPaging, readSort, writePaging, writeSort, type TableParams, type TableParamsOptions } from '@/utils/list-params';

export const VEHICLE_PAGE_SIZES = [10, 25, 50, 100] as const;

export const VEHICLE_TABLE: TableParamsOptions<VehicleSort> = { pageSizes: VEHICLE_PAGE_SIZES, defaultPageSize: 25, sortFields: VEHICLE_SORTS };

/** The vehicle list's page, order and search, as kept in the address bar. */
export interface VehicleListParams extends TableParams<VehicleSort> {
  q: string;
}

/** Reads the URL leniently: anything missing or out of range falls back to the default. */
export function parseVehicleListParams(search: URLSearchParams): VehicleListParams {
  return { ...readPaging(search, VEHICLE_TABLE), q: (search.get('q') ?? '').trim(), ...readSort(search, VEHICLE_TABLE) };
}

/** Writes only what differs from the defaults, so plain addresses stay plain. */
export function toVehicleListSearch(params: VehicleListParams): URLSearchParams {
  const search = new URLSearchParams();
  writePaging(search, params, VEHICLE_TABLE);
  if (params.q) search.set('q', params.q);
  writeSort(search, params, VEHICLE_TABLE);
  return search;
}
