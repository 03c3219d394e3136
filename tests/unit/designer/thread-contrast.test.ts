import { describe, expect, it } from 'vitest';
import { legibleThread } from '../../../storefront/src/features/designer/model/thread-contrast.ts';

// The first few threads of the demo palette (seeds/data/threads.ts), in its order.
const palette = [
  { code: 'WB-101', name: 'Chalk White', hex: '#F7F5EE' },
  { code: 'WB-103', name: 'Buttercup', hex: '#F6D44A' },
  { code: 'WB-106', name: 'Poppy Field', hex: '#D8403A' },
  { code: 'WB-133', name: 'Midnight Ink', hex: '#1C1F2E' },
];

describe('the starting thread for a name', () => {
  it('when the fabric is white, then pale threads are passed over for the first that reads clearly', () => {
    expect(legibleThread(palette, '#FAF7F0')?.code).toBe('WB-106');
  });

  it('when the fabric is dark, then the first pale thread is chosen', () => {
    expect(legibleThread(palette, '#22335C')?.code).toBe('WB-101');
  });

  it('when no thread reads clearly, then the last in the palette is offered rather than none', () => {
    expect(legibleThread(palette.slice(0, 1), '#FFFFFF')?.code).toBe('WB-101');
    expect(legibleThread([], '#FFFFFF')).toBeUndefined();
  });
});
