import nodemailer, { type Transporter } from 'nodemailer';

import { config } from '@/server/config';
import { logger } from '@/server/logger';
import { OutboxMessage } from '@/server/models/outbox-message';

export interface MailMessage {
  to: string;
  subject: string;
  text: string;
  html?: string;
  /** What the message is about (invitation, password-reset, ...), shown in the outbox. */
  kind: string;
  organisationId: number | null;
  userId?: number | null;
  /** The one-time link the message carries: its text is redacted in the outbox once the link no longer works. */
  link?: { tokenHash: string; expiresAt: Date };
}

/**
 * Sends through SMTP when SMTP_URL is set. Otherwise every message goes to the local outbox, a table that the
 * Mail outbox screen and the tests read, so links in e-mails can be followed on a machine with no mail server.
 */
class Mailer {
  private smtp: Transporter | null = null;

  get usesOutbox(): boolean {
    return !config.smtpUrl;
  }

  async send(message: MailMessage): Promise<void> {
    if (this.usesOutbox) {
      await OutboxMessage.create({
        organisationId: message.organisationId,
        userId: message.userId ?? null,
        kind: message.kind,
        to: message.to,
        from: config.mailFrom,
        subject: message.subject,
        text: message.text,
        html: message.html ?? null,
        linkTokenHash: message.link?.tokenHash ?? null,
        linkExpiresAt: message.link?.expiresAt ?? null,
      });
      logger.info({ kind: message.kind, outbox: true }, 'mail stored in the local outbox');
      return;
    }
    this.smtp ??= nodemailer.createTransport(config.smtpUrl);
    await this.smtp.sendMail({
      from: config.mailFrom,
      to: message.to,
      subject: message.subject,
      text: message.text,
      html: message.html,
    });
    logger.info({ kind: message.kind }, 'mail sent');
  }
}

export const mailer = new Mailer();
