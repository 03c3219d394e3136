import { useState, type FormEvent } from 'react';
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
  const [slug, setSlug] = useState(singles[0]?.slug ?? '');
  const [scalePct, setScalePct] = useState(100);
  const [zone, setZone] = useState(() => defaultItemZone(size)?.code ?? '');
  const motif = motifOf(setting, slug);
  if (!motif) return <EmptyState title="No single motifs are on offer just now." />;
  const scale = clampMotifScale(motif, scalePct, setting.hoops);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    dispatch('add-motif', { motif: motif.slug, scalePct: scale, zone });
  };
  return (
    <form onSubmit={submit} className="space-y-4">
      <MotifChoice
        name="new-motif"
        legend="Choose a motif"
        motifs={singles}
        value={motif.slug}
        onChange={setSlug}
        detailOf={(candidate) => `${candidate.colourCount} thread colour${candidate.colourCount === 1 ? '' : 's'}`}
      />
      <MotifSizeField motif={motif} hoops={setting.hoops} value={scale} onChange={setScalePct} />
      <ZoneChoice zones={size.zones} value={zone} onChange={setZone} />
      <Button type="submit" disabled={!hasRoomForPlacement(state)}>
        {commandOf('add-motif').label}
      </Button>
    </form>
  );
}
