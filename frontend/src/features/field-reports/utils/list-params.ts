import { FIELD_REPORT_KINDS, FIELD_REPORT_STATUSES, type FieldReportKind, type FieldReportStatus } from '@causeway/shared';

export const PAGE_SIZES = [10, 25, 50, 100] as const;
const DEFAULT_PAGE_SIZE = 25;

/** The page and filters of "my field reports", as kept in the address bar. */
export interface MyReportsParams {
  page: number;
  pageSize: number;
  status?: FieldReportStatus;
  kind?: FieldReportKind;
}

function oneOf<T extends string>(values: readonly T[], value: string | null): T | undefined {
  return values.find((v) => v === value);
}

export function parseMyReportsParams(search: URLSearchParams): MyReportsParams {
  const page = Number.parseInt(search.get('page') ?? '', 10);
  const pageSize = Number.parseInt(search.get('pageSize') ?? '', 10);
  return {
    page: Number.isSafeInteger(page) && page >= 1 ? page : 1,
    pageSize: (PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : DEFAULT_PAGE_SIZE,
    status: oneOf(FIELD_REPORT_STATUSES, search.get('status')),
    kind: oneOf(FIELD_REPORT_KINDS, search.get('kind')),
  };
}

export function toMyReportsSearch(params: MyReportsParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.page !== 1) search.set('page', String(params.page));
  if (params.pageSize !== DEFAULT_PAGE_SIZE) search.set('pageSize', String(params.pageSize));
  if (params.status) search.set('status', params.status);
  if (params.kind) search.set('kind', params.kind);
  return search;
}
