/** Kinds of background work. `mail`: a rendered e-mail; `quote.mail`: a sent quote's e-mail with its PDF; `payment.event`: a provider event to apply. */
export const JOB_KINDS = ['mail', 'quote.mail', 'payment.event'] as const;
export type JobKind = (typeof JOB_KINDS)[number];

/** queued: waiting for its time; running: claimed by a worker (until leaseUntil); done: applied once; dead: gave up after its attempts. */
export const JOB_STATES = ['queued', 'running', 'done', 'dead'] as const;
export type JobState = (typeof JOB_STATES)[number];

const KIND_WORDS: Record<JobKind, string> = { mail: 'An e-mail', 'quote.mail': "A quote's e-mail", 'payment.event': "The payment provider's event" };

/** What a job is about when it was stored without a subject. */
export function describeJobKind(kind: string): string {
  return KIND_WORDS[kind as JobKind] ?? `Background work (${kind})`;
}
