import { formatMoney } from '@swapwright/shared';
import { Popconfirm } from 'antd';
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
  return (
    <Popconfirm
      title={`Send revision ${quote.latestRevision} of ${quote.label} to ${quote.customerName ?? 'the customer'}?`}
      description={
        <span data-testid="send-quote-confirm">
          {quote.customerEmail
            ? `It is e-mailed to ${quoteRecipient(quote)} with the PDF: total ${money(totalCents)}, deposit on approval ${money(depositCents)}. The revision is frozen once sent.`
            : `${quote.customerName ?? 'The customer'} has no e-mail address yet: add one to the customer first. Total ${money(totalCents)}, deposit on approval ${money(depositCents)}.`}
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
