import nodemailer from 'nodemailer';
import type { AppConfig } from '../config.ts';

export interface OutgoingMail {
  to: string;
  subject: string;
  text: string;
  html?: string;
  attachments?: { filename: string; content: Buffer; contentType: string }[];
}

export interface Mailer {
  send(mail: OutgoingMail): Promise<{ messageId: string }>;
  close(): void;
}

/** nodemailer over SMTP_URL: fakes/smtp in development and tests, the shop's mail provider in production. */
export function createMailer(config: AppConfig): Mailer {
  const url = new URL(config.mail.smtpUrl);
  const isLocal = url.hostname === '127.0.0.1' || url.hostname === 'localhost';
  // The local capture server offers no TLS; real providers are reached over smtps:// or STARTTLS.
  const transport = nodemailer.createTransport(
    isLocal ? ({ url: config.mail.smtpUrl, ignoreTLS: true } as never) : config.mail.smtpUrl,
  );
  return {
    async send(mail) {
      const info = await transport.sendMail({ from: config.mail.from, ...mail });
      return { messageId: info.messageId };
    },
    close: () => transport.close(),
  };
}
