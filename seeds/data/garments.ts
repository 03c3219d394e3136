import type { GarmentSafetyFacts } from '../../server/src/contracts/guidance.ts';
import { defaultHemOffsetMm, type PlacementZone } from './placement-zones.ts';

export interface SeedSize {
  id: number;
  code: string;
  label: string;
  /** Hem run at the guide line: front panel and whole circumference, mm; absent when the garment takes no border. */
  hem?: { frontMm: number; circumferenceMm: number };
  /** Factor from the reference drawing to this size; hem garments derive it from the front hem instead. */
  scale?: number;
  /** The ages the size is made for, months, youngest first: the safety cautions assume the youngest. */
  ageMonths: [number, number];
}

export interface SeedGarment {
  id: number;
  slug: string;
  name: string;
  kind: 'dress' | 'romper' | 'bishop_dress' | 'bib' | 'bonnet';
  description: string;
  fabricType: 'woven' | 'knit' | 'sheer';
  isNapped: boolean;
  /** The youngest and oldest wearer over all its sizes, months. */
  ageMonths: [number, number];
  /** Ties, drawstrings, fastening and use, as the garment is made: the safety cautions read these. */
  safety: GarmentSafetyFacts;
  /** File in seeds/garments/, drawn at the reference size. */
  mockupFile: string;
  /** The size the mockup is drawn at; for hem garments, its front hem is the drawing's hem line width. */
  referenceSizeCode: string;
  zones: PlacementZone[];
  sizes: SeedSize[];
  colours: { id: number; name: string; hex: string }[];
}

const hem = (xMm: number, yMm: number, widthMm: number): PlacementZone => ({
  code: 'hem',
  label: 'Hem border',
  xMm,
  yMm,
  widthMm,
  heightMm: 100,
  hemOffsetMm: defaultHemOffsetMm,
});

// Ids are fixed so that a second seeding gives the same rows: garment n has sizes and colours n01, n02, …
export const garments: SeedGarment[] = [
  {
    id: 1,
    slug: 'smocked-yoke-dress',
    name: 'Smocked yoke dress',
    kind: 'dress',
    description:
      'Cotton batiste with a hand-smocked yoke, puff sleeves and a full gathered skirt: made for a hem border.',
    fabricType: 'woven',
    isNapped: false,
    ageMonths: [6, 60],
    safety: { tiePlaces: [], drawstringPlaces: [], closure: 'buttons', closesAtNeck: false, intendedUse: 'day_wear' },
    mockupFile: 'smocked-yoke-dress.svg',
    referenceSizeCode: '2T',
    zones: [hem(40, 420, 480), { code: 'chest', label: 'Yoke', xMm: 225, yMm: 60, widthMm: 110, heightMm: 56 }],
    sizes: [
      { id: 101, code: '6m', label: '6 months', hem: { frontMm: 380, circumferenceMm: 760 }, ageMonths: [6, 12] },
      { id: 102, code: '12m', label: '12 months', hem: { frontMm: 410, circumferenceMm: 820 }, ageMonths: [12, 18] },
      { id: 103, code: '18m', label: '18 months', hem: { frontMm: 440, circumferenceMm: 880 }, ageMonths: [18, 24] },
      { id: 104, code: '2T', label: '2T', hem: { frontMm: 480, circumferenceMm: 960 }, ageMonths: [24, 36] },
      { id: 105, code: '3T', label: '3T', hem: { frontMm: 510, circumferenceMm: 1020 }, ageMonths: [36, 48] },
      { id: 106, code: '4T', label: '4T', hem: { frontMm: 540, circumferenceMm: 1080 }, ageMonths: [48, 60] },
    ],
    colours: [
      { id: 101, name: 'Buttermilk', hex: '#F3E6C4' },
      { id: 102, name: "Robin's Egg", hex: '#BFDCE0' },
      { id: 103, name: 'Peony Pink', hex: '#F0C9CF' },
      { id: 104, name: 'Meadow Green', hex: '#C8D8B4' },
    ],
  },
  {
    id: 2,
    slug: 'bubble-romper',
    name: 'Knit bubble romper',
    kind: 'romper',
    description:
      'Soft cotton interlock with short sleeves and a snap crotch; the border runs round the body above the leg band.',
    fabricType: 'knit',
    isNapped: false,
    ageMonths: [6, 36],
    safety: { tiePlaces: [], drawstringPlaces: [], closure: 'snaps', closesAtNeck: false, intendedUse: 'day_wear' },
    mockupFile: 'bubble-romper.svg',
    referenceSizeCode: '12m',
    zones: [hem(40, 200, 280), { code: 'chest', label: 'Chest', xMm: 130, yMm: 60, widthMm: 100, heightMm: 60 }],
    sizes: [
      { id: 201, code: '6m', label: '6 months', hem: { frontMm: 260, circumferenceMm: 520 }, ageMonths: [6, 12] },
      { id: 202, code: '12m', label: '12 months', hem: { frontMm: 280, circumferenceMm: 560 }, ageMonths: [12, 18] },
      { id: 203, code: '18m', label: '18 months', hem: { frontMm: 300, circumferenceMm: 600 }, ageMonths: [18, 24] },
      { id: 204, code: '2T', label: '2T', hem: { frontMm: 320, circumferenceMm: 640 }, ageMonths: [24, 36] },
    ],
    colours: [
      { id: 201, name: 'Oatmeal', hex: '#E8DCC8' },
      { id: 202, name: 'Sky Wash', hex: '#CFE0EE' },
      { id: 203, name: 'Sorbet', hex: '#F6CDB8' },
    ],
  },
  {
    id: 3,
    slug: 'bishop-dress',
    name: 'Bishop dress',
    kind: 'bishop_dress',
    description:
      'Raglan-sleeved cotton lawn gathered at the neck with smocking rows; a classic for christenings and photos.',
    fabricType: 'woven',
    isNapped: false,
    ageMonths: [6, 48],
    safety: { tiePlaces: [], drawstringPlaces: [], closure: 'buttons', closesAtNeck: false, intendedUse: 'day_wear' },
    mockupFile: 'bishop-dress.svg',
    referenceSizeCode: '12m',
    // The full skirt is drawn from the front, so its hem curves: the ends rise 10 mm above the middle (bishop-dress.svg).
    zones: [
      { ...hem(40, 350, 380), hemCurveMm: 10 },
      { code: 'chest', label: 'Below the smocking', xMm: 180, yMm: 90, widthMm: 100, heightMm: 50 },
    ],
    sizes: [
      { id: 301, code: '6m', label: '6 months', hem: { frontMm: 346, circumferenceMm: 692 }, ageMonths: [6, 12] },
      { id: 302, code: '12m', label: '12 months', hem: { frontMm: 380, circumferenceMm: 760 }, ageMonths: [12, 18] },
      { id: 303, code: '18m', label: '18 months', hem: { frontMm: 410, circumferenceMm: 820 }, ageMonths: [18, 24] },
      { id: 304, code: '2T', label: '2T', hem: { frontMm: 440, circumferenceMm: 880 }, ageMonths: [24, 36] },
      { id: 305, code: '3T', label: '3T', hem: { frontMm: 470, circumferenceMm: 940 }, ageMonths: [36, 48] },
    ],
    colours: [
      { id: 301, name: 'Christening White', hex: '#FAF7F0' },
      { id: 302, name: 'Blush', hex: '#F4D6D4' },
      { id: 303, name: 'Mist Blue', hex: '#D3E1EC' },
      { id: 304, name: 'Lilac Haze', hex: '#DCD0E6' },
    ],
  },
  {
    id: 4,
    slug: 'terry-bib',
    name: 'Terry bib',
    kind: 'bib',
    description: 'Absorbent cotton terry with a bound edge and a snap at the neck; takes a name or a single motif.',
    // Terry is a woven pile: napped, so the stitching needs a water-soluble topping to stay on top of the loops.
    fabricType: 'woven',
    isNapped: true,
    ageMonths: [0, 48],
    safety: { tiePlaces: [], drawstringPlaces: [], closure: 'snaps', closesAtNeck: true, intendedUse: 'day_wear' },
    mockupFile: 'bib.svg',
    referenceSizeCode: 'medium',
    zones: [{ code: 'bib_centre', label: 'Bib front', xMm: 65, yMm: 112, widthMm: 110, heightMm: 130 }],
    sizes: [
      { id: 401, code: 'small', label: 'Small (0–6 months)', scale: 0.88, ageMonths: [0, 6] },
      { id: 402, code: 'medium', label: 'Medium (6–12 months)', scale: 1, ageMonths: [6, 12] },
      { id: 403, code: 'large', label: 'Large (12–24 months)', scale: 1.1, ageMonths: [12, 24] },
      { id: 404, code: 'xlarge', label: 'Extra large (2–4 years)', scale: 1.2, ageMonths: [24, 48] },
    ],
    colours: [
      { id: 401, name: 'Cloud White', hex: '#FBFAF6' },
      { id: 402, name: 'Duckling Yellow', hex: '#F7E08A' },
      { id: 403, name: 'Mint Cream', hex: '#D4EDE0' },
    ],
  },
  {
    id: 5,
    slug: 'sun-bonnet',
    name: 'Sun bonnet',
    kind: 'bonnet',
    description: 'Lined cotton poplin with a ruffled brim and ribbon ties; a name or small motif sits on the brim.',
    fabricType: 'woven',
    isNapped: false,
    ageMonths: [0, 24],
    safety: { tiePlaces: ['neck'], drawstringPlaces: [], closure: 'ties', closesAtNeck: true, intendedUse: 'day_wear' },
    mockupFile: 'sun-bonnet.svg',
    referenceSizeCode: '3-6m',
    zones: [{ code: 'brim', label: 'Brim', xMm: 95, yMm: 30, widthMm: 70, heightMm: 30 }],
    // Bonnet codes differ from the clothing sizes so each size reads plainly in the price list and on quotes.
    sizes: [
      { id: 501, code: '0-3m', label: '0–3 months', scale: 0.92, ageMonths: [0, 3] },
      { id: 502, code: '3-6m', label: '3–6 months', scale: 1, ageMonths: [3, 6] },
      { id: 503, code: '6-12m', label: '6–12 months', scale: 1.08, ageMonths: [6, 12] },
      { id: 504, code: '12-24m', label: '12–24 months', scale: 1.16, ageMonths: [12, 24] },
    ],
    colours: [
      { id: 501, name: 'Ecru', hex: '#F1E9D6' },
      { id: 502, name: 'Shell Pink', hex: '#F2D2CF' },
      { id: 503, name: 'Cornflower', hex: '#B8C9E8' },
    ],
  },
];

/** The factor that draws the garment's mockup at this size. */
export function mockupScale(garment: SeedGarment, size: SeedSize): number {
  const reference = garment.sizes.find((candidate) => candidate.code === garment.referenceSizeCode);
  if (size.hem && reference?.hem) return size.hem.frontMm / reference.hem.frontMm;
  if (size.scale !== undefined) return size.scale;
  throw new Error(`Size ${size.code} of ${garment.slug} has neither a hem nor a scale`);
}
