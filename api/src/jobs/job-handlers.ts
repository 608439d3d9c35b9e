import { Injectable } from '@nestjs/common';
import { EntityManager } from 'typeorm';
import type { JobKind } from './job-kinds';

/** What a handler gets: the manager of the job's own transaction (its writes commit with the job marked done). */
export interface JobContext {
  manager: EntityManager;
  job: { id: string; kind: string; shopId: string | null; attempts: number; maxAttempts: number };
}

/** Does the work of one job; returns what to keep as its result (e.g. a Message-ID). Throwing retries it later. */
export type JobHandler = (payload: Record<string, unknown>, context: JobContext) => Promise<string | void>;

/** Each feature module registers the handlers of its kinds here when it starts (the queue knows no feature). */
@Injectable()
export class JobHandlers {
  private readonly handlers = new Map<string, JobHandler>();

  register(kind: JobKind | string, handler: JobHandler): void {
    this.handlers.set(kind, handler);
  }

  get(kind: string): JobHandler | undefined {
    return this.handlers.get(kind);
  }
}
