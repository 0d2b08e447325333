import { FIELD_REPORT_KINDS, type FieldReportKind, type FieldReportStatus } from '@causeway/shared';

export const PAGE_SIZES = [10, 25, 50, 100] as const;
const DEFAULT_PAGE_SIZE = 25;

/** What the queue can show: waiting reports by default, decided or withdrawn ones for history. */
export const QUEUE_STATUSES = ['submitted', 'approved', 'rejected', 'withdrawn'] as const satisfies readonly FieldReportStatus[];
export type QueueStatus = (typeof QUEUE_STATUSES)[number];

/** The queue's page and filters, as kept in the address bar. */
export interface QueueParams {
  page: number;
  pageSize: number;
  status: QueueStatus;
  kind?: FieldReportKind;
  code: string;
}

function oneOf<T extends string>(values: readonly T[], value: string | null): T | undefined {
  return values.find((v) => v === value);
}

export function parseQueueParams(search: URLSearchParams): QueueParams {
  const page = Number.parseInt(search.get('page') ?? '', 10);
  const pageSize = Number.parseInt(search.get('pageSize') ?? '', 10);
  return {
    page: Number.isSafeInteger(page) && page >= 1 ? page : 1,
    pageSize: (PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : DEFAULT_PAGE_SIZE,
    status: oneOf(QUEUE_STATUSES, search.get('status')) ?? 'submitted',
    kind: oneOf(FIELD_REPORT_KINDS, search.get('kind')),
    code: (search.get('code') ?? '').trim().toUpperCase().slice(0, 16),
  };
}

export function toQueueSearch(params: QueueParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.page !== 1) search.set('page', String(params.page));
  if (params.pageSize !== DEFAULT_PAGE_SIZE) search.set('pageSize', String(params.pageSize));
  if (params.status !== 'submitted') search.set('status', params.status);
  if (params.kind) search.set('kind', params.kind);
  if (params.code) search.set('code', params.code);
  return search;
}
