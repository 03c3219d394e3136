import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { formatLength } from '@ui/format.ts';
import { useGarments } from '../../features/catalog/api/get-garments.ts';
import { GarmentPicture } from '../../features/catalog/components/garment-picture.tsx';
import { paths } from '../../config/paths.ts';

export function GarmentPage() {
  const { slug } = useParams();
  const garments = useGarments();
  const [colourId, setColourId] = useState<number>();
  if (garments.isPending) return <Loading />;
  if (garments.isError) return <ErrorNotice message={garments.error.message} onRetry={() => void garments.refetch()} />;
  const garment = garments.data.find((g) => g.slug === slug);
  if (!garment) {
    return (
      <div>
        <ErrorNotice message="We could not find that garment; it may no longer be offered." />
        <Link to={paths.home.href()} className="mt-4 inline-block text-madder-600 underline">Back to all garments</Link>
      </div>
    );
  }
  const hasHem = garment.sizes.some((size) => size.hemCircumferenceMm !== null);
  const colour = garment.colours.find((c) => c.id === colourId) ?? garment.colours[0];
  return (
    <div className="grid gap-8 lg:grid-cols-[3fr_2fr]">
      <GarmentPicture garment={garment} colourHex={colour?.hex} className="min-h-96" imageClassName="max-h-[32rem]" />
      <div>
        <Link to={paths.home.href()} className="text-sm text-walnut-500 hover:text-madder-600">← All garments</Link>
        <h1 className="mt-2 text-3xl font-semibold">{garment.name}</h1>
        <p className="mt-3 text-walnut-700">{garment.description}</p>
        <fieldset className="mt-6">
          <legend className="font-medium">Fabric colour{colour ? `: ${colour.name}` : ''}</legend>
          <div className="mt-2 flex flex-wrap gap-2">
            {garment.colours.map((c) => (
              <button
                key={c.id}
                type="button"
                aria-pressed={c.id === colour?.id}
                aria-label={c.name}
                onClick={() => setColourId(c.id)}
                className="h-11 w-11 rounded-full border-2 border-white shadow ring-2 ring-linen-300 aria-pressed:ring-madder-500"
                style={{ backgroundColor: c.hex }}
              />
            ))}
          </div>
        </fieldset>
        <h2 className="mt-6 font-medium">Sizes and hem lengths</h2>
        <p className="text-sm text-walnut-500">
          {hasHem ? 'The hem length decides how many repeats of a border fit all the way round.' : 'This piece takes a name or a single motif rather than a hem border.'}
        </p>
        <table className="mt-2 w-full text-left text-sm">
          <thead className="text-walnut-500">
            <tr>
              <th className="py-1 font-medium">Size</th>
              <th className="py-1 font-medium">Front hem</th>
              <th className="py-1 font-medium">All the way round</th>
            </tr>
          </thead>
          <tbody>
            {garment.sizes.map((size) => (
              <tr key={size.id} className="border-t border-linen-200">
                <td className="py-2">{size.label}</td>
                <td className="py-2">{size.hemFrontMm === null ? '—' : formatLength(size.hemFrontMm)}</td>
                <td className="py-2">{size.hemCircumferenceMm === null ? '—' : formatLength(size.hemCircumferenceMm)}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </div>
    </div>
  );
}
