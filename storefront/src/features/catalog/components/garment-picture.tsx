import type { GarmentSummary } from '@server/contracts/catalog.ts';

/**
 * The garment's outline drawing in a fabric colour. Each drawing paints its fabric with `currentColor`, so setting the
 * root element's `color` dyes it. It is shown through an <img> from a data URL, so any markup in it stays inert.
 */
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
  const dyed = colourHex
    ? garment.mockupSvg.replace(/<svg\b[^>]*>/, (root) => root.replace(/\scolor="[^"]*"/, '').replace(/^<svg/, `<svg color="${colourHex}"`))
    : garment.mockupSvg;
  const src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(dyed)}`;
  return (
    <div className={`flex items-center justify-center rounded-card bg-linen-100 p-4 ${className}`}>
      <img src={src} alt={`Drawing of the ${garment.name}`} className={`h-full w-auto drop-shadow-sm ${imageClassName}`} />
    </div>
  );
}
