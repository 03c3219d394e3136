import type { Db } from '../../db/knex.ts';
import type { Mailer, OutgoingMail } from '../../integrations/mailer.ts';
import { insertQueuedMail, recordMailOutcome } from './outbox-repo.ts';

export interface LoggedMail extends OutgoingMail {
  /** Names the message for the outbox: order_placed, proof_ready, proof_approved, order_shipped… */
  template: string;
  orderId: number | null;
}

/**
 * Sends one message and keeps it in email_log with its text, so the studio's outbox shows what a customer was told.
 * Call it after the transaction that caused it commits: a failed send is logged as failed and never undoes the
 * order's move. Returns the log row's id.
 */
export async function sendLoggedMail(
  deps: { db: Db; mailer: Mailer; now: () => Date },
  mail: LoggedMail,
): Promise<{ id: number; sent: boolean }> {
  const { template, orderId, ...message } = mail;
  const id = await insertQueuedMail(deps.db, { ...message, template, orderId, html: message.html ?? null }, deps.now());
  try {
    const { messageId } = await deps.mailer.send(message);
    await recordMailOutcome(deps.db, id, { sent: true, messageId }, deps.now());
    return { id, sent: true };
  } catch (error) {
    await recordMailOutcome(
      deps.db,
      id,
      { sent: false, error: String((error as Error)?.message ?? error) },
      deps.now(),
    );
    return { id, sent: false };
  }
}
