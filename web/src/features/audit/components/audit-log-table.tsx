import { AUDIT_KINDS } from '@swapwright/shared';
import { Card, Flex, Grid, Table, Tag, Typography } from 'antd';
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
  // Below antd's md (768 px) each entry is one stacked cell, so a phone reads when, who and what without scrolling sideways.
  const narrow = Grid.useBreakpoint().md === false;
  const change = (event: AuditEvent) => (
    <Typography.Text type="secondary" style={{ fontSize: 12 }}>
      {changeWords(event.action, event.before, currency)} → {changeWords(event.action, event.after, currency)}
    </Typography.Text>
  );

  const stacked: TableProps<AuditEvent>['columns'] = [
    {
      key: 'entry',
      title: 'Change',
      render: (_value, event) => (
        <Flex vertical gap={2} data-testid="audit-entry">
          <Flex wrap gap={6} align="center">
            <Tag color={KIND_COLOURS[event.kind]}>{KIND_LABELS[event.kind]}</Tag>
            <Typography.Text type="secondary" style={{ fontSize: 13 }}>
              {formatDateTime(event.createdAt)} · {event.actorName}
            </Typography.Text>
          </Flex>
          <Typography.Text>{event.summary}</Typography.Text>
          {change(event)}
        </Flex>
      ),
    },
  ];

  const columns: TableProps<AuditEvent>['columns'] = [
    { key: 'when', title: 'When', dataIndex: 'createdAt', width: 170, render: (value: string) => formatDateTime(value) },
    { key: 'who', title: 'Who', dataIndex: 'actorName', width: 170 },
    { key: 'kind', title: 'Kind', dataIndex: 'kind', width: 100, render: (kind: AuditKind) => <Tag color={KIND_COLOURS[kind]}>{KIND_LABELS[kind]}</Tag> },
    { key: 'what', title: 'What', dataIndex: 'summary' },
    { key: 'change', title: 'Before → after', render: (_value, event) => change(event) },
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
          columns={narrow ? stacked : columns}
          dataSource={events.data?.items ?? []}
          pagination={serverPagination(query, events.data?.total)}
          scroll={narrow ? undefined : { x: 720 }}
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
