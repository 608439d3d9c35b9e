import { useSearchParams } from 'react-router-dom';
import { PageHeader } from '@/components/page-header';
import { BackgroundWorkList } from '@/features/jobs/components/background-work-list';
import type { JobState } from '@/features/jobs/types';

const STATES: readonly JobState[] = ['queued', 'running', 'done', 'dead'];

/** The owner's view of the e-mails and payment events the server works on after a request (`?state=dead` shows the stopped ones). */
export function BackgroundWorkPage() {
  const [params, setParams] = useSearchParams();
  const state = STATES.find((value) => value === params.get('state'));
  return (
    <>
      <PageHeader
        title="Background work"
        subtitle="E-mails and payment events the server sends and applies after each request. One that keeps failing stops here until you try it again."
      />
      <BackgroundWorkList state={state} onStateChange={(next) => setParams(next ? { state: next } : {})} />
    </>
  );
}
