import { useEffect, useMemo, useState } from 'react';
import { useCustomers } from '@/features/customers/api/get-customers';
import { ownRecordWords } from '@/features/customers/own-record';

/**
 * Customer choices for selects in other features, searched on the server as the person types. `noOtherCustomers`
 * is true when the shop has no customer yet besides the signed-in person's own record (undefined while loading).
 * The signed-in person's own record reads "Name (you)"; `withoutOwnRecord` leaves it out (an invitation to oneself).
 */
export function useCustomerOptions({ enabled = true, ownUserId, withoutOwnRecord = false }: { enabled?: boolean; ownUserId?: string; withoutOwnRecord?: boolean } = {}) {
  const [text, setText] = useState('');
  const [search, setSearch] = useState('');

  useEffect(() => {
    const t = window.setTimeout(() => setSearch(text.trim()), 250);
    return () => window.clearTimeout(t);
  }, [text]);

  const query = useCustomers({ page: 1, pageSize: 20, sort: 'name', order: 'asc', search: search || undefined }, { enabled });
  const firstTwo = useCustomers({ page: 1, pageSize: 2, sort: 'name', order: 'asc' }, { enabled: enabled && ownUserId !== undefined });
  const options = useMemo(
    () =>
      (query.data?.items ?? [])
        .filter((c) => !(withoutOwnRecord && c.ownRecord))
        .map((c) => ({ value: c.id, label: c.ownRecord ? `${c.name}${ownRecordWords.optionSuffix}` : c.name })),
    [query.data, withoutOwnRecord],
  );
  const page = firstTwo.isSuccess && !firstTwo.isPlaceholderData ? firstTwo.data : undefined;
  const noOtherCustomers = page ? page.total === 0 || (page.total === 1 && page.items[0]?.userId === ownUserId) : undefined;

  return { options, loading: query.isFetching, onSearch: setText, noOtherCustomers };
}
