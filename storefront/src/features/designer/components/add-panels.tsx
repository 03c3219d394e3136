import { useState, type ReactNode } from 'react';
import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';
import type { Dispatch } from '../commands/command-registry.ts';
import type { DesignSetting } from '../model/design-setting.ts';
import { hasRoomForPlacement, MAX_PLACEMENTS, type DesignerState } from '../model/designer-state.ts';
import { AddBorderForm } from './add-border-form.tsx';
import { AddMotifForm } from './add-motif-form.tsx';
import { AddNameForm } from './add-name-form.tsx';
import { AddArtworkForm } from './add-artwork-form.tsx';

type Way = 'border' | 'name' | 'motif' | 'artwork';

function Drawer({
  title,
  hint,
  isOpen,
  onToggle,
  children,
}: {
  title: string;
  hint: string;
  isOpen: boolean;
  onToggle: (isOpen: boolean) => void;
  children: ReactNode;
}) {
  return (
    <details
      open={isOpen}
      onToggle={(event) => onToggle(event.currentTarget.open)}
      className="group rounded-card border border-linen-200 bg-white"
    >
      <summary className="flex min-h-14 cursor-pointer list-none items-center justify-between gap-3 rounded-card px-4 py-3 hover:bg-linen-100">
        <span>
          <span className="block font-semibold">{title}</span>
          <span className="block text-sm text-walnut-500">{hint}</span>
        </span>
        <span aria-hidden="true" className="text-xl text-madder-600 transition-transform group-open:rotate-45">
          +
        </span>
      </summary>
      <div className="border-t border-linen-200 p-4">{children}</div>
    </details>
  );
}

/**
 * The ways to add to the garment, each folded away until wanted so the page stays calm on a phone. Adding
 * folds the way away again: the new item opens under “On the garment”, where it is changed from then on.
 */
export function AddPanels({
  setting,
  state,
  threads,
  fabricHex,
  dispatch,
  onAdded,
}: {
  setting: DesignSetting;
  state: DesignerState;
  threads: readonly ThreadColourSummary[];
  fabricHex: string;
  dispatch: Dispatch;
  onAdded: () => void;
}) {
  const [open, setOpen] = useState<Way>();
  const drawer = (way: Way) => ({
    isOpen: open === way,
    onToggle: (isOpen: boolean) => setOpen((current) => (isOpen ? way : current === way ? undefined : current)),
  });
  const adding: Dispatch = (id, args) => {
    dispatch(id, args);
    setOpen(undefined);
    onAdded();
  };
  return (
    <section aria-labelledby="add-heading" className="space-y-2">
      <h2 id="add-heading" className="text-lg font-semibold">
        Add to the garment
      </h2>
      {!hasRoomForPlacement(state) && (
        <p className="text-sm text-walnut-700">
          A garment takes up to {MAX_PLACEMENTS} pieces of embroidery; remove one to add another.
        </p>
      )}
      <Drawer title="Add a border" hint="A little picture repeated along the hem" {...drawer('border')}>
        <AddBorderForm setting={setting} state={state} dispatch={adding} />
      </Drawer>
      <Drawer title="Add a name" hint="A name, initials or a few words" {...drawer('name')}>
        <AddNameForm setting={setting} state={state} threads={threads} fabricHex={fabricHex} dispatch={adding} />
      </Drawer>
      <Drawer title="Add a motif" hint="A single picture, such as a bunny or a lamb" {...drawer('motif')}>
        <AddMotifForm setting={setting} state={state} dispatch={adding} />
      </Drawer>
      <Drawer title="Add your own picture" hint="A child's drawing, a scan or a photo" {...drawer('artwork')}>
        <AddArtworkForm setting={setting} state={state} dispatch={adding} />
      </Drawer>
    </section>
  );
}
