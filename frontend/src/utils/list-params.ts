/**
 * The paging and sorting part of a server-side table's address (`page`, `pageSize`, `sort`,
 * `order`): read leniently, written only where it differs from the defaults. Each list adds its
 * own search and filters around these, in its own order.
 */

export type SortOrder = 'asc' | 'desc';

export interface TableParams<S extends string = string> {
  page: number;
  pageSize: number;
  sort?: S;
  order?: SortOrder;
}

export interface TableParamsOptions<S extends string = string> {
  pageSizes: readonly number[];
  defaultPageSize: number;
  /** The columns the server sorts by; leave out for a table that is not sorted. */
  sortFields?: readonly S[];
  /** The order of a sort that names none: ascending unless said. */
  defaultOrder?: SortOrder;
}

export function oneOf<T extends string>(values: readonly T[], value: string | null): T | undefined {
  return values.find((v) => v === value);
}

/** Page and page size; anything missing or out of range falls back to the default. */
export function readPaging(search: URLSearchParams, options: TableParamsOptions): Pick<TableParams, 'page' | 'pageSize'> {
  const page = Number.parseInt(search.get('page') ?? '', 10);
  const pageSize = Number.parseInt(search.get('pageSize') ?? '', 10);
  return {
    page: Number.isSafeInteger(page) && page >= 1 ? page : 1,
    pageSize: options.pageSizes.includes(pageSize) ? pageSize : options.defaultPageSize,
  };
}

/** The sort column and its order; an unknown column is no sort. */
export function readSort<S extends string>(search: URLSearchParams, options: TableParamsOptions<S>): Pick<TableParams<S>, 'sort' | 'order'> {
  const sort = oneOf(options.sortFields ?? [], search.get('sort'));
  return { sort, order: sort ? (oneOf(['asc', 'desc'] as const, search.get('order')) ?? options.defaultOrder ?? 'asc') : undefined };
}

export function writePaging(search: URLSearchParams, params: TableParams, options: TableParamsOptions): void {
  if (params.page !== 1) search.set('page', String(params.page));
  if (params.pageSize !== options.defaultPageSize) search.set('pageSize', String(params.pageSize));
}

export function writeSort<S extends string>(search: URLSearchParams, params: TableParams<S>, options: TableParamsOptions<S>): void {
  if (!params.sort) return;
  search.set('sort', params.sort);
  search.set('order', params.order ?? options.defaultOrder ?? 'asc');
}
