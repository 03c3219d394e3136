import { formatMoney } from '@ui/format.ts';

interface QuoteLinesProps {
  quote: { lines: { code: string; label: string; amountCents: number }[]; totalCents: number; currency: string };
  caption?: string;
}

/** The server's priced lines and the total, as a table: the same on the design page, at checkout and on an order. */
export function QuoteLines({ quote, caption = 'How the price is made up' }: QuoteLinesProps) {
  return (
    <table className="w-full text-sm">
      <caption className="sr-only">{caption}</caption>
      <tbody>
        {quote.lines.map((line, index) => (
          <tr key={`${line.code}-${index}`} className="border-t border-linen-200">
            <td className="py-1.5 pr-3">{line.label}</td>
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
