import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';
import type { PlacementOverlap } from '@server/engine/placement-overlap.ts';
import type { DesignPlacement } from '@server/contracts/designs.ts';
import { EmptyState } from '@ui/components/page-state.tsx';
import { commandOf, type Dispatch } from '../commands/command-registry.ts';
import type { DesignSetting } from '../model/design-setting.ts';
import { isItem, type DesignerState } from '../model/designer-state.ts';
import { placementLabel } from '../model/placement-label.ts';
import { BorderEditor } from './border-editor.tsx';
import { LetteringEditor } from './lettering-editor.tsx';
import { ItemPosition } from './item-position.tsx';
import { MotifEditor } from './motif-editor.tsx';
import { ArtworkEditor } from './artwork-editor.tsx';
import { RotationField } from './rotation-field.tsx';
import { NudgePad } from './nudge-pad.tsx';
import { PlacementOverlapNote } from './overlap-warning.tsx';

interface ListProps {
  setting: DesignSetting;
  state: DesignerState;
  threads: readonly ThreadColourSummary[];
  dispatch: Dispatch;
}

function Editor({ placement, ...props }: ListProps & { placement: DesignPlacement }) {
  if (placement.kind === 'border') return <BorderEditor border={placement} {...props} />;
  if (placement.kind === 'lettering') return <LetteringEditor lettering={placement} {...props} />;
  if (placement.kind === 'motif') return <MotifEditor placement={placement} {...props} />;
  return <ArtworkEditor placement={placement} {...props} />;
}

/**
 * Everything on the garment, each with its own buttons, so the whole design can be made without the canvas or a
 * mouse: open one to move it step by step or to its centre line, resize or turn it, choose its threads, or remove it.
 */
export function PlacementList({ overlaps = [], ...props }: ListProps & { overlaps?: readonly PlacementOverlap[] }) {
  const { setting, state, dispatch } = props;
  const { placements } = state.document;
  return (
    <section aria-labelledby="placements-heading">
      <h2 id="placements-heading" className="text-lg font-semibold">
        On the garment
      </h2>
      {placements.length === 0 ? (
        <div className="mt-3">
          <EmptyState title="Nothing on the garment yet.">Add a border, a name or a motif below.</EmptyState>
        </div>
      ) : (
        <ul className="mt-3 space-y-2">
          {placements.map((placement) => {
            const label = placementLabel(setting, placement);
            const isOpen = placement.id === state.selectedId;
            return (
              <li
                key={placement.id}
                className={`rounded-card border bg-white ${isOpen ? 'border-madder-500 shadow-sm' : 'border-linen-200'}`}
              >
                <div className="flex items-center gap-2 p-2">
                  <button
                    type="button"
                    aria-expanded={isOpen}
                    onClick={() => dispatch('select-placement', { id: isOpen ? null : placement.id })}
                    className="flex min-h-11 min-w-0 flex-1 items-center justify-between gap-2 rounded-lg px-3 text-left hover:bg-linen-100"
                  >
                    <span className="font-medium">{label}</span>
                    <span className="shrink-0 text-sm text-madder-600">{isOpen ? 'Done' : 'Change'}</span>
                  </button>
                  <button
                    type="button"
                    aria-label={`${commandOf('remove-placement').label} ${label}`}
                    onClick={() => dispatch('remove-placement', { id: placement.id })}
                    className="min-h-11 shrink-0 rounded-full border border-linen-300 px-4 text-sm hover:bg-linen-100"
                  >
                    {commandOf('remove-placement').label}
                  </button>
                </div>
                <PlacementOverlapNote setting={setting} placements={placements} id={placement.id} overlaps={overlaps} />
                {isOpen && (
                  <div className="space-y-4 border-t border-linen-200 p-4">
                    <NudgePad
                      id={placement.id}
                      label={label}
                      isBorder={placement.kind === 'border'}
                      dispatch={dispatch}
                    />
                    {isItem(placement) && <ItemPosition setting={setting} state={state} item={placement} />}
                    <Editor placement={placement} {...props} />
                    {isItem(placement) && (
                      <RotationField
                        id={placement.id}
                        label={label}
                        rotationDeg={placement.rotationDeg}
                        dispatch={dispatch}
                      />
                    )}
                  </div>
                )}
              </li>
            );
          })}
        </ul>
      )}
    </section>
  );
}
