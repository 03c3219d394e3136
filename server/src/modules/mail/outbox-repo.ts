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
