import { formatMoney } from '@swapwright/shared';
import { App, Button, Card, Empty, Flex, List, Space, Typography } from 'antd';
import { Link, useNavigate } from 'react-router-dom';
import { toQuote } from '@/config/paths';
import { getErrorMessage } from '@/lib/api-error';
import { useCreateQuote } from '../api/create-quote';
import { useProjectQuotes } from '../api/get-project-quotes';
import { useSendQuote } from '../api/send-quote';
import { formatDate } from '@/lib/dates';
import { OWN_TRUCK_QUOTE_NOTE } from '../own-truck-quote';
import { DepositTag, QuoteStatusTag } from './quote-status-tag';
import { draftedFromWords } from '../drafted-from-words';
import { SendQuoteConfirm } from './send-quote-confirm';
import { StartOwnBuildButton } from './start-own-build-button';

export interface ProjectQuotesCardProps {
  projectId: string;
  /** Owner and estimator write quotes; others read them. */
  canWrite: boolean;
  /** The customer opens a sent quote of their own project to read it, answer it and pay the deposit. */
  canAnswer?: boolean;
  /** The member's own truck: its quote is their budget, and the card says so. */
  forMyself?: boolean;
}

/** What the customer's link on a sent quote says: what is waiting for them. */
function customerAction(quote: { status: string; depositState: string }): string {
  if (quote.status === 'awaiting-answer') return 'Read and answer';
  if (quote.status === 'approved' && quote.depositState === 'due') return 'Pay the deposit';
  return 'Open quote';
}

/**
 * The project's quotes: draft one from the parts plan and the fit report, send it to the customer, follow the answer and the
 * deposit. A quote of the member's own truck has nobody to send it to: it says so, and offers to start the build from it
 * (the work order opens) in place of the button.
 */
export function ProjectQuotesCard({ projectId, canWrite, canAnswer = false, forMyself = false }: ProjectQuotesCardProps) {
  const quotes = useProjectQuotes(projectId);
  const create = useCreateQuote(projectId);
  const send = useSendQuote(projectId);
  const { message } = App.useApp();
  const navigate = useNavigate();
  return (
    <Card
      title={forMyself ? 'Budget' : 'Quotes'}
      style={{ marginBottom: 16 }}
      extra={
        canWrite && (
          <Button onClick={() => create.mutate({}, { onSuccess: (quote) => void message.success(draftedFromWords(quote)) })} loading={create.isPending}>
            {forMyself ? 'Draft a budget' : 'Draft a quote'}
          </Button>
        )
      }
    >
      <List
        dataSource={quotes.data ?? []}
        locale={{ emptyText: <Empty image={Empty.PRESENTED_IMAGE_SIMPLE} description={forMyself ? 'No budget yet: draft one from the parts plan' : 'No quote yet'} /> }}
        loading={quotes.isLoading}
        renderItem={(quote) => (
          <List.Item
            data-testid={`quote-${quote.label}`}
            actions={[
              canWrite && (
                <Link key="open" to={toQuote(quote.id)}>
                  {quote.latestRevision === quote.sentRevision || quote.status === 'approved' ? 'Open quote' : 'Edit lines'}
                </Link>
              ),
              canAnswer && quote.sentRevision !== null && (
                <Button key="answer" type={customerAction(quote) === 'Open quote' ? 'default' : 'primary'} onClick={() => navigate(toQuote(quote.id))}>
                  {customerAction(quote)}
                </Button>
              ),
              canWrite && !quote.forMyself && quote.status !== 'approved' && quote.latestRevision !== quote.sentRevision && (
                <SendQuoteConfirm
                  key="send"
                  quote={quote}
                  onConfirm={() =>
                    send.mutate(quote.id, {
                      onSuccess: (sent) => void message.success(`Quote ${sent.label} is on its way to ${sent.customerName ?? 'the customer'}: the e-mail goes out in a moment`),
                      onError: (error) => void message.error(getErrorMessage(error)),
                    })
                  }
                >
                  <Button type="primary" size="small" loading={send.isPending}>
                    Send to customer
                  </Button>
                </SendQuoteConfirm>
              ),
              canWrite && quote.forMyself && quote.status !== 'approved' && <StartOwnBuildButton key="start-build" quote={quote} size="small" />,
            ].filter(Boolean)}
          >
            <Flex vertical gap={4}>
              <Space wrap>
                <Typography.Text strong>{quote.label}</Typography.Text>
                <span>revision {quote.latestRevision}</span>
                <QuoteStatusTag status={quote.status} forCustomer={canAnswer} />
                <DepositTag state={quote.depositState} />
              </Space>
              <Typography.Text type="secondary">
                Total {formatMoney(quote.revision.totals.totalCents, quote.revision.currency)} · deposit {formatMoney(quote.revision.totals.depositCents, quote.revision.currency)} · valid until{' '}
                {formatDate(quote.revision.validUntil)}
                {quote.declineReason ? ` · reason: ${quote.declineReason}` : ''}
              </Typography.Text>
              {canWrite && quote.forMyself && quote.status !== 'approved' && (
                <Typography.Text type="secondary" data-testid="own-truck-quote-note">
                  {OWN_TRUCK_QUOTE_NOTE}
                </Typography.Text>
              )}
            </Flex>
          </List.Item>
        )}
      />
    </Card>
  );
}
