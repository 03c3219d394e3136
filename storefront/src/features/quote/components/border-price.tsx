import type { GarmentSummary, MotifSummary } from '@server/contracts/catalogue.ts';
import type { QuotePreviewRequest } from '@server/contracts/quotes.ts';
import { formatMoney } from '@ui/format.ts';
import { useQuotePreview } from '../api/preview-quote.ts';

/** The 1¾ in line above the hem edge where a border's centre commonly sits (common practice, no source). */
const HEM_OFFSET_MM = 44.45;

function borderRequest(
  garment: GarmentSummary,
  sizeId: number,
  colourId: number | undefined,
  motif: MotifSummary,
): QuotePreviewRequest {
  return {
    garmentId: garment.id,
    sizeId,
    ...(colourId === undefined ? {} : { colourId }),
    quantity: 1,
    isRush: false,
    document: {
      version: 1,
      placements: [
        {
          id: 'hem',
          kind: 'border',
          zone: 'hem',
          motif: motif.slug,
          run: 'circumference',
          hemOffsetMm: HEM_OFFSET_MM,
          threads: motif.threadCodes,
        },
      ],
    },
  };
}

/** The server's price for the garment with this border all the way round, with its lines on request. */
export function BorderPrice({
  garment,
  sizeId,
  colourId,
  motif,
}: {
  garment: GarmentSummary;
  sizeId: number;
  colourId: number | undefined;
  motif: MotifSummary;
}) {
  const preview = useQuotePreview(borderRequest(garment, sizeId, colourId, motif));
  if (preview.isPending)
    return (
      <p className="text-sm text-walnut-500" role="status">
        Pricing…
      </p>
    );
  if (preview.isError) return <p className="text-sm text-madder-700">{preview.error.message}</p>;
  const { quote, placements } = preview.data;
  const border = placements[0];
  return (
    <details className="group text-sm">
      <summary className="flex cursor-pointer list-none items-center justify-between gap-3 rounded-lg bg-linen-100 px-3 py-2">
        <span>
          <span className="font-semibold">{formatMoney(quote.totalCents, quote.currency)}</span>
          <span className="text-walnut-500"> for the {garment.name.toLowerCase()} with this border</span>
        </span>
        <span className="text-madder-600 group-open:hidden">How it's priced</span>
        <span className="hidden text-madder-600 group-open:inline">Hide</span>
      </summary>
      <table className="mt-2 w-full">
        <tbody>
          {quote.lines.map((line, index) => (
            <tr key={`${line.code}-${index}`} className="border-t border-linen-200">
              <td className="py-1 pr-3">{line.label}</td>
              <td className="py-1 text-right tabular-nums">{formatMoney(line.amountCents, quote.currency)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {border && (
        <p className="mt-2 text-xs text-walnut-500">
          About {border.stitches.toLocaleString('en-US')} stitches, sewn in {border.hoopings} hoopings (the fabric is
          clamped in a frame, stitched, then moved along for the next part of the border).
        </p>
      )}
    </details>
  );
}
