import { formatMoney } from '@swapwright/shared';
import { Popconfirm, Typography } from 'antd';
import type { ReactElement } from 'react';
import type { Quote } from '../types';

export interface SendQuoteConfirmProps {
  quote: Pick<Quote, 'label' | 'customerName' | 'customerEmail' | 'latestRevision' | 'revision'>;
  onConfirm: () => void;
  /** The send button itself. */
  children: ReactElement;
}

/** "Marlo Penhallow (marlo@example.test)": whom the quote e-mail goes to. */
export function quoteRecipient(quote: Pick<Quote, 'customerName' | 'customerEmail'>): string {
  const name = quote.customerName ?? 'the customer';
  return quote.customerEmail ? `${name} (${quote.customerEmail})` : name;
}

/**
 * Sending e-mails the customer at once, so the send button asks first: to whom, the total and the deposit they are asked
 * for on approval.
 */
export function SendQuoteConfirm({ quote, onConfirm, children }: SendQuoteConfirmProps) {
  const { totalCents, depositCents } = quote.revision.totals;
  const money = (cents: number) => formatMoney(cents, quote.revision.currency);
  // A line the customer would read at nothing is most often a price or hours not filled in yet.
  const free = quote.revision.lines.filter((line) => line.lineTotalCents === 0);
  return (
    <Popconfirm
      title={`Send revision ${quote.latestRevision} of ${quote.label} to ${quote.customerName ?? 'the customer'}?`}
      description={
        <span data-testid="send-quote-confirm">
          {quote.customerEmail
            ? `It is e-mailed to ${quoteRecipient(quote)} with the PDF: total ${money(totalCents)}, deposit on approval ${money(depositCents)}. The revision is frozen once sent.`
            : `${quote.customerName ?? 'The customer'} has no e-mail address yet: add one to the customer first. Total ${money(totalCents)}, deposit on approval ${money(depositCents)}.`}
          {free.length > 0 && (
            <Typography.Text type="warning" style={{ display: 'block', marginTop: 6 }} data-testid="send-quote-free-lines">
              {free.length === 1 ? '1 line reads' : `${free.length} lines read`} {money(0)} to the customer: {free.map((line) => line.description).join('; ')}.
            </Typography.Text>
          )}
        </span>
      }
      okText="Send"
      cancelText="Not yet"
      onConfirm={onConfirm}
    >
      {children}
    </Popconfirm>
  );
}
