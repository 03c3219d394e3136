import { useId, useState, type FormEvent } from 'react';
import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';
import { Button } from '@ui/components/button.tsx';
import { EmptyState } from '@ui/components/page-state.tsx';
import { commandOf } from '../commands/command-registry.ts';
import { defaultItemZone, fontOf, sizeOf, type DesignSetting } from '../model/design-setting.ts';
import { hasRoomForPlacement, type DesignerState } from '../model/designer-state.ts';
import { checkLetteringText, clampLetterHeight, MAX_LETTERING_LENGTH } from '../model/lettering-rules.ts';
import { legibleThread } from '../model/thread-contrast.ts';
import type { Dispatch } from '../commands/command-registry.ts';
import { FontChoice } from './font-choice.tsx';
import { LetterHeightField } from './letter-height-field.tsx';
import { ThreadChoice } from './thread-choice.tsx';
import { ZoneChoice } from './zone-choice.tsx';

/** A comfortable size for a name on a yoke or bib, before the customer changes it. */
const STARTING_HEIGHT_MM = 20;

export function AddNameForm({
  setting,
  state,
  threads,
  fabricHex,
  dispatch,
}: {
  setting: DesignSetting;
  state: DesignerState;
  threads: readonly ThreadColourSummary[];
  fabricHex: string;
  dispatch: Dispatch;
}) {
  const textId = useId();
  const size = sizeOf(setting, state.sizeId);
  const [text, setText] = useState('');
  const [fontSlug, setFontSlug] = useState(setting.fonts[0]?.slug ?? '');
  const [heightMm, setHeightMm] = useState(STARTING_HEIGHT_MM);
  const [thread, setThread] = useState(() => legibleThread(threads, fabricHex)?.code ?? '');
  const [zone, setZone] = useState(() => defaultItemZone(size)?.code ?? '');
  const [problem, setProblem] = useState<string>();
  const font = fontOf(setting, fontSlug);
  if (!font || threads.length === 0) return <EmptyState title="Names are not on offer just now." />;
  const letterHeightMm = clampLetterHeight(font, heightMm);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const check = checkLetteringText(text);
    if (!check.ok) {
      setProblem(check.message);
      return;
    }
    dispatch('add-lettering', { text: check.text, font: font.slug, letterHeightMm, thread, zone });
    setText('');
    setProblem(undefined);
  };
  return (
    <form onSubmit={submit} className="space-y-4" noValidate>
      <div>
        <label htmlFor={textId} className="flex items-baseline justify-between text-sm font-medium">
          <span>Name or words</span>
          <span className="font-normal text-walnut-500">
            {[...text].length} / {MAX_LETTERING_LENGTH}
          </span>
        </label>
        <input
          id={textId}
          value={text}
          maxLength={MAX_LETTERING_LENGTH}
          autoComplete="off"
          aria-invalid={problem !== undefined}
          aria-describedby={problem ? `${textId}-problem` : undefined}
          onChange={(event) => setText(event.target.value)}
          className="mt-2 block min-h-11 w-full rounded-lg border border-linen-300 bg-white px-3 text-lg aria-invalid:border-madder-500"
          placeholder="Eliza"
        />
        {problem && (
          <p id={`${textId}-problem`} className="mt-1 text-sm text-madder-700">
            {problem}
          </p>
        )}
      </div>
      <FontChoice name="new-name-font" fonts={setting.fonts} value={font.slug} sample={text} onChange={setFontSlug} />
      <LetterHeightField font={font} value={letterHeightMm} onChange={setHeightMm} />
      <ThreadChoice name="new-name-thread" threads={threads} value={thread} onChange={setThread} />
      <ZoneChoice zones={size.zones} value={zone} onChange={setZone} />
      <Button type="submit" disabled={!hasRoomForPlacement(state)}>
        {commandOf('add-lettering').label}
      </Button>
    </form>
  );
}
