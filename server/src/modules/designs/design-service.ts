import type { z } from 'zod';
import type { Db } from '../../db/knex.ts';
import {
  deleteDesign,
  findOrderNumberOfDesign,
  findOwnedDesign,
  insertDesign,
  listCustomerDesigns,
  lockOwnedDesign,
  updateOwnedDesign,
  type DesignWrite,
  type StoredDesign,
} from './design-repo.ts';
import { renameOwnedDesign } from './design-share-repo.ts';
import { restoreDesign } from '../../contracts/designs.ts';
import type {
  SaveDesignRequest,
  SavedDesign,
  savedDesignListResponse,
  savedDesignResponse,
} from '../../contracts/saved-designs.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { QuoteService } from '../quotes/quote-service.ts';
import { designUploadPictures, uploadsOf } from '../artwork/artwork-service.ts';
import type { DesignUploadPicture } from '../../contracts/artwork.ts';

type SavedDesignResponse = z.infer<typeof savedDesignResponse>;
type SavedDesignListResponse = z.infer<typeof savedDesignListResponse>;

/**
 * A customer's saved designs. Each person sees and changes only their own (staff and owners too: the studio
 * works through the admin routes), and someone else's design answers exactly as a missing one, so ids reveal
 * nothing. Only a design the server can price is saved, so every saved design can be quoted and ordered.
 */
export function createDesignService(deps: { db: Db; quotes: QuoteService; now: () => Date }) {
  const { db } = deps;

  /** The customer's designs, the most recently changed first. */
  async function list(customerId: number): Promise<Result<SavedDesignListResponse>> {
    const designs = (await listCustomerDesigns(db, customerId)).map(restored);
    const pictures = await designUploadPictures(
      db,
      customerId,
      designs.map((design) => design.document),
    );
    return ok({ designs: designs.map((design) => withUploads(design, pictures)) });
  }

  /** One of the customer's designs. */
  async function get(customerId: number, id: number): Promise<Result<SavedDesignResponse>> {
    const stored = await findOwnedDesign(db, { id, customerId });
    if (!stored) return noSuchDesign(id);
    const design = restored(stored);
    return ok({ design: withUploads(design, await designUploadPictures(db, customerId, [design.document])) });
  }

  /** Saves a new design once the server can price it; the answer is the design as stored. */
  async function create(customerId: number, request: SaveDesignRequest): Promise<Result<SavedDesignResponse>> {
    const priceable = await checkPriceable(customerId, request);
    if (!priceable.ok) return priceable;
    const id = await insertDesign(db, customerId, toWrite(request, deps.now()));
    return get(customerId, id);
  }

  /**
   * Replaces one of the customer's designs, under the same checks as a new one. The checks come first and answer
   * alike whether or not the id is this customer's, so they reveal nothing about other people's designs. A design
   * an order stitches is kept as it was ordered: the studio proofs and makes exactly that.
   */
  async function update(
    customerId: number,
    id: number,
    request: SaveDesignRequest,
  ): Promise<Result<SavedDesignResponse>> {
    const priceable = await checkPriceable(customerId, request);
    if (!priceable.ok) return priceable;
    const updated = await db.transaction(async (trx): Promise<Result<void>> => {
      if (!(await lockOwnedDesign(trx, { id, customerId }))) return noSuchDesign(id);
      const orderNumber = await findOrderNumberOfDesign(trx, id);
      if (orderNumber) {
        return failure(
          'conflict',
          `This design is part of order ${orderNumber}, which is made exactly as ordered. Save your changes as a new design instead.`,
        );
      }
      await updateOwnedDesign(trx, { id, customerId }, toWrite(request, deps.now()));
      return ok(undefined);
    });
    return updated.ok ? get(customerId, id) : updated;
  }

  /** Deletes one of the customer's designs, unless an order stitches it: the shop keeps what it was paid to make. */
  async function remove(customerId: number, id: number): Promise<Result<void>> {
    return db.transaction(async (trx) => {
      if (!(await lockOwnedDesign(trx, { id, customerId }))) return noSuchDesign(id);
      const orderNumber = await findOrderNumberOfDesign(trx, id);
      if (orderNumber) return failure('conflict', `This design is part of order ${orderNumber}, so it is kept.`);
      await deleteDesign(trx, id);
      return ok(undefined);
    });
  }

  /**
   * Prices the design once, for one garment, and keeps only the verdict: this runs the same catalogue checks and
   * engine as a quote (the garment on sale, its own size and colour, active motifs and fonts, borders only on a
   * hem), so a saved design is one the shop can quote. The catalogue lookup answers `not-found` for a garment,
   * size or colour that is not on offer; here those are fields of the request, so they answer 400 with the same
   * field messages. The engine's refusals are already `invalid`, keyed by the same `document.…` paths.
   */
  async function checkPriceable(customerId: number, request: SaveDesignRequest): Promise<Result<void>> {
    const quoted = await deps.quotes.preview(
      {
        garmentId: request.garmentId,
        sizeId: request.sizeId,
        colourId: request.colourId,
        quantity: 1,
        isRush: false,
        document: request.document,
      },
      { userId: customerId },
    );
    if (quoted.ok) return ok(undefined);
    if (quoted.error.kind === 'not-found') return failure('invalid', quoted.error.message, quoted.error.fields);
    return quoted;
  }

  /**
   * Saves a copy of one of the customer's designs as a new design of theirs, under the same checks as a new save:
   * the way to change a design an order keeps, or to try a variation. The copy is not shared.
   */
  async function duplicate(customerId: number, id: number): Promise<Result<SavedDesignResponse>> {
    const original = await get(customerId, id);
    if (!original.ok) return original;
    const { garmentId, sizeId, colourId, name, document } = original.value.design;
    return create(customerId, { garmentId, sizeId, colourId, name: copyNameOf(name), document });
  }

  /** Renames one of the customer's designs. The document is untouched, so a design an order keeps may be renamed. */
  async function rename(customerId: number, id: number, name: string): Promise<Result<SavedDesignResponse>> {
    const isFound = await renameOwnedDesign(db, { id, customerId }, name, deps.now());
    return isFound ? get(customerId, id) : noSuchDesign(id);
  }

  return { list, get, create, update, remove, duplicate, rename };
}

export type DesignService = ReturnType<typeof createDesignService>;

function noSuchDesign(id: number): Result<never> {
  return failure('not-found', `There is no design ${id}.`);
}

const MAX_NAME_LENGTH = 80;
const COPY_SUFFIX = ' (copy)';

/** “Name (copy)”, shortened so that it still fits the 80 characters a name may have. */
function copyNameOf(name: string): string {
  return `${name.slice(0, MAX_NAME_LENGTH - COPY_SUFFIX.length).trimEnd()}${COPY_SUFFIX}`;
}

function toWrite(request: SaveDesignRequest, savedAt: Date): DesignWrite {
  return {
    garmentId: request.garmentId,
    sizeId: request.sizeId,
    colourId: request.colourId,
    name: request.name,
    document: request.document,
    savedAt,
  };
}

/** A stored design with its document restored; one that fails restoreDesign is a bug. */
function restored(stored: StoredDesign): Omit<SavedDesign, 'uploads'> {
  const result = restoreDesign(stored.document);
  if (!result.success) throw new Error(`Saved design ${stored.id} no longer restores: ${result.error.message}`);
  return { ...stored, document: result.data };
}

/** The design as the customer gets it, with the pictures of the uploads it places. */
function withUploads(
  design: Omit<SavedDesign, 'uploads'>,
  pictures: ReadonlyMap<number, DesignUploadPicture>,
): SavedDesign {
  return { ...design, uploads: uploadsOf(design.document, pictures) };
}

/** A customer's own saved design as stored, or undefined for anyone else's; `db` may be the caller's transaction. */
export const findCustomerDesign = findOwnedDesign;
