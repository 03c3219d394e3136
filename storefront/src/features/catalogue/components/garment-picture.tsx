import type { GarmentSummary } from '@server/contracts/catalogue.ts';
import { dyedMockupSrc } from '@store/lib/dyed-mockup.ts';

/** The garment's outline drawing in a fabric colour. */
export function GarmentPicture({
  garment,
  colourHex,
  className = '',
  imageClassName = 'max-h-72',
}: {
  garment: GarmentSummary;
  colourHex?: string;
  className?: string;
  imageClassName?: string;
}) {
  return (
    <div className={`flex items-center justify-center rounded-card bg-linen-100 p-4 ${className}`}>
      <img
        src={dyedMockupSrc(garment.mockupSvg, colourHex)}
        alt={`Drawing of the ${garment.name}`}
        className={`h-full w-auto drop-shadow-sm ${imageClassName}`}
      />
    </div>
  );
}
