import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';
import type { BorderPlacement } from '@server/contracts/designs.ts';
import { formatLength } from '@ui/format.ts';
import { layoutBorder, trialBorder } from '../model/border-layout.ts';
import { sizeOf, type DesignSetting } from '../model/design-setting.ts';
import type { DesignerState } from '../model/designer-state.ts';
import type { Dispatch } from '../commands/command-registry.ts';
import { BorderFitSummary, borderFitWords } from './border-fit-summary.tsx';
import { MotifChoice } from './motif-choice.tsx';
import { RunChoice } from './run-choice.tsx';
import { BorderRepeats } from './border-repeats.tsx';
import { PlacementThreads } from './placement-threads.tsx';

export function BorderEditor({
  border,
  setting,
  state,
  threads,
  dispatch,
}: {
  border: BorderPlacement;
  setting: DesignSetting;
  state: DesignerState;
  threads: readonly ThreadColourSummary[];
  dispatch: Dispatch;
}) {
  const size = sizeOf(setting, state.sizeId);
  const borders = setting.motifs.filter((motif) => motif.kind === 'border');
  return (
    <div className="space-y-4">
      <BorderFitSummary layout={layoutBorder(setting, state.sizeId, border)} />
      <p className="text-sm text-walnut-700">Its middle runs {formatLength(border.hemOffsetMm)} above the hem edge.</p>
      <BorderRepeats border={border} setting={setting} sizeId={state.sizeId} dispatch={dispatch} />
      {size.hemFrontMm !== null && size.hemCircumferenceMm !== null && (
        <RunChoice
          name={`${border.id}-run`}
          value={border.run}
          frontMm={size.hemFrontMm}
          circumferenceMm={size.hemCircumferenceMm}
          onChange={(run) => dispatch('update-border', { id: border.id, run })}
        />
      )}
      <MotifChoice
        name={`${border.id}-motif`}
        legend="Border"
        motifs={borders}
        value={border.motif}
        onChange={(motif) => dispatch('update-border', { id: border.id, motif })}
        detailOf={(candidate) =>
          borderFitWords(layoutBorder(setting, state.sizeId, trialBorder(candidate.slug, border.run)))
        }
      />
      <PlacementThreads placement={border} threads={threads} dispatch={dispatch} />
    </div>
  );
}
