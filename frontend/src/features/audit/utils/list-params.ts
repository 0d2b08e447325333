import { readPaging, writePaging, type TableParams, type TableParamsOptions } from '@/utils/list-params';

export const PAGE_SIZES = [10, 25, 50, 100] as const;
export const AUDIT_TABLE: TableParamsOptions = { pageSizes: PAGE_SIZES, defaultPageSize: 25 };
const DATE = /^\d{4}-\d{2}-\d{2}$/;

/** The audit log's page and filters, as kept in the address bar. Dates are calendar days (UTC). */
export interface AuditListParams extends TableParams<never> {
  /** A user id or part of an e-mail address. */
  actor: string;
  /** An action (`cause.update`) or a prefix ending in a dot (`cause.`). */
  action: string;
  entityType: string;
  /** YYYY-MM-DD, inclusive. */
  from: string;
  to: string;
}

const ACTION = /^[a-z][a-z-]*(\.[a-z-]*)?$/;
const ENTITY = /^[a-z][a-z-]*$/;

export function parseAuditListParams(search: URLSearchParams): AuditListParams {
  const text = (key: string, max: number) => (search.get(key) ?? '').trim().slice(0, max);
  const action = text('action', 40);
  const entityType = text('entityType', 40);
  const from = text('from', 10);
  const to = text('to', 10);
  return {
    ...readPaging(search, AUDIT_TABLE),
    actor: text('actor', 254),
    action: ACTION.test(action) ? action : '',
    entityType: ENTITY.test(entityType) ? entityType : '',
    from: DATE.test(from) ? from : '',
    to: DATE.test(to) ? to : '',
  };
}

export function toAuditListSearch(params: AuditListParams): URLSearchParams {
  const search = new URLSearchParams();
  writePaging(search, params, AUDIT_TABLE);
  for (const key of ['actor', 'action', 'entityType', 'from', 'to'] as const) if (params[key]) search.set(key, params[key]);
  return search;
}
