import type { Db } from '../../db/knex.ts';
import { approvedOrderStatuses, isIn } from '../../contracts/order-status.ts';
import { artworkForQuote, artworkPicturesFor } from '../artwork/artwork-service.ts';
import {
  readMotifArtwork,
  readOrderToMake,
  readPalette,
  readThreadsByCode,
  type OrderToMake,
} from './production-sheet-repo.ts';
import { readStitchFileNames } from './placement-stitch-file-repo.ts';
import { restoreDesign, type DesignDocument } from '../../contracts/designs.ts';
import type { OrderStatus } from '../../contracts/order-status.ts';
import type { PaperSize, ProductionSheet } from '../../contracts/production-sheet.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { LetteringFontLoader } from '../../integrations/lettering-fonts.ts';
import { figureDesign } from '../quotes/design-figures.ts';
import { asBuffer, type HeavyWork } from '../../integrations/heavy-work.ts';
import { assembleSheet } from './production-sheet-assembly.ts';
import { artworkCatalogueOf, quoteCatalogueFor, slugsNamedIn, toQuoteCatalogue } from '../quotes/quote-service.ts';

/** The statuses a sheet is printed in: the customer has approved the proof in writing, so the needle may move. */

/** Why there is no sheet yet (or any more), in the studio's words. */
const NOT_YET: Readonly<Record<OrderStatus, string>> = {
  awaiting_payment: 'is waiting for the customer to pay, and then for an approved proof',
  authorized: 'has its card held but no proof sent yet: send a proof and wait for approval',
  proof_sent: 'has a proof waiting for the customer’s answer',
  changes_requested: 'has changes requested on its proof: send a new proof and wait for approval',
  proof_approved: '',
  in_production: '',
  stitched: '',
  shipped: '',
  cancelled: 'was cancelled, so nothing is to be made',
  refunded: 'was refunded, so nothing is to be made',
};

/**
 * The production sheet of an approved order: the hooping plan, threads, stabilizer, needle, run time, cautions
 * and 1:1 templates, all recomputed from the ordered design and today's catalogue with the quote's own
 * `figureDesign`, so the sheet is made the way the order was priced.
 */
export function createProductionSheetService(deps: { db: Db; fonts: LetteringFontLoader; heavyWork: HeavyWork }) {
  const { db } = deps;

  async function get(number: string): Promise<Result<ProductionSheet>> {
    const order = await readOrderToMake(db, number);
    if (!order) return failure('not-found', `There is no order ${number}.`);
    if (!isIn(approvedOrderStatuses, order.status)) {
      return failure(
        'conflict',
        `Order ${number} ${NOT_YET[order.status]}. The production sheet is ready once the customer approves the proof.`,
      );
    }
    const restored = restoreDesign(order.document);
    if (!restored.success)
      return failure(
        'conflict',
        `The design of order ${number} can't be read, so its sheet can't be made. Ask the developers to check it.`,
      );
    return sheetFor(order, restored.data);
  }

  async function pdf(number: string, paper: PaperSize): Promise<Result<Buffer>> {
    const sheet = await get(number);
    if (!sheet.ok) return sheet;
    // pdfkit lays out every page and template tile: done in the heavy-work pool.
    const built = await deps.heavyWork.run<Uint8Array>('productionSheetPdf', { sheet: sheet.value, paper });
    return built.ok ? ok(asBuffer(built.value)) : built;
  }

  async function sheetFor(order: OrderToMake, document: DesignDocument): Promise<Result<ProductionSheet>> {
    const record = await quoteCatalogueFor(db, {
      garmentId: order.garmentId,
      sizeId: order.sizeId,
      colourId: order.colourId,
      ...slugsNamedIn(document),
    });
    if (!record.ok)
      return failure('conflict', `Order ${order.number} can't be figured from the catalogue: ${record.error.message}`);
    // The customer's own uploads are stitched as they were priced: the order's customer owns them.
    const artworkIds = document.placements.flatMap((placement) =>
      placement.kind === 'artwork' ? [placement.artworkUploadId] : [],
    );
    const owner = { userId: order.customerId };
    const [uploads, pictures] = await Promise.all([
      artworkForQuote(db, owner, artworkIds),
      artworkPicturesFor(db, owner, artworkIds),
    ]);
    const catalogue = toQuoteCatalogue(record.value, deps.fonts, artworkCatalogueOf(uploads));
    const figured = figureDesign(catalogue, document);
    if (!figured.ok)
      return failure(
        'conflict',
        `Order ${order.number} can't be figured from today’s catalogue: ${figured.error.message}`,
      );
    const threadCodes = document.placements.flatMap((placement) =>
      placement.kind === 'lettering' ? [placement.thread] : placement.kind === 'artwork' ? [] : placement.threads,
    );
    const [threads, artwork, palette, stitchFileNames] = await Promise.all([
      readThreadsByCode(db, threadCodes),
      readMotifArtwork(db, slugsNamedIn(document).motifSlugs),
      artworkIds.length > 0 ? readPalette(db) : Promise.resolve([]),
      readStitchFileNames(db, order.id),
    ]);
    return assembleSheet({
      order,
      document,
      catalogue,
      figures: figured.value,
      threads,
      artwork,
      pictures: new Map(pictures.map((picture) => [picture.id, picture])),
      palette,
      stitchFileNames,
    });
  }

  return { get, pdf };
}

export type ProductionSheetService = ReturnType<typeof createProductionSheetService>;
