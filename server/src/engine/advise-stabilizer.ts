import { fail, type EngineResult } from './engine-result.ts';
import type { GuidanceMessage } from './guidance.ts';
import { isPositiveNumber, isRecord, isWholeNumber } from './input-checks.ts';
import { MM2_PER_CM2 } from './units.ts';

export type FabricConstruction = 'woven' | 'knit' | 'sheer';

export type StabilizerKind = 'water-soluble-adhesive' | 'tearaway' | 'cutaway-adhesive' | 'cutaway' | 'no-show-mesh';

export type DesignDensity = 'airy' | 'medium' | 'dense';

/** Where a design stops being airy or starts being dense, in stitches per cm² of its width × height. */
export interface DensityThresholds {
  airyBelowStitchesPerCm2: number;
  denseAboveStitchesPerCm2: number;
}

/**
 * Common practice, no source, reasoned from the fill defaults: a fully filled area carries about 125 top
 * stitches per cm² (0.2 mm rows × 4 mm stitches), so below 25 (about a fifth covered) a design is open and airy,
 * and above 80 (about two thirds covered) it is dense.
 */
export const DEFAULT_DENSITY_THRESHOLDS: Readonly<DensityThresholds> = Object.freeze({
  airyBelowStitchesPerCm2: 25,
  denseAboveStitchesPerCm2: 80,
});

export interface StabilizerInput {
  stitches: number;
  /** The design's stitched width and height, mm: density is counted over this area. */
  widthMm: number;
  heightMm: number;
  fabric: FabricConstruction;
  /** Towelling, fleece, velour, corduroy: a pile the stitches can sink into. */
  isNapped: boolean;
  isForBabyOrToddler?: boolean;
  thresholds?: Partial<DensityThresholds>;
}

export interface StabilizerAdvice {
  densityStitchesPerCm2: number;
  density: DesignDensity;
  backing: StabilizerKind;
  /** A topping laid over napped fabric, or null. */
  topping: 'water-soluble' | null;
  messages: GuidanceMessage[];
}

const BACKING_MESSAGES: Readonly<Record<StabilizerKind, Omit<GuidanceMessage, 'code' | 'severity'>>> = {
  'water-soluble-adhesive': {
    title: 'Wash-away backing',
    text: 'This design is light and open, so it is stitched over a sticky backing that rinses away, leaving the fabric soft with nothing behind it.',
    appliesWhen: 'An open, light design on woven fabric',
  },
  tearaway: {
    title: 'Tear-away backing',
    text: 'A backing that tears off after stitching supports this design on a stable woven fabric.',
    appliesWhen: 'A design of medium density on woven fabric',
  },
  'cutaway-adhesive': {
    title: 'Cut-away backing',
    text: 'This design has many stitches for its size. A sticky backing stays behind it, trimmed close, so it lies flat wash after wash. On some crisp wovens it can pucker slightly.',
    appliesWhen: 'A dense design on woven fabric',
  },
  cutaway: {
    title: 'Cut-away backing',
    text: 'Stretchy fabric needs a backing that stays behind the stitches, trimmed close, or the design pulls out of shape when the fabric stretches and is washed.',
    appliesWhen: 'Knit or stretchy fabric',
  },
  'no-show-mesh': {
    title: 'Sheer mesh backing',
    text: 'Sheer fabric shows what is behind it, so a fine mesh backing that does not show through is used and trimmed close.',
    appliesWhen: 'Sheer fabric',
  },
};

/**
 * Chooses backing and topping from fabric and stitch density (stitches ÷ the design's width × height, per cm²).
 * Rules: knits → cutaway; stable wovens → tearaway (lindeegembroidery.com "If you wear it don't tear it";
 * blackmoreandroy.com.au cutaway usage table); airy designs on wovens → water-soluble adhesive, dense ones →
 * cutaway adhesive, sheer fabric → no-show mesh (common practice, no source); water-soluble topping on napped
 * fabric (cigarcityarts.com/articles/wss.html); a soft fusible mesh over the back for baby and toddler wear
 * (blackmoreandroy.com.au).
 */
export function adviseStabilizer(input: StabilizerInput): EngineResult<StabilizerAdvice> {
  if (!isRecord(input)) return fail('The stabilizer advice needs the design and the fabric.');
  const { stitches, widthMm, heightMm, fabric, isNapped } = input;
  if (!isWholeNumber(stitches)) return fail('The stitch count must be a whole number, 0 or more.');
  if (!isPositiveNumber(widthMm) || !isPositiveNumber(heightMm))
    return fail('The design width and height must be positive numbers of millimetres.');
  if (fabric !== 'woven' && fabric !== 'knit' && fabric !== 'sheer')
    return fail('The fabric must be woven, knit or sheer.');
  if (typeof isNapped !== 'boolean') return fail('Say whether the fabric has a nap or pile.');
  if (input.thresholds !== undefined && !isRecord(input.thresholds))
    return fail('The density thresholds must be an object.');
  const thresholds = { ...DEFAULT_DENSITY_THRESHOLDS, ...input.thresholds };
  if (
    !isPositiveNumber(thresholds.airyBelowStitchesPerCm2) ||
    !isPositiveNumber(thresholds.denseAboveStitchesPerCm2) ||
    thresholds.airyBelowStitchesPerCm2 > thresholds.denseAboveStitchesPerCm2
  ) {
    return fail('The density thresholds must be positive, with the airy limit below the dense one.');
  }

  const densityStitchesPerCm2 = stitches / ((widthMm * heightMm) / MM2_PER_CM2);
  if (!Number.isFinite(densityStitchesPerCm2)) return fail('The design is too small to measure its density.');
  const density: DesignDensity =
    densityStitchesPerCm2 < thresholds.airyBelowStitchesPerCm2
      ? 'airy'
      : densityStitchesPerCm2 > thresholds.denseAboveStitchesPerCm2
        ? 'dense'
        : 'medium';
  const backing = chooseBacking(fabric, density);
  const messages: GuidanceMessage[] = [
    { code: `stabilizer.${backing}`, severity: 'info', ...BACKING_MESSAGES[backing] },
  ];
  if (fabric === 'sheer' && density === 'dense') {
    messages.push({
      code: 'stabilizer.dense-on-sheer',
      severity: 'caution',
      title: 'Heavy design on light fabric',
      text: 'This many stitches can pucker or drag sheer fabric. A lighter or smaller design will sit better.',
      appliesWhen: 'A dense design on sheer fabric',
    });
  }
  if (isNapped) {
    messages.push({
      code: 'stabilizer.water-soluble-topping',
      severity: 'info',
      title: 'Wash-away topping',
      text: 'A thin film laid on top keeps the stitches from sinking into the pile; it dissolves in the first wash.',
      appliesWhen: 'Fabric with a nap or pile, such as towelling or fleece',
    });
  }
  if (input.isForBabyOrToddler === true) {
    messages.push({
      code: 'stabilizer.soft-back-cover',
      severity: 'info',
      title: 'Soft cover on the back',
      text: 'A soft fusible mesh ironed over the back of the stitching keeps it from rubbing delicate skin.',
      appliesWhen: 'Clothes for babies and toddlers',
    });
  }
  return { ok: true, densityStitchesPerCm2, density, backing, topping: isNapped ? 'water-soluble' : null, messages };
}

function chooseBacking(fabric: FabricConstruction, density: DesignDensity): StabilizerKind {
  if (fabric === 'sheer') return 'no-show-mesh';
  if (fabric === 'knit') return 'cutaway';
  if (density === 'airy') return 'water-soluble-adhesive';
  return density === 'dense' ? 'cutaway-adhesive' : 'tearaway';
}
