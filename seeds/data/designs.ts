import type { ZoneCode } from './placement-zones.ts';
import type { CustomerKey } from './accounts.ts';

/** Where an item's centre sits in its zone, as percentages of the zone's width and height. */
type AtPct = [number, number];

export type PlacementSpec =
  | { id: string; kind: 'border'; motif: string; run: 'front' | 'circumference'; threads?: string[] }
  | { id: string; kind: 'motif'; zone: ZoneCode; motif: string; scalePct: number; at?: AtPct; threads?: string[] }
  | {
      id: string;
      kind: 'lettering';
      zone: ZoneCode;
      text: string;
      font: string;
      letterHeightMm: number;
      thread: string;
      at?: AtPct;
    }
  | { id: string; kind: 'artwork'; zone: ZoneCode; artworkUploadId: number; widthMm: number; at?: AtPct };

export interface DesignSpec {
  id: number;
  customer: CustomerKey;
  garment: string;
  size: string;
  colour: string;
  name: string;
  placements: PlacementSpec[];
  shareToken?: string;
  createdAt: string;
  updatedAt: string;
}

/** Customer artwork, as stored after sanitizing (the file in seeds/uploads/): Harriet's granddaughter's drawing. */
export const artworkUploads = [
  {
    id: 1,
    owner: 'harriet' as CustomerKey,
    file: 'sunshine-drawing.svg',
    originalName: 'lilys-sunshine.svg',
    widthPx: 600,
    heightPx: 600,
    createdAt: '2026-11-25T18:40',
  },
];

export const designs: DesignSpec[] = [
  {
    id: 1,
    customer: 'priya',
    garment: 'smocked-yoke-dress',
    size: '2T',
    colour: 'Peony Pink',
    name: "Clara's birthday dress",
    placements: [
      { id: 'hem', kind: 'border', motif: 'daisy-chain', run: 'circumference' },
      {
        id: 'name',
        kind: 'lettering',
        zone: 'chest',
        text: 'Clara',
        font: 'breezy-script',
        letterHeightMm: 20,
        thread: 'WB-110',
      },
    ],
    createdAt: '2026-11-26T02:10',
    updatedAt: '2026-11-27T01:45',
  },
  {
    id: 2,
    customer: 'priya',
    garment: 'bishop-dress',
    size: '18m',
    colour: 'Christening White',
    name: 'Strawberry bishop for Mae',
    placements: [{ id: 'hem', kind: 'border', motif: 'strawberry-vine', run: 'circumference' }],
    createdAt: '2026-11-22T19:05',
    updatedAt: '2026-11-23T16:20',
  },
  {
    id: 3,
    customer: 'priya',
    garment: 'terry-bib',
    size: 'medium',
    colour: 'Cloud White',
    name: "Mae's bunny bib",
    placements: [
      { id: 'bunny', kind: 'motif', zone: 'bib_centre', motif: 'sitting-bunny', scalePct: 100, at: [50, 38] },
      {
        id: 'name',
        kind: 'lettering',
        zone: 'bib_centre',
        text: 'Mae',
        font: 'rounded-block',
        letterHeightMm: 14,
        thread: 'WB-108',
        at: [50, 88],
      },
    ],
    createdAt: '2026-11-08T21:30',
    updatedAt: '2026-11-09T14:00',
  },
  {
    id: 4,
    customer: 'priya',
    garment: 'bubble-romper',
    size: '6m',
    colour: 'Sky Wash',
    name: 'Baby shower ducklings',
    placements: [{ id: 'hem', kind: 'border', motif: 'duckling-parade', run: 'front' }],
    createdAt: '2026-11-23T23:00',
    updatedAt: '2026-11-24T00:15',
  },
  {
    id: 5,
    customer: 'harriet',
    garment: 'bubble-romper',
    size: '12m',
    colour: 'Sky Wash',
    name: 'Sailboat rompers for the twins',
    placements: [{ id: 'hem', kind: 'border', motif: 'sailboats', run: 'front' }],
    createdAt: '2026-11-15T17:00',
    updatedAt: '2026-11-16T13:30',
  },
  {
    id: 6,
    customer: 'harriet',
    garment: 'bishop-dress',
    size: '6m',
    colour: 'Christening White',
    name: "Eliza's christening bishop",
    placements: [
      {
        id: 'hem',
        kind: 'border',
        motif: 'daisy-chain',
        run: 'circumference',
        threads: ['WB-121', 'WB-101', 'WB-129'],
      },
      {
        id: 'monogram',
        kind: 'lettering',
        zone: 'chest',
        text: 'EOK',
        font: 'heirloom-serif',
        letterHeightMm: 22,
        thread: 'WB-125',
      },
    ],
    createdAt: '2026-11-20T15:40',
    updatedAt: '2026-11-22T14:00',
  },
  {
    id: 7,
    customer: 'harriet',
    garment: 'terry-bib',
    size: 'small',
    colour: 'Mint Cream',
    name: 'Little lamb bib',
    placements: [{ id: 'lamb', kind: 'motif', zone: 'bib_centre', motif: 'little-lamb', scalePct: 100 }],
    createdAt: '2026-11-07T16:00',
    updatedAt: '2026-11-08T18:10',
  },
  {
    id: 8,
    customer: 'harriet',
    garment: 'bubble-romper',
    size: '18m',
    colour: 'Sorbet',
    name: "Lily's sunshine romper",
    placements: [{ id: 'sunshine', kind: 'artwork', zone: 'chest', artworkUploadId: 1, widthMm: 56 }],
    createdAt: '2026-11-25T18:45',
    updatedAt: '2026-11-26T15:10',
  },
  {
    id: 9,
    customer: 'dominic',
    garment: 'smocked-yoke-dress',
    size: '18m',
    colour: 'Buttermilk',
    name: "Ivy's duckling dress",
    placements: [{ id: 'hem', kind: 'border', motif: 'duckling-parade', run: 'circumference' }],
    createdAt: '2026-11-11T02:30',
    updatedAt: '2026-11-13T03:05',
  },
  {
    id: 10,
    customer: 'dominic',
    garment: 'sun-bonnet',
    size: '6-12m',
    colour: 'Cornflower',
    name: "Noah's bonnet",
    placements: [
      {
        id: 'name',
        kind: 'lettering',
        zone: 'brim',
        text: 'Noah',
        font: 'rounded-block',
        letterHeightMm: 16,
        thread: 'WB-116',
      },
    ],
    createdAt: '2026-11-27T22:00',
    updatedAt: '2026-11-27T22:35',
  },
  {
    id: 11,
    customer: 'dominic',
    garment: 'bubble-romper',
    size: '18m',
    colour: 'Oatmeal',
    name: 'Scallops and a lamb',
    placements: [
      { id: 'hem', kind: 'border', motif: 'scallop-and-dot', run: 'circumference', threads: ['WB-115'] },
      { id: 'lamb', kind: 'motif', zone: 'chest', motif: 'little-lamb', scalePct: 95 },
    ],
    createdAt: '2026-11-21T03:10',
    updatedAt: '2026-11-22T02:50',
  },
  {
    id: 12,
    customer: 'dominic',
    garment: 'smocked-yoke-dress',
    size: '3T',
    colour: "Robin's Egg",
    name: 'Sailboat dress',
    placements: [{ id: 'hem', kind: 'border', motif: 'sailboats', run: 'circumference' }],
    createdAt: '2026-11-12T01:00',
    updatedAt: '2026-11-14T02:20',
  },
  {
    id: 13,
    customer: 'priya',
    garment: 'terry-bib',
    size: 'large',
    colour: 'Duckling Yellow',
    name: 'Star and moon for cousin Theo',
    placements: [{ id: 'moon', kind: 'motif', zone: 'bib_centre', motif: 'star-and-moon', scalePct: 110 }],
    shareToken: 'seed-share-theo-star-and-moon-4f7c2a9e',
    createdAt: '2026-11-27T03:00',
    updatedAt: '2026-11-27T03:20',
  },
  // The production sheet's worked case: 4 daisy-chain repeats round the 692 mm hem at 173 mm, with a chest motif.
  {
    id: 14,
    customer: 'harriet',
    garment: 'bishop-dress',
    size: '6m',
    colour: 'Blush',
    name: "Rosie's garden-party bishop",
    placements: [
      { id: 'hem', kind: 'border', motif: 'daisy-chain', run: 'circumference' },
      { id: 'lamb', kind: 'motif', zone: 'chest', motif: 'little-lamb', scalePct: 90 },
    ],
    createdAt: '2026-11-17T19:20',
    updatedAt: '2026-11-17T19:40',
  },
];
