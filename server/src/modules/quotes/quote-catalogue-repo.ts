import type { Db } from '../../db/knex.ts';
import { jsonColumn } from '../../db/json-column.ts';
import { SHIPPING_RATE_COLUMNS, shippingRatesOfRow } from '../../db/shipping-rates-columns.ts';
import type { PricingRuleSet, ShippingRates } from '../../engine/index.ts';
import type { LetteringFontFile } from '../../integrations/lettering-fonts.ts';
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

/** The rows behind a quote; fonts still as files, for the caller's font loader to open. */
export interface QuoteCatalogueRecord {
  garment: CatalogueGarment;
  size: CatalogueSize;
  motifs: CatalogueMotifEntry[];
  fonts: QuoteCatalogueFontRow[];
  hoops: CatalogueHoop[];
  machine: ShopMachine;
  /** The shop's shipping methods and rates. */
  shipping: ShippingRates;
  /** The published price list, and its row id for the quotes priced with it. */
  ruleSet: PricingRuleSet;
  ruleSetId: number;
}

export type QuoteCatalogueFontRow = Omit<CatalogueFont, 'outlines'> & LetteringFontFile;

/**
 * Everything on sale that a quote may name, as the server keeps it in memory: active garments with their sizes
 * and colours, active motifs, fonts and hoops, the machine's pace and the published price list.
 */
export interface ActiveQuoteCatalogue {
  garments: ReadonlyMap<number, CatalogueGarment>;
  sizes: ReadonlyMap<number, CatalogueSize & { garmentId: number }>;
  /** Fabric colour id → its garment's id. */
  colourGarments: ReadonlyMap<number, number>;
  motifs: ReadonlyMap<string, CatalogueMotifEntry>;
  fonts: ReadonlyMap<string, QuoteCatalogueFontRow>;
  hoops: CatalogueHoop[];
  /** Undefined until the studio has set up its machine or published prices. */
  machine: ShopMachine | undefined;
  shipping: ShippingRates | undefined;
  ruleSet: { id: number; rules: PricingRuleSet } | undefined;
}

const ordered = [{ column: 'sort_order' }, { column: 'id' }];
// mysql2 returns DECIMAL columns as strings and booleans as 0/1; JSON columns arrive parsed.
const mmOrNull = (value: string | null) => (value === null ? null : Number(value));

/** Reads everything on sale that a quote may name: one query per table. */
export async function readActiveQuoteCatalogue(db: Db): Promise<ActiveQuoteCatalogue> {
  const [garments, sizes, colours, motifs, fonts, hoops, shop, ruleSet] = await Promise.all([
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
      .where({ is_active: true }),
    db('garment_sizes')
      .join('garments', 'garments.id', 'garment_sizes.garment_id')
      .select(
        'garment_sizes.id',
        'garment_sizes.garment_id',
        'garment_sizes.code',
        'garment_sizes.label',
        'garment_sizes.hem_front_mm',
        'garment_sizes.hem_circumference_mm',
        'garment_sizes.placement_zones',
        'garment_sizes.min_age_months',
      )
      .where({ 'garments.is_active': true }),
    db('fabric_colours')
      .join('garments', 'garments.id', 'fabric_colours.garment_id')
      .select('fabric_colours.id', 'fabric_colours.garment_id')
      .where({ 'garments.is_active': true }),
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
      .where({ is_active: true }),
    db('lettering_fonts')
      .select('slug', 'name', 'fontsource_package', 'file_name', 'min_height_mm', 'max_height_mm')
      .where({ is_active: true }),
    db('hoops')
      .select('slug', 'name', 'field_width_mm', 'field_height_mm', 'clearance_mm')
      .where({ is_active: true })
      .orderBy(ordered),
    db('shop_settings')
      .select(
        'machine_stitches_per_minute',
        'minutes_per_colour_change',
        'minutes_per_hooping',
        'setup_minutes',
        ...SHIPPING_RATE_COLUMNS,
      )
      .where({ id: 1 })
      .first(),
    db('pricing_rule_sets').select('id', 'rules').where({ status: 'published' }).first(),
  ]);
  return {
    garments: new Map(
      garments.map((garment: any): [number, CatalogueGarment] => [
        garment.id,
        {
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
      ]),
    ),
    sizes: new Map(
      sizes.map((size: any): [number, CatalogueSize & { garmentId: number }] => [
        size.id,
        {
          id: size.id,
          garmentId: size.garment_id,
          code: size.code,
          label: size.label,
          hemFrontMm: mmOrNull(size.hem_front_mm),
          hemCircumferenceMm: mmOrNull(size.hem_circumference_mm),
          zones: size.placement_zones as PlacementZone[],
          minAgeMonths: size.min_age_months,
        },
      ]),
    ),
    colourGarments: new Map(colours.map((colour: any): [number, number] => [colour.id, colour.garment_id])),
    motifs: new Map(
      motifs.map((m: any): [string, CatalogueMotifEntry] => [
        m.slug,
        {
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
        },
      ]),
    ),
    fonts: new Map(
      fonts.map((f: any): [string, QuoteCatalogueFontRow] => [
        f.slug,
        {
          slug: f.slug,
          name: f.name,
          fontsourcePackage: f.fontsource_package,
          fileName: f.file_name,
          minHeightMm: Number(f.min_height_mm),
          maxHeightMm: Number(f.max_height_mm),
        },
      ]),
    ),
    hoops: hoops.map((h: any) => ({
      slug: h.slug,
      name: h.name,
      fieldWidthMm: Number(h.field_width_mm),
      fieldHeightMm: Number(h.field_height_mm),
      clearanceMm: Number(h.clearance_mm),
    })),
    machine: shop && {
      stitchesPerMinute: shop.machine_stitches_per_minute,
      minutesPerColorChange: Number(shop.minutes_per_colour_change),
      minutesPerHooping: Number(shop.minutes_per_hooping),
      setupMinutes: Number(shop.setup_minutes),
    },
    shipping: shop && shippingRatesOfRow(shop),
    ruleSet: ruleSet && { id: ruleSet.id, rules: ruleSet.rules as PricingRuleSet },
  };
}
