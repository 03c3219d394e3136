import { describe, expect, it } from 'vitest';
import { describeDesignChanges, type DesignNames } from '../../../server/src/engine/design-changes.ts';
import type { DesignDocument } from '../../../server/src/contracts/designs.ts';

const names: DesignNames = {
  threads: new Map([
    ['WB-110', 'Magenta'],
    ['WB-118', 'Sky'],
    ['WB-140', 'Sage'],
  ]),
  fonts: new Map([
    ['breezy-script', 'Breezy Script'],
    ['block-caps', 'Block Capitals'],
  ]),
  motifs: new Map([['bunny', 'Bunny']]),
  zones: new Map([
    ['chest', 'Chest'],
    ['left_chest', 'Left chest'],
  ]),
};

const before: DesignDocument = {
  version: 1,
  placements: [
    {
      id: 'name',
      kind: 'lettering',
      zone: 'chest',
      centerXMm: 100,
      centerYMm: 80,
      rotationDeg: 0,
      text: 'Mia',
      font: 'breezy-script',
      letterHeightMm: 20,
      thread: 'WB-110',
    },
    {
      id: 'bunny',
      kind: 'motif',
      zone: 'chest',
      centerXMm: 100,
      centerYMm: 120,
      rotationDeg: 0,
      motif: 'bunny',
      scalePct: 100,
      threads: ['WB-118', 'WB-110'],
    },
  ],
};

describe('describeDesignChanges', () => {
  it('when nothing a person would see moved, then there are no changes', () => {
    const nudged = structuredClone(before);
    (nudged.placements[0] as { centerXMm: number }).centerXMm += 0.2;
    expect(describeDesignChanges(before, nudged, names)).toEqual([]);
  });

  it('when the name moves up and the bunny’s thread is swapped, then each change is one sentence with the threads’ names', () => {
    const after = structuredClone(before);
    (after.placements[0] as { centerYMm: number }).centerYMm = 75;
    (after.placements[1] as { threads: string[] }).threads = ['WB-140', 'WB-110'];
    expect(describeDesignChanges(before, after, names)).toEqual([
      'Name “Mia” moved 5 mm up',
      'Thread of the bunny changed from Sky to Sage',
    ]);
  });

  it('when the lettering, its font, size and place change, then the sentence names old and new', () => {
    const after = structuredClone(before);
    Object.assign(after.placements[0]!, {
      text: 'Maya',
      font: 'block-caps',
      letterHeightMm: 25,
      zone: 'left_chest',
      centerXMm: 90,
    });
    expect(describeDesignChanges(before, after, names)).toEqual([
      'Name “Mia” moved 10 mm left, moved to the left chest, lettering changed from “Mia” to “Maya”, font changed from Breezy Script to Block Capitals, letters made 25 mm tall instead of 20 mm',
    ]);
  });

  it('when a placement is taken off, made bigger or added, then the sentences say so', () => {
    const after: DesignDocument = {
      version: 1,
      placements: [
        {
          ...(before.placements[1] as Extract<DesignDocument['placements'][number], { kind: 'motif' }>),
          scalePct: 120,
        },
        {
          id: 'pic',
          kind: 'artwork',
          zone: 'chest',
          centerXMm: 1,
          centerYMm: 1,
          rotationDeg: 0,
          artworkUploadId: 3,
          widthMm: 40,
        },
      ],
    };
    expect(describeDesignChanges(before, after, names)).toEqual([
      'The bunny made bigger (120 % of its drawing instead of 100 %)',
      'Your picture added',
      'Name “Mia” taken off',
    ]);
  });
});
