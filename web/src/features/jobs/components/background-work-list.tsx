import { Alert, Button, Card, Flex, Pagination, Popconfirm, Tag, Typography } from 'antd';
import { useState } from 'react';
import { FilterStrip } from '@/components/filter-strip';
import { EmptyState, ErrorState, LoadingState } from '@/components/query-state';
import { palette } from '@/config/theme';
import { formatDateTime } from '@/lib/dates';
import { notifySuccess } from '@/lib/notifier';
import { serverPagination } from '@/lib/table';
import { useJobs } from '../api/get-jobs';
import { useRetryJob } from '../api/retry-job';
import { jobSubjectWords } from '../job-subject-words';
import { JOB_KIND_LABELS, JOB_STATE_COLOURS, JOB_STATE_LABELS, type Job, type JobState } from '../types';

// Stopped first: the one state the owner acts on stays in view when a phone scrolls the strip.
const FILTER_ORDER: JobState[] = ['dead', 'queued', 'running', 'done'];

const EMPTY_TEXT: Record<JobState | 'all', string> = {
  all: 'No background work yet. E-mails (quotes, invitations, answers) and payment events appear here as the server sends and applies them.',
  queued: 'Nothing waiting: every e-mail and payment event has been taken up.',
  running: 'Nothing running at the moment.',
  done: 'Nothing finished in the last two weeks (finished work is cleared after that).',
  dead: 'Nothing stopped: every e-mail and payment event went through or is still being tried.',
};

/** What trying again does, said before it happens. */
function retryWords(job: Job): string {
  const fresh = `It goes back in the queue now with ${job.maxAttempts} fresh attempts.`;
  if (job.kind === 'payment.event')
    return `${fresh} The payment is applied at most once: if it already took effect, nothing is settled twice.`;
  return `${fresh} The e-mail is sent from the start; fix what stopped it first (the address, the mail server), or it stops again.`;
}

/** When, in words that fit the state. */
function timing(job: Job): string {
  switch (job.state) {
    case 'queued':
      return job.attempts > 0 ? `Next attempt ${formatDateTime(job.runAt)}` : `Added ${formatDateTime(job.createdAt)}`;
    case 'running':
      return `Started ${formatDateTime(job.updatedAt)}`;
    case 'done':
      return `Done ${formatDateTime(job.doneAt)}`;
    case 'dead':
      return `Stopped ${formatDateTime(job.updatedAt)}`;
  }
}

/** Why the last attempt failed, in words to act on, with the technical reason folded away. */
function FailureNote({ job }: { job: Job }) {
  const stopped = job.state === 'dead';
  return (
    <div
      role="note"
      style={{
        marginTop: 8,
        padding: '8px 12px',
        borderInlineStart: `3px solid ${stopped ? palette.fail : palette.warn}`,
        background: stopped ? '#fbefed' : '#fbf4e8',
        borderRadius: 4,
      }}
    >
      <Typography.Text strong>{stopped ? 'What went wrong: ' : 'The last attempt failed: '}</Typography.Text>
      <Typography.Text>{job.lastError}</Typography.Text>
      {job.lastErrorDetail && (
        <details style={{ marginTop: 4 }}>
          <summary style={{ cursor: 'pointer', color: palette.inkMuted, fontSize: 13 }}>Technical detail</summary>
          <Typography.Text code style={{ fontSize: 12, overflowWrap: 'anywhere' }}>
            {job.lastErrorDetail}
          </Typography.Text>
        </details>
      )}
    </div>
  );
}

export type BackgroundWorkListProps = {
  state?: JobState;
  onStateChange: (state: JobState | undefined) => void;
};

/**
 * The shop's background work (e-mails, payment events), newest first: what each is about, its state and attempts,
 * why it last failed, and for a stopped one a way to try it again.
 */
export function BackgroundWorkList({ state, onStateChange }: BackgroundWorkListProps) {
  const [paging, setPaging] = useState({ page: 1, pageSize: 20 });
  // The job whose "Try again" confirmation is open: the list holds still meanwhile.
  const [confirming, setConfirming] = useState<string | null>(null);
  const query = { ...paging, ...(state ? { state } : {}) };
  const jobs = useJobs(query, { pauseRefresh: confirming !== null });
  const retry = useRetryJob({
    onSuccess: (job) => notifySuccess({ title: 'Queued again', description: `${job.subject}: the server takes it up now.` }),
  });
  const counts = jobs.data?.counts;

  const options = [
    { value: 'all' as const, label: 'All' },
    ...FILTER_ORDER.map((value) => ({ value, label: counts ? `${JOB_STATE_LABELS[value]} (${counts[value]})` : JOB_STATE_LABELS[value] })),
  ];

  return (
    <Card>
      <FilterStrip<JobState | 'all'>
        label="State of the work"
        options={options}
        value={state ?? 'all'}
        onChange={(value) => {
          setPaging((current) => ({ ...current, page: 1 }));
          onStateChange(value === 'all' ? undefined : value);
        }}
      />
      {!state && counts && counts.dead > 0 && (
        <Alert
          type="warning"
          showIcon
          style={{ marginBottom: 12 }}
          title={counts.dead === 1 ? '1 job stopped after its last attempt.' : `${counts.dead} jobs stopped after their last attempt.`}
          description={
            <Flex gap={8} wrap align="center" justify="space-between">
              <span>Each says what went wrong. Fix that, then try it again.</span>
              <Button size="small" onClick={() => onStateChange('dead')}>
                Show stopped
              </Button>
            </Flex>
          }
        />
      )}
      {jobs.isError && jobs.data && (
        // A self-refresh that failed keeps the list in view (and any open confirmation on it); it tries again later.
        <Alert type="info" showIcon style={{ marginBottom: 12 }} title="This list could not be refreshed just now; it shows the work as last read." />
      )}
      {jobs.isPending ? (
        <LoadingState rows={6} />
      ) : !jobs.data ? (
        <ErrorState error={jobs.error} onRetry={() => void jobs.refetch()} />
      ) : jobs.data.items.length === 0 ? (
        <EmptyState description={EMPTY_TEXT[state ?? 'all']} />
      ) : (
        <>
          <ul aria-label="Background work" style={{ listStyle: 'none', margin: 0, padding: 0 }}>
            {jobs.data.items.map((job, index) => (
              <li
                key={job.id}
                data-testid="job-row"
                style={{ padding: '12px 0', borderTop: index === 0 ? undefined : `1px solid ${palette.line}` }}
              >
                <Flex justify="space-between" align="flex-start" gap={12} wrap>
                  <div style={{ minWidth: 0, flex: '1 1 280px' }}>
                    <JobSubject subject={job.subject} />
                    <Flex gap={6} wrap align="center" style={{ marginTop: 4 }}>
                      <Tag color={JOB_STATE_COLOURS[job.state]} style={{ marginInlineEnd: 0 }}>
                        {JOB_STATE_LABELS[job.state]}
                      </Tag>
                      <Tag style={{ marginInlineEnd: 0 }}>{JOB_KIND_LABELS[job.kind]}</Tag>
                      <Typography.Text type="secondary" style={{ fontSize: 13 }}>
                        {job.attempts === 0 ? 'Not tried yet' : `Attempt ${job.attempts} of ${job.maxAttempts}`} · {timing(job)}
                      </Typography.Text>
                    </Flex>
                  </div>
                  {job.state === 'dead' && (
                    <Popconfirm
                      title="Try this again?"
                      description={<div style={{ maxWidth: 300 }}>{retryWords(job)}</div>}
                      okText="Try again"
                      cancelText="Not now"
                      onConfirm={() => retry.mutateAsync(job.id)}
                      onOpenChange={(open) => setConfirming((current) => (open ? job.id : current === job.id ? null : current))}
                    >
                      <Button type="primary" loading={retry.isPending && retry.variables === job.id} aria-label={`Try again: ${job.subject}`}>
                        Try again
                      </Button>
                    </Popconfirm>
                  )}
                </Flex>
                {job.lastError && <FailureNote job={job} />}
              </li>
            ))}
          </ul>
          <Flex justify="flex-end" style={{ marginTop: 12 }}>
            <Pagination
              {...serverPagination(paging, jobs.data.total)}
              size="small"
              hideOnSinglePage
              onChange={(page, pageSize) => setPaging({ page: pageSize !== paging.pageSize ? 1 : page, pageSize })}
            />
          </Flex>
        </>
      )}
    </Card>
  );
}

/** A job's subject in words, with a payment provider's reference (if any) in small print under it. */
function JobSubject({ subject }: { subject: string }) {
  const { text, reference } = jobSubjectWords(subject);
  return (
    <>
      <Typography.Text strong style={{ overflowWrap: 'anywhere' }}>
        {text}
      </Typography.Text>
      {reference && (
        <Typography.Text type="secondary" style={{ display: 'block', fontSize: 12, overflowWrap: 'anywhere' }}>
          Provider reference {reference}
        </Typography.Text>
      )}
    </>
  );
}
