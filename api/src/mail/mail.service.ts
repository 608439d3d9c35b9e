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

@Injectable()
export class MailService {
  private readonly logger = new Logger(MailService.name);
  private readonly transport: Transporter;
  private readonly from: string;

  constructor(config: ConfigService<EnvironmentVariables, true>) {
    const typed = config;
    this.from = typed.get('MAIL_FROM', { infer: true });
    this.transport = createTransport({
      host: typed.get('SMTP_HOST', { infer: true }),
      port: typed.get('SMTP_PORT', { infer: true }),
      secure: false,
      ignoreTLS: true,
    });
  }

  async send(mail: OutgoingMail): Promise<void> {
    await this.transport.sendMail({ from: this.from, ...mail });
    this.logger.log(`Mail "${mail.subject}" sent`);
  }

  /** For mails whose failure must not undo the request (the user can ask again); logs instead of throwing. */
  async sendOrLog(mail: OutgoingMail): Promise<boolean> {
    try {
      await this.send(mail);
      return true;
    } catch (error) {
      this.logger.error(`Mail "${mail.subject}" could not be sent: ${error instanceof Error ? error.message : error}`);
      return false;
    }
  }
}
