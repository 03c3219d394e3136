import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { designFieldRules, designLimits } from '@server/contracts/designs.ts';
import { Button } from '@ui/components/button.tsx';
import { EmptyState } from '@ui/components/page-state.tsx';
import { commandOf } from '../commands/command-registry.ts';
import { defaultItemZone, motifOf, sizeOf, type DesignSetting } from '../model/design-setting.ts';
import { hasRoomForPlacement, type DesignerState } from '../model/designer-state.ts';
import { clampMotifScale } from '../model/motif-rules.ts';
import type { Dispatch } from '../commands/command-registry.ts';
import { MotifChoice } from './motif-choice.tsx';
import { MotifSizeField } from './motif-size-field.tsx';
import { ZoneChoice } from './zone-choice.tsx';

/** A single motif to add: the design document's rules for its choice, size and place. */
const addMotifFields = z.object({
  motif: designFieldRules.catalogueSlug,
  scalePct: z.number().min(designLimits.scalePct.min).max(designLimits.scalePct.max),
  zone: designFieldRules.zoneCode,
});

export function AddMotifForm({
  setting,
  state,
  dispatch,
}: {
  setting: DesignSetting;
  state: DesignerState;
  dispatch: Dispatch;
}) {
  const singles = setting.motifs.filter((motif) => motif.kind === 'single');
  const size = sizeOf(setting, state.sizeId);
  const { watch, setValue, handleSubmit } = useForm({
    resolver: zodResolver(addMotifFields),
    defaultValues: { motif: singles[0]?.slug ?? '', scalePct: 100, zone: defaultItemZone(size)?.code ?? '' },
  });
  const motif = motifOf(setting, watch('motif'));
  const zone = watch('zone');
  if (!motif) return <EmptyState title="No single motifs are on offer just now." />;
  const scale = clampMotifScale(motif, watch('scalePct'), setting.hoops);
  const submit = handleSubmit((fields) =>
    dispatch('add-motif', {
      motif: motif.slug,
      scalePct: clampMotifScale(motif, fields.scalePct, setting.hoops),
      zone: fields.zone,
    }),
  );
  return (
    <form onSubmit={submit} noValidate className="space-y-4">
      <MotifChoice
        name="new-motif"
        legend="Choose a motif"
        motifs={singles}
        value={motif.slug}
        onChange={(slug) => setValue('motif', slug)}
        detailOf={(candidate) => `${candidate.colourCount} thread colour${candidate.colourCount === 1 ? '' : 's'}`}
      />
      <MotifSizeField
        motif={motif}
        hoops={setting.hoops}
        value={scale}
        onChange={(scalePct) => setValue('scalePct', scalePct)}
      />
      <ZoneChoice zones={size.zones} value={zone} onChange={(code) => setValue('zone', code)} />
      <Button type="submit" disabled={!hasRoomForPlacement(state)}>
        {commandOf('add-motif').label}
      </Button>
    </form>
  );
}
