import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { designFieldRules, type BorderPlacement } from '@server/contracts/designs.ts';
import { Button } from '@ui/components/button.tsx';
import { EmptyState } from '@ui/components/page-state.tsx';
import { commandOf } from '../commands/command-registry.ts';
import { layoutBorder, trialBorder } from '../model/border-layout.ts';
import { HEM_ZONE, sizeOf, zoneOf, type DesignSetting } from '../model/design-setting.ts';
import { hasRoomForPlacement, type DesignerState } from '../model/designer-state.ts';
import type { Dispatch } from '../commands/command-registry.ts';
import { borderFitWords } from './border-fit-summary.tsx';
import { MotifChoice } from './motif-choice.tsx';
import { RunChoice } from './run-choice.tsx';

/** A border to add: the design document's rules for its motif and its run along the hem. */
const addBorderFields = z.object({
  motif: designFieldRules.catalogueSlug,
  run: z.enum(['front', 'circumference']),
});

export function AddBorderForm({
  setting,
  state,
  dispatch,
}: {
  setting: DesignSetting;
  state: DesignerState;
  dispatch: Dispatch;
}) {
  const borders = setting.motifs.filter((motif) => motif.kind === 'border');
  const { watch, setValue, handleSubmit } = useForm({
    resolver: zodResolver(addBorderFields),
    defaultValues: { motif: borders[0]?.slug ?? '', run: 'circumference' as BorderPlacement['run'] },
  });
  const motif = watch('motif');
  const run = watch('run');
  const size = sizeOf(setting, state.sizeId);
  if (!zoneOf(size, HEM_ZONE) || size.hemFrontMm === null || size.hemCircumferenceMm === null) {
    return (
      <p className="text-sm text-walnut-700">This piece takes a name or a single motif rather than a hem border.</p>
    );
  }
  if (state.document.placements.some((placement) => placement.kind === 'border')) {
    return (
      <p className="text-sm text-walnut-700">The hem has its border. Choose it under “On the garment” to change it.</p>
    );
  }
  if (borders.length === 0) return <EmptyState title="No borders are on offer just now." />;
  const submit = handleSubmit((fields) => dispatch('add-border', fields));
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <p className="text-sm text-walnut-700">
        A border is one little picture repeated end to end along the hem. We resize it very slightly so whole repeats
        meet exactly — never a cut-off one.
      </p>
      <RunChoice
        name="new-border-run"
        value={run}
        frontMm={size.hemFrontMm}
        circumferenceMm={size.hemCircumferenceMm}
        onChange={(picked) => setValue('run', picked)}
      />
      <MotifChoice
        name="new-border-motif"
        legend="Choose a border"
        motifs={borders}
        value={motif}
        onChange={(slug) => setValue('motif', slug)}
        detailOf={(candidate) => borderFitWords(layoutBorder(setting, state.sizeId, trialBorder(candidate.slug, run)))}
      />
      <Button type="submit" disabled={!hasRoomForPlacement(state)}>
        {commandOf('add-border').label}
      </Button>
    </form>
  );
}
