import { z } from 'zod';
import { calendarDate } from './calendar-date.ts';

const minutes = (what: string) =>
  z
    .number({ error: `Enter ${what} in minutes` })
    .min(0, `${what} can't be negative`)
    .max(999, `${what} must be under 1,000 minutes`)
    .multipleOf(0.01, 'Use at most two decimal places');

/** Whether the runtime knows the IANA time zone (Intl refuses one it does not). */
const isKnownTimeZone = (zone: string) => {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
};

/** A day the shop is shut. */
const holiday = calendarDate({ format: 'Write each closed day as YYYY-MM-DD', unreal: 'That day does not exist' });

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
  /** Where the shop is, as an IANA zone (America/Chicago): the shop's day, and so "today" and "overdue", follow it. */
  timeZone: z
    .string({ error: 'Enter the shop’s time zone' })
    .trim()
    .min(1, 'Enter the shop’s time zone, like America/Chicago')
    .max(64, 'Use at most 64 characters')
    .refine(isKnownTimeZone, 'Use a time zone name like America/Chicago or Europe/London'),
  /** Days of the week the shop is shut, 0 Sunday to 6 Saturday: working-day counts step over them. */
  closedWeekdays: z
    .array(z.number().int().min(0, 'Choose days of the week').max(6, 'Choose days of the week'))
    .max(6, 'Keep at least one day of the week open')
    .refine((days) => new Set(days).size === days.length, 'Choose each day once'),
  /** Single days the shop is shut, such as holidays; working-day counts step over them too. */
  holidays: z.array(holiday).max(200, 'List at most 200 closed days'),
});
export type ShopSettings = z.infer<typeof shopSettings>;

export const shopSettingsResponse = z.object({ settings: shopSettings, canEdit: z.boolean() });
export type ShopSettingsResponse = z.infer<typeof shopSettingsResponse>;
