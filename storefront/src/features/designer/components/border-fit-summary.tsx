import { formatLength } from '@ui/format.ts';
import type { BorderLayout } from '../model/border-layout.ts';

/** The engine's fit for a border in words: how many repeats, how big each is stitched, or why it does not fit. */
export function borderFitWords(layout: BorderLayout): string {
  if (!layout.ok) return `Doesn't fit this size: ${layout.reason}`;
  const where = layout.isClosed ? 'all the way round' : 'across the front';
  const percent = Math.round(layout.fit.scale * 1000) / 10;
  return `${layout.fit.count} repeats ${where}, each ${formatLength(layout.fit.repeatWidthMm)} (${percent} % of its drawn size)`;
}

export function BorderFitSummary({ layout }: { layout: BorderLayout }) {
  return <p className={`text-sm ${layout.ok ? 'text-walnut-700' : 'text-madder-700'}`}>{borderFitWords(layout)}</p>;
}
