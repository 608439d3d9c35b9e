import { formatMoney } from '@swapwright/shared';
import { Grid, Table, Typography } from 'antd';
import type { TableColumnsType } from 'antd';
import type { Quote, QuoteLine } from '../types';
import { LineDescription } from './line-description';
import { QuoteLineCards } from './quote-line-cards';
import { QuoteTotals } from './quote-totals';

/** The columns every view of a quote's lines shows on a wide screen (the editor adds its actions). */
export const quoteLineColumns = (currency: string): TableColumnsType<QuoteLine> => [
  {
    title: 'Description',
    dataIndex: 'description',
    render: (_, line) => (
      <>
        <LineDescription line={line} />
        {line.sku && (
          <Typography.Text type="secondary" style={{ display: 'block', fontSize: 12 }}>
            Part no. {line.sku}
          </Typography.Text>
        )}
      </>
    ),
  },
  { title: 'Qty / hours', align: 'right', render: (_, line) => (line.kind === 'labor' ? `${(line.hours ?? 0).toFixed(1)} h` : line.quantity) },
  { title: 'Unit', align: 'right', render: (_, line) => formatMoney(line.unitPriceCents, currency) },
  { title: 'Amount', align: 'right', render: (_, line) => formatMoney(line.lineTotalCents, currency) },
];

export interface QuoteLinesProps {
  quote: Quote;
}

/** The lines and totals of the revision shown, with the rounding rule the figures follow. */
export function QuoteLines({ quote }: QuoteLinesProps) {
  // Below antd's md (768 px) the lines stack, so nothing hides past the right edge of a phone.
  const narrow = Grid.useBreakpoint().md === false;
  const { lines, currency } = quote.revision;
  return (
    <>
      {narrow ? (
        <QuoteLineCards lines={lines} currency={currency} />
      ) : (
        <Table<QuoteLine> size="small" rowKey="key" pagination={false} scroll={{ x: 720 }} dataSource={lines} columns={quoteLineColumns(currency)} />
      )}
      <QuoteTotals quote={quote} />
    </>
  );
}
