import { ROLES, type Role } from '@causeway/shared';

export const USER_SORT_FIELDS = ['email', 'displayName', 'createdAt', 'role'] as const;
export type UserSortField = (typeof USER_SORT_FIELDS)[number];
export type SortOrder = 'asc' | 'desc';
export const PAGE_SIZES = [10, 20, 50, 100] as const;

/** The table's page, sort, search and filter, as kept in the address bar. */
export interface UserListParams {
  page: number;
  pageSize: number;
  q: string;
  sort?: UserSortField;
  order?: SortOrder;
  role?: Role;
}

function oneOf<T extends string>(values: readonly T[], value: string | null): T | undefined {
  return values.find((v) => v === value);
}

/** Reads the URL leniently: anything missing or out of range falls back to the default. */
export function parseUserListParams(search: URLSearchParams): UserListParams {
  const page = Number.parseInt(search.get('page') ?? '', 10);
  const pageSize = Number.parseInt(search.get('pageSize') ?? '', 10);
  const sort = oneOf(USER_SORT_FIELDS, search.get('sort'));
  return {
    page: Number.isSafeInteger(page) && page >= 1 ? page : 1,
    pageSize: (PAGE_SIZES as readonly number[]).includes(pageSize) ? pageSize : 20,
    q: (search.get('q') ?? '').trim(),
    sort,
    order: sort ? (oneOf(['asc', 'desc'] as const, search.get('order')) ?? 'asc') : undefined,
    role: oneOf(ROLES, search.get('role')),
  };
}

/** Writes only what differs from the defaults, so plain addresses stay plain. */
export function toUserListSearch(params: UserListParams): URLSearchParams {
  const search = new URLSearchParams();
  if (params.page !== 1) search.set('page', String(params.page));
  if (params.pageSize !== 20) search.set('pageSize', String(params.pageSize));
  if (params.q) search.set('q', params.q);
  if (params.sort) {
    search.set('sort', params.sort);
    search.set('order', params.order ?? 'asc');
  }
  if (params.role) search.set('role', params.role);
  return search;
}
