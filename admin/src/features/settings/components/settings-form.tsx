import { useState } from 'react';
import type { ShopSettings } from '@server/contracts/admin-settings.ts';
import { ApiError } from '@ui/api-client.ts';
import { Button } from '@ui/components/button.tsx';
import { ErrorNotice } from '@ui/components/page-state.tsx';
import { NumberField } from '../../../components/number-field.tsx';
import { useUpdateSettings } from '../api/update-settings.ts';

type Field = keyof ShopSettings;

const fields: { key: Field; label: string; suffix: string; step: string; hint: string }[] = [
  {
    key: 'machineStitchesPerMinute',
    label: 'Machine speed',
    suffix: 'stitches a minute',
    step: '1',
    hint: 'The pace you actually run at, usually below the machine’s top speed.',
  },
  {
    key: 'minutesPerHooping',
    label: 'Each hooping',
    suffix: 'min',
    step: '0.01',
    hint: 'Hooping the garment and lining it up with the marks.',
  },
  {
    key: 'minutesPerColourChange',
    label: 'Each colour change',
    suffix: 'min',
    step: '0.01',
    hint: 'Re-threading for the next colour.',
  },
  {
    key: 'setupMinutes',
    label: 'Setup per job',
    suffix: 'min',
    step: '0.01',
    hint: 'Threading, loading the design, a test on scrap.',
  },
  {
    key: 'leadTimeDays',
    label: 'Lead time',
    suffix: 'working days',
    step: '1',
    hint: 'From approval to ready; an order with no date is due this long after it is placed.',
  },
  {
    key: 'machineHoursPerWeek',
    label: 'Machine hours a week',
    suffix: 'h',
    step: '0.5',
    hint: 'What the studio can stitch in a week: the capacity line on Today.',
  },
];

/** The shop's pace and capacity; every quote's run time is worked out from the first four. */
export function SettingsForm({
  settings,
  canEdit,
  onSaved,
}: {
  settings: ShopSettings;
  canEdit: boolean;
  onSaved: () => void;
}) {
  const [values, setValues] = useState<Record<Field, string>>(
    () => Object.fromEntries(fields.map(({ key }) => [key, String(settings[key])])) as Record<Field, string>,
  );
  const update = useUpdateSettings();
  const errors = update.error instanceof ApiError ? (update.error.fields ?? {}) : {};
  const toNumber = (text: string) => (text.trim() === '' ? Number.NaN : Number(text));

  return (
    <form
      className="grid gap-5"
      aria-label="Shop settings"
      onSubmit={(event) => {
        event.preventDefault();
        update.mutate(Object.fromEntries(fields.map(({ key }) => [key, toNumber(values[key])])) as ShopSettings, {
          onSuccess: onSaved,
        });
      }}
    >
      {!canEdit && (
        <p className="rounded-xl bg-linen-100 p-3 text-sm text-walnut-700">Only the studio owner can change these.</p>
      )}
      <div className="grid gap-4 sm:grid-cols-2">
        {fields.map(({ key, label, suffix, step, hint }) => (
          <NumberField
            key={key}
            label={label}
            suffix={suffix}
            step={step}
            hint={hint}
            value={values[key]}
            error={errors[key]}
            isReadOnly={!canEdit}
            onChange={(value) => setValues({ ...values, [key]: value })}
          />
        ))}
      </div>
      {canEdit && (
        <div className="flex flex-wrap items-center gap-3">
          <Button type="submit" disabled={update.isPending}>
            {update.isPending ? 'Saving…' : 'Save settings'}
          </Button>
          <span role="status" className="text-sm text-sage-700">
            {update.isSuccess ? 'Saved. New quotes use these figures.' : ''}
          </span>
        </div>
      )}
      {update.isError && !Object.keys(errors).length && <ErrorNotice message={update.error.message} />}
    </form>
  );
}
