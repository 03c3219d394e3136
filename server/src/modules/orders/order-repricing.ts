/**
 * The order's design priced again by the server, with the same engine and price list as the storefront's quote,
 * and with the stitch files the studio has entered for the customer's pictures. Reads only: a price changes the
 * order's totals only when the customer approves a proof that carries it (`order-price-of-record.ts`).
 */
import type { Db } from '../../db/knex.ts';
import { restoreDesign, type DesignDocument } from '../../contracts/designs.ts';
import type { RepricedOrder } from '../../contracts/proof-versions.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { describeDesignChanges } from '../../engine/design-changes.ts';
import type { QuoteService } from '../quotes/quote-service.ts';
import { readDesignNames, type OrderPricingContext } from './order-design-repo.ts';
import { listStitchFiles } from './stitch-file-repo.ts';

/** The design the customer last saw: the latest proof's own, else the design as ordered. */
export function currentDesignOf(context: OrderPricingContext): { document: DesignDocument; fromVersion: number } {
  const proofDocument = context.latestProof?.document;
  if (proofDocument) {
    const restored = restoreDesign(proofDocument);
    if (restored.success) return { document: restored.data, fromVersion: context.latestProof!.version };
  }
  const ordered = restoreDesign(context.orderedDocument);
  if (!ordered.success) throw new Error(`The design of ${context.number} no longer restores: ${ordered.error.message}`);
  return { document: ordered.data, fromVersion: 0 };
}

function codesIn(documents: DesignDocument[]) {
  const threads = new Set<string>();
  const fonts = new Set<string>();
  const motifs = new Set<string>();
  for (const placement of documents.flatMap((document) => document.placements)) {
    if (placement.kind === 'lettering') {
      threads.add(placement.thread);
      fonts.add(placement.font);
    }
    if (placement.kind === 'motif' || placement.kind === 'border') {
      placement.threads.forEach((code) => threads.add(code));
      motifs.add(placement.motif);
    }
  }
  return { threads: [...threads], fonts: [...fonts], motifs: [...motifs] };
}

export function createOrderRepricing(deps: { db: Db; quotes: Pick<QuoteService, 'price'> }) {
  /** What changed from the design the customer last saw to this one, in sentences. */
  async function changesTo(context: OrderPricingContext, document: DesignDocument): Promise<string[]> {
    const { document: before } = currentDesignOf(context);
    const names = await readDesignNames(deps.db, codesIn([before, document]));
    return describeDesignChanges(before, document, {
      ...names,
      zones: new Map(context.zones.map((zone) => [zone.code, zone.label])),
    });
  }

  /** Prices `document` (the design as last sent when left out) on the order's garment, for its customer. */
  async function reprice(context: OrderPricingContext, document?: DesignDocument): Promise<Result<RepricedOrder>> {
    const design = document ?? currentDesignOf(context).document;
    const files = await listStitchFiles(deps.db, context.id);
    const digitized = new Map(
      files.map((file) => [file.placementId, { stitches: file.stitchCount, colourCount: file.colourCount }]),
    );
    const priced = await deps.quotes.price(
      {
        garmentId: context.garmentId,
        sizeId: context.sizeId,
        colourId: context.colourId,
        quantity: context.quantity,
        isRush: context.isRush,
        document: design,
        ...(context.shippingMethod ? { shippingMethod: context.shippingMethod } : {}),
      },
      { userId: context.customerId },
      digitized,
    );
    // A garment or size since taken off sale is the shop's to sort out, not a missing order.
    if (!priced.ok)
      return priced.error.kind === 'not-found'
        ? failure('conflict', priced.error.message, priced.error.fields)
        : priced;
    const { quote, placements } = priced.value.response;
    return ok({
      authorizedTotalCents: context.totalCents,
      subtotalCents: quote.subtotalCents,
      taxCents: quote.taxCents,
      totalCents: quote.totalCents,
      differenceCents: quote.totalCents - context.totalCents,
      currency: quote.currency,
      lines: quote.lines,
      changes: document ? await changesTo(context, design) : [],
      isPriceProvisional: placements.some((placement) => placement.isPriceProvisional === true),
    });
  }

  return { reprice, changesTo };
}
export type OrderRepricing = ReturnType<typeof createOrderRepricing>;
