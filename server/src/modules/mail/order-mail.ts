import type { Db } from '../../db/knex.ts';
import type { Mailer, OutgoingMail } from '../../integrations/mailer.ts';

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
  const [id] = await deps.db('email_log').insert({
    to_email: message.to,
    subject: message.subject,
    template,
    order_id: orderId,
    status: 'queued',
    text_body: message.text,
    html_body: message.html ?? null,
    created_at: deps.now(),
    updated_at: deps.now(),
  });
  try {
    const { messageId } = await deps.mailer.send(message);
    await deps
      .db('email_log')
      .where({ id })
      .update({ status: 'sent', provider_message_id: messageId, updated_at: deps.now() });
    return { id: id!, sent: true };
  } catch (error) {
    await deps
      .db('email_log')
      .where({ id })
      .update({
        status: 'failed',
        error: String((error as Error)?.message ?? error).slice(0, 2000),
        updated_at: deps.now(),
      });
    return { id: id!, sent: false };
  }
}
