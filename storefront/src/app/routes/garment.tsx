import { useState } from 'react';
import { Link, useParams } from 'react-router-dom';
import { ApiError } from '@ui/api-client.ts';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { buttonClassName } from '@ui/components/button.tsx';
import { useGarment } from '../../features/catalogue/api/get-garment.ts';
import { useMotifs } from '../../features/catalogue/api/get-motifs.ts';
import { GarmentViews } from '../../features/catalogue/components/garment-views.tsx';
import { SizePicker } from '../../features/catalogue/components/size-picker.tsx';
import { SizeTable } from '../../features/catalogue/components/size-table.tsx';
import { SafetyCautions } from '../../components/safety-cautions.tsx';
import { FabricColourPicker } from '../../features/catalogue/components/fabric-colour-picker.tsx';
import { BorderFitList } from '../../features/catalogue/components/border-fit-list.tsx';
import { MotifCard } from '../../features/catalogue/components/motif-card.tsx';
import { motifSuitsGarment } from '../../features/catalogue/model/motif-suits-garment.ts';
import { BorderPrice } from '../../features/quote/components/border-price.tsx';
import { paths } from '../../config/paths.ts';
import { usePageTitle } from '@ui/hooks/use-page-title.ts';
import { SHOP_TITLE } from '../../config/shop-title.ts';
import type { DesignStart } from '../../features/designer/model/design-start.ts';

export function GarmentPage() {
  const { slug = '' } = useParams();
  const garment = useGarment(slug);
  const motifs = useMotifs();
  const [colourId, setColourId] = useState<number>();
  const [sizeId, setSizeId] = useState<number>();
  usePageTitle(garment.data?.name, SHOP_TITLE);
  if (garment.isPending) return <Loading label="Fetching the garment…" />;
  if (garment.isError) {
    const isMissing =
      garment.error instanceof ApiError && (garment.error.kind === 'not-found' || garment.error.kind === 'invalid');
    return (
      <div>
        <ErrorNotice
          message={isMissing ? 'We could not find that garment; it may no longer be offered.' : garment.error.message}
          onRetry={isMissing ? undefined : () => void garment.refetch()}
        />
        <Link to={paths.home.href()} className="mt-4 inline-block text-madder-600 underline">
          Back to all garments
        </Link>
      </div>
    );
  }
  const { data } = garment;
  const hasHem = data.sizes.some((size) => size.hemCircumferenceMm !== null);
  const colour = data.colours.find((c) => c.id === colourId) ?? data.colours[0];
  const size = data.sizes.find((s) => s.id === sizeId) ?? data.sizes[0];
  const borders = motifs.data?.filter((motif) => motif.kind === 'border') ?? [];
  const singles = motifs.data?.filter((motif) => motif.kind === 'single' && motifSuitsGarment(motif, data)) ?? [];
  return (
    <div>
      <div className="grid gap-8 lg:grid-cols-[3fr_2fr]">
        <GarmentViews garment={data} colourHex={colour?.hex} />
        <div>
          <Link
            to={paths.home.href()}
            className="inline-flex min-h-11 items-center text-sm text-walnut-500 hover:text-madder-600"
          >
            ← All garments
          </Link>
          <h1 className="mt-1 text-3xl font-semibold">{data.name}</h1>
          <p className="mt-3 text-walnut-700">{data.description}</p>
          <Link
            to={paths.design.href(data.slug)}
            state={{ sizeId: size?.id, colourId: colour?.id } satisfies DesignStart}
            className={`mt-5 ${buttonClassName()}`}
          >
            Design this garment
          </Link>
          <div className="mt-6">
            <FabricColourPicker colours={data.colours} selected={colour} onSelect={setColourId} />
          </div>
          <div className="mt-6">
            <SizePicker sizes={data.sizes} selectedId={size?.id} onSelect={setSizeId} />
          </div>
          {size && (
            <SafetyCautions
              cautions={size.cautions}
              heading={`Safety notes for size ${size.label}`}
              headingLevel="h2"
              className="mt-6"
            />
          )}
        </div>
      </div>

      <section aria-labelledby="sizes-heading" className="mt-10">
        <h2 id="sizes-heading" className="seam inline-block pb-2 text-xl font-semibold">
          Sizes and measurements
        </h2>
        <p className="mt-3 max-w-2xl text-sm text-walnut-700">
          Measured on the garment laid flat: the chest all the way round and the length from the shoulder.
          {hasHem && ' The hem is measured along the line the border is stitched on.'}
        </p>
        <div className="mt-4">
          <SizeTable garmentName={data.name} sizes={data.sizes} selectedId={size?.id} />
        </div>
      </section>

      <section aria-labelledby="borders-heading" className="mt-10">
        <h2 id="borders-heading" className="seam inline-block pb-2 text-xl font-semibold">
          Borders all the way round
        </h2>
        {!hasHem ? (
          <p className="mt-3 text-walnut-700">This piece takes a name or a single motif rather than a hem border.</p>
        ) : (
          <>
            <p className="mt-3 max-w-2xl text-sm text-walnut-700">
              A border is one little picture repeated end to end round the hem. We resize it very slightly so that whole
              repeats meet exactly at the back seam — never a cut-off duck. Here is how each border sits on size{' '}
              {size?.label}.
            </p>
            <div className="mt-4">
              {motifs.isPending && <Loading label="Laying out the borders…" />}
              {motifs.isError && <ErrorNotice message={motifs.error.message} onRetry={() => void motifs.refetch()} />}
              {motifs.isSuccess && borders.length === 0 && <EmptyState title="No borders are on offer just now." />}
              {size && borders.length > 0 && (
                <BorderFitList
                  motifs={borders}
                  size={size}
                  fabricHex={colour?.hex}
                  priceOf={(motif) => (
                    <BorderPrice garment={data} sizeId={size.id} colourId={colour?.id} motif={motif} />
                  )}
                />
              )}
            </div>
          </>
        )}
      </section>

      <section aria-labelledby="motifs-heading" className="mt-10">
        <h2 id="motifs-heading" className="seam inline-block pb-2 text-xl font-semibold">
          Single motifs that suit it
        </h2>
        <div className="mt-4">
          {motifs.isPending && <Loading label="Finding the motifs…" />}
          {motifs.isSuccess && singles.length === 0 && (
            <EmptyState title={`No single motifs fit the ${data.name.toLowerCase()} just now.`} />
          )}
          {singles.length > 0 && (
            <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
              {singles.map((motif) => (
                <MotifCard key={motif.id} motif={motif} />
              ))}
            </ul>
          )}
        </div>
      </section>
    </div>
  );
}
