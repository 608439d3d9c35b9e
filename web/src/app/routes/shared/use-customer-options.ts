import { useEffect, useMemo, useState } from 'react';
import { useCustomers } from '@/features/customers/api/get-customers';

/** Customer choices for selects in other features, searched on the server as the person types. */
export function useCustomerOptions({ enabled = true }: { enabled?: boolean } = {}) {
  const [text, setText] = useState('');
  const [search, setSearch] = useState('');

  useEffect(() => {
    const t = window.setTimeout(() => setSearch(text.trim()), 250);
    return () => window.clearTimeout(t);
  }, [text]);

  const query = useCustomers({ page: 1, pageSize: 20, sort: 'name', order: 'asc', search: search || undefined }, { enabled });
  const options = useMemo(() => (query.data?.items ?? []).map((c) => ({ value: c.id, label: c.name })), [query.data]);

  return { options, loading: query.isFetching, onSearch: setText };
}
