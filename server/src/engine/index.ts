/**
 * The embroidery engine: pure functions from data to data (no I/O, clock, randomness or globals), shared by the
 * server, which prices orders, and the storefront and admin apps, which show instant feedback. Lengths are
 * millimetres, money is integer cents with an ISO 4217 code, and every function returns `{ ok: false, reason }`
 * instead of throwing.
 */
export type { EngineResult, Failure } from './engine-result.ts';
export { MM_PER_INCH } from './units.ts';

export { fitBorder, fitMotifBorder, MAX_BORDER_REPEATS } from './fit-border.ts';
export type { BorderFit, BorderFitFailure, BorderFitInput, BorderMotifLimits, BorderSuggestion } from './fit-border.ts';

export { planHoopings } from './plan-hoopings.ts';
export type { HoopField, Hooping, HoopingPlan, HoopingPlanInput, HoopingSide } from './plan-hoopings.ts';

export { estimateStitches } from './estimate-stitches.ts';
export type { StitchSource } from './estimate-stitches.ts';
export type { CatalogueMotif } from './estimate-catalogue-stitches.ts';
export { measureSvgArtwork } from './svg-artwork-figures.ts';
export type { SvgArtworkFigures, SvgShapeFigures, SvgSize } from './svg-artwork-figures.ts';
export { MAX_SVG_ELEMENTS, MAX_SVG_PATH_SEGMENTS } from './svg-document.ts';
export { MAX_LETTERING_CHARACTERS } from './estimate-lettering-stitches.ts';
export type { GlyphOutlineSource } from './estimate-lettering-stitches.ts';
export type { OutlineCommand } from './outline-geometry.ts';
export type { StitchEstimate } from './stitch-estimate.ts';
export type { StitchTally } from './shape-stitches.ts';
export { DEFAULT_STITCH_SETTINGS } from './stitch-settings.ts';
export type { StitchSettings } from './stitch-settings.ts';
export { estimateBorderStitches } from './estimate-border-stitches.ts';
export type { BorderStitchInput } from './estimate-border-stitches.ts';

export { DEFAULT_MACHINE_SETTINGS, estimateRunMinutes } from './estimate-run-minutes.ts';
export type {
  MachineSettings,
  RunTimeEstimate,
  RunTimeInput,
  RunTimeItem,
  RunTimeItemCode,
} from './estimate-run-minutes.ts';

export { checkPricingRuleSet } from './pricing-rules.ts';
export type { PricingRuleSet, QuantityBreak } from './pricing-rules.ts';
export { priceQuote, rehoopingWords } from './price-quote.ts';
export type {
  PlacementKind,
  Quote,
  QuoteInput,
  QuoteLine,
  QuoteLineCode,
  QuoteLineRate,
  QuotePlacement,
} from './price-quote.ts';
export { checkShippingRates, shippingMethodInWords, shippingOptions, shippingRefusal } from './price-shipping.ts';
export type { ShippingMethodCode, ShippingOption, ShippingRates } from './price-shipping.ts';
export { colourChangesBetween } from './colour-changes-between.ts';

export { colorDifferenceCiede2000, hexToLab } from './color-difference.ts';
export type { LabColor } from './color-difference.ts';
export { nearestThreads } from './nearest-threads.ts';
export type { ThreadColor, ThreadMatch } from './nearest-threads.ts';

export type { GuidanceMessage, GuidanceSeverity } from './guidance.ts';
export { adviseStabilizer, DEFAULT_DENSITY_THRESHOLDS } from './advise-stabilizer.ts';
export type {
  DensityThresholds,
  DesignDensity,
  FabricConstruction,
  StabilizerAdvice,
  StabilizerInput,
  StabilizerKind,
} from './advise-stabilizer.ts';
export { cautionsForGarment, garmentCautions, needsSafetyAcknowledgement } from './garment-cautions.ts';
export type { CordPlace, GarmentCautionInput, GarmentClosure, GarmentSafetyFactsInput } from './garment-cautions.ts';
export { layoutHemBorder } from './hem-border-layout.ts';
export type { BorderBand, BorderRepeat, HemZone } from './hem-border-layout.ts';
export { recolourThreadGroups } from './recolour-threads.ts';
export type { PaintableElement } from './recolour-threads.ts';

export { apportionStitches, foldUnderlay, svgCanvasSizeMm, svgColoursInOrder } from './motif-figures.ts';
export type { MotifStitchMix } from './motif-figures.ts';
export {
  addCalendarDays,
  addWorkingDays,
  dueDateOf,
  isPastDue,
  isWorkingDay,
  shopDayOf,
  weekStartOf,
} from './shop-calendar.ts';
export type { DatedOrder, ShopCalendar } from './shop-calendar.ts';

export { chargeStepOf, planCardPayment } from './card-payment-plan.ts';
export type { CardMethod, CardPlan, ChargeStep } from './card-payment-plan.ts';
export { findOverlaps, MIN_OVERLAP_MM, overlapDepthMm, overlappingIds } from './placement-overlap.ts';
export type { PlacementOutline, PlacementOverlap } from './placement-overlap.ts';
export { findFreeCentre, GRID_STEP_MM } from './free-space.ts';
export type { FreeCentre, ZoneRect } from './free-space.ts';
