import type { Db } from '../../db/knex.ts';

/**
 * Records a verified webhook event once. Returns false when the event id was seen before, so a redelivery is
 * acknowledged without being processed twice.
 */
export async function recordWebhookEvent(
  db: Db,
  event: { id: string; type: string; payload: string; receivedAt: Date },
): Promise<boolean> {
  const inserted = await db('payment_webhook_events')
    .insert({ event_id: event.id, type: event.type, payload: event.payload, received_at: event.receivedAt })
    .onConflict('event_id')
    .ignore();
  return Number((inserted as unknown as number[])[0] ?? 0) > 0;
}

/** Marks an event as applied, in the transaction that applied it. */
export async function markWebhookEventProcessed(db: Db, eventId: string, processedAt: Date): Promise<void> {
  await db('payment_webhook_events').where({ event_id: eventId }).update({ processed_at: processedAt });
}
