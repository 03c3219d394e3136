import type { GarmentSummary } from '@server/contracts/catalog.ts';

/**
 * The garment's outline drawing, tinted with a fabric colour. The drawing is shown through an <img> from a data URL,
 * so any markup in it stays inert.
 */
export function GarmentPicture({ garment, colourHex, className = '' }: { garment: GarmentSummary; colourHex?: string; className?: string }) {
  const src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(garment.mockupSvg)}`;
  return (
    <div className={`flex items-center justify-center rounded-card p-4 ${className}`} style={{ backgroundColor: colourHex ?? '#f8f1e4' }}>
      <img src={src} alt={`Drawing of the ${garment.name}`} className="h-full max-h-64 w-auto" />
    </div>
  );
}
