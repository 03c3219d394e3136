import { useId } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import type { ThreadColourSummary } from '@server/contracts/catalogue.ts';
import { designFieldRules, designLimits } from '@server/contracts/designs.ts';
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

/** A name to add: the design document's rules for lettering, its font, height, thread and place. */
const addNameFields = z.object({
  text: z.string().transform((text, context) => {
    const check = checkLetteringText(text);
    if (check.ok) return check.text;
    context.addIssue({ code: 'custom', message: check.message });
    return z.NEVER;
  }),
  font: designFieldRules.catalogueSlug,
  letterHeightMm: z.number().min(designLimits.letterHeightMm.min).max(designLimits.letterHeightMm.max),
  thread: designFieldRules.threadCode,
  zone: designFieldRules.zoneCode,
});

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
  const { register, watch, setValue, resetField, formState, handleSubmit } = useForm({
    resolver: zodResolver(addNameFields),
    reValidateMode: 'onSubmit',
    defaultValues: {
      text: '',
      font: setting.fonts[0]?.slug ?? '',
      letterHeightMm: STARTING_HEIGHT_MM,
      thread: legibleThread(threads, fabricHex)?.code ?? '',
      zone: defaultItemZone(size)?.code ?? '',
    },
  });
  const text = watch('text');
  const thread = watch('thread');
  const zone = watch('zone');
  const problem = formState.errors.text?.message;
  const font = fontOf(setting, watch('font'));
  if (!font || threads.length === 0) return <EmptyState title="Names are not on offer just now." />;
  const letterHeightMm = clampLetterHeight(font, watch('letterHeightMm'));

  const submit = handleSubmit((fields) => {
    dispatch('add-lettering', {
      ...fields,
      font: font.slug,
      letterHeightMm: clampLetterHeight(font, fields.letterHeightMm),
    });
    resetField('text');
  });
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
          maxLength={MAX_LETTERING_LENGTH}
          autoComplete="off"
          aria-invalid={problem !== undefined}
          aria-describedby={problem ? `${textId}-problem` : undefined}
          className="mt-2 block min-h-11 w-full rounded-lg border border-linen-300 bg-white px-3 text-lg aria-invalid:border-madder-500"
          placeholder="Eliza"
          {...register('text')}
        />
        {problem && (
          <p id={`${textId}-problem`} className="mt-1 text-sm text-madder-700">
            {problem}
          </p>
        )}
      </div>
      <FontChoice
        name="new-name-font"
        fonts={setting.fonts}
        value={font.slug}
        sample={text}
        onChange={(slug) => setValue('font', slug)}
      />
      <LetterHeightField
        font={font}
        value={letterHeightMm}
        onChange={(heightMm) => setValue('letterHeightMm', heightMm)}
      />
      <ThreadChoice
        name="new-name-thread"
        threads={threads}
        value={thread}
        onChange={(code) => setValue('thread', code)}
      />
      <ZoneChoice zones={size.zones} value={zone} onChange={(code) => setValue('zone', code)} />
      <Button type="submit" disabled={!hasRoomForPlacement(state)}>
        {commandOf('add-lettering').label}
      </Button>
    </form>
  );
}
