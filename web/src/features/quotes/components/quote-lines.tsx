import { formatCents } from '@swapwright/shared';
import { Table, Typography } from 'antd';
import type { TableColumnsType } from 'antd';
import type { Quote, QuoteLine } from '../types';
import { QuoteTotals } from './quote-totals';

/** The columns every view of a quote's lines shows (the editor adds its actions). */
export const quoteLineColumns: TableColumnsType<QuoteLine> = [
  {
    title: 'Description',
    dataIndex: 'description',
    render: (_, line) => (
      <>
        {line.description}
        {line.sku && (
          <Typography.Text type="secondary" style={{ display: 'block', fontSize: 12 }}>
            Part no. {line.sku}
          </Typography.Text>
        )}
      </>
    ),
  },
  { title: 'Qty / hours', align: 'right', render: (_, line) => (line.kind === 'labor' ? `${(line.hours ?? 0).toFixed(1)} h` : line.quantity) },
  { title: 'Unit', align: 'right', render: (_, line) => formatCents(line.unitPriceCents) },
  { title: 'Amount', align: 'right', render: (_, line) => formatCents(line.lineTotalCents) },
];

export interface QuoteLinesProps {
  quote: Quote;
}

/** The lines and totals of the revision shown, with the rounding rule the figures follow. */
export function QuoteLines({ quote }: QuoteLinesProps) {
  return (
    <>
      <Table<QuoteLine> size="small" rowKey="key" pagination={false} scroll={{ x: 'max-content' }} dataSource={quote.revision.lines} columns={quoteLineColumns} />
      <QuoteTotals quote={quote} />
    </>
  );
}
