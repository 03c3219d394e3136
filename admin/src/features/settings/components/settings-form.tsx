import { useForm, type FieldPath } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { shopSettings, type ShopSettings } from '@server/contracts/admin-settings.ts';
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

const toNumber = (text: string) => (text.trim() === '' ? Number.NaN : Number(text));
const numberBox = <T extends z.ZodType<number, number>>(rule: T) => z.string().transform(toNumber).pipe(rule);
/** The closed days as the box holds them: one a line (or split by spaces or commas). */
const closedDaysOf = (text: string) =>
  text
    .split(/[\s,]+/)
    .map((day) => day.trim())
    .filter(Boolean);
/** Every refusal of the closed days, one a line, shown together under the box as the server's are. */
const joinedMessages = (messages: string[]) => [...new Set(messages)].join('\n');

/** The contract's settings as the form's boxes hold them: numbers and the closed days as typed text. */
const settingsFields = z.object({
  machineStitchesPerMinute: numberBox(shopSettings.shape.machineStitchesPerMinute),
  minutesPerHooping: numberBox(shopSettings.shape.minutesPerHooping),
  minutesPerColourChange: numberBox(shopSettings.shape.minutesPerColourChange),
  setupMinutes: numberBox(shopSettings.shape.setupMinutes),
  leadTimeDays: numberBox(shopSettings.shape.leadTimeDays),
  machineHoursPerWeek: numberBox(shopSettings.shape.machineHoursPerWeek),
  timeZone: shopSettings.shape.timeZone,
  closedWeekdays: shopSettings.shape.closedWeekdays,
  holidays: z.string().transform((text, context) => {
    const parsed = shopSettings.shape.holidays.safeParse(closedDaysOf(text));
    if (parsed.success) return parsed.data;
    context.addIssue({ code: 'custom', message: joinedMessages(parsed.error.issues.map((issue) => issue.message)) });
    return z.NEVER;
  }),
});
type SettingsFieldsInput = z.input<typeof settingsFields>;

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
  const update = useUpdateSettings();
  const { register, watch, setValue, setError, formState, handleSubmit } = useForm<
    SettingsFieldsInput,
    unknown,
    ShopSettings
  >({
    resolver: zodResolver(settingsFields),
    defaultValues: {
      ...(Object.fromEntries(fields.map(({ key }) => [key, String(settings[key])])) as Record<Field, string>),
      timeZone: settings.timeZone,
      closedWeekdays: settings.closedWeekdays,
      holidays: settings.holidays.join('\n'),
    },
  });
  const errors = formState.errors;
  const closedWeekdays = watch('closedWeekdays');
  const holidayMessages = errors.holidays?.message?.split('\n') ?? [];
  const setField = <K extends keyof SettingsFieldsInput>(key: K, value: SettingsFieldsInput[K]) =>
    setValue(key as FieldPath<SettingsFieldsInput>, value, { shouldValidate: formState.isSubmitted });

  /** The server's field messages beside their fields (every closed day's under the box), else one notice. */
  const showServerErrors = (error: Error) => {
    const serverFields = error instanceof ApiError ? Object.entries(error.fields ?? {}) : [];
    const holidayRefusals = serverFields.filter(([key]) => key.startsWith('holidays')).map(([, message]) => message);
    if (holidayRefusals.length) setError('holidays', { type: 'server', message: joinedMessages(holidayRefusals) });
    for (const [key, message] of serverFields)
      if (key in settingsFields.shape && key !== 'holidays')
        setError(key as keyof SettingsFieldsInput, { type: 'server', message });
    if (!serverFields.length) setError('root.server', { type: 'server', message: error.message });
  };

  return (
    <form
      className="grid gap-5"
      aria-label="Shop settings"
      noValidate
      onSubmit={handleSubmit((values) => update.mutate(values, { onSuccess: onSaved, onError: showServerErrors }))}
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
            value={watch(key)}
            error={errors[key]?.message}
            isReadOnly={!canEdit}
            onChange={(value) => setField(key, value)}
          />
        ))}
      </div>
      <fieldset className="grid gap-4 sm:grid-cols-2">
        <legend className="mb-1 text-base font-semibold">The shop’s days</legend>
        <label className="grid text-sm font-medium">
          Time zone
          <input
            className={inputClassName}
            readOnly={!canEdit}
            aria-invalid={errors.timeZone ? true : undefined}
            {...register('timeZone')}
          />
          <span className="mt-1 text-xs font-normal text-walnut-500">
            Where the shop is, like America/Chicago: “today” and “overdue” follow its clock.
          </span>
          {errors.timeZone && <span className="text-sm font-normal text-madder-700">{errors.timeZone.message}</span>}
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
                    setField(
                      'closedWeekdays',
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
          {errors.closedWeekdays && <span className="text-sm text-madder-700">{errors.closedWeekdays.message}</span>}
        </fieldset>
        <label className="grid text-sm font-medium sm:col-span-2">
          Holidays and other closed days
          <textarea
            rows={3}
            className={`${inputClassName} py-2`}
            readOnly={!canEdit}
            aria-invalid={holidayMessages.length ? true : undefined}
            placeholder="2026-12-25"
            {...register('holidays')}
          />
          <span className="mt-1 text-xs font-normal text-walnut-500">
            One day a line, as YYYY-MM-DD. Lead times and ready dates step over these and the closed days above.
          </span>
          {holidayMessages.map((message) => (
            <span key={message} className="text-sm font-normal text-madder-700">
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
      {errors.root?.server?.message && <ErrorNotice message={errors.root.server.message} />}
    </form>
  );
}
