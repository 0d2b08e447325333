// @vitest-environment node
import { describe, expect, it } from 'vitest';
import { readPaging, readSort, writePaging, writeSort, type TableParams, type TableParamsOptions } from '@/utils/list-params';

const USERS: TableParamsOptions<'email' | 'role'> = { pageSizes: [10, 20, 50], defaultPageSize: 20, sortFields: ['email', 'role'] };
const JOBS: TableParamsOptions<'openedAt'> = { pageSizes: [10, 25], defaultPageSize: 25, sortFields: ['openedAt'], defaultOrder: 'desc' };

const read = <S extends string>(query: string, options: TableParamsOptions<S>) => {
  const search = new URLSearchParams(query);
  return { ...readPaging(search, options), ...readSort(search, options) };
};
const write = <S extends string>(params: TableParams<S>, options: TableParamsOptions<S>) => {
  const search = new URLSearchParams();
  writePaging(search, params, options);
  writeSort(search, params, options);
  return search.toString();
};

describe('paging and sorting in the address', () => {
  it('falls back to the defaults for anything missing or out of range', () => {
    expect(read('page=0&pageSize=7&sort=password&order=up', USERS)).toEqual({ page: 1, pageSize: 20, sort: undefined, order: undefined });
    expect(read('page=x', USERS)).toMatchObject({ page: 1 });
  });

  it("gives a sort without an order the list's own default: ascending unless said, newest first for jobs", () => {
    expect(read('sort=email', USERS)).toMatchObject({ sort: 'email', order: 'asc' });
    expect(read('sort=openedAt', JOBS)).toMatchObject({ sort: 'openedAt', order: 'desc' });
    expect(write({ page: 1, pageSize: 25, sort: 'openedAt' }, JOBS)).toBe('sort=openedAt&order=desc');
  });

  it('writes only what differs from the defaults, and reads it back the same', () => {
    const query = 'page=2&pageSize=50&sort=role&order=desc';
    expect(write(read(query, USERS), USERS)).toBe(query);
    expect(write({ page: 1, pageSize: 20 }, USERS)).toBe('');
  });
});
