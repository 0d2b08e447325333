import type { TablePaginationConfig } from 'antd';
import type { Key } from 'react';
import type { TableParams, TableParamsOptions } from '@/utils/list-params';

/** What antd's Table hands its onChange: the column filters and the sorted column. */
type TableFilters = Record<string, readonly (Key | boolean)[] | null>;
type TableSorter = { columnKey?: Key; order?: 'ascend' | 'descend' | null };

type UseTableParamsOptions<S extends string, P> = TableParamsOptions<S> & {
  /** The list's own params from the columns' filters, when it filters in the header. */
  filtersOf?: (filters: TableFilters) => Partial<P>;
};

/**
 * A server-side antd Table driven by params held by its page (in the address): the sortable
 * columns' props, the Table's onChange and its pagination. A new order, filter or page size
 * starts again at the first page.
 */
export function useTableParams<S extends string, P extends TableParams<S>>(params: P, onParamsChange: (next: P) => void, options: UseTableParamsOptions<S, P>) {
  const defaultOrder = options.defaultOrder ?? 'asc';

  const sortOrderOf = (field: S): 'ascend' | 'descend' | null => {
    if (params.sort !== field) return null;
    return (params.order ?? defaultOrder) === 'desc' ? 'descend' : 'ascend';
  };

  /** A column the server sorts by; its key is the sort field. */
  const sortable = (field: S) => ({ key: field, sorter: true, sortOrder: sortOrderOf(field) });

  const onChange = (pagination: TablePaginationConfig, filters: TableFilters, sorter: TableSorter | TableSorter[], extra: { action: string }) => {
    const pageSize = pagination.pageSize ?? params.pageSize;
    const page = extra.action === 'paginate' && pageSize === params.pageSize ? (pagination.current ?? 1) : 1;
    const next = { ...params, page, pageSize };
    if (options.sortFields) {
      const { columnKey, order } = (Array.isArray(sorter) ? sorter[0] : sorter) ?? {};
      const sortField = options.sortFields.find((f) => f === columnKey);
      next.sort = order && sortField ? sortField : undefined;
      next.order = order && sortField ? (order === 'descend' ? 'desc' : 'asc') : undefined;
    }
    onParamsChange({ ...next, ...options.filtersOf?.(filters) });
  };

  /** A new search or filter starts again at the first page. */
  const refine = (changes: Partial<P>) => onParamsChange({ ...params, ...changes, page: 1 });

  const pagination = (total: number, showTotal: (total: number) => string): TablePaginationConfig => ({
    current: params.page,
    pageSize: params.pageSize,
    total,
    showSizeChanger: true,
    pageSizeOptions: options.pageSizes.map(String),
    showTotal,
  });

  return { sortable, onChange, refine, pagination };
}
