import { useState } from 'react';
import type { ShopSettings } from '@server/contracts/admin-settings.ts';
import { ApiError } from '@ui/api-client.ts';
import { Button } from '@ui/components/button.tsx';
import { ErrorNotice } from '@ui/components/page-state.tsx';
import { NumberField } from '../../../components/number-field.tsx';
import { useUpdateSettings } from '../api/update-settings.ts';

type Field = Exclude<keyof ShopSettings, 'timeZone' | 'closedWeekdays' | 'holidays'>;

/** Monday first, as the studio's week runs; values are JavaScript's days, 0 Sunday to 6 Saturday. */
const weekdays = [
  { day: 1, label: 'Monday' },
  { day: 2, label: 'Tuesday' },
  { day: 3, label: 'Wednesday' },
  { day: 4, label: 'Thursday' },
  { day: 5, label: 'Friday' },
  { day: 6, label: 'Saturday' },
  { day: 0, label: 'Sunday' },
];
const inputClassName =
  'mt-1 block min-h-10 w-full rounded-lg border border-linen-300 bg-white px-3 read-only:bg-linen-100 aria-invalid:border-madder-600';

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

/**
 * The shop's pace, capacity and days; every quote's run time is worked out from the first four, and every due and
 * ready date from the lead time, the time zone and the closed days.
 */
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
  const [timeZone, setTimeZone] = useState(settings.timeZone);
  const [closedWeekdays, setClosedWeekdays] = useState<number[]>(settings.closedWeekdays);
  const [holidays, setHolidays] = useState(settings.holidays.join('\n'));
  const update = useUpdateSettings();
  const errors = update.error instanceof ApiError ? (update.error.fields ?? {}) : {};
  const toNumber = (text: string) => (text.trim() === '' ? Number.NaN : Number(text));

  return (
    <form
      className="grid gap-5"
      aria-label="Shop settings"
      onSubmit={(event) => {
        event.preventDefault();
        const numbers = Object.fromEntries(fields.map(({ key }) => [key, toNumber(values[key])]));
        const closedDays = holidays
          .split(/[\s,]+/)
          .map((day) => day.trim())
          .filter(Boolean);
        update.mutate({ ...numbers, timeZone, closedWeekdays, holidays: closedDays } as ShopSettings, {
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
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-1 text-base font-semibold">The shop’s days</legend>
        <label className="grid text-sm font-medium">
          Time zone
          <input
            className={inputClassName}
            value={timeZone}
            readOnly={!canEdit}
            aria-invalid={errors.timeZone ? true : undefined}
            onChange={(event) => setTimeZone(event.target.value)}
          />
          <span className="mt-1 text-xs font-normal text-walnut-500">
            Where the shop is, like America/Chicago: “today” and “overdue” follow its clock.
          </span>
          {errors.timeZone && <span className="text-sm font-normal text-madder-700">{errors.timeZone}</span>}
        </label>
        <fieldset className="grid gap-1">
          <legend className="text-sm font-medium">Closed every week on</legend>
          <div className="flex flex-wrap gap-x-4 gap-y-1">
            {weekdays.map(({ day, label }) => (
              <label key={day} className="flex min-h-10 items-center gap-2 text-sm">
                <input
                  type="checkbox"
                  className="h-5 w-5 accent-madder-600"
                  checked={closedWeekdays.includes(day)}
                  disabled={!canEdit}
                  onChange={(event) =>
                    setClosedWeekdays(
                      event.target.checked
                        ? [...closedWeekdays, day]
                        : closedWeekdays.filter((closed) => closed !== day),
                    )
                  }
                />
                {label}
              </label>
            ))}
          </div>
          {errors.closedWeekdays && <span className="text-sm text-madder-700">{errors.closedWeekdays}</span>}
        </fieldset>
        <label className="grid text-sm font-medium sm:col-span-2">
          Holidays and other closed days
          <textarea
            rows={3}
            className={`${inputClassName} py-2`}
            value={holidays}
            readOnly={!canEdit}
            aria-invalid={Object.keys(errors).some((key) => key.startsWith('holidays')) ? true : undefined}
            placeholder="2026-12-25"
            onChange={(event) => setHolidays(event.target.value)}
          />
          <span className="mt-1 text-xs font-normal text-walnut-500">
            One day a line, as YYYY-MM-DD. Lead times and ready dates step over these and the closed days above.
          </span>
          {Object.entries(errors)
            .filter(([key]) => key.startsWith('holidays'))
            .map(([key, message]) => (
              <span key={key} className="text-sm font-normal text-madder-700">
                {message}
              </span>
            ))}
        </label>
      </fieldset>
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
