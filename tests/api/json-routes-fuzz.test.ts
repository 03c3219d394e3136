/**
 * Random bodies for every JSON route: a client's mistake is a 4xx, never a 500. Each route gets a few hundred
 * bodies built by fast-check, half of them wholly random JSON and half a valid body with one to three of its values
 * swapped for awkward ones (values that round to 0 in a column, the smallest and largest doubles, huge strings,
 * wrong types). The bodies that answered 500 or more are listed when the test fails.
 */
import fc from 'fast-check';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startPaymentHarness, type PaymentHarness } from '../support/payment-stand-ins.ts';
import { signedInAgent } from '../support/api-calls.ts';
import { daisyDressQuote } from '../support/sample-designs.ts';
import type { ApiAgent } from '../support/api-harness.ts';
import { priyasShipTo } from '../support/checkout-bodies.ts';

const bodiesPerRoute = 200;

let harness: PaymentHarness;
let owner: ApiAgent;
let priya: ApiAgent;
let harriet: ApiAgent;
beforeAll(async () => {
  harness = await startPaymentHarness();
  owner = await signedInAgent(harness, 'marigold@wrenandbobbin.test');
  priya = await signedInAgent(harness, 'priya@example.test');
  harriet = await signedInAgent(harness, 'harriet@example.test');
}, 60_000);
afterAll(async () => {
  await harness.close();
});

type Json = null | boolean | number | string | Json[] | { [key: string]: Json };
type Who = 'owner' | 'priya' | 'harriet' | 'visitor';
interface JsonRoute {
  method: 'post' | 'put' | 'patch';
  path: string;
  who: Who;
  sample: () => Promise<Json>;
}

const squareInch =
  '<svg xmlns="http://www.w3.org/2000/svg" width="25.4mm" height="25.4mm" viewBox="0 0 10 10"><rect width="10" height="10" fill="#204080"/></svg>';
const lettering = {
  ...daisyDressQuote,
  document: {
    version: 1,
    placements: [
      ...daisyDressQuote.document.placements,
      {
        id: 'name',
        kind: 'lettering',
        zone: 'hem',
        centerXMm: 150,
        centerYMm: 340,
        rotationDeg: 0,
        text: 'Ivy',
        font: 'pacifico',
        letterHeightMm: 20,
        thread: 'WB-101',
      },
    ],
  },
} as unknown as Json;
const fixed = (value: unknown) => () => Promise.resolve(value as Json);
const readBody = (who: () => ApiAgent, path: string, pick: (body: Record<string, unknown>) => unknown) => async () =>
  pick((await who().get(path).expect(200)).body) as Json;

/** Every route that takes a JSON body, with a body it accepts and who may call it. */
const routes: JsonRoute[] = [
  { method: 'post', path: '/api/quotes/preview', who: 'visitor', sample: fixed(lettering) },
  { method: 'post', path: '/api/quotes', who: 'priya', sample: fixed({ ...(lettering as object), designId: 1 }) },
  { method: 'post', path: '/api/designs', who: 'priya', sample: fixed({ ...(lettering as object), name: 'Fuzz' }) },
  {
    method: 'put',
    path: '/api/designs/3',
    who: 'priya',
    sample: readBody(
      () => priya,
      '/api/designs/3',
      (b) => b.design,
    ),
  },
  { method: 'patch', path: '/api/designs/3', who: 'priya', sample: fixed({ name: 'Renamed' }) },
  {
    method: 'post',
    path: '/api/orders',
    who: 'priya',
    sample: fixed({ quoteId: 1, designId: 1, neededBy: '2026-12-18', shipTo: priyasShipTo, note: 'Soon please.' }),
  },
  { method: 'post', path: '/api/orders/WB-1008/proofs/2/approval', who: 'harriet', sample: fixed({ comment: 'Yes' }) },
  {
    method: 'post',
    path: '/api/orders/WB-1008/proofs/2/change-request',
    who: 'harriet',
    sample: fixed({ comment: 'Bigger', pins: [{ xPct: 10, yPct: 20, comment: 'here' }] }),
  },
  {
    method: 'post',
    path: '/api/admin/catalogue/hoops',
    who: 'owner',
    sample: fixed({ slug: 'fuzz-hoop', name: 'Fuzz', fieldWidthMm: 150, fieldHeightMm: 150 }),
  },
  {
    method: 'put',
    path: '/api/admin/catalogue/hoops/1',
    who: 'owner',
    sample: fixed({ name: 'Hoop', fieldWidthMm: 100, fieldHeightMm: 100 }),
  },
  {
    method: 'post',
    path: '/api/admin/catalogue/threads',
    who: 'owner',
    sample: fixed({ code: 'WB-990', name: 'Fuzz', hex: '#1a8fb0', lab: { l: 50, a: 10, b: -10 } }),
  },
  {
    method: 'put',
    path: '/api/admin/catalogue/threads/1',
    who: 'owner',
    sample: fixed({ name: 'Thread', hex: '#1a8fb0' }),
  },
  {
    method: 'post',
    path: '/api/admin/catalogue/fonts',
    who: 'owner',
    sample: fixed({
      slug: 'fuzz-font',
      fontsourcePackage: '@fontsource/fredoka',
      name: 'Fuzz',
      minHeightMm: 8,
      maxHeightMm: 40,
    }),
  },
  {
    method: 'put',
    path: '/api/admin/catalogue/fonts/1',
    who: 'owner',
    sample: fixed({ name: 'Font', minHeightMm: 8, maxHeightMm: 40 }),
  },
  {
    method: 'post',
    path: '/api/admin/catalogue/garments',
    who: 'owner',
    sample: fixed({
      slug: 'fuzz-pinafore',
      name: 'Pinafore',
      kind: 'dress',
      description: 'A pinafore.',
      fabricType: 'woven',
      isNapped: false,
      minAgeMonths: 12,
      maxAgeMonths: 48,
      mockupSvg:
        '<svg xmlns="http://www.w3.org/2000/svg" viewBox="0 0 300 400"><path d="M10 10 H290 V390 H10 Z"/></svg>',
    }),
  },
  {
    method: 'post',
    path: '/api/admin/catalogue/garments/1/sizes',
    who: 'owner',
    sample: fixed({
      code: '9T',
      label: '9 years',
      hemFrontMm: 300,
      hemCircumferenceMm: 620,
      mockupScale: 1,
      zones: [{ code: 'hem', label: 'Hem', xMm: 10, yMm: 330, widthMm: 280, heightMm: 60, hemOffsetMm: 44.45 }],
    }),
  },
  {
    method: 'post',
    path: '/api/admin/catalogue/garments/1/colours',
    who: 'owner',
    sample: fixed({ name: 'Oat', hex: '#e8dcc4' }),
  },
  {
    method: 'post',
    path: '/api/admin/catalogue/motifs',
    who: 'owner',
    sample: fixed({
      slug: 'fuzz-square',
      name: 'Square',
      kind: 'single',
      svg: squareInch,
      widthMm: 25.4,
      heightMm: 25.4,
      gapMm: 0,
      minScalePct: 80,
      maxScalePct: 120,
      threadCodes: ['WB-101'],
      measured: null,
    }),
  },
  {
    method: 'put',
    path: '/api/admin/settings',
    who: 'owner',
    sample: readBody(
      () => owner,
      '/api/admin/settings',
      (b) => b.settings,
    ),
  },
  {
    method: 'post',
    path: '/api/admin/pricing/preview',
    who: 'owner',
    sample: readBody(
      () => owner,
      '/api/admin/pricing/2',
      (b) => ({ rules: (b.ruleSet as { rules: unknown }).rules }),
    ),
  },
  {
    method: 'put',
    path: '/api/admin/pricing/2',
    who: 'owner',
    sample: readBody(
      () => owner,
      '/api/admin/pricing/2',
      (b) => ({ rules: (b.ruleSet as { rules: unknown }).rules, notes: null }),
    ),
  },
  { method: 'put', path: '/api/admin/users/5/role', who: 'owner', sample: fixed({ role: 'customer' }) },
  { method: 'post', path: '/api/admin/orders/WB-1009/proofs', who: 'owner', sample: fixed({ source: 'render' }) },
  {
    method: 'post',
    path: '/api/admin/orders/WB-1010/refunds',
    who: 'owner',
    sample: fixed({ amountCents: 100, reason: 'Fuzz' }),
  },
  { method: 'post', path: '/api/admin/orders/WB-1013/cancel', who: 'owner', sample: fixed({ reason: 'Fuzz' }) },
  { method: 'post', path: '/api/admin/orders/WB-1005/shipped', who: 'owner', sample: fixed({ trackingNumber: 'Z 1' }) },
];

/** Values that are easy to send and hard to store: rounding to 0, overflowing a column, the wrong type. */
const awkward: fc.Arbitrary<Json> = fc.oneof(
  fc.constantFrom<Json>(
    0,
    -0,
    0.001,
    0.004,
    0.005,
    5e-324,
    -5e-324,
    1e-7,
    0.49,
    1e308,
    -1e308,
    2 ** 31,
    2 ** 32 + 1,
    2 ** 53 + 1,
    99_999_999_999,
    1e21,
    -1,
    '',
    ' ',
    '0',
    '1e999',
    'x'.repeat(5000),
    '😀'.repeat(300),
    null,
    true,
    [],
    {},
  ),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.integer(),
  fc.string({ maxLength: 300 }),
);

type Path = (string | number)[];

function leafPaths(value: Json, at: Path = []): Path[] {
  if (Array.isArray(value)) return [at, ...value.flatMap((item, i) => leafPaths(item, [...at, i]))];
  if (value && typeof value === 'object')
    return [at, ...Object.entries(value).flatMap(([key, item]) => leafPaths(item, [...at, key]))];
  return [at];
}

function replaced(value: Json, path: Path, next: Json): Json {
  if (path.length === 0) return next;
  const [head, ...rest] = path;
  if (Array.isArray(value)) return value.map((item, i) => (i === head ? replaced(item, rest, next) : item));
  if (value && typeof value === 'object') return { ...value, [head!]: replaced(value[head!] ?? null, rest, next) };
  return value;
}

/** A valid body with one to three of its values (or whole objects) swapped for awkward ones. */
function mutationsOf(sample: Json): fc.Arbitrary<Json> {
  const paths = leafPaths(sample).filter((path) => path.length > 0);
  const change = fc.tuple(fc.constantFrom(...paths), awkward);
  return fc
    .array(change, { minLength: 1, maxLength: 3 })
    .map((changes) => changes.reduce((body, [path, next]) => replaced(body, path, next), sample));
}

describe('values the database would round to nothing', () => {
  it('when a hoop of 0.001 mm or a lettering font of 5e-324 mm is sent, then it answers 400 naming the field', async () => {
    const hoop = await owner
      .post('/api/admin/catalogue/hoops')
      .send({ slug: 'tiny-hoop', name: 'Tiny', fieldWidthMm: 0.001, fieldHeightMm: 100 })
      .expect(400);
    expect(hoop.body.error.fields).toMatchObject({ fieldWidthMm: 'The field width must be at least 0.01 mm' });
    const font = await owner
      .put('/api/admin/catalogue/fonts/1')
      .send({ name: 'Font', minHeightMm: 5e-324, maxHeightMm: 40 })
      .expect(400);
    expect(font.body.error.fields).toEqual({ minHeightMm: 'The smallest letter height must be at least 0.01 mm' });
    const size = await owner
      .post('/api/admin/catalogue/garments/1/sizes')
      .send({ code: '9T', label: '9 years', hemFrontMm: 300, hemCircumferenceMm: 620, mockupScale: 1e-9, zones: [] })
      .expect(400);
    expect(size.body.error.fields.mockupScale).toBe('Use a scale of at least 0.0001');
  });
});

const serverFailures: { route: string; status: number; body: string }[] = [];

describe('every JSON route, fed random bodies', () => {
  it.each(routes.map((route) => [`${route.method.toUpperCase()} ${route.path}`, route] as const))(
    'when %s gets a few hundred random and near-valid bodies, then none is answered 500 or more',
    async (label, route) => {
      const agents: Record<Who, () => ApiAgent> = {
        owner: () => owner,
        priya: () => priya,
        harriet: () => harriet,
        visitor: () => harness.agent(),
      };
      const sample = await route.sample();
      const bodies = fc.oneof(fc.jsonValue() as fc.Arbitrary<Json>, mutationsOf(sample), mutationsOf(sample));
      const before = serverFailures.length;
      await fc.assert(
        fc.asyncProperty(bodies, async (body) => {
          const agent = agents[route.who]();
          const res = await agent[route.method](route.path)
            .set('Content-Type', 'application/json')
            .send(JSON.stringify(body));
          if (res.status >= 500)
            serverFailures.push({ route: label, status: res.status, body: JSON.stringify(body).slice(0, 300) });
        }),
        { numRuns: bodiesPerRoute, seed: 20261203 },
      );
      expect(serverFailures.slice(before)).toEqual([]);
    },
    120_000,
  );

  afterAll(() => {
    console.log(
      `Fuzzed ${routes.length} JSON routes × ${bodiesPerRoute} bodies: ${serverFailures.length} answers ≥ 500.`,
    );
  });
});
