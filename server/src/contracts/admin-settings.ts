import { z } from 'zod';

const minutes = (what: string) =>
  z
    .number({ error: `Enter ${what} in minutes` })
    .min(0, `${what} can't be negative`)
    .max(999, `${what} must be under 1,000 minutes`)
    .multipleOf(0.01, 'Use at most two decimal places');

/** The shop's pace and capacity: the run-time estimate of every quote and the Today page's capacity chart use them. */
export const shopSettings = z.object({
  machineStitchesPerMinute: z
    .number({ error: 'Enter the machine speed' })
    .int('Use a whole number of stitches a minute')
    .min(50, 'A machine sews at least 50 stitches a minute')
    .max(2_000, 'Use at most 2,000 stitches a minute'),
  minutesPerHooping: minutes('Time per hooping'),
  minutesPerColourChange: minutes('Time per colour change'),
  setupMinutes: minutes('Setup time'),
  leadTimeDays: z
    .number({ error: 'Enter the lead time' })
    .int('Use whole working days')
    .min(1, 'The lead time is at least 1 working day')
    .max(120, 'Use at most 120 working days'),
  machineHoursPerWeek: z
    .number({ error: 'Enter the machine hours' })
    .min(0.5, 'Use at least half an hour a week')
    .max(168, 'A week has 168 hours')
    .multipleOf(0.01, 'Use at most two decimal places'),
});
export type ShopSettings = z.infer<typeof shopSettings>;

export const shopSettingsResponse = z.object({ settings: shopSettings, canEdit: z.boolean() });
export type ShopSettingsResponse = z.infer<typeof shopSettingsResponse>;
