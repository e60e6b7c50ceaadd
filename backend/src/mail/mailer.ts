import nodemailer, { type Transporter } from 'nodemailer';
import type { AppConfig } from '../config';
import { DomainError } from '../errors';

/** The mail server refused or did not answer; callers roll back what the mail was for. */
export class MailUnavailableError extends DomainError {
  constructor(cause: unknown) {
    super(502, 'mail_unavailable', 'The mail server did not accept the message, so nothing was saved. Try again shortly.');
    this.cause = cause;
  }
}

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<void>;
  close(): void;
}

/** Mail always goes over SMTP: to the local fake server in development and tests, to a real one in production. */
export function createMailer(config: Pick<AppConfig, 'smtp' | 'mailFrom'>): Mailer {
  const { host, port, secure, user, password } = config.smtp;
  const transport: Transporter = nodemailer.createTransport({
    host,
    port,
    secure,
    auth: user ? { user, pass: password ?? '' } : undefined,
    connectionTimeout: 5_000,
    greetingTimeout: 5_000,
  });
  return {
    async send(mail) {
      try {
        await transport.sendMail({ from: config.mailFrom, ...mail });
      } catch (err) {
        console.warn(`[mail] could not send "${mail.subject}":`, (err as Error).message);
        throw new MailUnavailableError(err);
      }
    },
    close() {
      transport.close();
    },
  };
}
