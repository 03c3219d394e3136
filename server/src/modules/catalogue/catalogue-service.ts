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

/** A size with the cautions for its youngest wearer; trims come with motifs, so the garment alone has none. */
function withCautions<Size extends { minAgeMonths: number }>(safety: GarmentSafetyFacts, size: Size) {
  const cautions = cautionsForGarment(safety, size.minAgeMonths, false);
  if (!cautions.ok) throw new Error(`The catalogue's garment facts do not read: ${cautions.reason}`);
  return { ...size, cautions: cautions.messages };
}

/** What the shop offers: the public catalogue a visitor chooses from, and the studio's whole list. */
export function createCatalogueService(deps: { db: Db }) {
  const { db } = deps;
  return {
    garments: async (): Promise<GarmentListResponse> => ({ garments: await listActiveGarments(db) }),
    async garment(slug: string): Promise<Result<GarmentDetailResponse>> {
      const garment = await findActiveGarmentDetail(db, slug);
      if (!garment) return failure('not-found', `There is no garment “${slug}” on offer.`);
      return ok({ garment: { ...garment, sizes: garment.sizes.map((size) => withCautions(garment.safety, size)) } });
    },
    motifs: async (): Promise<MotifListResponse> => ({ motifs: await listActiveMotifs(db) }),
    fonts: async (): Promise<FontListResponse> => ({ fonts: await listActiveLetteringFonts(db) }),
    threads: async (): Promise<ThreadListResponse> => ({ threads: await listActiveThreads(db) }),
    hoops: async (): Promise<HoopListResponse> => ({ hoops: await listActiveHoops(db) }),
    /** Everything the studio stitches with, retired rows included. */
    studioCatalogue: (): Promise<StudioCatalogueResponse> => readStudioCatalogue(db),
  };
}

export type CatalogueService = ReturnType<typeof createCatalogueService>;
