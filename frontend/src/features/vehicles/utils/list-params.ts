import { VEHICLE_SORTS, type VehicleSort } from '@causeway/shared';

export type SortOrder = 'asc' | 'desc';
export const VEHICLE_PAGE_SIZES = [10, 25, 50, 100] as const;
const DEFAULT_PAGE_SIZE = 25;

/** The vehicle list's page, order and search, as kept in the address bar. */
export interface VehicleListParams {
  page: number;
  pageSize: number;
  q: string;
  sort?: VehicleSort;
  order?: SortOrder;
}

function oneOf<T extends string>(values: readonly T[], value: string | null): T | undefined {
  return values.find((v) => v === value);
}

/** Reads the URL leniently: anything missing or out of range falls back to the default. */
export function parseVehicleListParams(search: URLSearchParams): VehicleListParams {
  const page = Number.parseInt(search.get('page') ?? '', 10);
  const pageSize = Number.parseInt(search.get('pageSize') ?? '', 10);
  const sort = oneOf(VEHICLE_SORTS, search.get('sort'));
  return {
    page: Number.isSafeInteger(page) && page >= 1 ? page : 1,
    pageSize: (VEHICLE_PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : DEFAULT_PAGE_SIZE,
    q: (search.get('q') ?? '').trim(),
    sort,
    order: sort ? (oneOf(['asc', 'desc'] as const, search.get('order')) ?? 'asc') : undefined,
  };
}

/** Writes only what differs from the defaults, so plain addresses stay plain. */
export function toVehicleListSearch(params: VehicleListParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.page !== 1) search.set('page', String(params.page));
  if (params.pageSize !== DEFAULT_PAGE_SIZE) search.set('pageSize', String(params.pageSize));
  if (params.q) search.set('q', params.q);
  if (params.sort) {
    search.set('sort', params.sort);
    search.set('order', params.order ?? 'asc');
  }
  return search;
}
