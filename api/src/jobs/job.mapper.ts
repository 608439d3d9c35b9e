import { describeJobError } from './job-error-words';
import { describeJobKind, type JobKind } from './job-kinds';
import { JobResponseDto } from './dto/job.dto';
import { Job } from './job.entity';

export function mapJob(job: Job): JobResponseDto {
  return {
    id: job.id,
    kind: job.kind as JobKind,
    subject: job.subject ?? describeJobKind(job.kind),
    state: job.state,
    attempts: job.attempts,
    maxAttempts: job.maxAttempts,
    lastError: job.lastError ? describeJobError(job.kind, job.lastError) : null,
    lastErrorDetail: job.lastError,
    runAt: job.runAt.toISOString(),
    createdAt: job.createdAt.toISOString(),
    updatedAt: job.updatedAt.toISOString(),
    doneAt: job.doneAt ? job.doneAt.toISOString() : null,
  };
}
