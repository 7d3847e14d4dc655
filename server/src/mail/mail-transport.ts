import { Injectable, type OnModuleDestroy } from '@nestjs/common';
import { createTransport, type Transporter } from 'nodemailer';
import type { Attachment } from 'nodemailer/lib/mailer';
import { AppConfig } from '../config/app-config';

export type OutgoingMail = {
  messageId: string;
  to: string;
  replyTo: string | null;
  subject: string;
  text: string;
  html: string | null;
  attachments: Array<{ filename: string; content: Buffer; contentType: string }>;
};

/** SMTP through nodemailer: the local fake in development and tests, the configured host in production. */
@Injectable()
export class MailTransport implements OnModuleDestroy {
  private readonly transporter: Transporter;

  constructor(private readonly config: AppConfig) {
    const smtp = config.smtp;
    this.transporter = createTransport({
      host: smtp.host,
      port: smtp.port,
      secure: smtp.secure,
      auth: smtp.user ? { user: smtp.user, pass: smtp.password } : undefined,
      // An unreachable server must fail the attempt quickly so the worker can back off and retry.
      connectionTimeout: 10_000,
      greetingTimeout: 10_000,
      socketTimeout: 30_000,
    });
  }

  async send(mail: OutgoingMail): Promise<void> {
    const attachments: Attachment[] = mail.attachments.map((a) => ({ ...a }));
    await this.transporter.sendMail({
      from: this.config.smtp.from,
      to: mail.to,
      replyTo: mail.replyTo ?? undefined,
      subject: mail.subject,
      text: mail.text,
      html: mail.html ?? undefined,
      messageId: mail.messageId,
      attachments,
    });
  }

  onModuleDestroy(): void {
    this.transporter.close();
  }
}
