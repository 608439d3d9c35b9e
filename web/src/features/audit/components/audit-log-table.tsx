import { AUDIT_KINDS } from '@swapwright/shared';
import { Card, Table, Tag, Typography } from 'antd';
import { FilterStrip } from '@/components/filter-strip';
import type { TableProps } from 'antd';
import { useState } from 'react';
import { EmptyState, ErrorState } from '@/components/query-state';
import { formatDateTime } from '@/lib/dates';
import { serverPagination } from '@/lib/table';
import { useAuditEvents } from '../api/get-audit-events';
import { changeWords } from '../audit-change-words';
import type { AuditEvent, AuditEventQuery, AuditKind } from '../types';

const KIND_LABELS: Record<AuditKind, string> = { money: 'Money', stock: 'Stock', 'sign-off': 'Sign-off', membership: 'Members', 'background-work': 'Background work' };
const KIND_COLOURS: Record<AuditKind, string> = { money: 'gold', stock: 'blue', 'sign-off': 'green', membership: 'purple', 'background-work': 'cyan' };


/** The shop's audit log: who changed money, stock, a sheet's sign-off or a membership, when, from what to what. */
export function AuditLogTable({ currency }: { currency?: string }) {
  const [query, setQuery] = useState<AuditEventQuery>({ page: 1, pageSize: 20 });
  const events = useAuditEvents(query);

  const columns: TableProps<AuditEvent>['columns'] = [
    { key: 'when', title: 'When', dataIndex: 'createdAt', width: 170, render: (value: string) => formatDateTime(value) },
    { key: 'who', title: 'Who', dataIndex: 'actorName', width: 170 },
    { key: 'kind', title: 'Kind', dataIndex: 'kind', width: 100, render: (kind: AuditKind) => <Tag color={KIND_COLOURS[kind]}>{KIND_LABELS[kind]}</Tag> },
    { key: 'what', title: 'What', dataIndex: 'summary' },
    {
      key: 'change',
      title: 'Before → after',
      render: (_value, event) => (
        <Typography.Text type="secondary" style={{ fontSize: 12 }}>
          {changeWords(event.action, event.before, currency)} → {changeWords(event.action, event.after, currency)}
        </Typography.Text>
      ),
    },
  ];

  const kindOptions: { label: string; value: AuditKind | 'all' }[] = [{ label: 'All', value: 'all' }, ...AUDIT_KINDS.map((kind) => ({ label: KIND_LABELS[kind], value: kind }))];

  return (
    <Card title="Audit log">
      <FilterStrip<AuditKind | 'all'>
        label="Kind of change"
        options={kindOptions}
        value={query.kind ?? 'all'}
        onChange={(value) => setQuery({ ...query, page: 1, kind: value === 'all' ? undefined : value })}
      />
      <Typography.Paragraph type="secondary">
        Every change to money (quotes sent and answered, deposits settled, rates), stock (counts, reservations, receipts, imports),
        measurement sign-offs, members and background work tried again, with who made it and the figures before and after.
      </Typography.Paragraph>
      {events.isError ? (
        <ErrorState error={events.error} onRetry={() => void events.refetch()} />
      ) : (
        <Table<AuditEvent>
          rowKey="id"
          size="small"
          loading={events.isPending}
          columns={columns}
          dataSource={events.data?.items ?? []}
          pagination={serverPagination(query, events.data?.total)}
          scroll={{ x: 720 }}
          locale={{
            emptyText: events.isPending ? (
              ' '
            ) : (
              <EmptyState
                description={
                  query.kind
                    ? `No ${KIND_LABELS[query.kind].toLowerCase()} changes recorded yet.`
                    : 'Nothing recorded yet. Sending or answering a quote, a deposit, a rate change, a stock count or reservation, a sheet sign-off or a member change each adds a line here.'
                }
              />
            ),
          }}
          onChange={(pagination) => {
            const pageSize = pagination.pageSize ?? query.pageSize;
            setQuery({ ...query, page: pageSize !== query.pageSize ? 1 : (pagination.current ?? 1), pageSize });
          }}
        />
      )}
    </Card>
  );
}
