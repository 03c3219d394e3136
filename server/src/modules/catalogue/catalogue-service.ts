import { LRUCache } from 'lru-cache';
import type { Db } from '../../db/knex.ts';
import type {
  FontListResponse,
  GarmentDetailResponse,
  GarmentListResponse,
  HoopListResponse,
  MotifListResponse,
  ThreadListResponse,
} from '../../contracts/catalogue.ts';
import type { StudioCatalogueResponse } from '../../contracts/admin-catalogue.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import type { GarmentSafetyFacts } from '../../contracts/guidance.ts';
import { cautionsForGarment } from '../../engine/index.ts';
import { findActiveGarmentDetail, listActiveGarments } from './garment-repo.ts';
import { listActiveMotifs } from './motif-repo.ts';
import { listActiveLetteringFonts } from './lettering-font-repo.ts';
import { listActiveThreads } from './thread-repo.ts';
import { listActiveHoops } from './hoop-repo.ts';
import { readStudioCatalogue } from './studio-catalogue-repo.ts';
import {
  createCatalogueVersionWatch,
  keptWhileCatalogueUnchanged,
  type CatalogueVersionWatch,
} from './catalogue-version.ts';

/** A size with the cautions for its youngest wearer; trims come with motifs, so the garment alone has none. */
function withCautions<Size extends { minAgeMonths: number }>(safety: GarmentSafetyFacts, size: Size) {
  const cautions = cautionsForGarment(safety, size.minAgeMonths, false);
  if (!cautions.ok) throw new Error(`The catalogue's garment facts do not read: ${cautions.reason}`);
  return { ...size, cautions: cautions.messages };
}

/** Garment pages kept per catalogue version; the shop has a few dozen garments at most. */
const KEPT_GARMENT_PAGES = 200;

/**
 * What the shop offers: the public catalogue a visitor chooses from, kept in memory while the catalogue's change
 * count stays the same, and the studio's whole list, read afresh.
 */
export function createCatalogueService(deps: { db: Db; versions?: CatalogueVersionWatch }) {
  const { db } = deps;
  const versions = deps.versions ?? createCatalogueVersionWatch(db);
  const kept = <T>(read: () => Promise<T>) => keptWhileCatalogueUnchanged(versions, read);
  const garmentPages = kept(
    async () => new LRUCache<string, Promise<GarmentDetailResponse | null>>({ max: KEPT_GARMENT_PAGES }),
  );
  async function garmentPage(slug: string): Promise<GarmentDetailResponse | null> {
    const pages = await garmentPages();
    let page = pages.get(slug);
    if (!page) {
      page = findActiveGarmentDetail(db, slug).then((garment) =>
        garment
          ? { garment: { ...garment, sizes: garment.sizes.map((size) => withCautions(garment.safety, size)) } }
          : null,
      );
      pages.set(slug, page);
      page.catch(() => pages.delete(slug));
    }
    return page;
  }
  return {
    garments: kept(async (): Promise<GarmentListResponse> => ({ garments: await listActiveGarments(db) })),
    async garment(slug: string): Promise<Result<GarmentDetailResponse>> {
      const page = await garmentPage(slug);
      return page ? ok(page) : failure('not-found', `There is no garment “${slug}” on offer.`);
    },
    motifs: kept(async (): Promise<MotifListResponse> => ({ motifs: await listActiveMotifs(db) })),
    fonts: kept(async (): Promise<FontListResponse> => ({ fonts: await listActiveLetteringFonts(db) })),
    threads: kept(async (): Promise<ThreadListResponse> => ({ threads: await listActiveThreads(db) })),
    hoops: kept(async (): Promise<HoopListResponse> => ({ hoops: await listActiveHoops(db) })),
    /** Everything the studio stitches with, retired rows included. */
    studioCatalogue: (): Promise<StudioCatalogueResponse> => readStudioCatalogue(db),
  };
}

export type CatalogueService = ReturnType<typeof createCatalogueService>;
