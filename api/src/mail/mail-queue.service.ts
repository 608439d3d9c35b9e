import { Injectable, OnModuleInit } from '@nestjs/common';
import { EntityManager } from 'typeorm';
import { JobHandlers } from '../jobs/job-handlers';
import { JobsService } from '../jobs/jobs.service';
import { MailService, OutgoingMail } from './mail.service';

/** A mail without attachments, as stored in its job. */
export type QueuedMail = Pick<OutgoingMail, 'to' | 'subject' | 'text' | 'html'>;

/**
 * Mail goes out from the background worker, never inside a request: `enqueue` stores it with the change that
 * causes it (same transaction), the `mail` job sends it. Every attempt of a job sends the same Message-ID
 * (`<job id@sender domain>`), and the job is marked done right after the relay accepted it.
 */
@Injectable()
export class MailQueue implements OnModuleInit {
  constructor(
    private readonly jobs: JobsService,
    private readonly handlers: JobHandlers,
    private readonly mail: MailService,
  ) {}

  onModuleInit(): void {
    this.handlers.register('mail', async (payload, { job }) => {
      const messageId = this.messageIdOf(job.id);
      await this.mail.send(payload as unknown as QueuedMail, messageId);
      return messageId;
    });
  }

  messageIdOf(jobId: string): string {
    return `<${jobId}@${this.mail.messageIdDomain}>`;
  }

  /** `idempotencyKey` names the cause (e.g. `invitation:<id>`): the same cause mails once. */
  enqueue(manager: EntityManager, idempotencyKey: string, shopId: string | null, mail: QueuedMail): Promise<boolean> {
    return this.jobs.enqueue(manager, { kind: 'mail', idempotencyKey, shopId, subject: `E-mail to ${mail.to}: “${mail.subject}”`, payload: { ...mail } });
  }
}
