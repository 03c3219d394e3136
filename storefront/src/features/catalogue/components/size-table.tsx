import type { GarmentDetail } from '@server/contracts/catalogue.ts';
import { formatLength } from '@ui/format.ts';

type SizeDetail = GarmentDetail['sizes'][number];

const lengthOrDash = (mm: number | null) => (mm === null ? '—' : formatLength(mm));

/**
 * Every size with the garment's own measurements, in millimetres and inches, the chosen size marked. The hem columns
 * show only on garments that take a hem border; the table scrolls sideways on a narrow phone rather than squeezing.
 */
export function SizeTable({
  garmentName,
  sizes,
  selectedId,
}: {
  garmentName: string;
  sizes: SizeDetail[];
  selectedId: number | undefined;
}) {
  const hasHem = sizes.some((size) => size.hemCircumferenceMm !== null);
  const hasChest = sizes.some((size) => size.chestMm !== null);
  const hasLength = sizes.some((size) => size.lengthMm !== null);
  const columns: { heading: string; cell: (size: SizeDetail) => string; isShown: boolean }[] = [
    { heading: 'Chest, all round', cell: (size) => lengthOrDash(size.chestMm), isShown: hasChest },
    { heading: 'Length', cell: (size) => lengthOrDash(size.lengthMm), isShown: hasLength },
    { heading: 'Hem, front', cell: (size) => lengthOrDash(size.hemFrontMm), isShown: hasHem },
    { heading: 'Hem, all round', cell: (size) => lengthOrDash(size.hemCircumferenceMm), isShown: hasHem },
  ];
  const shown = columns.filter((column) => column.isShown);
  if (shown.length === 0)
    return (
      <p className="text-sm text-walnut-700">One size fits as labelled; ask the studio if you need a measurement.</p>
    );
  return (
    <div
      role="region"
      aria-label={`Sizes of the ${garmentName.toLowerCase()}`}
      tabIndex={0}
      className="overflow-x-auto rounded-card border border-linen-200 bg-white"
    >
      <table className="w-full min-w-[34rem] text-left text-sm">
        <caption className="sr-only">
          Measurements of each size of the {garmentName.toLowerCase()}, in millimetres and inches
        </caption>
        <thead className="bg-linen-100 text-walnut-700">
          <tr>
            <th scope="col" className="px-3 py-2 font-medium">
              Size
            </th>
            {shown.map((column) => (
              <th key={column.heading} scope="col" className="px-3 py-2 font-medium">
                {column.heading}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {sizes.map((size) => {
            const isChosen = size.id === selectedId;
            return (
              <tr key={size.id} className={`border-t border-linen-200 ${isChosen ? 'bg-madder-50 font-medium' : ''}`}>
                <th scope="row" className="px-3 py-2 font-medium">
                  {size.label}
                  {isChosen && <span className="ml-2 text-xs font-normal text-madder-700"> (chosen)</span>}
                </th>
                {shown.map((column) => (
                  <td key={column.heading} className="whitespace-nowrap px-3 py-2">
                    {column.cell(size)}
                  </td>
                ))}
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}
