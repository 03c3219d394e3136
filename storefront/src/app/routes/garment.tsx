import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { buttonClassName } from '@ui/components/button.tsx';
import { formatLength } from '@ui/format.ts';
import { useGarments } from '../../features/catalog/api/get-garments.ts';
import { useMotifs } from '../../features/catalog/api/get-motifs.ts';
import { GarmentPicture } from '../../features/catalog/components/garment-picture.tsx';
import { SizePicker } from '../../features/catalog/components/size-picker.tsx';
import { FabricColourPicker } from '../../features/catalog/components/fabric-colour-picker.tsx';
import { BorderFitList } from '../../features/catalog/components/border-fit-list.tsx';
import { BorderPrice } from '../../features/quote/components/border-price.tsx';
import { paths } from '../../config/paths.ts';

export function GarmentPage() {
  const { slug } = useParams();
  const garments = useGarments();
  const motifs = useMotifs();
  const [colourId, setColourId] = useState<number>();
  const [sizeId, setSizeId] = useState<number>();
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
  const size = garment.sizes.find((s) => s.id === sizeId) ?? garment.sizes[0];
  const borders = motifs.data?.filter((motif) => motif.kind === 'border') ?? [];
  return (
    <div>
      <div className="grid gap-8 lg:grid-cols-[3fr_2fr]">
        <GarmentPicture garment={garment} colourHex={colour?.hex} className="min-h-96" imageClassName="max-h-[32rem]" />
        <div>
          <Link to={paths.home.href()} className="text-sm text-walnut-500 hover:text-madder-600">← All garments</Link>
          <h1 className="mt-2 text-3xl font-semibold">{garment.name}</h1>
          <p className="mt-3 text-walnut-700">{garment.description}</p>
          <Link to={paths.design.href(garment.slug)} className={`mt-5 ${buttonClassName()}`}>
            Design this garment
          </Link>
          <div className="mt-6">
            <FabricColourPicker colours={garment.colours} selected={colour} onSelect={setColourId} />
          </div>
          <div className="mt-6">
            <SizePicker sizes={garment.sizes} selectedId={size?.id} onSelect={setSizeId} />
          </div>
          {size && (
            <dl className="mt-4 grid grid-cols-2 gap-3 text-sm">
              <div className="rounded-lg bg-linen-100 p-3">
                <dt className="text-walnut-500">Front of the hem</dt>
                <dd className="font-medium">{size.hemFrontMm === null ? 'No hem border' : formatLength(size.hemFrontMm)}</dd>
              </div>
              <div className="rounded-lg bg-linen-100 p-3">
                <dt className="text-walnut-500">All the way round</dt>
                <dd className="font-medium">{size.hemCircumferenceMm === null ? 'No hem border' : formatLength(size.hemCircumferenceMm)}</dd>
              </div>
            </dl>
          )}
        </div>
      </div>

      <section aria-labelledby="borders-heading" className="mt-10">
        <h2 id="borders-heading" className="seam inline-block pb-2 text-xl font-semibold">Borders all the way round</h2>
        {!hasHem ? (
          <p className="mt-3 text-walnut-700">This piece takes a name or a single motif rather than a hem border.</p>
        ) : (
          <>
            <p className="mt-3 max-w-2xl text-sm text-walnut-700">
              A border is one little picture repeated end to end round the hem. We resize it very slightly so that whole
              repeats meet exactly at the back seam — never a cut-off duck. Here is how each border sits on size {size?.label}.
            </p>
            <div className="mt-4">
              {motifs.isPending && <Loading label="Laying out the borders…" />}
              {motifs.isError && <ErrorNotice message={motifs.error.message} onRetry={() => void motifs.refetch()} />}
              {motifs.isSuccess && borders.length === 0 && <EmptyState title="No borders are on offer just now." />}
              {size && borders.length > 0 && <BorderFitList
                  motifs={borders}
                  size={size}
                  fabricHex={colour?.hex}
                  priceOf={(motif) => <BorderPrice garment={garment} sizeId={size.id} colourId={colour?.id} motif={motif} />}
                />}
            </div>
          </>
        )}
      </section>
    </div>
  );
}
