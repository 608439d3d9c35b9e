import { FIT_REPORT_CAUTION, formatMoney } from '@swapwright/shared';
import { useQuery } from '@tanstack/react-query';
import { Alert, Button, Card, Flex, Input, Popconfirm, Space, Typography } from 'antd';
import { useState } from 'react';
import { ErrorState } from '@/components/query-state';
import { getApiErrorBody, getErrorMessage } from '@/lib/api-error';
import { formatDate } from '@/lib/dates';
import { useAnswerQuote } from '../api/answer-quote';
import { type AnswerQuoteBody as QuoteAnswerBody, useAnswerQuoteByLink } from '../api/answer-quote-by-link';
import { useQuoteByLink } from '../api/get-quote-by-link';
import { quoteQueryOptions } from '../api/get-quote';
import { usePayDeposit } from '../api/pay-deposit';
import { usePayDepositByLink } from '../api/pay-deposit-by-link';
import type { Quote } from '../types';
import { QuoteLines } from './quote-lines';
import { QuotePdfButton } from './quote-pdf-button';
import { DepositTag, QuoteStatusTag } from './quote-status-tag';

/**
 * The local payment fake's card form: its test cards stand for the payment methods a provider's card form
 * would return (4242 4242 4242 4242 pays; 4000 0000 0000 0002 is declined).
 */
const TEST_CARDS: Record<string, string> = {
  '4242424242424242': 'pm_card_visa',
  '4000000000000002': 'pm_card_chargeDeclined',
};

export interface QuoteAnswerPanelProps {
  token: string;
}

/** What the customer sees from the link in the quote e-mail: the quote, accept or decline with a reason, then the deposit. */
export function QuoteAnswerPanel({ token }: QuoteAnswerPanelProps) {
  const [paying, setPaying] = useState(false);
  // polling stops once the deposit reads as paid (the card below is then no longer shown)
  const quote = useQuoteByLink(token, paying);
  const answer = useAnswerQuoteByLink(token);
  const pay = usePayDepositByLink(token);
  if (quote.isLoading) return <Card loading />;
  if (quote.isError || !quote.data) {
    // an older revision's link after a later one was accepted: nothing is wrong, the answer is already in
    if (getApiErrorBody(quote.error)?.code === 'quote_link_already_accepted') {
      return <Alert type="success" showIcon title="This quote was already accepted" description={getErrorMessage(quote.error)} />;
    }
    return <Alert type="error" showIcon title="This quote link cannot be opened" description={getErrorMessage(quote.error)} />;
  }
  return (
    <QuoteAnswerView
      quote={quote.data}
      pdf={{ href: `/api/quote-links/${encodeURIComponent(token)}/pdf` }}
      answer={answer}
      pay={pay}
      paying={paying}
      onPaymentSent={() => setPaying(true)}
    />
  );
}

export interface CustomerQuotePanelProps {
  quoteId: string;
}

/** The same answer for the signed-in customer, opened from their project: read the quote, accept or decline, pay the deposit. */
export function CustomerQuotePanel({ quoteId }: CustomerQuotePanelProps) {
  const [paying, setPaying] = useState(false);
  const quote = useQuery({ ...quoteQueryOptions(quoteId), refetchInterval: (query) => (paying && query.state.data?.depositState !== 'paid' ? 1000 : false) });
  const answer = useAnswerQuote(quoteId);
  const pay = usePayDeposit(quoteId);
  if (quote.isPending) return <Card loading />;
  // another customer's quote (or one not sent yet) answers 404: the not-found state, nothing of the quote
  if (quote.isError) return <ErrorState error={quote.error} onRetry={() => void quote.refetch()} />;
  const { label, revision } = quote.data;
  return (
    <QuoteAnswerView
      quote={quote.data}
      pdf={{ quoteId, label, revision: revision.number }}
      answer={answer}
      pay={pay}
      paying={paying}
      onPaymentSent={() => setPaying(true)}
    />
  );
}

interface QuoteAnswerViewProps {
  quote: Quote;
  /** The PDF: a plain link for the e-mailed link's holder; a download through the session when signed in (the link carries no token). */
  pdf: { href: string } | { quoteId: string; label: string; revision: number };
  answer: { mutate: (body: QuoteAnswerBody) => void; isPending: boolean; isError: boolean; error: unknown };
  pay: { mutate: (paymentMethod: string, callbacks: { onSuccess: () => void; onError: (error: unknown) => void }) => void; isPending: boolean };
  /** A payment went to the provider; its confirmation (the webhook) is awaited. */
  paying: boolean;
  onPaymentSent: () => void;
}

function QuoteAnswerView({ quote: q, pdf, answer, pay, paying, onPaymentSent }: QuoteAnswerViewProps) {
  const [declining, setDeclining] = useState(false);
  const [reason, setReason] = useState('');
  const [card, setCard] = useState('');
  const [payError, setPayError] = useState<string | null>(null);
  const money = (cents: number) => formatMoney(cents, q.revision.currency);
  const { totalCents, depositCents } = q.revision.totals;
  const waiting = paying && q.depositState !== 'paid';
  const submitCard = () => {
    setPayError(null);
    const digits = card.replace(/\s/g, '');
    if (!digits) {
      setPayError('Enter a card number.');
      return;
    }
    const method = TEST_CARDS[digits];
    if (!method) {
      setPayError('That card number is not one of the local payment service’s test cards: 4242 4242 4242 4242 pays, 4000 0000 0000 0002 is declined.');
      return;
    }
    pay.mutate(method, { onSuccess: onPaymentSent, onError: (error) => setPayError(getErrorMessage(error)) });
  };

  return (
    <Flex vertical gap={16}>
      <Card
        title={
          <Space wrap>
            <span>
              Quote {q.label} · revision {q.revision.number}
            </span>
            <QuoteStatusTag status={q.status} forCustomer />
            <DepositTag state={q.depositState} />
          </Space>
        }
      >
        <Typography.Paragraph>
          From <Typography.Text strong>{q.shopName}</Typography.Text> · {q.projectTitle} · for {q.customerName} · valid until {formatDate(q.revision.validUntil)}
        </Typography.Paragraph>
        <QuoteLines quote={q} />
        <Typography.Paragraph style={{ marginTop: 12 }}>
          {'href' in pdf ? (
            <a href={pdf.href} target="_blank" rel="noreferrer">
              Open the quote as a PDF
            </a>
          ) : (
            <QuotePdfButton {...pdf}>Download the quote as a PDF</QuotePdfButton>
          )}
        </Typography.Paragraph>
        <Alert type="warning" showIcon title="Planning aid" description={FIT_REPORT_CAUTION} />
      </Card>

      {q.revision.terms.trim() && (
        <Card title="Terms">
          <Typography.Paragraph style={{ whiteSpace: 'pre-wrap', marginBottom: 0 }} data-testid="quote-terms">
            {q.revision.terms}
          </Typography.Paragraph>
        </Card>
      )}

      {q.status === 'awaiting-answer' && (
        <Card title="Your answer">
          <Typography.Paragraph data-testid="answer-money">
            Accepting asks you for a deposit of <strong>{money(depositCents)}</strong> of the {money(totalCents)} total, paid by card on the next
            step. Nothing is charged when you accept; the shop books your truck into the bay once the deposit is paid. The remaining{' '}
            {money(totalCents - depositCents)} is not charged here.
          </Typography.Paragraph>
          {answer.isError && <Alert type="error" showIcon title={getErrorMessage(answer.error)} style={{ marginBottom: 12 }} />}
          {!declining ? (
            <Space wrap>
              <Popconfirm
                title={`Accept quote ${q.label} for ${money(totalCents)}?`}
                description={`The deposit of ${money(depositCents)} is then asked for.`}
                okText="Accept"
                cancelText="Not yet"
                onConfirm={() => answer.mutate({ answer: 'accept' })}
              >
                <Button type="primary" loading={answer.isPending}>
                  Accept this quote
                </Button>
              </Popconfirm>
              <Button onClick={() => setDeclining(true)}>Decline…</Button>
            </Space>
          ) : (
            <Flex vertical gap={8}>
              <label htmlFor="decline-reason">Why are you declining? The shop reads this.</label>
              <Input.TextArea id="decline-reason" value={reason} onChange={(event) => setReason(event.target.value)} maxLength={1000} rows={3} />
              <Space>
                <Button danger disabled={!reason.trim()} loading={answer.isPending} onClick={() => answer.mutate({ answer: 'decline', reason })}>
                  Decline the quote
                </Button>
                <Button onClick={() => setDeclining(false)}>Back</Button>
              </Space>
            </Flex>
          )}
        </Card>
      )}

      {q.status === 'approved' && q.depositState === 'due' && (
        <Card title="Pay the deposit">
          <Typography.Paragraph>
            Deposit due: <strong>{money(depositCents)}</strong> of the {money(totalCents)} total. Your card is charged this amount once, through the
            payment service; the shop books your truck into the bay once it is paid. The remaining {money(totalCents - depositCents)} is not
            charged here.
          </Typography.Paragraph>
          {payError && <Alert type="error" showIcon title={payError} style={{ marginBottom: 12 }} />}
          {waiting ? (
            <Alert type="info" showIcon title="Payment sent; waiting for the payment service to confirm it…" />
          ) : (
            <Flex vertical gap={8} style={{ maxWidth: 360 }}>
              <label htmlFor="card-number">Card number (local test payment service)</label>
              <Input id="card-number" inputMode="numeric" autoComplete="off" value={card} onChange={(event) => setCard(event.target.value)} placeholder="4242 4242 4242 4242" />
              <Button type="primary" loading={pay.isPending} onClick={submitCard}>
                Pay the deposit
              </Button>
            </Flex>
          )}
        </Card>
      )}

      {q.depositState === 'paid' && (
        <Alert
          type="success"
          showIcon
          title="Deposit paid. Thank you: the shop will book your truck into the bay."
          description={`${money(depositCents)} received${q.depositPaidAt ? ` on ${formatDate(q.depositPaidAt)}` : ''}. The remaining ${money(totalCents - depositCents)} is not charged here.`}
        />
      )}
      {q.status === 'turned-down' && <Alert type="info" showIcon title="You declined this quote. The shop has been told." />}
    </Flex>
  );
}
