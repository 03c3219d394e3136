import { estimateStitches, type StitchEstimate } from '../../engine/index.ts';
import type { ArtworkPlacement, LetteringPlacement, MotifPlacement } from '../../contracts/designs.ts';
import { describeCharacters } from '../../integrations/character-names.ts';
import type { CatalogueFont, QuoteCatalogue } from './quote-catalogue-types.ts';
import {
  catalogueMotifFor,
  checkFitsAHoop,
  countOf,
  refuse,
  type PlacementFigures,
  type PlacementOutcome,
} from './placement-outcome.ts';

type ItemPlacement = MotifPlacement | LetteringPlacement | ArtworkPlacement;

/**
 * A single motif, lettering or the customer's artwork: one hooping, in a zone of this size, no bigger than the
 * largest hoop's sewing field. `path` is the placement's field path in the request, for the messages.
 */
export function figureItem(catalogue: QuoteCatalogue, placement: ItemPlacement, path: string): PlacementOutcome {
  const { zones } = catalogue.size;
  if (!zones.some((zone) => zone.code === placement.zone)) {
    const choices = zones.map((zone) => zone.label).join(' or ');
    return refuse(
      `${path}.zone`,
      `The ${catalogue.garment.name} has no place called “${placement.zone}”${choices ? `; choose ${choices}` : ''}.`,
    );
  }
  if (placement.kind === 'motif') return figureMotif(catalogue, placement, path);
  if (placement.kind === 'lettering') return figureLettering(catalogue, placement, path);
  return figureArtwork(catalogue, placement, path);
}

function figureMotif(catalogue: QuoteCatalogue, placement: MotifPlacement, path: string): PlacementOutcome {
  const motif = catalogue.motifs.get(placement.motif);
  if (!motif)
    return refuse(`${path}.motif`, `There is no motif “${placement.motif}” in the catalogue; choose another.`);
  if (motif.kind !== 'single')
    return refuse(`${path}.motif`, `The ${motif.name} is a border; add it along the hem instead.`);
  // A stitch file only resizes within narrow limits before the stitching looks wrong.
  if (placement.scalePct < motif.minScalePct || placement.scalePct > motif.maxScalePct) {
    return refuse(
      `${path}.scalePct`,
      `The ${motif.name} can be stitched from ${motif.minScalePct} % to ${motif.maxScalePct} % of its size; choose a size in that range.`,
    );
  }
  if (placement.threads.length !== motif.colourCount) {
    return refuse(
      `${path}.threads`,
      `The ${motif.name} is sewn in ${countOf(motif.colourCount, 'colour')}; choose a thread for each.`,
    );
  }
  const estimate = estimateStitches({
    kind: 'catalogue',
    motif: catalogueMotifFor(motif),
    scale: placement.scalePct / 100,
  });
  if (!estimate.ok) return refuse(`${path}.motif`, `The ${motif.name} can't be estimated: ${estimate.reason}`);
  return oneHooping(catalogue, placement, estimate, {
    label: motif.name,
    what: `The ${motif.name} at ${placement.scalePct} %`,
    field: `${path}.scalePct`,
  });
}

function figureLettering(catalogue: QuoteCatalogue, placement: LetteringPlacement, path: string): PlacementOutcome {
  const font = catalogue.fonts.get(placement.font);
  if (!font) return refuse(`${path}.font`, `There is no lettering font “${placement.font}”; choose another.`);
  if (placement.letterHeightMm < font.minHeightMm || placement.letterHeightMm > font.maxHeightMm) {
    return refuse(
      `${path}.letterHeightMm`,
      `${font.name} sews cleanly from ${font.minHeightMm} to ${font.maxHeightMm} mm tall; choose a letter height in that range.`,
    );
  }
  const missing = font.outlines.missingCharacters(placement.text);
  if (missing.length > 0) return refuse(`${path}.text`, cannotStitch(font, missing), 'unprocessable');
  const estimate = estimateStitches({
    kind: 'lettering',
    text: placement.text,
    font: font.outlines,
    letterHeightMm: placement.letterHeightMm,
  });
  if (!estimate.ok)
    return refuse(`${path}.text`, `“${placement.text}” can't be set in ${font.name}: ${estimate.reason}`);
  return oneHooping(catalogue, placement, estimate, {
    label: `Lettering “${placement.text}”`,
    what: `“${placement.text}” at ${placement.letterHeightMm} mm`,
    field: `${path}.letterHeightMm`,
  });
}

/** Which characters the font has no letters for, named so a parent can see which ones to change. */
function cannotStitch(font: CatalogueFont, missing: readonly string[]): string {
  const them = missing.length === 1 ? 'it' : 'them';
  return `${font.name} cannot stitch ${describeCharacters(missing)}: the font has no letter for ${them}; choose another font or leave ${them} out.`;
}

function figureArtwork(catalogue: QuoteCatalogue, placement: ArtworkPlacement, path: string): PlacementOutcome {
  if (!catalogue.artworkUploads) return refuse(path, 'Uploading your own artwork is coming soon.');
  const upload = catalogue.artworkUploads.get(placement.artworkUploadId);
  if (!upload) return refuse(`${path}.artworkUploadId`, 'That artwork upload is not available; upload it again.');
  const wording = {
    label: 'Your artwork',
    what: `Your artwork at ${placement.widthMm} mm wide`,
    field: `${path}.widthMm`,
  };
  if ('rasterSizePx' in upload)
    return oneHooping(catalogue, placement, rasterPlaceholder(upload.rasterSizePx, placement.widthMm), wording, {
      isPriceProvisional: true,
    });
  if (!upload.svgFigures)
    return refuse(`${path}.artworkUploadId`, 'That artwork could not be measured for stitching; upload it again.');
  // Measured once at upload; a quote only scales the measurements to the width.
  const estimate = estimateStitches({
    kind: 'svg-figures',
    figures: upload.svgFigures,
    size: { widthMm: placement.widthMm },
  });
  if (!estimate.ok) return refuse(`${path}.artworkUploadId`, `Your artwork can't be estimated: ${estimate.reason}`);
  return oneHooping(catalogue, placement, estimate, wording);
}

/**
 * A photo or scan has no lines to count stitches from: the studio digitizes it by hand first. Until then it is
 * its size on the garment, with no stitches; the quote charges the placement's minimum and the setup fee, and
 * says the studio will confirm the price.
 */
function rasterPlaceholder(sizePx: { widthPx: number; heightPx: number }, widthMm: number): StitchEstimate {
  return {
    stitches: 0,
    colorChanges: 0,
    trims: 0,
    byType: { run: 0, satin: 0, fill: 0, underlay: 0 },
    widthMm,
    heightMm: (widthMm * sizePx.heightPx) / sizePx.widthPx,
    notes: ['A picture is digitized by the studio before its stitches are known.'],
  };
}

function oneHooping(
  catalogue: QuoteCatalogue,
  placement: ItemPlacement,
  estimate: StitchEstimate,
  wording: { label: string; what: string; field: string },
  pricing: { isPriceProvisional: boolean } = { isPriceProvisional: false },
): PlacementOutcome {
  const tooBig = checkFitsAHoop(catalogue.hoops, wording.what, estimate, wording.field);
  if (tooBig) return tooBig;
  const figures: PlacementFigures = {
    id: placement.id,
    label: wording.label,
    kind: placement.kind,
    estimate,
    hoopings: 1,
    hasCustomerArtwork: placement.kind === 'artwork',
    isPriceProvisional: pricing.isPriceProvisional,
  };
  return { ok: true, figures };
}
