import type { Readable } from 'node:stream';
import { simpleParser } from 'mailparser';
import { SMTPServer } from 'smtp-server';
import { DEFAULT_FAKE_HOST, listenOnLoopback, originFor, serveHttpOnLoopback } from '../loopback-server.ts';
import { createMailHttpApp } from './mail-http-app.ts';
import { createMailbox, type CapturedMail } from './mailbox.ts';

export type { CapturedMail } from './mailbox.ts';

const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

/** Reads a message, buffering at most `maxBytes`; resolves undefined when it is larger. */
async function readBoundedMessage(stream: Readable, maxBytes: number): Promise<Buffer | undefined> {
  const chunks: Buffer[] = [];
  let size = 0;
  for await (const chunk of stream) {
    size += (chunk as Buffer).length;
    // Keep draining past the limit so the client gets an answer, but stop holding the bytes.
    if (size <= maxBytes) chunks.push(chunk as Buffer);
  }
  return size <= maxBytes ? Buffer.concat(chunks) : undefined;
}

/**
 * A local SMTP server that captures every message (nodemailer with `host`, `port`, `secure: false`,
 * `ignoreTLS: true`), plus an HTTP endpoint to read them back. No authentication and no TLS: loopback only.
 */
export async function startSmtpFake(opts: { smtpPort: number; httpPort: number; host?: string }): Promise<{
  smtpUrl: string;
  httpUrl: string;
  messages: CapturedMail[];
  /** Answers the next `count` messages with 451 (try again later), as a busy provider does. */
  refuseNext(count: number): void;
  close(): Promise<void>;
}> {
  const host = opts.host ?? DEFAULT_FAKE_HOST;
  const mailbox = createMailbox();
  let toRefuse = 0;
  const smtp = new SMTPServer({
    secure: false,
    authOptional: true,
    // smtp-server's built-in certificate has expired, so STARTTLS would only break clients (stack notes §6).
    disabledCommands: ['STARTTLS'],
    logger: false,
    size: MAX_MESSAGE_BYTES,
    closeTimeout: 1_000,
    onData(stream, session, callback) {
      readBoundedMessage(stream, MAX_MESSAGE_BYTES)
        .then(async (raw) => {
          if (!raw) {
            callback(Object.assign(new Error('Message exceeds fixed maximum message size'), { responseCode: 552 }));
            return;
          }
          if (toRefuse > 0) {
            toRefuse -= 1;
            callback(Object.assign(new Error('Mailbox busy, try again later'), { responseCode: 451 }));
            return;
          }
          const { mailFrom, rcptTo } = session.envelope;
          mailbox.add(await simpleParser(raw), {
            from: mailFrom ? mailFrom.address : '',
            to: rcptTo.map((recipient) => recipient.address),
          });
          callback();
        })
        .catch(callback);
    },
  });
  const closeSmtp = () => new Promise<void>((resolve) => smtp.close(() => resolve()));

  const smtpPort = await listenOnLoopback(smtp.server, opts.smtpPort, host);
  let http: Awaited<ReturnType<typeof serveHttpOnLoopback>>;
  try {
    http = await serveHttpOnLoopback(createMailHttpApp(mailbox), opts.httpPort, host);
  } catch (error) {
    await closeSmtp();
    throw error;
  }
  return {
    smtpUrl: originFor('smtp', host, smtpPort),
    httpUrl: http.url,
    messages: mailbox.messages,
    refuseNext(count) {
      toRefuse = count;
    },
    async close() {
      await Promise.all([http.close(), closeSmtp()]);
    },
  };
}
