import { Typography } from 'antd';
import type { ReactNode } from 'react';
import { CompactList } from '@/components/compact-list';
import { EmptyState, QueryState } from '@/components/query-state';
import { formatDate } from '@/lib/table';
import { useCustomers } from '../api/get-customers';
import { ownRecordWords } from '../own-record';

export type RecentCustomersProps = { limit?: number; emptyAction?: ReactNode };

export function RecentCustomers({ limit = 5, emptyAction }: RecentCustomersProps) {
  const query = useCustomers({ page: 1, pageSize: limit, sort: 'createdAt', order: 'desc' });
  return (
    <QueryState
      query={query}
      loadingRows={3}
      isEmpty={(p) => p.items.length === 0}
      empty={<EmptyState description="No customers yet." action={emptyAction} />}
    >
      {(page) => (
        <CompactList
          label="Recent customers"
          items={page.items.map((c) => ({
            key: c.id,
            title: c.ownRecord ? `${c.name}${ownRecordWords.optionSuffix}` : c.name,
            description: c.ownRecord ? ownRecordWords.note : (c.email ?? c.phone ?? 'No contact details'),
            extra: <Typography.Text type="secondary">{formatDate(c.createdAt)}</Typography.Text>,
          }))}
        />
      )}
    </QueryState>
  );
}
