import { formatMoney, quoteTotalRows } from '@swapwright/shared';
import { Typography } from 'antd';
import type { Quote } from '../types';

export interface QuoteTotalsProps {
  quote: Quote;
}

/** The revision's totals as the API worked them out (a customer's quote with its deposit), with the rounding rule the figures follow. */
export function QuoteTotals({ quote }: QuoteTotalsProps) {
  const { revision } = quote;
  const money = (cents: number) => formatMoney(cents, revision.currency);
  const totals = revision.totals;

  return (
    <>
      <table style={{ marginLeft: 'auto', marginTop: 12 }} aria-label="Totals">
        <tbody>
          {quoteTotalRows(totals).map(({ label, cents }) => (
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
          {/* the budget of one's own build has nobody to pay a deposit to */}
          {!quote.forMyself && (
            <tr>
              <td style={{ paddingRight: 24 }}>Deposit on approval</td>
              <td style={{ textAlign: 'right' }} data-testid="quote-deposit">
                {money(totals.depositCents)}
              </td>
            </tr>
          )}
        </tbody>
      </table>
      <Typography.Paragraph type="secondary" style={{ marginTop: 12, fontSize: 12 }}>
        {quote.roundingRule}
      </Typography.Paragraph>
    </>
  );
}
