import { JOB_SORTS, type JobSort, type JobStatus } from '@causeway/shared';
import { oneOf, readPaging, readSort, writePaging, writeSort, type TableParams, type TableParamsOptions } from '@/utils/list-params';

export const JOB_PAGE_SIZES = [10, 25, 50, 100] as const;
const DATE = /^\d{4}-\d{2}-\d{2}$/;
const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Jobs sort newest first unless the address says otherwise. */
export const JOB_TABLE: TableParamsOptions<JobSort> = { pageSizes: JOB_PAGE_SIZES, defaultPageSize: 25, sortFields: JOB_SORTS, defaultOrder: 'desc' };

/** The job list's page, filters and order, as kept in the address bar. */
export interface JobListParams extends TableParams<JobSort> {
  status?: JobStatus;
  code?: string;
  vehicleId?: string;
  technicianId?: string;
  /** Opened on or after, YYYY-MM-DD. */
  from?: string;
  /** Opened on or before (the whole day), YYYY-MM-DD. */
  to?: string;
}

function matching(pattern: RegExp, value: string | null): string | undefined {
  return value !== null && pattern.test(value) ? value : undefined;
}

/** Reads the URL leniently: anything missing or malformed falls back to no filter. */
export function parseJobListParams(search: URLSearchParams): JobListParams {
  const code = (search.get('code') ?? '').trim();
  return {
    ...readPaging(search, JOB_TABLE),
    status: oneOf(['open', 'closed'] as const, search.get('status')),
    code: code || undefined,
    vehicleId: matching(UUID, search.get('vehicle')),
    technicianId: matching(UUID, search.get('technician')),
    from: matching(DATE, search.get('from')),
    to: matching(DATE, search.get('to')),
    ...readSort(search, JOB_TABLE),
  };
}

/** Writes only what differs from the defaults, so plain addresses stay plain. */
export function toJobListSearch(params: JobListParams): URLSearchParams {
  const search = new URLSearchParams();
  writePaging(search, params, JOB_TABLE);
  if (params.status) search.set('status', params.status);
  if (params.code) search.set('code', params.code);
  if (params.vehicleId) search.set('vehicle', params.vehicleId);
  if (params.technicianId) search.set('technician', params.technicianId);
  if (params.from) search.set('from', params.from);
  if (params.to) search.set('to', params.to);
  writeSort(search, params, JOB_TABLE);
  return search;
}
