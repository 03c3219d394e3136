/**
 * The studio's work on an order's design before the customer approves it: entering the stitch file of each
 * customer's picture once it is digitized, and pricing its own changed version of the design for proof 2. Every
 * price is worked out here by the same engine as the storefront's quote; none comes from the browser.
 */
import type { Db } from '../../db/knex.ts';
import type { DesignDocument } from '../../contracts/designs.ts';
import type {
  OrderDesignResponse,
  RepricedOrder,
  StitchFileRequest,
  StitchFileResponse,
} from '../../contracts/proof-versions.ts';
import { isIn, type OrderStatus } from '../../contracts/order-status.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { mockupSizeMm } from '../../engine/garment-mockup-size.ts';
import { readOrderPricingContext, type OrderPricingContext } from './order-design-repo.ts';
import { currentDesignOf, type OrderRepricing } from './order-repricing.ts';
import { listStitchFiles, saveStitchFile } from './stitch-file-repo.ts';
import type { StudioActor } from './order-payment-service.ts';

/** Until the customer approves a proof, its price can still move; afterwards it is the price of record. */
const designOpenStatuses = ['authorized', 'proof_sent', 'changes_requested'] as const satisfies readonly OrderStatus[];

export function createOrderDesignService(deps: { db: Db; repricing: OrderRepricing; now: () => Date }) {
  const { db } = deps;

  async function openContext(number: string): Promise<Result<OrderPricingContext>> {
    const context = await readOrderPricingContext(db, number);
    if (!context) return failure('not-found', `There is no order ${number}.`);
    if (!isIn(designOpenStatuses, context.status))
      return failure(
        'conflict',
        context.status === 'awaiting_payment'
          ? `Order ${number} is not paid for yet; its design can be worked on once the card is held.`
          : `The customer has already approved the design and price of ${number}; they can no longer change.`,
      );
    return ok(context);
  }

  /** The design as the customer last saw it, priced now, with the stitch files entered so far. */
  async function design(number: string): Promise<Result<OrderDesignResponse>> {
    const context = await readOrderPricingContext(db, number);
    if (!context) return failure('not-found', `There is no order ${number}.`);
    const [price, stitchFiles] = await Promise.all([deps.repricing.reprice(context), listStitchFiles(db, context.id)]);
    if (!price.ok) return price;
    const { document, fromVersion } = currentDesignOf(context);
    const size = mockupSizeMm(context.mockup.svg, context.mockup.garmentSlug);
    return ok({
      number: context.number,
      garmentId: context.garmentId,
      sizeId: context.sizeId,
      mockupWidthMm: size.widthMm * context.mockup.scale,
      mockupHeightMm: size.heightMm * context.mockup.scale,
      document,
      fromVersion,
      nextVersion: (context.latestProof?.version ?? 0) + 1,
      price: price.value,
      stitchFiles,
    });
  }

  /** The studio's draft priced against what the customer authorized, with what changed in words. */
  async function draftPrice(number: string, document: DesignDocument): Promise<Result<RepricedOrder>> {
    const context = await openContext(number);
    if (!context.ok) return context;
    const uploads = new Set(currentDesignOf(context.value).document.placements.flatMap(uploadOf));
    const foreign = document.placements.findIndex((placement) => uploadOf(placement).some((id) => !uploads.has(id)));
    if (foreign >= 0) {
      const message = 'Only the customer’s own pictures on this order can go on its design.';
      return failure('invalid', message, { [`document.placements.${foreign}.artworkUploadId`]: message });
    }
    return deps.repricing.reprice(context.value, document);
  }

  /** Enters or corrects the stitch file of one of the customer's pictures; answers the order's price with it. */
  async function enterStitchFile(
    number: string,
    placementId: string,
    request: StitchFileRequest,
    actor: StudioActor,
  ): Promise<Result<StitchFileResponse>> {
    const context = await openContext(number);
    if (!context.ok) return context;
    const placement = currentDesignOf(context.value).document.placements.find((p) => p.id === placementId);
    if (!placement) return failure('not-found', `The design of ${number} has no such placement.`);
    if (placement.kind !== 'artwork')
      return failure(
        'unprocessable',
        'Stitch files are entered for the customer’s own pictures; motifs and lettering are priced from the catalogue.',
      );
    await db.transaction((trx) =>
      saveStitchFile(trx, {
        orderId: context.value.id,
        placementId,
        ...request,
        enteredBy: actor.userId,
        at: deps.now(),
      }),
    );
    const [price, files] = await Promise.all([
      deps.repricing.reprice(context.value),
      listStitchFiles(db, context.value.id),
    ]);
    if (!price.ok) return price;
    return ok({ stitchFile: files.find((file) => file.placementId === placementId)!, price: price.value });
  }

  return { design, draftPrice, enterStitchFile };
}

function uploadOf(placement: DesignDocument['placements'][number]): number[] {
  return placement.kind === 'artwork' ? [placement.artworkUploadId] : [];
}

export type OrderDesignService = ReturnType<typeof createOrderDesignService>;
