import { FIELD_REPORT_KINDS, FIELD_REPORT_STATUSES, type FieldReportKind, type FieldReportStatus } from '@causeway/shared';
import { oneOf, readPaging, writePaging, type TableParams, type TableParamsOptions } from '@/utils/list-params';

export const PAGE_SIZES = [10, 25, 50, 100] as const;
export const MY_REPORTS_TABLE: TableParamsOptions = { pageSizes: PAGE_SIZES, defaultPageSize: 25 };

/** The page and filters of "my field reports", as kept in the address bar. */
export interface MyReportsParams extends TableParams<never> {
  status?: FieldReportStatus;
  kind?: FieldReportKind;
}

export function parseMyReportsParams(search: URLSearchParams): MyReportsParams {
  return {
    ...readPaging(search, MY_REPORTS_TABLE),
    status: oneOf(FIELD_REPORT_STATUSES, search.get('status')),
    kind: oneOf(FIELD_REPORT_KINDS, search.get('kind')),
  };
}

export function toMyReportsSearch(params: MyReportsParams): URLSearchParams {
  const search = new URLSearchParams();
  writePaging(search, params, MY_REPORTS_TABLE);
  if (params.status) search.set('status', params.status);
  if (params.kind) search.set('kind', params.kind);
  return search;
}
