/** The studio's steps after the charge: the embroidery is stitched, then the parcel is posted (and the customer told). */
import type { Db } from '../../db/knex.ts';
import type { Mailer } from '../../integrations/mailer.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { OrderActionResponse, ShipOrderRequest } from '../../contracts/studio-orders.ts';
import { findStudioOrder, readOrderStanding } from './studio-order-repo.ts';
import { queueLoggedMail, sendQueuedMail, type LoggedMail, type QueuedMail } from '../mail/order-mail.ts';
import type { OrderAction } from './order-flow.ts';
import { moveOrder } from './order-transitions.ts';
import type { StudioActor } from './order-payment-service.ts';
import { orderShippedMail } from './studio-order-mail.ts';
import { readShippingMethod, recordShipment } from './order-shipment-repo.ts';
import type { Db as Trx } from '../../db/knex.ts';

export function createOrderProductionSteps(deps: { db: Db; mailer: Mailer; now: () => Date; appOrigin: string }) {
  async function step(
    number: string,
    action: Extract<OrderAction, 'mark_stitched' | 'ship'>,
    actor: StudioActor,
    payload?: object,
    /** The message the step sends, queued in the step's own transaction (after `write`). */
    mailOf?: (order: NonNullable<Awaited<ReturnType<typeof findStudioOrder>>>, trx: Trx) => Promise<LoggedMail>,
  ): Promise<{ result: Result<OrderActionResponse>; mail?: QueuedMail }> {
    return deps.db.transaction(async (trx) => {
      const order = await findStudioOrder(trx, number);
      if (!order)
        return { result: failure('not-found', `There is no order ${number}.`) as Result<OrderActionResponse> };
      const moved = await moveOrder(trx, {
        orderId: order.id,
        action,
        actor: actor.role,
        actorUserId: actor.userId,
        payload,
        now: deps.now(),
      });
      if (!moved.ok) return { result: moved as Result<OrderActionResponse> };
      const mail = mailOf && (await queueLoggedMail(trx, await mailOf(order, trx), deps.now()));
      return { result: ok(await readOrderStanding(trx, order.id)), mail };
    });
  }

  return {
    async markStitched(number: string, actor: StudioActor): Promise<Result<OrderActionResponse>> {
      return (await step(number, 'mark_stitched', actor)).result;
    },
    async ship(number: string, request: ShipOrderRequest, actor: StudioActor): Promise<Result<OrderActionResponse>> {
      const shipment = { carrier: request.carrier ?? null, trackingNumber: request.trackingNumber ?? null };
      const { result, mail } = await step(number, 'ship', actor, shipment, async (order, trx) => {
        await recordShipment(trx, order.id, shipment, deps.now());
        return orderShippedMail(order, deps.appOrigin, {
          ...shipment,
          method: await readShippingMethod(trx, order.id),
        });
      });
      if (mail) await sendQueuedMail(deps, mail);
      return result;
    },
  };
}
export type OrderProductionSteps = ReturnType<typeof createOrderProductionSteps>;
