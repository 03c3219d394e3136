import type { Db } from '../../db/knex.ts';
import { jsonColumn } from '../../db/json-column.ts';
import type { PricingRuleSet } from '../../engine/index.ts';
import type { LetteringFontFile } from '../../integrations/lettering-fonts.ts';
import { failure, ok, type Result } from '../../contracts/result.ts';
import { garmentSafetyFacts } from '../../contracts/guidance.ts';
import type {
  CatalogueFont,
  CatalogueGarment,
  CatalogueHoop,
  CatalogueMotifEntry,
  CatalogueSize,
  PlacementZone,
  ShopMachine,
} from './quote-catalogue-types.ts';

/** Which catalogue rows a quote needs: the design names its motifs and fonts by slug. */
interface QuoteCatalogueQuery {
  garmentId: number;
  sizeId: number;
  colourId?: number;
  motifSlugs: string[];
  fontSlugs: string[];
}

/** The rows behind a quote; fonts still as files, for the caller's font loader to open. */
export interface QuoteCatalogueRecord {
  garment: CatalogueGarment;
  size: CatalogueSize;
  motifs: CatalogueMotifEntry[];
  fonts: (Omit<CatalogueFont, 'outlines'> & LetteringFontFile)[];
  hoops: CatalogueHoop[];
  machine: ShopMachine;
  /** The published price list, and its row id for the quotes priced with it. */
  ruleSet: PricingRuleSet;
  ruleSetId: number;
}

const ordered = [{ column: 'sort_order' }, { column: 'id' }];
// mysql2 returns DECIMAL columns as strings and booleans as 0/1; JSON columns arrive parsed.
const mmOrNull = (value: string | null) => (value === null ? null : Number(value));

/**
 * Reads what pricing a design on this garment, size (and colour) needs: one query per table. `not-found` when
 * the garment is not on sale or the size or colour is not one of its own; `conflict` when the studio has no
 * published price list, no hoops or no shop settings, as no design can be priced until it has.
 */
export async function loadQuoteCatalogue(db: Db, query: QuoteCatalogueQuery): Promise<Result<QuoteCatalogueRecord>> {
  const [garment, size, colour, motifs, fonts, hoops, shop, ruleSet] = await Promise.all([
    db('garments')
      .select(
        'id',
        'slug',
        'name',
        'fabric_type',
        'is_napped',
        'min_age_months',
        'tie_places',
        'drawstring_places',
        'closure',
        'closes_at_neck',
        'intended_use',
      )
      .where({ id: query.garmentId, is_active: true })
      .first(),
    db('garment_sizes')
      .select('id', 'code', 'label', 'hem_front_mm', 'hem_circumference_mm', 'placement_zones', 'min_age_months')
      .where({ id: query.sizeId, garment_id: query.garmentId })
      .first(),
    query.colourId === undefined
      ? undefined
      : db('fabric_colours').select('id').where({ id: query.colourId, garment_id: query.garmentId }).first(),
    db('motifs')
      .select(
        'slug',
        'name',
        'kind',
        'width_mm',
        'height_mm',
        'gap_mm',
        'run_stitches',
        'satin_stitches',
        'fill_stitches',
        'colour_count',
        'min_scale_pct',
        'max_scale_pct',
        'trims',
      )
      .whereIn('slug', query.motifSlugs)
      .where({ is_active: true }),
    db('lettering_fonts')
      .select('slug', 'name', 'fontsource_package', 'file_name', 'min_height_mm', 'max_height_mm')
      .whereIn('slug', query.fontSlugs)
      .where({ is_active: true }),
    db('hoops')
      .select('slug', 'name', 'field_width_mm', 'field_height_mm', 'clearance_mm')
      .where({ is_active: true })
      .orderBy(ordered),
    db('shop_settings')
      .select('machine_stitches_per_minute', 'minutes_per_colour_change', 'minutes_per_hooping', 'setup_minutes')
      .where({ id: 1 })
      .first(),
    db('pricing_rule_sets').select('id', 'rules').where({ status: 'published' }).first(),
  ]);
  if (!garment)
    return failure('not-found', 'That garment is not in the shop any more.', { garmentId: 'Choose another garment' });
  if (!size)
    return failure('not-found', 'That size is not made in this garment.', {
      sizeId: 'Choose one of this garment’s sizes',
    });
  if (query.colourId !== undefined && !colour) {
    return failure('not-found', 'That fabric colour is not made in this garment.', {
      colourId: 'Choose one of this garment’s colours',
    });
  }
  if (!ruleSet) return failure('conflict', 'The studio has not published its prices yet, so designs cannot be priced.');
  if (hoops.length === 0)
    return failure('conflict', 'The studio has no hoops set up yet, so designs cannot be priced.');
  if (!shop) return failure('conflict', 'The studio has not set up its machine yet, so designs cannot be priced.');

  return ok({
    garment: {
      id: garment.id,
      slug: garment.slug,
      name: garment.name,
      fabricType: garment.fabric_type,
      isNapped: Boolean(garment.is_napped),
      minAgeMonths: garment.min_age_months,
      safety: garmentSafetyFacts.parse({
        tiePlaces: jsonColumn(garment.tie_places),
        drawstringPlaces: jsonColumn(garment.drawstring_places),
        closure: garment.closure,
        closesAtNeck: Boolean(garment.closes_at_neck),
        intendedUse: garment.intended_use,
      }),
    },
    size: {
      id: size.id,
      code: size.code,
      label: size.label,
      hemFrontMm: mmOrNull(size.hem_front_mm),
      hemCircumferenceMm: mmOrNull(size.hem_circumference_mm),
      zones: size.placement_zones as PlacementZone[],
      minAgeMonths: size.min_age_months,
    },
    motifs: motifs.map((m) => ({
      slug: m.slug,
      name: m.name,
      kind: m.kind,
      widthMm: Number(m.width_mm),
      heightMm: Number(m.height_mm),
      gapMm: Number(m.gap_mm),
      run: m.run_stitches,
      satin: m.satin_stitches,
      fill: m.fill_stitches,
      colourCount: m.colour_count,
      minScalePct: m.min_scale_pct,
      maxScalePct: m.max_scale_pct,
      trims: jsonColumn(m.trims) as string[],
    })),
    fonts: fonts.map((f) => ({
      slug: f.slug,
      name: f.name,
      fontsourcePackage: f.fontsource_package,
      fileName: f.file_name,
      minHeightMm: Number(f.min_height_mm),
      maxHeightMm: Number(f.max_height_mm),
    })),
    hoops: hoops.map((h) => ({
      slug: h.slug,
      name: h.name,
      fieldWidthMm: Number(h.field_width_mm),
      fieldHeightMm: Number(h.field_height_mm),
      clearanceMm: Number(h.clearance_mm),
    })),
    machine: {
      stitchesPerMinute: shop.machine_stitches_per_minute,
      minutesPerColorChange: Number(shop.minutes_per_colour_change),
      minutesPerHooping: Number(shop.minutes_per_hooping),
      setupMinutes: Number(shop.setup_minutes),
    },
    ruleSet: ruleSet.rules as PricingRuleSet,
    ruleSetId: ruleSet.id,
  });
}
