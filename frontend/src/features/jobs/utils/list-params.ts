import { JOB_SORTS, type JobSort, type JobStatus } from '@causeway/shared';

export type SortOrder = 'asc' | 'desc';
export const JOB_PAGE_SIZES = [10, 25, 50, 100] as const;
const DEFAULT_PAGE_SIZE = 25;
const DATE = /^\d{4}-\d{2}-\d{2}$/;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** The job list's page, filters and order, as kept in the address bar. */
export interface JobListParams {
  page: number;
  pageSize: number;
  status?: JobStatus;
  code?: string;
  vehicleId?: string;
  technicianId?: string;
  /** Opened on or after, YYYY-MM-DD. */
  from?: string;
  /** Opened on or before (the whole day), YYYY-MM-DD. */
  to?: string;
  sort?: JobSort;
  order?: SortOrder;
}

function oneOf<T extends string>(values: readonly T[], value: string | null): T | undefined {
  return values.find((v) => v === value);
}

function matching(pattern: RegExp, value: string | null): string | undefined {
  return value !== null && pattern.test(value) ? value : undefined;
}

/** Reads the URL leniently: anything missing or malformed falls back to no filter. */
export function parseJobListParams(search: URLSearchParams): JobListParams {
  const page = Number.parseInt(search.get('page') ?? '', 10);
  const pageSize = Number.parseInt(search.get('pageSize') ?? '', 10);
  const sort = oneOf(JOB_SORTS, search.get('sort'));
  const code = (search.get('code') ?? '').trim();
  return {
    page: Number.isSafeInteger(page) && page >= 1 ? page : 1,
    pageSize: (JOB_PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : DEFAULT_PAGE_SIZE,
    status: oneOf(['open', 'closed'] as const, search.get('status')),
    code: code || undefined,
    vehicleId: matching(UUID, search.get('vehicle')),
    technicianId: matching(UUID, search.get('technician')),
    from: matching(DATE, search.get('from')),
    to: matching(DATE, search.get('to')),
    sort,
    order: sort ? (oneOf(['asc', 'desc'] as const, search.get('order')) ?? 'desc') : undefined,
  };
}

/** Writes only what differs from the defaults, so plain addresses stay plain. */
export function toJobListSearch(params: JobListParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.page !== 1) search.set('page', String(params.page));
  if (params.pageSize !== DEFAULT_PAGE_SIZE) search.set('pageSize', String(params.pageSize));
  if (params.status) search.set('status', params.status);
  if (params.code) search.set('code', params.code);
  if (params.vehicleId) search.set('vehicle', params.vehicleId);
  if (params.technicianId) search.set('technician', params.technicianId);
  if (params.from) search.set('from', params.from);
  if (params.to) search.set('to', params.to);
  if (params.sort) {
    search.set('sort', params.sort);
    search.set('order', params.order ?? 'desc');
  }
  return search;
}
