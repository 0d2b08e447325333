export const PAGE_SIZES = [10, 25, 50, 100] as const;
const DEFAULT_PAGE_SIZE = 25;
const DATE = /^\d{4}-\d{2}-\d{2}$/;

/** The audit log's page and filters, as kept in the address bar. Dates are calendar days (UTC). */
export interface AuditListParams {
  page: number;
  pageSize: number;
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
  const page = Number.parseInt(search.get('page') ?? '', 10);
  const pageSize = Number.parseInt(search.get('pageSize') ?? '', 10);
  const text = (key: string, max: number) => (search.get(key) ?? '').trim().slice(0, max);
  const action = text('action', 40);
  const entityType = text('entityType', 40);
  const from = text('from', 10);
  const to = text('to', 10);
  return {
    page: Number.isSafeInteger(page) && page >= 1 ? page : 1,
    pageSize: (PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : DEFAULT_PAGE_SIZE,
    actor: text('actor', 254),
    action: ACTION.test(action) ? action : '',
    entityType: ENTITY.test(entityType) ? entityType : '',
    from: DATE.test(from) ? from : '',
    to: DATE.test(to) ? to : '',
  };
}

export function toAuditListSearch(params: AuditListParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.page !== 1) search.set('page', String(params.page));
  if (params.pageSize !== DEFAULT_PAGE_SIZE) search.set('pageSize', String(params.pageSize));
  for (const key of ['actor', 'action', 'entityType', 'from', 'to'] as const) if (params[key]) search.set(key, params[key]);
  return search;
}
