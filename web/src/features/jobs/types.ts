import { JOB_STATE_LABELS as JOB_STATE_WORDS } from '@swapwright/shared';
import type { PagedQueryOf, ResponseOf, Schemas } from '@/lib/api-types';

export type Job = Schemas['JobResponseDto'];
export type JobPage = ResponseOf<'/api/jobs', 'get'>;
export type JobQuery = PagedQueryOf<'/api/jobs'>;
export type JobState = Job['state'];
export type JobKind = Job['kind'];

/** Our words for the queue's states (shared's, as the audit log writes them). */
export const JOB_STATE_LABELS: Record<JobState, string> = JOB_STATE_WORDS;
export const JOB_STATE_COLOURS: Record<JobState, string> = { queued: 'blue', running: 'processing', done: 'green', dead: 'red' };
export const JOB_KIND_LABELS: Record<JobKind, string> = { mail: 'E-mail', 'quote.mail': 'Quote e-mail', 'payment.event': 'Payment' };
