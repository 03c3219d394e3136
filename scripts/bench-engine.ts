/**
 * Engine benchmark (issue 3): median time of a full quote for one design (a 30-repeat border, one lettering,
 * two catalogue motifs) and of the SVG estimate for a 2,000-segment path and a 20,000-segment one (the most an upload may have), against a plain
 * JSON.parse(JSON.stringify(payload)) of the same quote input measured in the same run. Target (issue 13): the full
 * quote under 20 × that baseline. The engine keeps laid-out lettering per font, height and text, as a server pricing
 * the same name again does, so the full quote is timed warm; a name laid out the first time is printed beside it.
 * Run with `npm run bench:engine`, which gives this process the young heap the server's request thread and heavy-work
 * threads have (`--max-semi-space-size=64`; see scripts/stack.ts and integrations/heavy-work.ts).
 */
import { readFileSync } from 'node:fs';
import { createRequire } from 'node:module';
import { cpus, loadavg } from 'node:os';
import opentype from 'opentype.js';
import {
  estimateBorderStitches,
  estimateRunMinutes,
  estimateStitches,
  fitBorder,
  planHoopings,
  priceQuote,
  type CatalogueMotif,
  type GlyphOutlineSource,
  type PricingRuleSet,
  type QuotePlacement,
} from '../server/src/engine/index.ts';

const TARGET_RATIO = 20;
const SAMPLES = 41;
const MIN_SAMPLE_NS = 2_000_000n;

/** The font file is read here, outside the engine (opentype.js parses WOFF, not WOFF2; default import only). */
function loadFont(name: string): GlyphOutlineSource {
  const file = createRequire(import.meta.url).resolve(`@fontsource/${name}/files/${name}-latin-400-normal.woff`);
  const bytes = readFileSync(file);
  return opentype.parse(bytes.buffer.slice(bytes.byteOffset, bytes.byteOffset + bytes.byteLength));
}

const ruleSet: PricingRuleSet = {
  version: 7,
  currency: 'USD',
  garmentBaseCents: { 'smocked-yoke-dress': { '2T': 1800, '4': 2000, '6': 2200 } },
  centsPerThousandStitches: 95,
  minimumPerPlacementCents: 500,
  extraHoopingCents: 150,
  colorChangeCents: 25,
  artworkSetupCents: 2500,
  lettering: { centsPerThousandStitches: 120, minimumCents: 600 },
  rushMultiplierBp: 15_000,
  quantityBreaks: [
    { minQty: 3, discountBp: 500 },
    { minQty: 6, discountBp: 1000 },
  ],
  taxRateBp: 825,
};

const sailboat: CatalogueMotif = {
  stitchCount: 2400,
  mix: { run: 15, satin: 55, fill: 30 },
  colorChanges: 2,
  widthMm: 60,
  heightMm: 45,
  trims: 3,
};
const payload = {
  ruleSet,
  garment: { slug: 'smocked-yoke-dress', name: 'Smocked yoke dress' },
  sizeCode: '4',
  quantity: 3,
  isRush: false,
  border: {
    runLengthMm: 1800,
    closed: true,
    motifWidthMm: 60,
    gapMm: 0,
    minScale: 0.9,
    maxScale: 1.1,
    motif: sailboat,
  },
  hoop: { fieldWidthMm: 130, fieldHeightMm: 180 },
  lettering: { text: 'Amelia', font: 'pacifico', letterHeightMm: 22 },
  motifs: [
    {
      motif: { stitchCount: 3100, mix: { run: 10, satin: 40, fill: 50 }, colorChanges: 3, widthMm: 70, heightMm: 70 },
      scale: 1,
    },
    {
      motif: { stitchCount: 1500, mix: { run: 30, satin: 70, fill: 0 }, colorChanges: 1, widthMm: 40, heightMm: 30 },
      scale: 0.8,
    },
  ],
};
const font = loadFont(payload.lettering.font);

function fullQuote(): number {
  const fit = fitBorder(payload.border);
  if (!fit.ok) throw new Error(fit.reason);
  const plan = planHoopings({
    count: fit.count,
    repeatWidthMm: fit.repeatWidthMm,
    pitchMm: fit.pitchMm,
    motifHeightMm: sailboat.heightMm * fit.scale,
    hoop: payload.hoop,
    firstCenterMm: fit.centersMm[0],
  });
  if (!plan.ok) throw new Error(plan.reason);
  const repeat = estimateStitches({ kind: 'catalogue', motif: payload.border.motif, scale: fit.scale });
  if (!repeat.ok) throw new Error(repeat.reason);
  const border = estimateBorderStitches({ repeat, fit, hoopings: plan.hoopings.length });
  const name = estimateStitches({
    kind: 'lettering',
    text: payload.lettering.text,
    font,
    letterHeightMm: payload.lettering.letterHeightMm,
  });
  const motifs = payload.motifs.map(({ motif, scale }) => estimateStitches({ kind: 'catalogue', motif, scale }));
  if (!border.ok || !name.ok || !motifs.every((m) => m.ok)) throw new Error('estimate failed');
  const placements: QuotePlacement[] = [
    {
      id: 'hem',
      label: 'Hem border',
      kind: 'stitching',
      stitches: border.stitches,
      hoopings: plan.hoopings.length,
      colorChanges: border.colorChanges,
      hasCustomerArtwork: false,
    },
    {
      id: 'name',
      label: 'Name on yoke',
      kind: 'lettering',
      stitches: name.stitches,
      hoopings: 1,
      colorChanges: 0,
      hasCustomerArtwork: false,
    },
    ...motifs.map((m, i): QuotePlacement => ({
      id: `motif-${i}`,
      label: `Motif ${i + 1}`,
      kind: 'stitching',
      stitches: m.ok ? m.stitches : 0,
      hoopings: 1,
      colorChanges: m.ok ? m.colorChanges : 0,
      hasCustomerArtwork: false,
    })),
  ];
  const minutes = estimateRunMinutes({
    stitches: placements.reduce((sum, p) => sum + p.stitches, 0),
    colorChanges: placements.reduce((sum, p) => sum + p.colorChanges, 0),
    hoopings: placements.reduce((sum, p) => sum + p.hoopings, 0),
    trims: border.trims + name.trims,
  });
  const quote = priceQuote({
    ruleSet,
    garment: payload.garment,
    sizeCode: payload.sizeCode,
    quantity: payload.quantity,
    placements,
    isRush: payload.isRush,
  });
  if (!quote.ok || !minutes.ok) throw new Error('quote failed');
  return quote.totalCents;
}

/** A closed wavy outline of `count` cubic segments, about 120 mm across, filled and stroked. */
function svgWithSegments(count: number): string {
  const segments: string[] = [];
  const point = (k: number) => {
    const angle = (2 * Math.PI * k) / count;
    const radius = 50 + 8 * Math.sin(angle * 60);
    return [60 + radius * Math.cos(angle), 60 + radius * Math.sin(angle)];
  };
  for (let k = 1; k <= count; k += 1) {
    const [x0, y0] = point(k - 1);
    const [x1, y1] = point(k);
    segments.push(
      `C${x0 + (x1 - x0) / 3 + 0.2} ${y0 + (y1 - y0) / 3} ${x0 + (2 * (x1 - x0)) / 3 - 0.2} ${y0 + (2 * (y1 - y0)) / 3} ${x1.toFixed(3)} ${y1.toFixed(3)}`,
    );
  }
  const [sx, sy] = point(0);
  return `<svg xmlns="http://www.w3.org/2000/svg" width="120mm" height="120mm" viewBox="0 0 120 120"><path d="M${sx} ${sy}${segments.join('')}Z" fill="#f4a6c0" stroke="#5b3a29" stroke-width="0.4"/></svg>`;
}
// Ten times the segments, the largest within the upload limit of 20,000 path segments (engine/svg-document.ts; the path adds its move and close).
const svgText = svgWithSegments(1_998);
const largeSvgText = svgWithSegments(19_980);

/** Median nanoseconds per call over `samples` samples: each repeats the call until it has run for at least 2 ms. */
function medianNs(run: () => unknown, samples = SAMPLES, warmUps = 20): number {
  for (let i = 0; i < warmUps; i += 1) run();
  const perCall: number[] = [];
  for (let s = 0; s < samples; s += 1) {
    let calls = 0;
    const start = process.hrtime.bigint();
    let elapsed = 0n;
    while (elapsed < MIN_SAMPLE_NS) {
      run();
      calls += 1;
      elapsed = process.hrtime.bigint() - start;
    }
    perCall.push(Number(elapsed) / calls);
  }
  perCall.sort((a, b) => a - b);
  return perCall[Math.floor(perCall.length / 2)];
}

const loadAverage = () =>
  `load average ${loadavg()
    .map((n) => n.toFixed(2))
    .join(', ')}`;
const microseconds = (ns: number) => `${(ns / 1000).toFixed(1)} µs`;
const baselineNs = medianNs(() => JSON.parse(JSON.stringify(payload)));
const quoteNs = medianNs(fullQuote);
const estimateSvg = (text: string) => () => {
  const estimate = estimateStitches({ kind: 'svg', svgText: text });
  if (!estimate.ok) throw new Error(estimate.reason);
};
const svgNs = medianNs(estimateSvg(svgText));
// Each call takes about a second on a busy machine, so fewer samples.
const largeSvgNs = medianNs(estimateSvg(largeSvgText), 7, 2);
// Issue 13: ten times the segments may cost about ten times as much, no more (allowance for noise: 12 ×).
const SVG_GROWTH_LIMIT = 12;
let coldNames = 0;
const coldLetteringNs = medianNs(() => {
  // A text never laid out before, so nothing kept is used.
  coldNames += 1;
  const estimate = estimateStitches({ kind: 'lettering', text: `Amelia ${coldNames}`, font, letterHeightMm: 22 });
  if (!estimate.ok) throw new Error(estimate.reason);
});
const ratio = quoteNs / baselineNs;

console.log(`Load: ${loadAverage()} (${cpus().length} cores)`);
console.log(`Quote total for the benchmark design: ${fullQuote()} cents`);
console.log(
  `Baseline JSON.parse(JSON.stringify(payload)), ${JSON.stringify(payload).length} bytes: ${microseconds(baselineNs)}`,
);
console.log(
  `Full quote (border ×30, lettering, 2 motifs):  ${microseconds(quoteNs)}  = ${ratio.toFixed(1)} × baseline (target < ${TARGET_RATIO} ×) ${ratio < TARGET_RATIO ? 'PASS' : 'MISS'}`,
);
console.log(
  `Lettering laid out the first time ("Amelia n"): ${microseconds(coldLetteringNs)}  = ${(coldLetteringNs / baselineNs).toFixed(1)} × baseline`,
);
console.log(
  `SVG estimate, 2,000-segment path:              ${microseconds(svgNs)}  = ${(svgNs / baselineNs).toFixed(1)} × baseline`,
);
console.log(
  `SVG estimate, 20,000-segment path:             ${microseconds(largeSvgNs)}  = ${(largeSvgNs / svgNs).toFixed(1)} × the 2,000-segment one (target ≤ 10 ×, pass ≤ ${SVG_GROWTH_LIMIT} ×) ${largeSvgNs / svgNs <= SVG_GROWTH_LIMIT ? 'PASS' : 'MISS'}`,
);
