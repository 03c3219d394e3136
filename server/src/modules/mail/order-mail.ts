import type { Db } from '../../db/knex.ts';
import type { Mailer, OutgoingMail } from '../../integrations/mailer.ts';
import { enqueueJob, retryDelayMs, runJobNow, type JobHandler } from '../jobs/job-runner.ts';
import { insertQueuedMail, readMailToSend, recordMailOutcome } from './outbox-repo.ts';

export interface LoggedMail extends Omit<OutgoingMail, 'attachments'> {
  /** Names the message for the outbox: order_placed, proof_ready, proof_approved, order_shipped… */
  template: string;
  orderId: number | null;
}

type MailDeps = { db: Db; mailer: Mailer; now: () => Date; log?: (line: string) => void };

/** The job kind that sends one logged message. */
export const SEND_MAIL_JOB = 'send-mail';

/**
 * Sends one logged message (job payload `{ mailId }`): the outbox row says sent, or why not and when it is tried
 * again; a failure is thrown so the job runner retries it with a growing delay, up to the job's last attempt.
 */
export function sendMailJobHandler(deps: MailDeps): JobHandler {
  return async (job) => {
    const { mailId } = job.payload as { mailId: number };
    const mail = await readMailToSend(deps.db, mailId);
    if (!mail || mail.status === 'sent') return;
    try {
      const { messageId } = await deps.mailer.send({
        to: mail.to,
        subject: mail.subject,
        text: mail.text,
        ...(mail.html ? { html: mail.html } : {}),
      });
      await recordMailOutcome(deps.db, mailId, { sent: true, messageId, attempt: job.attempt }, deps.now());
    } catch (error) {
      const now = deps.now();
      const isLast = job.attempt >= job.maxAttempts;
      const nextAttemptAt = isLast ? null : new Date(now.getTime() + retryDelayMs(job.attempt));
      const reason = String((error as Error)?.message ?? error);
      await recordMailOutcome(
        deps.db,
        mailId,
        { sent: false, error: reason, attempt: job.attempt, nextAttemptAt },
        now,
      );
      throw error;
    }
  };
}

/** A message written to the outbox and its send-mail job, not yet tried. */
export interface QueuedMail {
  id: number;
  jobId: number;
}

/**
 * Keeps one message in email_log, with its text, so the studio's outbox shows what a customer was told, and queues
 * the job that sends it. Pass the transaction of the change the message tells of, so both are kept or neither;
 * then, after the commit, `sendQueuedMail` makes the first attempt (the worker makes any later ones).
 */
export async function queueLoggedMail(db: Db, mail: LoggedMail, now: Date): Promise<QueuedMail> {
  const { template, orderId, ...message } = mail;
  const id = await insertQueuedMail(db, { ...message, template, orderId, html: message.html ?? null }, now);
  const jobId = await enqueueJob(db, { kind: SEND_MAIL_JOB, payload: { mailId: id } }, now);
  return { id, jobId };
}

/** The first attempt at a queued message, right after the change committed; a failure is left to the worker. */
export async function sendQueuedMail(deps: MailDeps, queued: QueuedMail): Promise<{ id: number; sent: boolean }> {
  const sent = await runJobNow({ ...deps, log: deps.log ?? (() => {}) }, queued.jobId, sendMailJobHandler(deps));
  return { id: queued.id, sent };
}

/**
 * `queueLoggedMail` in a transaction of its own, then the first attempt unless `sendNow` is false: for a message
 * that follows no change of its own (a test's, or the studio sending one again).
 */
export async function sendLoggedMail(
  deps: MailDeps,
  mail: LoggedMail,
  options: { sendNow?: boolean } = {},
): Promise<{ id: number; sent: boolean }> {
  const queued = await deps.db.transaction((trx) => queueLoggedMail(trx, mail, deps.now()));
  if (options.sendNow === false) return { id: queued.id, sent: false };
  return sendQueuedMail(deps, queued);
}
