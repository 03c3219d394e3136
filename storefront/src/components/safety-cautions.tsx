import type { GuidanceMessageSummary } from '@server/contracts/guidance.ts';

/** The engine's note to the seller about local rules; a parent gets the line below the list instead. */
const SELLER_NOTE = 'caution.local-rules';

/** The look of a note by its weight, shared with the designer's stabilizer advice. */
export const severityLook = {
  info: 'border-sage-500/40 bg-sage-50',
  caution: 'border-saffron-500/50 bg-saffron-100',
  warning: 'border-madder-500/50 bg-madder-50',
} as const;
const severityWord = { info: 'Good to know', caution: 'Please take care', warning: 'Important' } as const;

/**
 * The server's safety notes for a garment, size and design, as a parent reads them: hazards first, each with its
 * weight in words (not only colour), and the shop's deferral to local rules after them. Shows nothing when only
 * the seller's note is there.
 */
export function SafetyCautions({
  cautions,
  heading,
  headingLevel = 'h3',
  className = '',
}: {
  cautions: readonly GuidanceMessageSummary[];
  heading: string;
  headingLevel?: 'h2' | 'h3';
  className?: string;
}) {
  const shown = cautions.filter((caution) => caution.code !== SELLER_NOTE);
  if (shown.length === 0) return null;
  const Heading = headingLevel;
  return (
    <section aria-label={heading} className={`space-y-2 text-sm ${className}`}>
      <Heading className="font-semibold">{heading}</Heading>
      <ul className="space-y-2">
        {shown.map((caution) => (
          <li key={caution.code} className={`rounded-lg border p-3 ${severityLook[caution.severity]}`}>
            <p className="font-medium">
              <span className="sr-only">{severityWord[caution.severity]}: </span>
              {caution.title}
            </p>
            <p className="mt-0.5 text-walnut-700">{caution.text}</p>
          </li>
        ))}
      </ul>
      <p className="text-xs text-walnut-500">
        These notes are general guidance, not a safety test or certificate. Please follow the children’s product rules
        where you live.
      </p>
    </section>
  );
}
