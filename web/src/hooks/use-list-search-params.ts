import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';
import type { SortOrder } from '@/lib/api-types';

export type ListParams<TSort extends string> = {
  page: number;
  pageSize: number;
  sort?: TSort;
  order?: SortOrder;
  search?: string;
  [filter: string]: string | number | undefined;
};

export type ListParamsConfig<TSort extends string> = {
  sortFields: readonly TSort[];
  filters?: readonly string[];
  defaultPageSize?: number;
};

export const PAGE_SIZES = [10, 20, 50, 100] as const;

/** List state (page, sort, search, filters) kept in the URL so it survives reloads and can be shared. */
export function useListSearchParams<TSort extends string>({
  sortFields,
  filters = [],
  defaultPageSize = 20,
}: ListParamsConfig<TSort>) {
  const [searchParams, setSearchParams] = useSearchParams();

  const params = useMemo<ListParams<TSort>>(() => {
    const page = Math.max(1, Number(searchParams.get('page')) || 1);
    const sizeRaw = Number(searchParams.get('pageSize'));
    const pageSize = (PAGE_SIZES as readonly number[]).includes(sizeRaw) ? sizeRaw : defaultPageSize;
    const sortRaw = searchParams.get('sort');
    const sort = sortFields.find((f) => f === sortRaw);
    const orderRaw = searchParams.get('order');
    const order: SortOrder | undefined = sort ? (orderRaw === 'desc' ? 'desc' : 'asc') : undefined;
    const result: ListParams<TSort> = { page, pageSize, sort, order, search: searchParams.get('search') || undefined };
    for (const f of filters) result[f] = searchParams.get(f) || undefined;
    return result;
    // sortFields and filters are constant per call site
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [searchParams, defaultPageSize]);

  const setParams = useCallback(
    (patch: Partial<ListParams<TSort>>) => {
      setSearchParams(
        (prev) => {
          const next = new URLSearchParams(prev);
          for (const [key, value] of Object.entries(patch)) {
            if (value === undefined || value === null || value === '') next.delete(key);
            else next.set(key, String(value));
          }
          if (next.get('page') === '1') next.delete('page');
          if (next.get('pageSize') === String(defaultPageSize)) next.delete('pageSize');
          return next;
        },
        { replace: false },
      );
    },
    [setSearchParams, defaultPageSize],
  );

  return [params, setParams] as const;
}
