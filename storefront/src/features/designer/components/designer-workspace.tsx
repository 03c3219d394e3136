import { useMemo, useRef, type ReactNode } from 'react';
import type { GarmentSummary, ThreadColourSummary } from '@server/contracts/catalogue.ts';
import type { SavedDesign } from '@server/contracts/saved-designs.ts';
import { dyedMockupSrc } from '@store/lib/dyed-mockup.ts';
import { findPlacement } from '../model/designer-state.ts';
import { mockupSizeMm, sizeOf, type DesignSetting } from '../model/design-setting.ts';
import type { Designer } from '../hooks/use-designer.ts';
import { useDesignDraft } from '../hooks/use-design-draft.ts';
import { describeScene } from '../render/describe-scene.ts';
import { designOverlaps } from '../model/placement-outlines.ts';
import { OverlapWarning } from './overlap-warning.tsx';
import { AddPanels } from './add-panels.tsx';
import { DesignCanvas } from './design-canvas.tsx';
import { DesignerToolbar } from './designer-toolbar.tsx';
import { PlacementList } from './placement-list.tsx';
import { SaveDesignPanel } from './save-design-panel.tsx';

interface WorkspaceProps {
  garment: GarmentSummary;
  setting: DesignSetting;
  threads: readonly ThreadColourSummary[];
  designer: Designer;
  saved: SavedDesign | undefined;
  onSaved: (design: SavedDesign) => void;
  /** Size and fabric colour pickers, composed by the page from the catalogue. */
  garmentOptions: ReactNode;
  /** The server's price for the design as it stands, composed by the page: in full, and as a one-line total. */
  price: ReactNode;
  priceTotal: ReactNode;
  header: ReactNode;
}

/**
 * The design page's working area: the garment on the canvas with its tools, and beside it (below it on a phone)
 * the garment options, what is on the garment, ways to add more, the price and saving. Keyboard shortcuts work
 * anywhere in it except inside a text field.
 */
export function DesignerWorkspace({
  garment,
  setting,
  threads,
  designer,
  saved,
  onSaved,
  garmentOptions,
  price,
  priceTotal,
  header,
}: WorkspaceProps) {
  const { state, dispatch } = designer;
  const size = sizeOf(setting, state.sizeId);
  const colour = garment.colours.find((candidate) => candidate.id === state.colourId);
  const selected = findPlacement(state, state.selectedId);
  useDesignDraft(garment.slug, state, saved === undefined);
  const garmentView = useRef<HTMLDivElement>(null);
  // On a phone the add forms are below the garment; bring it back into view to show what was just added.
  const showGarment = () => garmentView.current?.scrollIntoView({ block: 'nearest', behavior: 'smooth' });

  const { document, sizeId } = state;
  const drawables = useMemo(
    () => describeScene({ document, sizeId }, setting, threads),
    [document, sizeId, setting, threads],
  );
  const overlaps = useMemo(() => designOverlaps(setting, { document, sizeId }), [document, sizeId, setting]);
  const scene = useMemo(
    () => ({
      drawables,
      mockupSrc: dyedMockupSrc(garment.mockupSvg, colour?.hex),
      zones: size.zones,
      selectedId: state.selectedId,
      selectedZone: selected?.zone ?? null,
    }),
    [drawables, garment.mockupSvg, colour?.hex, size.zones, state.selectedId, selected?.zone],
  );

  return (
    <div onKeyDown={designer.onKeyDown}>
      {header}
      <div className="mt-6 grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(20rem,2fr)] lg:gap-8">
        <div ref={garmentView} className="min-w-0 scroll-mt-4 space-y-3 lg:sticky lg:top-4">
          <DesignerToolbar
            canUndo={designer.canUndo}
            canRedo={designer.canRedo}
            hasSelection={selected !== undefined}
            dispatch={dispatch}
          />
          <DesignCanvas
            scene={scene}
            mockupSizeMm={mockupSizeMm(garment, size)}
            dispatch={dispatch}
            label={`The ${garment.name.toLowerCase()} in size ${size.label}, with your design`}
          />
          <OverlapWarning setting={setting} placements={document.placements} overlaps={overlaps} />
          {/* On a phone the full price is far below the garment, so its total rides along here. */}
          <div className="lg:hidden">{priceTotal}</div>
          <p id="canvas-help" className="text-sm text-walnut-500">
            Drag a name, motif or picture to move it (near the middle it settles on the centre line); a border moves up
            and down, and a picture's corners resize it. Arrow keys move the chosen item 1 mm (with Shift, 10 mm), R
            turns it 15° (Shift + R back), C centres it side to side, Delete removes it, and Ctrl or ⌘ + Z undoes.
          </p>
        </div>
        <div className="min-w-0 space-y-6">
          {garmentOptions}
          <PlacementList setting={setting} state={state} threads={threads} dispatch={dispatch} overlaps={overlaps} />
          <AddPanels
            setting={setting}
            state={state}
            threads={threads}
            fabricHex={colour?.hex ?? '#ffffff'}
            dispatch={dispatch}
            onAdded={showGarment}
          />
          {price}
          <SaveDesignPanel garment={garment} state={state} saved={saved} onSaved={onSaved} />
        </div>
      </div>
    </div>
  );
}
