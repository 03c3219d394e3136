/**
 * Sends a proof to an order the way the studio's side does, straight through the database and the order flow, so
 * the customer's side can be tested without the studio's screens. Shared by the API tests and the browser journeys.
 */
import { Jimp } from 'jimp';
import type { Db } from '../../server/src/db/knex.ts';
import { moveOrder } from '../../server/src/modules/orders/order-transitions.ts';

/** A plain picture to stand for a rendered proof: a linen field with a coloured band where the border would be. */
export async function proofPicture(bandColour = 0xb5533cff): Promise<Buffer> {
  const image = new Jimp({ width: 480, height: 360, color: 0xf4eee2ff });
  const band = new Jimp({ width: 420, height: 40, color: bandColour });
  image.composite(band, 30, 280);
  return image.getBuffer('image/png');
}

export async function sendTestProof(
  db: Db,
  opts: { orderNumber: string; staffEmail?: string; message?: string; image?: Buffer | null; now?: Date },
): Promise<number> {
  const now = opts.now ?? new Date();
  const staff = await db('users')
    .select('id', 'role')
    .where({ email: opts.staffEmail ?? 'marigold@wrenandbobbin.test' })
    .first();
  const order = await db('orders').select('id').where({ number: opts.orderNumber }).first();
  if (!staff || !order) throw new Error(`No staff member or order ${opts.orderNumber} to send a proof for.`);
  const image = opts.image === undefined ? await proofPicture() : opts.image;
  return db.transaction(async (trx) => {
    const previous = await trx('proofs').where({ order_id: order.id }).max({ version: 'version' }).first();
    const version = Number(previous?.version ?? 0) + 1;
    const moved = await moveOrder(trx, {
      orderId: order.id,
      action: 'send_proof',
      actor: staff.role,
      actorUserId: staff.id,
      payload: { proofVersion: version },
      now,
    });
    if (!moved.ok) throw new Error(`The proof could not be sent: ${moved.error.message}`);
    await trx('proofs').where({ order_id: order.id, status: 'sent' }).update({ status: 'superseded', updated_at: now });
    await trx('proofs').insert({
      order_id: order.id,
      version,
      status: 'sent',
      image_png: image,
      message: opts.message ?? 'Here is your proof, drawn to scale on the garment.',
      comment_pins: JSON.stringify([]),
      sent_by_user_id: staff.id,
      source: 'render',
      created_at: now,
      updated_at: now,
    });
    return version;
  });
}
