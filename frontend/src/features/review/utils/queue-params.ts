import { FIELD_REPORT_KINDS, type FieldReportKind, type FieldReportStatus } from '@causeway/shared';
import { oneOf, readPaging, writePaging, type TableParams, type TableParamsOptions } from '@/utils/list-params';

export const PAGE_SIZES = [10, 25, 50, 100] as const;
export const QUEUE_TABLE: TableParamsOptions = { pageSizes: PAGE_SIZES, defaultPageSize: 25 };

/** What the queue can show: waiting reports by default, decided or withdrawn ones for history. */
export const QUEUE_STATUSES = ['submitted', 'approved', 'rejected', 'withdrawn'] as const satisfies readonly FieldReportStatus[];
export type QueueStatus = (typeof QUEUE_STATUSES)[number];

/** The queue's page and filters, as kept in the address bar. */
export interface QueueParams extends TableParams<never> {
  status: QueueStatus;
  kind?: FieldReportKind;
  code: string;
}

export function parseQueueParams(search: URLSearchParams): QueueParams {
  return {
    ...readPaging(search, QUEUE_TABLE),
    status: oneOf(QUEUE_STATUSES, search.get('status')) ?? 'submitted',
    kind: oneOf(FIELD_REPORT_KINDS, search.get('kind')),
    code: (search.get('code') ?? '').trim().toUpperCase().slice(0, 16),
  };
}

export function toQueueSearch(params: QueueParams): URLSearchParams {
  const search = new URLSearchParams();
  writePaging(search, params, QUEUE_TABLE);
  if (params.status !== 'submitted') search.set('status', params.status);
  if (params.kind) search.set('kind', params.kind);
  if (params.code) search.set('code', params.code);
  return search;
}
