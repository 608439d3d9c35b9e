import type { TablePaginationConfig } from 'antd';
import type { SorterResult } from 'antd/es/table/interface';
import type { SortOrder } from '@/lib/api-types';
import { PAGE_SIZES } from '@/hooks/use-list-search-params';

export type TableSort<TSort extends string> = { sort?: TSort; order?: SortOrder };

/** antd's sorter → our `sort` / `order` query params. */
export function sorterToParams<TRecord, TSort extends string>(
  sorter: SorterResult<TRecord> | SorterResult<TRecord>[],
  allowed: readonly TSort[],
): TableSort<TSort> {
  const s = Array.isArray(sorter) ? sorter[0] : sorter;
  const field = (s?.columnKey ?? s?.field) as string | undefined;
  if (!s?.order || !field) return { sort: undefined, order: undefined };
  const sort = allowed.find((a) => a === field);
  if (!sort) return { sort: undefined, order: undefined };
  return { sort, order: s.order === 'descend' ? 'desc' : 'asc' };
}

/** Our params → antd's controlled `sortOrder` for one column. */
export function sortOrderFor(column: string, sort?: string, order?: SortOrder): 'ascend' | 'descend' | null {
  if (sort !== column) return null;
  return order === 'desc' ? 'descend' : 'ascend';
}

/** antd pagination for a list paged by the server: current page, size choices and "1–20 of 57". */
export function serverPagination(query: { page: number; pageSize: number }, total: number | undefined): TablePaginationConfig {
  return {
    current: query.page,
    pageSize: query.pageSize,
    total: total ?? 0,
    showSizeChanger: true,
    pageSizeOptions: PAGE_SIZES.map(String),
    showTotal: (all, [from, to]) => `${from}–${to} of ${all}`,
  };
}

/** Kept for existing imports; the formatter lives in `@/lib/dates`. */
export { formatDate } from './dates';
