import {
  estimateBorderStitches,
  estimateStitches,
  fitMotifBorder,
  planHoopings,
  type BorderFit,
  type HoopingPlan,
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

  const fit = fitMotifBorder(motif, { runLengthMm, closed: isClosed, count: placement.count });
  if (!fit.ok) {
    const where = isClosed ? 'round the hem' : 'along the front hem';
    const isAsked = placement.count !== undefined;
    const hint = isAsked && fit.nearest?.isWithinLimits ? ` ${countOf(fit.nearest.count, 'repeat')} would fit.` : '';
    return refuse(
      `${path}.${isAsked ? 'count' : 'motif'}`,
      `The ${motif.name} doesn't fit ${where} in size ${size.label}: ${fit.reason}${hint}`,
    );
  }

  const planned = planInBestHoop(catalogue.hoops, motif, fit);
  if (!planned.ok) return refuse(path, `No hoop holds the ${motif.name} in size ${size.label}: ${planned.reason}`);
  const repeat = estimateStitches({ kind: 'catalogue', motif: catalogueMotifFor(motif), scale: fit.scale });
  if (!repeat.ok) return refuse(`${path}.motif`, `The ${motif.name} can't be estimated: ${repeat.reason}`);
  const hoopings = planned.plan.hoopings.length;
  const estimate = estimateBorderStitches({ repeat, fit, hoopings });
  if (!estimate.ok) return refuse(`${path}.motif`, `The ${motif.name} can't be estimated: ${estimate.reason}`);
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
      },
    },
  };
}

type PlannedHoop = { ok: true; hoop: CatalogueHoop; plan: HoopingPlan } | { ok: false; reason: string };

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
