import type { Db } from '../../db/knex.ts';
import { artworkForQuote, type ArtworkOwner } from '../artwork/artwork-service.ts';
import type { QuoteCatalogueRecord } from './quote-catalogue-repo.ts';
import { createQuoteCatalogueSnapshot, quoteCatalogueFor as readQuoteCatalogue } from './quote-catalogue.ts';
import type { CatalogueVersionWatch } from '../catalogue/catalogue-version.ts';
import { priceQuote, type GuidanceMessage, type Quote } from '../../engine/index.ts';
import type { LetteringFontLoader } from '../../integrations/lettering-fonts.ts';
import type { DesignDocument } from '../../contracts/designs.ts';
import type { QuotePreviewRequest, QuotePreviewResponse } from '../../contracts/quotes.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { figureDesign, type DesignFigures, type DigitizedFigures } from './design-figures.ts';
import { chooseShippingMethod } from './shipping-choice.ts';
import type { CatalogueArtwork, QuoteCatalogue } from './quote-catalogue-types.ts';

/** A priced design: the preview's answer, the engine's figures and the catalogue rows it was priced from. */
export interface PricedDesign {
  response: QuotePreviewResponse;
  figures: DesignFigures;
  catalogue: QuoteCatalogueRecord;
}

/** Quotes priced by the server from the published price list; the client's own figures are never used. */
export function createQuoteService(deps: { db: Db; fonts: LetteringFontLoader; versions?: CatalogueVersionWatch }) {
  const catalogueFor = createQuoteCatalogueSnapshot(deps);
  /**
   * Prices a design for one garment size and quantity, with what storing the quote needs. Reads only. Artwork
   * uploads count only when `owner` may see them; anyone else's read as not available.
   */
  async function price(
    request: QuotePreviewRequest,
    owner?: ArtworkOwner,
    digitized?: ReadonlyMap<string, DigitizedFigures>,
  ): Promise<Result<PricedDesign>> {
    const { motifSlugs, fontSlugs, artworkIds } = namedIn(request.document);
    const [record, uploads] = await Promise.all([
      catalogueFor({
        garmentId: request.garmentId,
        sizeId: request.sizeId,
        colourId: request.colourId,
        motifSlugs,
        fontSlugs,
      }),
      owner ? artworkForQuote(deps.db, owner, artworkIds) : [],
    ]);
    if (!record.ok) return record;
    const figured = figureDesign(
      toQuoteCatalogue(record.value, deps.fonts, artworkCatalogueOf(uploads)),
      request.document,
      digitized,
    );
    if (!figured.ok) return figured;
    const figures = figured.value;
    const { garment, size, ruleSet, shipping } = record.value;
    const method = chooseShippingMethod(shipping, request.shippingMethod);
    if (!method.ok) return method;
    const quote = priceQuote({
      ruleSet,
      garment: { slug: garment.slug, name: garment.name },
      sizeCode: size.code,
      sizeLabel: size.label,
      quantity: request.quantity,
      placements: figures.quotePlacements,
      isRush: request.isRush,
      shipping: { rates: shipping, method: method.value },
    });
    // The design was sound, so a pricing failure is the price list's: it has no price for this size, say.
    if (!quote.ok) return failure('conflict', `This garment can't be priced online right now: ${quote.reason}`);

    const response: QuotePreviewResponse = {
      quote: quoteSummaryOf({ ...quote, shipping: quoteShippingOf(quote, shipping) }),
      placements: figures.placements.map((placement) => ({
        id: placement.id,
        label: placement.label,
        kind: placement.kind,
        stitches: placement.estimate.stitches,
        colourChanges: placement.estimate.colorChanges,
        hoopings: placement.hoopings,
        ...(placement.border && {
          border: {
            count: placement.border.count,
            scalePct: placement.border.scalePct,
            repeatWidthMm: placement.border.repeatWidthMm,
            hoopSlug: placement.border.hoop.slug,
            hoopName: placement.border.hoop.name,
          },
        }),
        widthMm: placement.estimate.widthMm,
        heightMm: placement.estimate.heightMm,
        ...(placement.isPriceProvisional ? { isPriceProvisional: true } : {}),
      })),
      runMinutes: figures.runMinutes,
      stabilizer: {
        backing: figures.stabilizer.backing,
        topping: figures.stabilizer.topping,
        density: figures.stabilizer.density,
        messages: figures.stabilizer.messages,
      },
      cautions: figures.cautions,
      stitching: {
        hoopings: figures.totals.hoopings,
        extraHoopings: figures.totals.hoopings - figures.placements.length,
        colourChanges: figures.totals.colourChanges,
        colourChangesBetweenPlacements: figures.totals.colourChangesBetweenPlacements,
      },
      layoutNotes: figures.layoutNotes,
    };
    return ok({ response, figures, catalogue: record.value });
  }

  /** Prices a design without saving it, for one garment size and quantity. */
  async function preview(request: QuotePreviewRequest, owner?: ArtworkOwner): Promise<Result<QuotePreviewResponse>> {
    const priced = await price(request, owner);
    return priced.ok ? ok(priced.value.response) : priced;
  }

  /**
   * The safety cautions for a design on a garment size as the catalogue states them now (ties, fastening, use, the
   * size's youngest wearer, the motifs' trims). Empty when the design can no longer be figured (a retired garment):
   * the page then shows none rather than failing.
   */
  async function cautionsFor(
    design: { garmentId: number; sizeId: number; document: DesignDocument },
    owner?: ArtworkOwner,
  ): Promise<GuidanceMessage[]> {
    // Cautions do not depend on shipping: any method the shop offers will do.
    const priced = await price({ ...design, quantity: 1, isRush: false }, owner);
    return priced.ok ? priced.value.figures.cautions : [];
  }

  /**
   * The cautions and the layout notes (overlapping placements) of a design as the catalogue states it now, priced
   * once; both empty when the design can no longer be figured.
   */
  async function guidanceFor(
    design: { garmentId: number; sizeId: number; document: DesignDocument },
    owner?: ArtworkOwner,
  ): Promise<{ cautions: GuidanceMessage[]; layoutNotes: GuidanceMessage[] }> {
    const priced = await price({ ...design, quantity: 1, isRush: false }, owner);
    return priced.ok
      ? { cautions: priced.value.figures.cautions, layoutNotes: priced.value.figures.layoutNotes }
      : { cautions: [], layoutNotes: [] };
  }

  return { preview, price, cautionsFor, guidanceFor };
}

export type QuoteService = ReturnType<typeof createQuoteService>;

/** The priced lines and totals as the apps get them, from the engine's quote or a stored one. */
export function quoteSummaryOf(quote: QuotePreviewResponse['quote']): QuotePreviewResponse['quote'] {
  const { lines, subtotalCents, shippingCents, taxCents, totalCents, currency, ruleSetVersion, shipping } = quote;
  return {
    lines,
    subtotalCents,
    shippingCents,
    taxCents,
    totalCents,
    currency,
    ruleSetVersion,
    ...(shipping ? { shipping } : {}),
  };
}

/** The quote's shipping as the apps show it: the engine's priced methods with the shop's own words on them. */
function quoteShippingOf(
  quote: Quote,
  rates: PricedDesign['catalogue']['shipping'],
): NonNullable<QuotePreviewResponse['quote']['shipping']> | undefined {
  if (!quote.shipping) return undefined;
  return {
    ...quote.shipping,
    freeDeliveryFromCents: rates.delivery.isOffered ? rates.delivery.freeFromCents : null,
    pickupNote: rates.pickup.isOffered ? rates.pickup.note : null,
  };
}

/** The motifs, fonts and uploads a design names, so only those rows are read. */
function namedIn(document: DesignDocument): { motifSlugs: string[]; fontSlugs: string[]; artworkIds: number[] } {
  const motifSlugs = new Set<string>();
  const fontSlugs = new Set<string>();
  const artworkIds = new Set<number>();
  for (const placement of document.placements) {
    if (placement.kind === 'border' || placement.kind === 'motif') motifSlugs.add(placement.motif);
    if (placement.kind === 'lettering') fontSlugs.add(placement.font);
    if (placement.kind === 'artwork') artworkIds.add(placement.artworkUploadId);
  }
  return { motifSlugs: [...motifSlugs], fontSlugs: [...fontSlugs], artworkIds: [...artworkIds] };
}

/** Uploaded artwork as `figureDesign` takes it: an SVG's stored measurements, or a raster's size in pixels. */
export function artworkCatalogueOf(
  uploads: Awaited<ReturnType<typeof artworkForQuote>>,
): ReadonlyMap<number, CatalogueArtwork> {
  return new Map(
    uploads.map((upload): [number, CatalogueArtwork] => [
      upload.id,
      upload.isSvg
        ? { svgFigures: upload.stitchFigures }
        : { rasterSizePx: { widthPx: upload.widthPx, heightPx: upload.heightPx } },
    ]),
  );
}

/** The motifs and fonts a design names, so only those catalogue rows are read. */
export function slugsNamedIn(document: DesignDocument): { motifSlugs: string[]; fontSlugs: string[] } {
  const { motifSlugs, fontSlugs } = namedIn(document);
  return { motifSlugs, fontSlugs };
}

/** The catalogue as `figureDesign` takes it, with the uploads the requester may use. */
export function toQuoteCatalogue(
  record: QuoteCatalogueRecord,
  fonts: LetteringFontLoader,
  artworkUploads: ReadonlyMap<number, CatalogueArtwork> = new Map(),
): QuoteCatalogue {
  return {
    garment: record.garment,
    size: record.size,
    motifs: new Map(record.motifs.map((motif) => [motif.slug, motif])),
    fonts: new Map(
      record.fonts.map(({ fontsourcePackage, fileName, ...font }) => [
        font.slug,
        { ...font, outlines: fonts({ fontsourcePackage, fileName }) },
      ]),
    ),
    hoops: record.hoops,
    machine: record.machine,
    artworkUploads,
  };
}

/** The catalogue rows one design is priced from, for whoever prices or makes it (quotes, production sheets). */
export const quoteCatalogueFor = readQuoteCatalogue;
