import { formatMoney } from '@swapwright/shared';
import { Alert, Button, Card, Select, Space, Typography } from 'antd';
import { useState } from 'react';
import { Link, useNavigate } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { ErrorState, LoadingState } from '@/components/query-state';
import { toProjectDetail } from '@/config/paths';
import { formatDate } from '@/lib/dates';
import { getErrorMessage } from '@/lib/api-error';
import { notifySuccess } from '@/lib/notifier';
import { useQuote } from '../api/get-quote';
import { useQuoteSettings } from '../api/get-quote-settings';
import { useSendQuote } from '../api/send-quote';
import { useUpdateQuote } from '../api/update-quote';
import { OWN_TRUCK_QUOTE_NOTE } from '../own-truck-quote';
import { ownTimeLaborSentence, PAID_HELP_LINK } from '../own-build-open-items';
import type { Quote } from '../types';
import { QuoteLineEditor } from './quote-line-editor';
import { QuoteLines } from './quote-lines';
import { QuotePdfButton } from './quote-pdf-button';
import { DepositTag, QuoteStatusTag } from './quote-status-tag';
import { QuoteTermsDrawer } from './quote-terms-drawer';
import { RevisionCompare } from './revision-compare';
import { SendQuoteConfirm } from './send-quote-confirm';
import { StartOwnBuildButton } from './start-own-build-button';

export interface QuoteWorkspaceProps {
  quoteId: string;
  /** Owner and estimator write lines, start revisions and send. */
  canWrite: boolean;
  /** The shop's IANA time zone, whose today is the first day a quote may be valid until. */
  timeZone: string;
}

function revisionLabel(revision: Quote['revisions'][number], currency: string): string {
  return `Revision ${revision.number} · ${revision.sentAt ? `sent ${formatDate(revision.sentAt)}` : 'being written'} · ${formatMoney(revision.totalCents, currency)}`;
}

/** One quote for the shop: the working revision's lines (editable until sent), earlier revisions, and what changed between two. */
export function QuoteWorkspace({ quoteId, canWrite, timeZone }: QuoteWorkspaceProps) {
  const working = useQuote(quoteId);
  const [viewing, setViewing] = useState<number | undefined>(undefined);
  const latestNumber = working.data?.latestRevision;
  const shownNumber = viewing !== undefined && viewing !== latestNumber ? viewing : undefined;
  const shown = useQuote(quoteId, shownNumber);
  const settings = useQuoteSettings(canWrite);
  const update = useUpdateQuote(quoteId);
  const send = useSendQuote(working.data?.projectId ?? '');
  const [termsOpen, setTermsOpen] = useState(false);
  const navigate = useNavigate();

  if (working.isPending) return <LoadingState rows={10} />;
  if (working.isError) return <ErrorState error={working.error} onRetry={() => void working.refetch()} />;
  const quote = working.data;
  const revision = quote.revision;
  const approved = quote.status === 'approved';
  const editable = canWrite && !approved && !revision.sent && shownNumber === undefined;
  const canSend = canWrite && !quote.forMyself && !approved && !revision.sent && shownNumber === undefined;
  const canStartBuild = canWrite && quote.forMyself && !approved && shownNumber === undefined;
  const ownTimeLabor = ownTimeLaborSentence(revision);

  const startRevision = () =>
    update.mutate({}, { onSuccess: (next) => notifySuccess({ title: `Revision ${next.latestRevision} started`, description: 'Change its lines, then send it.' }) });
  const sendQuote = () =>
    send.mutate(quote.id, { onSuccess: (sent) => notifySuccess({ title: `Quote ${sent.label} sent`, description: `Revision ${sent.sentRevision} went to ${sent.customerName ?? 'the customer'}.` }) });

  return (
    <>
      <PageHeader
        eyebrow={quote.forMyself ? 'Budget of your own build' : 'Quote'}
        title={`${quote.label} · ${quote.projectTitle}`}
        subtitle={
          <Space wrap size={8}>
            <span>For {quote.customerName ?? 'no customer'}</span>
            <QuoteStatusTag status={quote.status} />
            <DepositTag state={quote.depositState} />
            <span>valid until {formatDate(revision.validUntil)}</span>
          </Space>
        }
        extra={
          <>
            <Button onClick={() => navigate(toProjectDetail(quote.projectId))}>Back to the project</Button>
            <QuotePdfButton quoteId={quote.id} label={quote.label} revision={shownNumber ?? revision.number} forMyself={quote.forMyself}>
              {shownNumber === undefined ? 'Download PDF' : `Download revision ${shownNumber} as PDF`}
            </QuotePdfButton>
            {canSend && (
              <SendQuoteConfirm quote={quote} onConfirm={sendQuote}>
                <Button type="primary" loading={send.isPending}>
                  Send revision {revision.number} to the customer
                </Button>
              </SendQuoteConfirm>
            )}
            {canStartBuild && <StartOwnBuildButton quote={quote} />}
          </>
        }
      />
      {canWrite && quote.forMyself && !approved && (
        <Alert
          type="info"
          showIcon
          title={OWN_TRUCK_QUOTE_NOTE}
          description={
            ownTimeLabor && (
              <span data-testid="own-time-labor">
                {ownTimeLabor} <Link to={PAID_HELP_LINK.to}>{PAID_HELP_LINK.label}</Link>.
              </span>
            )
          }
          style={{ marginBottom: 16 }}
          data-testid="own-truck-quote-note"
        />
      )}
      {send.isError && <Alert type="error" showIcon title={getErrorMessage(send.error)} style={{ marginBottom: 16 }} />}
      <Card
        data-testid="quote-revision"
        title={shownNumber === undefined ? `Revision ${revision.number}${revision.sent ? ' (sent, frozen)' : ' (being written)'}` : `Revision ${shownNumber} (earlier)`}
        extra={
          quote.revisions.length > 1 && (
            <Select
              aria-label="Revision shown"
              value={shownNumber ?? quote.latestRevision}
              onChange={(number) => setViewing(number)}
              options={quote.revisions.map((summary) => ({ value: summary.number, label: revisionLabel(summary, revision.currency) }))}
              style={{ minWidth: 240 }}
            />
          )
        }
        style={{ marginBottom: 16 }}
      >
        {shownNumber !== undefined ? (
          shown.data ? (
            <QuoteLines quote={shown.data} />
          ) : (
            <LoadingState rows={4} />
          )
        ) : editable ? (
          <>
            <QuoteLineEditor
              quote={quote}
              defaultMarkupPercent={settings.data?.defaultMarkupPercent}
              update={update}
              otherFormOpen={termsOpen}
              actions={
                <Button
                  onClick={() => {
                    update.reset();
                    setTermsOpen(true);
                  }}
                >
                  Discount, deposit and validity
                </Button>
              }
            />
            <QuoteTermsDrawer
              open={termsOpen}
              revision={revision}
              timeZone={timeZone}
              saving={update.isPending}
              error={update.error}
              onSubmit={(changes) => update.mutate(changes, { onSuccess: () => setTermsOpen(false) })}
              onClose={() => {
                update.reset();
                setTermsOpen(false);
              }}
            />
          </>
        ) : (
          <>
            {revision.sent && (
              <Alert
                type="info"
                showIcon
                style={{ marginBottom: 12 }}
                title={`Revision ${revision.number} was sent on ${formatDate(revision.sentAt)} and is frozen.`}
                description={
                  approved
                    ? 'The customer approved it; an approved quote is not changed.'
                    : canWrite
                      ? `To change the quote, start revision ${revision.number + 1}: it begins as a copy you can edit and send.`
                      : undefined
                }
                action={
                  canWrite &&
                  !approved && (
                    <Button type="primary" loading={update.isPending} onClick={startRevision}>
                      Start revision {revision.number + 1}
                    </Button>
                  )
                }
              />
            )}
            {update.isError && <Alert type="error" showIcon title={getErrorMessage(update.error)} style={{ marginBottom: 12 }} />}
            <QuoteLines quote={quote} />
          </>
        )}
      </Card>
      {quote.revisions.length > 1 && (
        <Card title="Compare revisions">
          <RevisionCompare quote={quote} />
        </Card>
      )}
      {quote.revisions.length <= 1 && (
        <Typography.Paragraph type="secondary">Once a revision is sent and changed, the revisions can be compared here.</Typography.Paragraph>
      )}
    </>
  );
}
