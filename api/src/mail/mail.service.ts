import { Injectable, Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { EnvironmentVariables } from '../config/env.validation';
import { createTransport, Transporter } from 'nodemailer';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

/** Sends through the SMTP relay. Only the background worker calls it (see MailQueue): requests enqueue their mail. */
@Injectable()
export class MailService {
  private readonly logger = new Logger(MailService.name);
  private readonly transport: Transporter;
  private readonly from: string;
  /** The domain of Message-IDs: the sender address's. */
  readonly messageIdDomain: string;

  constructor(config: ConfigService<EnvironmentVariables, true>) {
    const typed = config;
    this.from = typed.get('MAIL_FROM', { infer: true });
    this.messageIdDomain = /@([A-Za-z0-9.-]+)/.exec(this.from)?.[1] ?? 'swapwright.invalid';
    this.transport = createTransport({
      host: typed.get('SMTP_HOST', { infer: true }),
      port: typed.get('SMTP_PORT', { infer: true }),
      secure: false,
      ignoreTLS: true,
      // Well inside a job's lease, so a slow relay fails the attempt instead of outliving it.
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 20_000,
    });
  }

  /** Sends with the given Message-ID (stable per job, so a repeated attempt is recognisably the same message). */
  async send(mail: OutgoingMail, messageId: string): Promise<void> {
    await this.transport.sendMail({ from: this.from, ...mail, messageId });
    this.logger.log(`Mail "${mail.subject}" sent`);
  }
}
