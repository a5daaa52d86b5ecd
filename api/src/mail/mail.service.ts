import { Injectable, type OnModuleDestroy } from '@nestjs/common';
import { createTransport, type Transporter } from 'nodemailer';
import type { AppConfig } from '../config/app-config';
import { InjectConfig } from '../config/config.module';

/** One message for the relay. */
export interface MailMessage {
  to: string;
  subject: string;
  text: string;
}

/** Hands mails to the SMTP relay through nodemailer. Callers queue mails in the outbox; only the mail worker sends. */
@Injectable()
export class MailService implements OnModuleDestroy {
  private readonly transport: Transporter;

  constructor(@InjectConfig() private readonly config: AppConfig) {
    const { smtpHost, smtpPort, smtpAuth } = config.mail;
    this.transport = createTransport({
      host: smtpHost,
      port: smtpPort,
      ...(smtpAuth ? { auth: smtpAuth } : {}),
      // A relay that does not answer must not hold the worker's claim for long.
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 30_000,
    });
  }

  /** Sends one mail; resolves with the relay's Message-ID, rejects when the relay refuses or cannot be reached. */
  async send(message: MailMessage): Promise<string> {
    const info = await this.transport.sendMail({ from: this.config.mail.from, to: message.to, subject: message.subject, text: message.text });
    return info.messageId;
  }

  onModuleDestroy(): void {
    this.transport.close();
  }
}
