import type { Db } from '../../db/knex.ts';
import type { OutboxEntry, OutboxMessageResponse, OutboxQuery } from '../../contracts/admin-outbox.ts';

const iso = (value: Date | string) => new Date(value).toISOString();
const entryColumns = [
  'm.id',
  'm.to_email',
  'm.subject',
  'm.template',
  'm.status',
  'm.error',
  'm.attempts',
  'm.next_attempt_at',
  'm.created_at',
  'o.number as order_number',
];

const toEntry = (row: Record<string, any>): OutboxEntry => ({
  id: row.id,
  toEmail: row.to_email,
  subject: row.subject,
  template: row.template,
  status: row.status,
  error: row.error,
  attempts: row.attempts,
  nextAttemptAt: row.next_attempt_at ? iso(row.next_attempt_at) : null,
  orderNumber: row.order_number ?? null,
  createdAt: iso(row.created_at),
});

/** One page of the e-mail log, newest first, optionally for one order or in one status. */
export async function readOutboxPage(
  db: Db,
  query: OutboxQuery,
  pageSize: number,
): Promise<{ messages: OutboxEntry[]; total: number }> {
  const filtered = () => {
    const q = db('email_log as m').leftJoin('orders as o', 'o.id', 'm.order_id');
    if (query.order) q.where('o.number', query.order);
    if (query.status) q.where('m.status', query.status);
    return q;
  };
  const [rows, [{ n }]] = await Promise.all([
    filtered()
      .select(entryColumns)
      .orderBy([
        { column: 'm.created_at', order: 'desc' },
        { column: 'm.id', order: 'desc' },
      ])
      .limit(pageSize)
      .offset((query.page - 1) * pageSize),
    filtered().count({ n: '*' }) as Promise<{ n: number | string }[]>,
  ]);
  return { messages: rows.map(toEntry), total: Number(n) };
}

export async function readOutboxMessage(db: Db, id: number): Promise<OutboxMessageResponse['message'] | undefined> {
  const row = await db('email_log as m')
    .leftJoin('orders as o', 'o.id', 'm.order_id')
    .select([...entryColumns, 'm.text_body', 'm.html_body', 'm.provider_message_id', 'm.updated_at'])
    .where('m.id', id)
    .first();
  return (
    row && {
      ...toEntry(row),
      textBody: row.text_body,
      htmlBody: row.html_body,
      providerMessageId: row.provider_message_id,
      updatedAt: iso(row.updated_at),
    }
  );
}

export interface MailLogEntry {
  to: string;
  subject: string;
  template: string;
  orderId: number | null;
  text: string;
  html: string | null;
}

/** Keeps a message before it is sent, as queued; returns its id. */
export async function insertQueuedMail(db: Db, mail: MailLogEntry, at: Date): Promise<number> {
  const [id] = await db('email_log').insert({
    to_email: mail.to,
    subject: mail.subject,
    template: mail.template,
    order_id: mail.orderId,
    status: 'queued',
    text_body: mail.text,
    html_body: mail.html,
    created_at: at,
    updated_at: at,
  });
  return id!;
}

/** Records how an attempt went: the provider's message id, or the reason and whether it will be tried again. */
export async function recordMailOutcome(
  db: Db,
  id: number,
  outcome:
    | { sent: true; messageId: string; attempt: number }
    | { sent: false; error: string; attempt: number; nextAttemptAt: Date | null },
  at: Date,
): Promise<void> {
  await db('email_log')
    .where({ id })
    .update(
      outcome.sent
        ? {
            status: 'sent',
            provider_message_id: outcome.messageId,
            error: null,
            attempts: outcome.attempt,
            next_attempt_at: null,
            updated_at: at,
          }
        : {
            status: outcome.nextAttemptAt ? 'retrying' : 'failed',
            error: outcome.error.slice(0, 2000),
            attempts: outcome.attempt,
            next_attempt_at: outcome.nextAttemptAt,
            updated_at: at,
          },
    );
}

/** The message as logged, to send (or send again). */
export async function readMailToSend(
  db: Db,
  id: number,
): Promise<{ to: string; subject: string; text: string; html: string | null; status: string } | undefined> {
  const row = await db('email_log').where({ id }).first('to_email', 'subject', 'text_body', 'html_body', 'status');
  return (
    row && {
      to: row.to_email,
      subject: row.subject,
      text: row.text_body ?? '',
      html: row.html_body,
      status: row.status,
    }
  );
}

/** Puts a failed message back in the queue, to be tried again from its first attempt. */
export async function requeueFailedMail(db: Db, id: number, at: Date): Promise<boolean> {
  const changed = await db('email_log')
    .where({ id, status: 'failed' })
    .update({ status: 'queued', error: null, attempts: 0, next_attempt_at: null, updated_at: at });
  return changed === 1;
}
