import { AppError } from '../common/errors/app-error';
import type { JobState } from './job-kinds';

const STATE_WORDS: Record<JobState, string> = {
  queued: 'waiting to run',
  running: 'running now',
  done: 'already done',
  dead: 'stopped after its last attempt',
};

export const JobErrors = {
  notFound: () => new AppError(404, 'job_not_found', 'That background job does not exist in your shop (done jobs are removed after two weeks).'),
  notDead: (state: JobState) =>
    new AppError(
      409,
      'job_not_stopped',
      `This job is ${STATE_WORDS[state]}; only a job that stopped after its last attempt can be tried again.` +
        (state === 'done' ? ' Its work was applied once and is not repeated.' : ' The worker takes it by itself.'),
    ),
};
