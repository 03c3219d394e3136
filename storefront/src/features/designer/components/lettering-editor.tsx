import { useId, useState } from 'react';
import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';
import type { LetteringPlacement } from '@server/contracts/designs.ts';
import { fontOf, sizeOf, zoneOf, type DesignSetting } from '../model/design-setting.ts';
import type { DesignerState } from '../model/designer-state.ts';
import { fitsZone } from '../model/clamp.ts';
import { itemExtent } from '../model/item-extent.ts';
import { checkLetteringText, MAX_LETTERING_LENGTH } from '../model/lettering-rules.ts';
import type { UpdateLetteringArgs } from '../commands/update-lettering.ts';
import type { Dispatch } from '../commands/command-registry.ts';
import { FontChoice } from './font-choice.tsx';
import { LetterHeightField } from './letter-height-field.tsx';
import { ThreadPicker } from './thread-picker.tsx';
import { TooBigNote } from './too-big-note.tsx';
import { ZoneChoice } from './zone-choice.tsx';

export function LetteringEditor({
  lettering,
  setting,
  state,
  threads,
  dispatch,
}: {
  lettering: LetteringPlacement;
  setting: DesignSetting;
  state: DesignerState;
  threads: readonly ThreadColourSummary[];
  dispatch: Dispatch;
}) {
  const textId = useId();
  // The field keeps what is typed, even blank for a moment; only text the contract accepts reaches the design,
  // and an undo that changes the text shows up in the field.
  const [draft, setDraft] = useState(lettering.text);
  const [shownText, setShownText] = useState(lettering.text);
  if (lettering.text !== shownText) {
    setShownText(lettering.text);
    setDraft(lettering.text);
  }
  const check = checkLetteringText(draft);
  const font = fontOf(setting, lettering.font);
  const size = sizeOf(setting, state.sizeId);
  const zone = zoneOf(size, lettering.zone);
  const isTooBig = zone !== undefined && !fitsZone(itemExtent(setting, lettering), zone);
  const update = (change: Omit<UpdateLetteringArgs, 'id'>) =>
    dispatch('update-lettering', { id: lettering.id, ...change });

  return (
    <div className="space-y-4">
      <div>
        <label htmlFor={textId} className="flex items-baseline justify-between text-sm font-medium">
          <span>Name or words</span>
          <span className="font-normal text-walnut-500">
            {[...draft].length} / {MAX_LETTERING_LENGTH}
          </span>
        </label>
        <input
          id={textId}
          value={draft}
          maxLength={MAX_LETTERING_LENGTH}
          autoComplete="off"
          aria-invalid={!check.ok}
          aria-describedby={check.ok ? undefined : `${textId}-problem`}
          onChange={(event) => {
            setDraft(event.target.value);
            if (checkLetteringText(event.target.value).ok) update({ text: event.target.value });
          }}
          className="mt-2 block min-h-11 w-full rounded-lg border border-linen-300 bg-white px-3 text-lg aria-invalid:border-madder-500"
        />
        {!check.ok && (
          <p id={`${textId}-problem`} className="mt-1 text-sm text-madder-700">
            {check.message}
          </p>
        )}
      </div>
      {isTooBig && zone && <TooBigNote zone={zone} advice="Try smaller letters or fewer words." />}
      <FontChoice
        name={`${lettering.id}-font`}
        fonts={setting.fonts}
        value={lettering.font}
        sample={lettering.text}
        onChange={(slug) => update({ font: slug })}
      />
      {font && (
        <LetterHeightField
          font={font}
          value={lettering.letterHeightMm}
          onChange={(letterHeightMm) => update({ letterHeightMm })}
        />
      )}
      <ThreadPicker
        name={`${lettering.id}-thread`}
        legend="Thread colour"
        threads={threads}
        value={lettering.thread}
        onChange={(thread) => dispatch('set-thread-colour', { id: lettering.id, index: 0, thread })}
      />
      <ZoneChoice zones={size.zones} value={lettering.zone} onChange={(code) => update({ zone: code })} />
    </div>
  );
}
