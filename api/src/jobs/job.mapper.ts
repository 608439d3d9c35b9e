import type { JobKind } from './job-kinds';
import { JobResponseDto } from './dto/job.dto';
import { Job } from './job.entity';

export function mapJob(job: Job): JobResponseDto {
  return {
    id: job.id,
    kind: job.kind as JobKind,
    state: job.state,
    attempts: job.attempts,
    maxAttempts: job.maxAttempts,
    lastError: job.lastError,
    runAt: job.runAt.toISOString(),
    createdAt: job.createdAt.toISOString(),
    doneAt: job.doneAt ? job.doneAt.toISOString() : null,
  };
}
