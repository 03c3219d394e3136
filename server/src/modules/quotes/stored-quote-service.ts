import type { Db } from '../../db/knex.ts';
import { findCustomerDesign } from '../designs/design-service.ts';
import { shopCalendarOf } from '../settings/settings-service.ts';
import {
  findFabricColourName,
  findQuote,
  insertQuote,
  type StoredQuote,
  type StoredQuoteInput,
} from './stored-quote-repo.ts';
import { estimateRunMinutes, shopDayOf, type GuidanceMessage } from '../../engine/index.ts';
import type { CreateQuoteRequest, StoredQuoteResponse } from '../../contracts/stored-quotes.ts';
import type { QuotePreviewRequest } from '../../contracts/quotes.ts';
import type { ShippingMethod } from '../../contracts/shipping.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { quoteSummaryOf, type QuoteService } from './quote-service.ts';
import { workOutReadyDates } from './ready-dates.ts';

/** A quote holds its price for two weeks: long enough to decide, short enough that prices do not go stale. */
export const QUOTE_VALIDITY_DAYS = 14;
const dayMs = 86_400_000;

/** Who asks: a signed-in customer, or a visitor whose session remembers the quotes it made. */
export interface QuoteViewer {
  customerId: number | null;
  sessionQuoteIds: readonly number[];
}

/**
 * Quotes kept in the database: priced by the quote service from the published price list, stored with the
 * figures they were priced from, and held until they expire. An order takes its totals from one of these.
 */
export function createStoredQuoteService(deps: { db: Db; quotes: QuoteService; now: () => Date }) {
  const { db } = deps;

  /** Prices the design and keeps the quote; a design named must be the caller's own saved design. */
  async function create(request: CreateQuoteRequest, customerId: number | null): Promise<Result<StoredQuoteResponse>> {
    const { designId, ...pricing } = request;
    if (designId !== undefined) {
      if (customerId === null) return failure('unauthenticated', 'Sign in to price one of your saved designs.');
      const design = await findCustomerDesign(db, { id: designId, customerId });
      if (!design)
        return failure('not-found', `There is no design ${designId}.`, {
          designId: 'Choose one of your saved designs',
        });
    }
    const stored = await store(pricing, { designId: designId ?? null, customerId });
    return stored.ok ? present(stored.value) : stored;
  }

  /** A quote for the customer who made it, or for the visitor's session that made it; anyone else's is missing. */
  async function get(id: number, viewer: QuoteViewer): Promise<Result<StoredQuoteResponse>> {
    const quote = await findQuote(db, id);
    const isViewers =
      quote &&
      (quote.customerId === null ? viewer.sessionQuoteIds.includes(id) : quote.customerId === viewer.customerId);
    if (!quote || !isViewers) return failure('not-found', `There is no quote ${id}.`);
    return present(quote);
  }

  /** Prices a quote's design again with today's price list (a quote that expired, or one to turn into a rush). */
  async function reprice(
    quote: StoredQuote,
    changes: { isRush?: boolean; shippingMethod?: ShippingMethod } = {},
  ): Promise<Result<StoredQuote>> {
    const { input } = quote;
    if (input.garmentId === undefined || input.sizeId === undefined || !input.document) {
      return failure('conflict', 'This quote is too old to be priced again; open the design and price it afresh.');
    }
    return store(
      {
        garmentId: input.garmentId,
        sizeId: input.sizeId,
        ...(input.colourId ? { colourId: input.colourId } : {}),
        quantity: quote.quantity,
        isRush: changes.isRush ?? quote.isRush,
        ...((changes.shippingMethod ?? quote.shippingMethod)
          ? { shippingMethod: changes.shippingMethod ?? quote.shippingMethod! }
          : {}),
        document: input.document,
      },
      { designId: quote.designId, customerId: quote.customerId },
    );
  }

  async function store(
    request: QuotePreviewRequest,
    owner: { designId: number | null; customerId: number | null },
  ): Promise<Result<StoredQuote>> {
    // The customer's own uploads price with the design; a visitor's stored quote prices catalogue items only.
    const priced = await deps.quotes.price(
      request,
      owner.customerId === null ? undefined : { userId: owner.customerId },
    );
    if (!priced.ok) return priced;
    const { response, figures, catalogue } = priced.value;
    const { quote, ...shown } = response;
    const { quantity } = request;
    // Machine time for the whole quantity; setup is counted once per job.
    const runTime = estimateRunMinutes({
      stitches: figures.totals.stitches * quantity,
      colorChanges: figures.totals.colourChanges * quantity,
      hoopings: figures.totals.hoopings * quantity,
      trims: figures.totals.trims * quantity,
      machine: catalogue.machine,
    });
    if (!runTime.ok) return failure('invalid', `The machine time can't be estimated: ${runTime.reason}`);
    const colourName = request.colourId === undefined ? null : await findFabricColourName(db, request.colourId);
    const input: StoredQuoteInput = {
      garmentId: request.garmentId,
      sizeId: request.sizeId,
      colourId: request.colourId ?? null,
      garment: catalogue.garment.slug,
      sizeCode: catalogue.size.code,
      fabricColour: colourName,
      document: request.document,
      quantity,
      isRush: request.isRush,
      placements: figures.quotePlacements,
      ...(quote.shipping ? { shipping: quote.shipping } : {}),
      figures: shown,
    };
    const now = deps.now();
    const id = await insertQuote(db, {
      ...owner,
      ruleSetId: catalogue.ruleSetId,
      input,
      quote,
      stitchCount: figures.totals.stitches,
      hoopingCount: figures.totals.hoopings,
      colourChangeCount: figures.totals.colourChanges,
      runMinutes: runTime.totalMinutes,
      expiresAt: new Date(now.getTime() + QUOTE_VALIDITY_DAYS * dayMs),
      createdAt: now,
    });
    const stored = await findQuote(db, id);
    if (!stored) throw new Error(`Quote ${id} vanished right after it was stored.`);
    return ok(stored);
  }

  async function present(quote: StoredQuote): Promise<Result<StoredQuoteResponse>> {
    if (!quote.input.figures)
      return failure('not-found', `Quote ${quote.id} can't be shown again; price the design afresh.`);
    return ok({
      ...quote.input.figures,
      quote: quoteSummaryOf(quote),
      quoteId: quote.id,
      designId: quote.designId,
      quantity: quote.quantity,
      isRush: quote.isRush,
      expiresAt: quote.expiresAt.toISOString(),
      readyDates: await readyDatesToday(),
    });
  }

  /**
   * The safety cautions for a quote's design as the catalogue states the garment, size and motifs today, so a fact
   * the studio corrected since the quote counts; a quote too old to be figured again keeps the cautions it showed.
   */
  async function cautionsOf(quote: StoredQuote): Promise<GuidanceMessage[]> {
    const { garmentId, sizeId, document, figures } = quote.input;
    if (garmentId === undefined || sizeId === undefined || !document) return figures?.cautions ?? [];
    const owner = quote.customerId === null ? undefined : { userId: quote.customerId };
    const cautions = await deps.quotes.cautionsFor({ garmentId, sizeId, document }, owner);
    return cautions.length > 0 ? cautions : (figures?.cautions ?? []);
  }

  /** The ready dates for an order placed now. */
  async function readyDatesToday() {
    const calendar = await shopCalendarOf(db);
    return workOutReadyDates(shopDayOf(deps.now().getTime(), calendar.timeZone), calendar);
  }

  return { create, get, reprice, cautionsOf, readyDatesToday };
}

export type StoredQuoteService = ReturnType<typeof createStoredQuoteService>;

export type { StoredQuote };

/** A stored quote with its price list version, for checkout; `db` may be the caller's transaction. */
export const findStoredQuote = findQuote;
