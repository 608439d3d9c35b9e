import { formatCents } from '@swapwright/shared';
import { Table, Typography } from 'antd';
import type { Quote } from '../types';

type Line = Quote['revision']['lines'][number];

export interface QuoteLinesProps {
  quote: Quote;
}

/** The lines and totals of the revision shown, with the rounding rule the figures follow. */
export function QuoteLines({ quote }: QuoteLinesProps) {
  const { revision } = quote;
  const money = (cents: number) => `${revision.currency} ${formatCents(cents)}`;
  const totals = revision.totals;
  const rows: [string, number][] = [
    ['Parts', totals.partsSubtotalCents],
    ...(totals.partsDiscountCents ? [['Parts discount', -totals.partsDiscountCents] as [string, number]] : []),
    ['Labor', totals.laborSubtotalCents],
    ...(totals.laborDiscountCents ? [['Labor discount', -totals.laborDiscountCents] as [string, number]] : []),
    ['Shop supplies', totals.suppliesCents],
    ['Tax', totals.taxCents],
  ];
  return (
    <>
      <Table<Line>
        size="small"
        rowKey="key"
        pagination={false}
        scroll={{ x: 'max-content' }}
        dataSource={revision.lines}
        columns={[
          { title: 'Description', dataIndex: 'description' },
          { title: 'Qty / hours', align: 'right', render: (_, line) => (line.kind === 'labor' ? `${(line.hours ?? 0).toFixed(1)} h` : line.quantity) },
          { title: 'Unit', align: 'right', render: (_, line) => formatCents(line.unitPriceCents) },
          { title: 'Amount', align: 'right', render: (_, line) => formatCents(line.lineTotalCents) },
        ]}
      />
      <table style={{ marginLeft: 'auto', marginTop: 12 }} aria-label="Totals">
        <tbody>
          {rows.map(([label, cents]) => (
            <tr key={label}>
              <td style={{ paddingRight: 24 }}>{label}</td>
              <td style={{ textAlign: 'right' }}>{money(cents)}</td>
            </tr>
          ))}
          <tr>
            <td style={{ paddingRight: 24 }}>
              <strong>Total</strong>
            </td>
            <td style={{ textAlign: 'right' }} data-testid="quote-total">
              <strong>{money(totals.totalCents)}</strong>
            </td>
          </tr>
          <tr>
            <td style={{ paddingRight: 24 }}>Deposit on approval</td>
            <td style={{ textAlign: 'right' }} data-testid="quote-deposit">
              {money(totals.depositCents)}
            </td>
          </tr>
        </tbody>
      </table>
      <Typography.Paragraph type="secondary" style={{ marginTop: 12, fontSize: 12 }}>
        {quote.roundingRule}
      </Typography.Paragraph>
    </>
  );
}
