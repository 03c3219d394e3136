/**
 * Sending a proof: the picture is made first (a render of the design on the garment, or a checked photo of a test
 * stitch-out), outside any transaction; then, with the order locked, the proof becomes the next version, an
 * unanswered earlier version is superseded and the order moves to `proof_sent`. The customer is e-mailed after.
 */
import type { Db } from '../../db/knex.ts';
import { findProofPicture, insertSentProof, nextProofVersion } from './proof-repo.ts';
import type { Mailer } from '../../integrations/mailer.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { proofImagePath, type SendProofRequest, type SentProofResponse } from '../../contracts/studio-orders.ts';
import { findStudioOrder } from './studio-order-repo.ts';
import { proofSceneFor } from './proof-scene.ts';
import { asBuffer, type HeavyWork } from '../../integrations/heavy-work.ts';
import { cleanPhotoOffThread } from '../../integrations/inspect-upload-job.ts';
import { queueLoggedMail, sendQueuedMail, type QueuedMail } from '../mail/order-mail.ts';
import { planOrderMove } from './order-flow.ts';
import { moveOrder } from './order-transitions.ts';
import type { StudioActor } from './order-payment-service.ts';
import { proofReadyMail } from './studio-order-mail.ts';
import type { DesignDocument } from '../../contracts/designs.ts';
import { readOrderPricingContext } from './order-design-repo.ts';
import { currentDesignOf, type OrderRepricing } from './order-repricing.ts';

export function createProofService(deps: {
  db: Db;
  mailer: Mailer;
  now: () => Date;
  appOrigin: string;
  heavyWork: HeavyWork;
  repricing: OrderRepricing;
}) {
  const { db } = deps;

  /** The render proof of the order's design, drawn in the heavy-work pool (resvg and jimp take a while). */
  async function drawing(orderId: number, design: DesignDocument): Promise<Result<Buffer>> {
    const scene = await proofSceneFor(db, orderId, design);
    if (!scene) return failure('conflict', 'This order has no design to draw a proof from; send a photo instead.');
    const drawn = await deps.heavyWork.run<{ png: Uint8Array }>('renderProof', scene);
    return drawn.ok ? ok(asBuffer(drawn.value.png)) : drawn;
  }

  async function pictureFor(
    orderId: number,
    request: SendProofRequest,
    photo: Buffer | undefined,
    design: DesignDocument,
  ): Promise<Result<Buffer>> {
    if (request.source === 'render') return drawing(orderId, design);
    if (!photo)
      return failure('invalid', 'Choose the photo of the stitch-out to send.', { file: 'Choose a PNG or JPEG photo' });
    return cleanPhotoOffThread(deps.heavyWork, photo);
  }

  /**
   * The drawing a render proof would send now, for the studio to look at first, of the design as last sent or of
   * the studio's draft; nothing is stored or sent.
   */
  async function preview(number: string, draft?: DesignDocument): Promise<Result<Buffer>> {
    const context = await readOrderPricingContext(db, number);
    if (!context) return failure('not-found', `There is no order ${number}.`);
    if (draft) {
      // Pricing refuses a picture that is not the customer's, so a draft cannot draw anyone else's upload.
      const priced = await deps.repricing.reprice(context, draft);
      if (!priced.ok) return priced;
    }
    return drawing(context.id, draft ?? currentDesignOf(context).document);
  }

  async function send(
    number: string,
    request: SendProofRequest,
    photo: Buffer | undefined,
    actor: StudioActor,
  ): Promise<Result<SentProofResponse>> {
    const order = await findStudioOrder(db, number);
    if (!order) return failure('not-found', `There is no order ${number}.`);
    // Checked before the picture is made, so a refused proof costs no rendering; moveOrder checks again under the lock.
    const planned = planOrderMove(order.status, 'send_proof', actor.role);
    if (!planned.ok) return failure(planned.kind, planned.reason);
    const context = await readOrderPricingContext(db, number);
    if (!context) return failure('not-found', `There is no order ${number}.`);
    // A change is drawn and priced from the studio's version; otherwise the proof shows the design as last sent.
    const draft = request.source === 'render' ? request.document : undefined;
    const design = draft ?? currentDesignOf(context).document;
    const price = await deps.repricing.reprice(context, draft);
    if (!price.ok) return price;
    const picture = await pictureFor(order.id, request, photo, design);
    if (!picture.ok) return picture;

    const sent = await db.transaction(async (trx): Promise<Result<{ sent: SentProofResponse; mail: QueuedMail }>> => {
      const now = deps.now();
      const version = await nextProofVersion(trx, order.id);
      const moved = await moveOrder(trx, {
        orderId: order.id,
        action: 'send_proof',
        actor: actor.role,
        actorUserId: actor.userId,
        payload: { proofVersion: version, source: request.source },
        now,
      });
      if (!moved.ok) return moved;
      await insertSentProof(trx, version, {
        orderId: order.id,
        source: request.source,
        imagePng: picture.value,
        message: request.message,
        sentByUserId: actor.userId,
        at: now,
        version: {
          document: design,
          lines: price.value.lines,
          subtotalCents: price.value.subtotalCents,
          taxCents: price.value.taxCents,
          totalCents: price.value.totalCents,
          previousTotalCents: context.totalCents,
          changes: price.value.changes,
        },
      });
      const mail = await queueLoggedMail(
        trx,
        proofReadyMail(order, deps.appOrigin, {
          version,
          message: request.message,
          ...(price.value.differenceCents !== 0 && {
            newPrice: { totalCents: price.value.totalCents, previousTotalCents: context.totalCents },
          }),
        }),
        now,
      );
      return ok({
        sent: {
          version,
          source: request.source,
          status: moved.value.to,
          imageUrl: proofImagePath(order.number, version),
        },
        mail,
      });
    });
    if (!sent.ok) return sent;
    await sendQueuedMail(deps, sent.value.mail);
    return ok(sent.value.sent);
  }

  /** The stored picture of one proof version; seeded history kept no pictures. */
  async function image(number: string, version: number): Promise<Result<Buffer>> {
    const picture = await findProofPicture(db, number, version);
    if (picture === undefined) return failure('not-found', `Order ${number} has no proof ${version}.`);
    if (picture === null) return failure('not-found', `No picture was kept for proof ${version} of ${number}.`);
    return ok(picture);
  }

  return { send, preview, image };
}
export type ProofService = ReturnType<typeof createProofService>;
