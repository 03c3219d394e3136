import { Link } from 'react-router-dom';
import type { GarmentSummary } from '@server/contracts/catalogue.ts';
import { GarmentPicture } from './garment-picture.tsx';

export function GarmentCard({ garment, href }: { garment: GarmentSummary; href: string }) {
  return (
    <li className="group overflow-hidden rounded-card border border-linen-200 bg-white shadow-sm transition hover:-translate-y-0.5 hover:shadow-md">
      <Link to={href} className="block focus-visible:outline-none">
        <GarmentPicture garment={garment} colourHex={garment.colours[0]?.hex} className="aspect-[4/3] rounded-none" />
        <div className="p-4">
          <h3 className="text-lg font-semibold group-hover:text-madder-600">{garment.name}</h3>
          <p className="mt-1 line-clamp-2 text-sm text-walnut-500">{garment.description}</p>
          <div className="mt-3 flex items-center justify-between text-xs text-walnut-700">
            <span>
              Sizes {garment.sizes[0]?.label} – {garment.sizes.at(-1)?.label}
            </span>
            <span className="flex gap-1" aria-label={`${garment.colours.length} fabric colours`}>
              {garment.colours.map((colour) => (
                <span
                  key={colour.id}
                  title={colour.name}
                  className="h-4 w-4 rounded-full border border-walnut-900/15"
                  style={{ backgroundColor: colour.hex }}
                />
              ))}
            </span>
          </div>
        </div>
      </Link>
    </li>
  );
}
