const weekFormat = new Intl.DateTimeFormat('en-US', { month: 'short', day: 'numeric', timeZone: 'UTC' });

/** "Nov 30": the Monday a week starts on. */
export const weekLabel = (weekStart: string) => weekFormat.format(new Date(`${weekStart}T00:00:00Z`));
