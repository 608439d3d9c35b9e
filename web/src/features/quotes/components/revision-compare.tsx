import { formatMoney, formatMoneyChange } from '@swapwright/shared';
import { Alert, Flex, Grid, Select, Table, Tag, Typography } from 'antd';
import { useState } from 'react';
import { getErrorMessage } from '@/lib/api-error';
import { formatDate } from '@/lib/dates';
import { useQuoteRevisionCompare } from '../api/compare-quote-revisions';
import type { Quote, QuoteRevisionDiff } from '../types';
import { LineDescription } from './line-description';

type DiffLine = QuoteRevisionDiff['lines'][number];
type Side = NonNullable<DiffLine['before']>;
type DiffTotal = QuoteRevisionDiff['totals'][number];

export interface RevisionCompareProps {
  quote: Quote;
}

const CHANGE_TAG: Record<DiffLine['change'], { color: string; label: string }> = {
  added: { color: 'green', label: 'Added' },
  removed: { color: 'red', label: 'Removed' },
  changed: { color: 'gold', label: 'Changed' },
};

const TOTAL_LABELS: Record<string, string> = {
  partsSubtotalCents: 'Parts',
  laborSubtotalCents: 'Labor',
  suppliesCents: 'Shop supplies',
  partsDiscountCents: 'Parts discount',
  laborDiscountCents: 'Labor discount',
  partsTaxCents: 'Tax on parts',
  laborTaxCents: 'Tax on labor',
  taxCents: 'Tax',
  totalCents: 'Total',
  depositCents: 'Deposit on approval',
};

const amountOf = (line: DiffLine, side: Side) => (line.kind === 'labor' ? `${(side.hours ?? 0).toFixed(1)} h` : String(side.quantity));

/** "before → after" when a figure moved, the one figure when it did not, and only one side for added or removed lines. */
function beforeAfter(line: DiffLine, show: (side: Side) => string) {
  const before = line.before ? show(line.before) : null;
  const after = line.after ? show(line.after) : null;
  if (before === null) return after;
  if (after === null) return <Typography.Text delete>{before}</Typography.Text>;
  if (before === after) return after;
  return (
    <span>
      <Typography.Text type="secondary">{before}</Typography.Text> → <strong>{after}</strong>
    </span>
  );
}

/** Two revisions of a quote side by side: the lines added, removed and changed, and every total that moved, as the API compares them. */
export function RevisionCompare({ quote }: RevisionCompareProps) {
  const numbers = quote.revisions.map((revision) => revision.number);
  const [from, setFrom] = useState<number | undefined>(numbers.at(-2));
  const [to, setTo] = useState<number | undefined>(numbers.at(-1));
  const diff = useQuoteRevisionCompare(quote.id, from, to);
  const options = quote.revisions.map((revision) => ({
    value: revision.number,
    label: `Revision ${revision.number} · ${revision.sentAt ? `sent ${formatDate(revision.sentAt)}` : 'not sent'}`,
  }));
  const currency = quote.revision.currency;
  const money = (cents: number) => formatMoney(cents, currency);
  const signed = (cents: number) => formatMoneyChange(cents, currency);
  // Below antd's md (768 px) a changed line is one stacked cell (change, description, quantity, unit and amount,
  // each before → after), so nothing hides past the right edge of a phone.
  const narrow = Grid.useBreakpoint().md === false;

  return (
    <Flex vertical gap={12} data-testid="revision-compare">
      <Flex gap={8} wrap align="center">
        <span>From</span>
        <Select aria-label="Compare from revision" value={from} onChange={setFrom} options={options} style={{ minWidth: 220 }} />
        <span>to</span>
        <Select aria-label="Compare to revision" value={to} onChange={setTo} options={options} style={{ minWidth: 220 }} />
      </Flex>
      {from !== undefined && from === to && <Typography.Text type="secondary">Pick two different revisions.</Typography.Text>}
      {diff.isError && <Alert type="error" showIcon title={getErrorMessage(diff.error)} />}
      {diff.data && (
        <>
          {diff.data.lines.length === 0 ? (
            <Typography.Text>No line changed between revision {diff.data.fromNumber} and revision {diff.data.toNumber}.</Typography.Text>
          ) : (
            <Table<DiffLine>
              size="small"
              rowKey="key"
              pagination={false}
              scroll={narrow ? undefined : { x: 'max-content' }}
              dataSource={diff.data.lines}
              aria-label="Lines changed"
              columns={
                narrow
                  ? [
                      {
                        title: 'Line',
                        key: 'line',
                        render: (_, line) => (
                          <Flex vertical gap={2}>
                            <span>
                              <Tag color={CHANGE_TAG[line.change].color}>{CHANGE_TAG[line.change].label}</Tag>
                              <LineDescription line={line} />
                            </span>
                            <span>
                              {beforeAfter(line, (side) => amountOf(line, side))} × {beforeAfter(line, (side) => money(side.unitPriceCents))}
                            </span>
                            <span>Amount {beforeAfter(line, (side) => money(side.lineTotalCents))}</span>
                          </Flex>
                        ),
                      },
                    ]
                  : [
                      { title: 'Change', key: 'change', render: (_, line) => <Tag color={CHANGE_TAG[line.change].color}>{CHANGE_TAG[line.change].label}</Tag> },
                      { title: 'Description', dataIndex: 'description', render: (_, line) => <LineDescription line={line} /> },
                      { title: 'Qty / hours', key: 'amount', align: 'right', render: (_, line) => beforeAfter(line, (side) => amountOf(line, side)) },
                      { title: 'Unit', key: 'unit', align: 'right', render: (_, line) => beforeAfter(line, (side) => money(side.unitPriceCents)) },
                      { title: 'Amount', key: 'total', align: 'right', render: (_, line) => beforeAfter(line, (side) => money(side.lineTotalCents)) },
                    ]
              }
            />
          )}
          {diff.data.totals.length === 0 ? (
            <Typography.Text>The totals are the same.</Typography.Text>
          ) : (
            <Table<DiffTotal>
              size="small"
              rowKey="field"
              pagination={false}
              dataSource={diff.data.totals}
              aria-label="Totals changed"
              columns={[
                { title: 'Total', dataIndex: 'field', render: (field: string) => TOTAL_LABELS[field] ?? field },
                { title: `Revision ${diff.data.fromNumber}`, dataIndex: 'beforeCents', align: 'right', render: money },
                { title: `Revision ${diff.data.toNumber}`, dataIndex: 'afterCents', align: 'right', render: money },
                { title: 'Change', dataIndex: 'deltaCents', align: 'right', render: signed },
              ]}
            />
          )}
        </>
      )}
    </Flex>
  );
}
