import type { OrderStep } from './order-timeline.ts';

export interface ShipTo {
  name: string;
  line1: string;
  line2?: string;
  city: string;
  region: string;
  postalCode: string;
  countryCode: 'US';
}

export interface OrderSpec {
  id: number;
  number: string;
  /** The quote the order was placed from; its design, customer and totals carry over. */
  quoteId: number;
  neededBy?: string;
  customerNote?: string;
  steps: OrderStep[];
}

// Invented addresses in invented towns.
export const shipToByCustomer: Record<'priya' | 'harriet' | 'dominic', ShipTo> = {
  priya: {
    name: 'Priya Castellanos',
    line1: '48 Larkspur Lane',
    city: 'Fernhollow',
    region: 'OR',
    postalCode: '97000',
    countryCode: 'US',
  },
  harriet: {
    name: 'Harriet Okonkwo',
    line1: '212 Quarry Road',
    line2: 'Apt 3',
    city: 'Millbrook Falls',
    region: 'GA',
    postalCode: '30000',
    countryCode: 'US',
  },
  dominic: {
    name: 'Dominic Lark',
    line1: '9 Thistle Court',
    city: 'Cedar Bend',
    region: 'MN',
    postalCode: '55000',
    countryCode: 'US',
  },
};

const proofNote =
  'Here is your proof, drawn to scale on the garment. Reply with any change, or approve it to start stitching.';

/** Thirteen orders: every status at least once, as the studio's board shows them on 28 November 2026. */
export const orders: OrderSpec[] = [
  {
    id: 1,
    number: 'WB-1001',
    quoteId: 1,
    steps: [
      { type: 'order_created', at: '2026-11-08T18:15' },
      { type: 'payment_authorized', at: '2026-11-08T18:18' },
      { type: 'proof_sent', at: '2026-11-09T16:00', by: 'marigold', message: proofNote },
      { type: 'proof_approved', at: '2026-11-09T20:30' },
      { type: 'payment_captured', at: '2026-11-10T14:10', by: 'marigold' },
      { type: 'stitched', at: '2026-11-12T21:00', by: 'tobias' },
      { type: 'shipped', at: '2026-11-13T17:30', by: 'tobias', trackingNumber: 'SEEDPOST0001' },
    ],
  },
  {
    id: 2,
    number: 'WB-1002',
    quoteId: 2,
    steps: [
      { type: 'order_created', at: '2026-11-09T14:08' },
      { type: 'payment_authorized', at: '2026-11-09T14:10' },
      { type: 'proof_sent', at: '2026-11-10T15:20', by: 'marigold', message: proofNote },
      { type: 'proof_approved', at: '2026-11-10T23:05' },
      { type: 'payment_captured', at: '2026-11-11T14:00', by: 'marigold' },
      { type: 'stitched', at: '2026-11-13T19:40', by: 'tobias' },
      { type: 'shipped', at: '2026-11-14T16:50', by: 'tobias', trackingNumber: 'SEEDPOST0002' },
      {
        type: 'note_added',
        at: '2026-11-20T15:00',
        by: 'marigold',
        note: 'Parcel arrived four days late; Priya asked about the delay.',
      },
      {
        type: 'refunded',
        at: '2026-11-20T15:05',
        by: 'marigold',
        amountCents: 500,
        note: 'Goodwill refund for the late delivery.',
      },
    ],
  },
  {
    id: 3,
    number: 'WB-1003',
    quoteId: 3,
    neededBy: '2026-12-05',
    customerNote: "For Ivy's first birthday party.",
    steps: [
      { type: 'order_created', at: '2026-11-13T03:12' },
      { type: 'payment_authorized', at: '2026-11-13T03:15' },
      { type: 'proof_sent', at: '2026-11-13T18:00', by: 'marigold', message: proofNote },
      { type: 'proof_approved', at: '2026-11-14T01:20' },
      { type: 'payment_captured', at: '2026-11-14T15:00', by: 'marigold' },
      { type: 'stitched', at: '2026-11-27T22:15', by: 'tobias' },
    ],
  },
  {
    id: 4,
    number: 'WB-1004',
    quoteId: 4,
    neededBy: '2026-12-12',
    customerNote: 'Matching rompers for twin boys.',
    steps: [
      { type: 'order_created', at: '2026-11-16T13:40' },
      { type: 'payment_authorized', at: '2026-11-16T13:42' },
      { type: 'proof_sent', at: '2026-11-17T16:30', by: 'marigold', message: proofNote },
      { type: 'proof_approved', at: '2026-11-18T12:10' },
      { type: 'payment_captured', at: '2026-11-18T15:00', by: 'marigold' },
      { type: 'note_added', at: '2026-11-26T16:00', by: 'tobias', note: 'First romper stitched; second is hooped.' },
    ],
  },
  {
    id: 5,
    number: 'WB-1005',
    quoteId: 5,
    steps: [
      { type: 'order_created', at: '2026-11-14T02:30' },
      { type: 'payment_authorized', at: '2026-11-14T02:33' },
      { type: 'proof_sent', at: '2026-11-14T17:45', by: 'marigold', message: proofNote },
      { type: 'proof_approved', at: '2026-11-15T03:00' },
      { type: 'payment_captured', at: '2026-11-16T14:30', by: 'marigold' },
      {
        type: 'refunded',
        at: '2026-11-17T15:12',
        by: 'marigold',
        note: 'Full refund: the 3T blank arrived with a flaw and the supplier is out until January; Dominic agreed to cancel.',
      },
    ],
  },
  {
    id: 6,
    number: 'WB-1006',
    quoteId: 6,
    steps: [
      { type: 'order_created', at: '2026-11-22T03:00' },
      { type: 'payment_authorized', at: '2026-11-22T03:02' },
      { type: 'proof_sent', at: '2026-11-23T16:00', by: 'marigold', message: proofNote },
      {
        type: 'proof_sent',
        at: '2026-11-23T18:30',
        by: 'marigold',
        message: 'A corrected proof: the lamb sits a little higher, clear of the scallops.',
      },
      { type: 'proof_approved', at: '2026-11-26T02:40', note: 'Perfect, thank you!' },
    ],
  },
  {
    id: 7,
    number: 'WB-1007',
    quoteId: 7,
    neededBy: '2026-12-20',
    steps: [
      { type: 'order_created', at: '2026-11-23T16:30' },
      { type: 'payment_authorized', at: '2026-11-23T16:31' },
      { type: 'proof_sent', at: '2026-11-24T17:00', by: 'marigold', message: proofNote },
      {
        type: 'changes_requested',
        at: '2026-11-25T04:15',
        note: 'Could the strawberries be a deeper red, and the vine a little lower?',
        pins: [
          { xPct: 41.5, yPct: 83.0, comment: 'A deeper red for the berries, please.' },
          { xPct: 63.0, yPct: 78.5, comment: 'Move the vine closer to the hem.' },
        ],
      },
    ],
  },
  {
    id: 8,
    number: 'WB-1008',
    quoteId: 8,
    neededBy: '2026-12-13',
    customerNote: 'Christening on 13 December.',
    steps: [
      { type: 'order_created', at: '2026-11-22T14:10' },
      { type: 'payment_authorized', at: '2026-11-22T14:12' },
      { type: 'proof_sent', at: '2026-11-23T17:20', by: 'marigold', message: proofNote, isMailFailing: true },
      {
        type: 'changes_requested',
        at: '2026-11-24T13:05',
        note: 'The monogram should read E O K with the surname initial larger in the middle.',
        pins: [{ xPct: 50.0, yPct: 24.0, comment: 'Larger O in the middle, please.' }],
      },
      {
        type: 'proof_sent',
        at: '2026-11-26T16:40',
        by: 'marigold',
        message: 'Version 2: the O is now the larger centre initial.',
      },
    ],
  },
  {
    id: 9,
    number: 'WB-1009',
    quoteId: 9,
    customerNote: 'My granddaughter drew this sun; can it go on the chest?',
    steps: [
      { type: 'order_created', at: '2026-11-26T15:20' },
      { type: 'payment_authorized', at: '2026-11-26T15:22' },
      {
        type: 'note_added',
        at: '2026-11-27T15:30',
        by: 'marigold',
        note: 'Artwork checked: clean shapes, stitches as fill and satin at 56 mm.',
      },
    ],
  },
  {
    id: 10,
    number: 'WB-1010',
    quoteId: 10,
    neededBy: '2026-12-06',
    customerNote: "Clara's party is on 6 December; rush please.",
    steps: [
      { type: 'order_created', at: '2026-11-27T01:55' },
      { type: 'payment_authorized', at: '2026-11-27T01:57' },
    ],
  },
  {
    id: 11,
    number: 'WB-1011',
    quoteId: 11,
    steps: [
      { type: 'order_created', at: '2026-11-24T00:25' },
      { type: 'payment_authorized', at: '2026-11-24T00:27' },
      {
        type: 'cancelled',
        at: '2026-11-25T02:00',
        by: 'customer',
        note: 'The shower moved to January; I will order again closer to the date.',
      },
    ],
  },
  {
    id: 12,
    number: 'WB-1012',
    quoteId: 12,
    steps: [{ type: 'order_created', at: '2026-11-27T22:45' }],
  },
  {
    id: 13,
    number: 'WB-1013',
    quoteId: 15,
    neededBy: '2026-12-10',
    customerNote: 'For a garden party; Rosie loves lambs.',
    steps: [
      { type: 'order_created', at: '2026-11-17T19:50' },
      { type: 'payment_authorized', at: '2026-11-17T19:52' },
      { type: 'proof_sent', at: '2026-11-18T16:10', by: 'marigold', message: proofNote },
      { type: 'proof_approved', at: '2026-11-19T02:30' },
      { type: 'payment_captured', at: '2026-11-19T15:00', by: 'marigold' },
    ],
  },
];
