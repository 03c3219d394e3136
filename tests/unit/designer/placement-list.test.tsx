// @vitest-environment jsdom
import { afterEach, describe, expect, it } from 'vitest';
import { cleanup, fireEvent, render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import type { DesignDocument } from '../../../server/src/contracts/designs.ts';
import { PlacementList } from '../../../storefront/src/features/designer/components/placement-list.tsx';
import { useDesigner } from '../../../storefront/src/features/designer/hooks/use-designer.ts';
import { createDesignerState } from '../../../storefront/src/features/designer/model/designer-state.ts';
import { threads } from '../../../seeds/data/threads.ts';
import { setting, zone } from './support/bishop-dress-setting.ts';

afterEach(cleanup);
// user-event walks radio groups with CSS.escape, which jsdom does not provide.
globalThis.CSS ??= {
  escape: (value: string) => value.replace(/[^\w-]/g, (character) => `\\${character}`),
} as typeof CSS;

/** The list beside the canvas, working on the real designer state and commands, for the 6-month bishop dress. */
function Designer({ document }: { document: DesignDocument }) {
  const designer = useDesigner(setting, createDesignerState(301, 301, document));
  return (
    <div onKeyDown={designer.onKeyDown}>
      <PlacementList setting={setting} state={designer.state} threads={threads} dispatch={designer.dispatch} />
    </div>
  );
}

const chest = zone(0, 'chest');
const middle = { centerXMm: chest.xMm + chest.widthMm / 2, centerYMm: chest.yMm + chest.heightMm / 2 };
const bunnyAt = (scalePct: number): DesignDocument => ({
  version: 1,
  placements: [
    {
      id: 'motif',
      kind: 'motif',
      zone: 'chest',
      ...middle,
      rotationDeg: 0,
      motif: 'sitting-bunny',
      scalePct,
      threads: ['WB-118'],
    },
  ],
});
const bunny = bunnyAt(80);
const drawing: DesignDocument = {
  version: 1,
  placements: [
    { id: 'artwork', kind: 'artwork', zone: 'chest', ...middle, rotationDeg: 0, artworkUploadId: 41, widthMm: 40 },
  ],
};

/** Moves the focus with Tab until it reaches the element, as a keyboard user would, and fails if it never does. */
async function tabTo(user: ReturnType<typeof userEvent.setup>, element: HTMLElement) {
  for (let presses = 0; presses < 60 && document.activeElement !== element; presses += 1) await user.tab();
  expect(document.activeElement).toBe(element);
}

const list = () => screen.getByRole('region', { name: 'On the garment' });
const where = () => within(list()).getByRole('status').textContent;

describe('the placement list, by keyboard alone', () => {
  it('when a motif is opened, moved, centred, turned and removed with Tab, Enter and Space, then the design follows each step', async () => {
    const user = userEvent.setup();
    render(<Designer document={bunnyAt(100)} />);

    await tabTo(user, within(list()).getByRole('button', { name: /^Sitting bunny/ }));
    await user.keyboard('{Enter}');
    expect(
      within(list())
        .getByRole('button', { name: /^Sitting bunny/ })
        .getAttribute('aria-expanded'),
    ).toBe('true');
    expect(where()).toBe('In “Below the smocking”: centred side to side, centred top to bottom.');

    // The bunny is taller than the zone, so it stays centred top to bottom; side to side it moves.
    await tabTo(user, within(list()).getByRole('button', { name: 'Move Sitting bunny right 1 mm' }));
    await user.keyboard('{Enter}{Enter} ');
    expect(where()).toBe('In “Below the smocking”: 3 mm right of centre, centred top to bottom.');
    await tabTo(user, within(list()).getByRole('checkbox', { name: '10 mm steps' }));
    await user.keyboard(' ');
    await user.tab({ shift: true });
    await user.tab({ shift: true });
    expect(document.activeElement).toBe(within(list()).getByRole('button', { name: 'Move Sitting bunny right 10 mm' }));
    await user.keyboard('{Enter}');
    expect(where()).toBe('In “Below the smocking”: 13 mm right of centre, centred top to bottom.');

    await tabTo(user, within(list()).getByRole('button', { name: 'Centre side to side' }));
    await user.keyboard('{Enter}');
    expect(where()).toBe('In “Below the smocking”: centred side to side, centred top to bottom.');

    await tabTo(user, within(list()).getByRole('button', { name: 'Turn Sitting bunny 15° clockwise' }));
    await user.keyboard('{Enter}{Enter}');
    expect(within(list()).getByRole('slider', { name: /^Turn/ }).getAttribute('aria-valuetext')).toBe('30° clockwise');

    await tabTo(user, within(list()).getByRole('button', { name: 'Remove Sitting bunny' }));
    await user.keyboard('{Enter}');
    expect(list().textContent).toContain('Nothing on the garment yet.');
  });

  it('when the arrow keys move between thread swatches, then the motif takes each thread in turn', async () => {
    const user = userEvent.setup();
    render(<Designer document={bunny} />);
    await tabTo(user, within(list()).getByRole('button', { name: /^Sitting bunny/ }));
    await user.keyboard('{Enter}');
    const fern = within(list()).getByRole('radio', { name: 'Fern Frond' });
    await tabTo(user, fern);
    await user.keyboard('{ArrowRight}');
    expect((within(list()).getByRole('radio', { name: 'Clover Patch' }) as HTMLInputElement).checked).toBe(true);
    expect(within(list()).getByRole('group', { name: /^Thread colour: Clover Patch/ })).toBeTruthy();
  });

  it('when a colour of one’s own is picked, then the nearest threads are offered with their difference, and Enter chooses one', async () => {
    const user = userEvent.setup();
    render(<Designer document={bunny} />);
    await user.click(within(list()).getByRole('button', { name: /^Sitting bunny/ }));
    // The browser's colour dialog is its own; what it hands back is an input event with the colour.
    fireEvent.input(within(list()).getByLabelText('Match a colour of your own'), { target: { value: '#f6d44b' } });
    const matches = within(list()).getByRole('list', { name: 'Our nearest threads to #f6d44b:' });
    const offers = within(matches).getAllByRole('button');
    expect(offers).toHaveLength(3);
    expect(offers[0]!.textContent).toMatch(/^Buttercup WB-103ΔE 0\.\d: no visible difference$/);
    await tabTo(user, offers[0]!);
    await user.keyboard('{Enter}');
    expect((within(list()).getByRole('radio', { name: 'Buttercup' }) as HTMLInputElement).checked).toBe(true);
    expect(offers[0]!.getAttribute('aria-pressed')).toBe('true');
  });

  it('when the artwork’s width is typed and Enter pressed, then it resizes, no wider than the zone lets it', async () => {
    const user = userEvent.setup();
    render(<Designer document={drawing} />);
    await tabTo(user, within(list()).getByRole('button', { name: /^Your own artwork/ }));
    await user.keyboard('{Enter}');
    const width = within(list()).getByRole('spinbutton', { name: 'Width in mm' });
    await tabTo(user, width);
    await user.keyboard('{Control>}a{/Control}72{Enter}');
    expect(
      within(list())
        .getByRole('slider', { name: /^Width/ })
        .getAttribute('aria-valuetext'),
    ).toBe('72 mm · 2 ¹³⁄₁₆ in wide');
    await user.keyboard('{Control>}a{/Control}500{Enter}');
    // The 6-month chest zone is 91.05 × 45.53 mm: a drawing twice as wide as tall stops at 91 mm.
    expect((width as HTMLInputElement).value).toBe('91');
    expect(list().textContent).toContain('It can be no bigger than the space for it (“Below the smocking”).');
  });
});
