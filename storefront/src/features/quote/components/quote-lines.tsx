import type { QuoteLineShape } from '@server/contracts/quotes.ts';
import { formatMoney } from '@ui/format.ts';

interface QuoteLinesProps {
  quote: { lines: QuoteLineShape[]; totalCents: number; currency: string };
  caption?: string;
}

/** The unit rate beside a line's count, in words: "at $1.20 per 1,000 stitches (at least $5.00)". */
function rateWords(rate: NonNullable<QuoteLineShape['rate']>, currency: string): string {
  const money = (cents: number) => formatMoney(cents, currency);
  const minimum = rate.minimumCents ? ` (at least ${money(rate.minimumCents)} a garment)` : '';
  return `at ${money(rate.cents)} per ${rate.per}${minimum}`;
}

/**
 * The server's priced lines and the total, as a table: the same on the design page, at checkout and on an order.
 * Lines priced per unit show their rate under the count, so the price explains itself.
 */
export function QuoteLines({ quote, caption = 'How the price is made up' }: QuoteLinesProps) {
  return (
    <table className="w-full text-sm">
      <caption className="sr-only">{caption}</caption>
      <tbody>
        {quote.lines.map((line, index) => (
          <tr key={`${line.code}-${index}`} className="border-t border-linen-200 align-top">
            <td className="py-1.5 pr-3">
              {line.label}
              {line.rate && (
                <span className="block text-xs text-walnut-500">{rateWords(line.rate, quote.currency)}</span>
              )}
            </td>
            <td className="py-1.5 text-right tabular-nums">{formatMoney(line.amountCents, quote.currency)}</td>
          </tr>
        ))}
      </tbody>
      <tfoot>
        <tr className="border-t-2 border-walnut-900/20 text-base font-semibold">
          <th scope="row" className="pt-2 text-left">
            Total
          </th>
          <td className="pt-2 text-right tabular-nums">{formatMoney(quote.totalCents, quote.currency)}</td>
        </tr>
      </tfoot>
    </table>
  );
}
