import type { GarmentDetail } from '@server/contracts/catalogue.ts';
import { dyedMockupSrc } from '@store/lib/dyed-mockup.ts';

/** The garment from the front and, where the studio has drawn it, from the back, both in the chosen fabric colour. */
export function GarmentViews({ garment, colourHex }: { garment: GarmentDetail; colourHex: string | undefined }) {
  const views = [
    { side: 'Front', svg: garment.mockupSvg },
    ...(garment.mockupBackSvg ? [{ side: 'Back', svg: garment.mockupBackSvg }] : []),
  ];
  return (
    <div className={`grid items-start gap-3 ${views.length > 1 ? 'grid-cols-2' : ''}`}>
      {views.map((view) => (
        <figure key={view.side} className="flex flex-col rounded-card bg-linen-100 p-3 sm:p-4">
          <img
            src={dyedMockupSrc(view.svg, colourHex)}
            alt={`The ${garment.name.toLowerCase()} from the ${view.side.toLowerCase()}`}
            className="mx-auto max-h-[30rem] w-full object-contain drop-shadow-sm"
          />
          <figcaption className="mt-2 text-center text-sm font-medium text-walnut-700">{view.side}</figcaption>
        </figure>
      ))}
    </div>
  );
}
