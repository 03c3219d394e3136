/** A calendar day (YYYY-MM-DD) as a person reads it in messages and e-mails: Tuesday, December 15. */
export function formatDayText(day: string): string {
  // Noon UTC of the day, shown in UTC: the calendar day itself, whatever zone the server runs in.
  return new Date(`${day}T12:00:00Z`).toLocaleDateString('en-US', {
    weekday: 'long',
    month: 'long',
    day: 'numeric',
    timeZone: 'UTC',
  });
}
