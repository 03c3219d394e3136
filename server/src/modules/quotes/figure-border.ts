import { LRUCache } from 'lru-cache';
import {
  estimateBorderStitches,
  estimateStitches,
  fitMotifBorder,
  planHoopings,
  type BorderFit,
  type BorderFitFailure,
  type HoopingPlan,
  type StitchEstimate,
} from '../../engine/index.ts';
import type { BorderPlacement } from '../../contracts/designs.ts';
import type { CatalogueHoop, CatalogueMotifEntry, QuoteCatalogue } from './quote-catalogue-types.ts';
import { byFieldArea, catalogueMotifFor, countOf, refuse, type PlacementOutcome } from './placement-outcome.ts';

/**
 * A hem border: the repeats fitted to the run (the customer's count when they asked for one), planned into the
 * hoop that needs the fewest hoopings, and the stitches of the whole border. `path` is the placement's
 * field path in the request, for the messages.
 */
export function figureBorder(catalogue: QuoteCatalogue, placement: BorderPlacement, path: string): PlacementOutcome {
  const { garment, size } = catalogue;
  const motif = catalogue.motifs.get(placement.motif);
  if (!motif)
    return refuse(`${path}.motif`, `There is no motif “${placement.motif}” in the catalogue; choose another.`);
  if (motif.kind !== 'border')
    return refuse(
      `${path}.motif`,
      `The ${motif.name} is a single motif, not a border; place it on the garment instead.`,
    );
  if (placement.threads.length !== motif.colourCount) {
    return refuse(
      `${path}.threads`,
      `The ${motif.name} is sewn in ${countOf(motif.colourCount, 'colour')}; choose a thread for each.`,
    );
  }
  const isClosed = placement.run === 'circumference';
  const runLengthMm = isClosed ? size.hemCircumferenceMm : size.hemFrontMm;
  if (runLengthMm === null) return refuse(`${path}.zone`, `The ${garment.name} has no hem to take a border.`);

  const sewn = sewnBorder(catalogue.hoops, motif, { runLengthMm, closed: isClosed, count: placement.count });
  if (!sewn.ok && sewn.step === 'fit') {
    const { fit } = sewn;
    const where = isClosed ? 'round the hem' : 'along the front hem';
    const isAsked = placement.count !== undefined;
    const hint = isAsked && fit.nearest?.isWithinLimits ? ` ${countOf(fit.nearest.count, 'repeat')} would fit.` : '';
    return refuse(
      `${path}.${isAsked ? 'count' : 'motif'}`,
      `The ${motif.name} doesn't fit ${where} in size ${size.label}: ${fit.reason}${hint}`,
    );
  }
  if (!sewn.ok && sewn.step === 'hoop')
    return refuse(path, `No hoop holds the ${motif.name} in size ${size.label}: ${sewn.reason}`);
  if (!sewn.ok) return refuse(`${path}.motif`, `The ${motif.name} can't be estimated: ${sewn.reason}`);
  const { fit, planned, estimate } = sewn;
  const hoopings = planned.plan.hoopings.length;
  return {
    ok: true,
    figures: {
      id: placement.id,
      label: `Hem border: ${motif.name}`,
      kind: 'border',
      estimate,
      hoopings,
      hasCustomerArtwork: false,
      isPriceProvisional: false,
      border: {
        count: fit.count,
        // Two places, as the design document records it: 96.11 for the 692 mm loop of a 180 mm motif.
        scalePct: Number((fit.scale * 100).toFixed(2)),
        repeatWidthMm: fit.repeatWidthMm,
        pitchMm: fit.pitchMm,
        runLengthMm,
        isClosed,
        hoop: planned.hoop,
        plan: planned.plan,
        fit,
      },
    },
  };
}

type PlannedHoop = { ok: true; hoop: CatalogueHoop; plan: HoopingPlan } | { ok: false; reason: string };

/** A border as the engine sews it: the fit, the hoop and plan, the whole border's stitches, or the step that failed. */
type SewnBorder =
  | { ok: true; fit: BorderFit; planned: Extract<PlannedHoop, { ok: true }>; estimate: StitchEstimate }
  | { ok: false; step: 'fit'; fit: BorderFitFailure }
  | { ok: false; step: 'hoop' | 'estimate'; reason: string };

const BORDERS_KEPT_PER_MOTIF = 200;
/**
 * Borders already worked out, per catalogue snapshot and motif (the snapshot's hoop list and motif entries are
 * the same objects for as long as it lives, so a studio change starts afresh), then per run length, open or closed
 * and asked count: the same dress, size and border are priced again and again while a customer designs, and each
 * time the answer is the same.
 */
const sewnBorders = new WeakMap<readonly CatalogueHoop[], WeakMap<CatalogueMotifEntry, LRUCache<string, SewnBorder>>>();

/** The run a border fills: its length, mm, whether it closes on itself, and the count the customer asked for. */
type BorderRun = { runLengthMm: number; closed: boolean; count?: number };

function sewnBorder(hoops: readonly CatalogueHoop[], motif: CatalogueMotifEntry, run: BorderRun): SewnBorder {
  let byMotif = sewnBorders.get(hoops);
  if (!byMotif) sewnBorders.set(hoops, (byMotif = new WeakMap()));
  let kept = byMotif.get(motif);
  if (!kept) byMotif.set(motif, (kept = new LRUCache({ max: BORDERS_KEPT_PER_MOTIF })));
  const key = `${run.runLengthMm}|${run.closed}|${run.count ?? ''}`;
  const known = kept.get(key);
  if (known) return known;
  const sewn = sewBorder(hoops, motif, run);
  kept.set(key, sewn);
  return sewn;
}

function sewBorder(hoops: readonly CatalogueHoop[], motif: CatalogueMotifEntry, run: BorderRun): SewnBorder {
  const fit = fitMotifBorder(motif, run);
  if (!fit.ok) return { ok: false, step: 'fit', fit };
  const planned = planInBestHoop(hoops, motif, fit);
  if (!planned.ok) return { ok: false, step: 'hoop', reason: planned.reason };
  const repeat = estimateStitches({ kind: 'catalogue', motif: catalogueMotifFor(motif), scale: fit.scale });
  if (!repeat.ok) return { ok: false, step: 'estimate', reason: repeat.reason };
  const estimate = estimateBorderStitches({ repeat, fit, hoopings: planned.plan.hoopings.length });
  if (!estimate.ok) return { ok: false, step: 'estimate', reason: estimate.reason };
  return { ok: true, fit, planned, estimate };
}

/**
 * The hoop that stitches the border in the fewest hoopings, because each re-hooping is slow, skilled labour; among
 * equals, the smallest, because a smaller hoop holds the fabric tighter (blog.dzgns.com "All About Embroidery
 * Hoops", via the team's trade facts). When no hoop holds a repeat, the largest hoop's reason says why.
 */
function planInBestHoop(hoops: readonly CatalogueHoop[], motif: CatalogueMotifEntry, fit: BorderFit): PlannedHoop {
  let reason = 'the studio has no hoops set up.';
  let best: { ok: true; hoop: CatalogueHoop; plan: HoopingPlan } | undefined;
  for (const hoop of byFieldArea(hoops)) {
    const plan = planHoopings({
      count: fit.count,
      repeatWidthMm: fit.repeatWidthMm,
      pitchMm: fit.pitchMm,
      motifHeightMm: motif.heightMm * fit.scale,
      hoop: { fieldWidthMm: hoop.fieldWidthMm, fieldHeightMm: hoop.fieldHeightMm },
      clearanceMm: hoop.clearanceMm,
      firstCenterMm: fit.centersMm[0],
    });
    if (!plan.ok) reason = plan.reason;
    else if (!best || plan.hoopings.length < best.plan.hoopings.length) best = { ok: true, hoop, plan };
  }
  return best ?? { ok: false, reason };
}
