import { ROLES, type Role } from '@causeway/shared';
import { oneOf, readPaging, readSort, writePaging, writeSort, type TableParams, type TableParamsOptions } from '@/utils/list-params';

export const USER_SORT_FIELDS = ['email', 'displayName', 'createdAt', 'role'] as const;
export type UserSortField = (typeof USER_SORT_FIELDS)[number];
export const PAGE_SIZES = [10, 20, 50, 100] as const;

export const USER_TABLE: TableParamsOptions<UserSortField> = { pageSizes: PAGE_SIZES, defaultPageSize: 20, sortFields: USER_SORT_FIELDS };

/** The table's page, sort, search and filter, as kept in the address bar. */
export interface UserListParams extends TableParams<UserSortField> {
  q: string;
  role?: Role;
}

/** Reads the URL leniently: anything missing or out of range falls back to the default. */
export function parseUserListParams(search: URLSearchParams): UserListParams {
  return {
    ...readPaging(search, USER_TABLE),
    q: (search.get('q') ?? '').trim(),
    ...readSort(search, USER_TABLE),
    role: oneOf(ROLES, search.get('role')),
  };
}

/** Writes only what differs from the defaults, so plain addresses stay plain. */
export function toUserListSearch(params: UserListParams): URLSearchParams {
  const search = new URLSearchParams();
  writePaging(search, params, USER_TABLE);
  if (params.q) search.set('q', params.q);
  writeSort(search, params, USER_TABLE);
  if (params.role) search.set('role', params.role);
  return search;
}
