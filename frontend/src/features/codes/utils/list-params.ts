import { DTC_CONTROL_LABELS, DTC_SYSTEM_NAMES, type DtcControl, type DtcSystem } from '@causeway/shared';
import { oneOf, readPaging, readSort, writePaging, writeSort, type TableParams, type TableParamsOptions } from '@/utils/list-params';

export const CODE_SORT_FIELDS = ['code', 'title', 'subsystem'] as const;
export type CodeSortField = (typeof CODE_SORT_FIELDS)[number];
export const CODE_PAGE_SIZES = [25, 50, 100] as const;

export const CODE_SYSTEMS = Object.keys(DTC_SYSTEM_NAMES) as DtcSystem[];
export const CODE_CONTROLS = Object.keys(DTC_CONTROL_LABELS) as DtcControl[];

export const CODE_TABLE: TableParamsOptions<CodeSortField> = { pageSizes: CODE_PAGE_SIZES, defaultPageSize: 25, sortFields: CODE_SORT_FIELDS };

/** The browse table's page, sort, search and filters, as kept in the address bar. */
export interface CodeListParams extends TableParams<CodeSortField> {
  q: string;
  system?: DtcSystem;
  control?: DtcControl;
}

/** Reads the URL leniently: anything missing or out of range falls back to the default. */
export function parseCodeListParams(search: URLSearchParams): CodeListParams {
  return {
    ...readPaging(search, CODE_TABLE),
    q: (search.get('q') ?? '').trim().slice(0, 100),
    system: oneOf(CODE_SYSTEMS, (search.get('system') ?? '').toUpperCase()),
    control: oneOf(CODE_CONTROLS, search.get('control')),
    ...readSort(search, CODE_TABLE),
  };
}

/** Writes only what differs from the defaults, so plain addresses stay plain. */
export function toCodeListSearch(params: CodeListParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.q) search.set('q', params.q);
  if (params.system) search.set('system', params.system);
  if (params.control) search.set('control', params.control);
  writeSort(search, params, CODE_TABLE);
  writePaging(search, params, CODE_TABLE);
  return search;
}
