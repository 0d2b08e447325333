import { DTC_CONTROL_LABELS, DTC_SYSTEM_NAMES, type DtcControl, type DtcSystem } from '@causeway/shared';

export const CODE_SORT_FIELDS = ['code', 'title', 'subsystem'] as const;
export type CodeSortField = (typeof CODE_SORT_FIELDS)[number];
export type SortOrder = 'asc' | 'desc';
export const CODE_PAGE_SIZES = [25, 50, 100] as const;
const DEFAULT_PAGE_SIZE = 25;

export const CODE_SYSTEMS = Object.keys(DTC_SYSTEM_NAMES) as DtcSystem[];
export const CODE_CONTROLS = Object.keys(DTC_CONTROL_LABELS) as DtcControl[];

/** The browse table's page, sort, search and filters, as kept in the address bar. */
export interface CodeListParams {
  page: number;
  pageSize: number;
  q: string;
  system?: DtcSystem;
  control?: DtcControl;
  sort?: CodeSortField;
  order?: SortOrder;
}

function oneOf<T extends string>(values: readonly T[], value: string | null): T | undefined {
  return values.find((v) => v === value);
}

/** Reads the URL leniently: anything missing or out of range falls back to the default. */
export function parseCodeListParams(search: URLSearchParams): CodeListParams {
  const page = Number.parseInt(search.get('page') ?? '', 10);
  const pageSize = Number.parseInt(search.get('pageSize') ?? '', 10);
  const sort = oneOf(CODE_SORT_FIELDS, search.get('sort'));
  return {
    page: Number.isSafeInteger(page) && page >= 1 ? page : 1,
    pageSize: (CODE_PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : DEFAULT_PAGE_SIZE,
    q: (search.get('q') ?? '').trim().slice(0, 100),
    system: oneOf(CODE_SYSTEMS, (search.get('system') ?? '').toUpperCase()),
    control: oneOf(CODE_CONTROLS, search.get('control')),
    sort,
    order: sort ? (oneOf(['asc', 'desc'] as const, search.get('order')) ?? 'asc') : undefined,
  };
}

/** Writes only what differs from the defaults, so plain addresses stay plain. */
export function toCodeListSearch(params: CodeListParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.q) search.set('q', params.q);
  if (params.system) search.set('system', params.system);
  if (params.control) search.set('control', params.control);
  if (params.sort) {
    search.set('sort', params.sort);
    search.set('order', params.order ?? 'asc');
  }
  if (params.page !== 1) search.set('page', String(params.page));
  if (params.pageSize !== DEFAULT_PAGE_SIZE) search.set('pageSize', String(params.pageSize));
  return search;
}
