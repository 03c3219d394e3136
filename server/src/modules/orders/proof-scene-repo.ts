import type { Db } from '../../db/knex.ts';
import { designDocument, type DesignDocument } from '../../contracts/designs.ts';
import type { PlacementZone } from '../quotes/quote-catalogue-types.ts';
import type { LetteringFontFile } from '../../integrations/lettering-fonts.ts';
import { mockupSizeMm } from '../../engine/garment-mockup-size.ts';

/** A motif's drawing and the figures that size and fit it. */
export interface SceneMotif {
  svg: string;
  widthMm: number;
  heightMm: number;
  gapMm: number;
  minScalePct: number;
  maxScalePct: number;
}

/** Everything needed to draw an order's design on its garment, as the customer designed it. */
export interface ProofScene {
  document: DesignDocument;
  /** The garment drawing at its reference size, painted with `currentColor`. */
  mockupSvg: string;
  /** The drawing at this size, mm. */
  mockupWidthMm: number;
  mockupHeightMm: number;
  fabricHex: string;
  hemFrontMm: number | null;
  hemCircumferenceMm: number | null;
  zones: PlacementZone[];
  motifs: ReadonlyMap<string, SceneMotif>;
  threadHexes: ReadonlyMap<string, string>;
  fonts: ReadonlyMap<string, LetteringFontFile>;
  /** The customer's uploads the design names, drawn from their clean copies (`proof-scene.ts` fills them in). */
  artwork: ReadonlyMap<number, SceneArtwork>;
}

/** An upload as the proof draws it: its clean copy as a data URL, and its proportions. */
export interface SceneArtwork {
  href: string;
  widthPx: number;
  heightPx: number;
}

const mmOrNull = (value: string | null) => (value === null ? null : Number(value));

/**
 * The scene of an order's first line (an order is one design on identical garments), with the catalogue rows its
 * design names, retired ones included: a proof shows what was ordered, even if the shop no longer offers it.
 */
export async function loadProofScene(
  db: Db,
  orderId: number,
  design?: DesignDocument,
): Promise<{ scene: ProofScene; customerId: number; uploadIds: number[] } | undefined> {
  const row = await db('order_items as i')
    .join('orders as o', 'o.id', 'i.order_id')
    .join('designs as d', 'd.id', 'i.design_id')
    .join('garments as g', 'g.id', 'd.garment_id')
    .join('garment_sizes as s', 's.id', 'i.garment_size_id')
    .join('fabric_colours as c', 'c.id', 'd.fabric_colour_id')
    .where('i.order_id', orderId)
    .orderBy('i.id')
    .first(
      'd.document',
      'g.slug',
      'g.mockup_svg',
      's.mockup_scale',
      's.hem_front_mm',
      's.hem_circumference_mm',
      's.placement_zones',
      'c.hex',
      'o.customer_id',
    );
  if (!row) return undefined;
  // The studio's own version of the design (a change it made for a proof) is drawn instead of the one ordered.
  const document =
    design ?? designDocument.parse(typeof row.document === 'string' ? JSON.parse(row.document) : row.document);
  const motifSlugs = document.placements.flatMap((p) => (p.kind === 'border' || p.kind === 'motif' ? [p.motif] : []));
  const fontSlugs = document.placements.flatMap((p) => (p.kind === 'lettering' ? [p.font] : []));
  const uploadIds = document.placements.flatMap((p) => (p.kind === 'artwork' ? [p.artworkUploadId] : []));
  const [motifs, threads, fonts] = await Promise.all([
    db('motifs')
      .whereIn('slug', motifSlugs)
      .select('slug', 'svg', 'width_mm', 'height_mm', 'gap_mm', 'min_scale_pct', 'max_scale_pct'),
    db('threads').select('code', 'hex'),
    db('lettering_fonts').whereIn('slug', fontSlugs).select('slug', 'fontsource_package', 'file_name'),
  ]);
  const reference = mockupSizeMm(row.mockup_svg, row.slug);
  const scale = Number(row.mockup_scale);
  const scene: ProofScene = {
    document,
    mockupSvg: row.mockup_svg,
    mockupWidthMm: reference.widthMm * scale,
    mockupHeightMm: reference.heightMm * scale,
    fabricHex: row.hex,
    hemFrontMm: mmOrNull(row.hem_front_mm),
    hemCircumferenceMm: mmOrNull(row.hem_circumference_mm),
    zones: typeof row.placement_zones === 'string' ? JSON.parse(row.placement_zones) : row.placement_zones,
    motifs: new Map(
      motifs.map((m) => [
        m.slug,
        {
          svg: m.svg,
          widthMm: Number(m.width_mm),
          heightMm: Number(m.height_mm),
          gapMm: Number(m.gap_mm),
          minScalePct: Number(m.min_scale_pct),
          maxScalePct: Number(m.max_scale_pct),
        },
      ]),
    ),
    threadHexes: new Map(threads.map((t) => [t.code, t.hex])),
    fonts: new Map(fonts.map((f) => [f.slug, { fontsourcePackage: f.fontsource_package, fileName: f.file_name }])),
    artwork: new Map(),
  };
  return { scene, customerId: row.customer_id, uploadIds };
}
