import { useSearchParams } from 'react-router-dom';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { useGarments } from '../../features/catalogue/api/get-garments.ts';
import { useMotifs } from '../../features/catalogue/api/get-motifs.ts';
import { useFonts } from '../../features/catalogue/api/get-fonts.ts';
import { GarmentCard } from '../../features/catalogue/components/garment-card.tsx';
import { CatalogueFilters } from '../../features/catalogue/components/catalogue-filters.tsx';
import { EmbroideryCatalogue } from '../../features/catalogue/components/embroidery-catalogue.tsx';
import {
  readCatalogueFilter,
  writeCatalogueFilter,
  type CatalogueFilter,
} from '../../features/catalogue/model/catalogue-filter.ts';
import { paths } from '../../config/paths.ts';

export function HomePage() {
  const garments = useGarments();
  const motifs = useMotifs();
  const fonts = useFonts();
  const [params, setParams] = useSearchParams();
  const filter = readCatalogueFilter(params);
  const setFilter = (next: CatalogueFilter) =>
    setParams(writeCatalogueFilter(params, next), { preventScrollReset: true });
  const embroideryFailure = [motifs, fonts].find((query) => query.isError);
  return (
    <div>
      <section className="rounded-card bg-linen-100 px-6 py-10 sm:px-10">
        <p className="text-sm font-medium uppercase tracking-wider text-sage-700">
          Stitched to order in our little studio
        </p>
        <h1 className="mt-2 max-w-2xl text-3xl font-semibold leading-tight sm:text-4xl">
          A keepsake border, a name, a tiny motif — designed by you on the very garment.
        </h1>
        <p className="mt-4 max-w-xl text-walnut-700">
          Pick a garment and its size, choose a border or a name, and see the price as you go. We send you a proof to
          approve before a single stitch is sewn.
        </p>
      </section>

      <h2 className="seam mt-10 inline-block pb-2 text-xl font-semibold">Choose a garment</h2>
      <div className="mt-6">
        {garments.isPending && <Loading label="Fetching the garments…" />}
        {garments.isError && <ErrorNotice message={garments.error.message} onRetry={() => void garments.refetch()} />}
        {garments.data?.length === 0 && (
          <EmptyState title="The studio has no garments on offer right now.">Please check back soon.</EmptyState>
        )}
        {garments.data && garments.data.length > 0 && (
          <ul className="grid gap-6 sm:grid-cols-2 lg:grid-cols-3">
            {garments.data.map((garment) => (
              <GarmentCard key={garment.id} garment={garment} href={paths.garment.href(garment.slug)} />
            ))}
          </ul>
        )}
      </div>

      <section aria-labelledby="embroidery-heading" className="mt-14">
        <h2 id="embroidery-heading" className="seam inline-block pb-2 text-xl font-semibold">
          Borders, motifs and lettering
        </h2>
        <div className="mt-6">
          {garments.data && <CatalogueFilters garments={garments.data} filter={filter} onChange={setFilter} />}
          {embroideryFailure && (
            <ErrorNotice message={embroideryFailure.error!.message} onRetry={() => void embroideryFailure.refetch()} />
          )}
          {!embroideryFailure && (motifs.isPending || fonts.isPending) && (
            <Loading label="Laying out the borders and motifs…" />
          )}
          {garments.data && motifs.data && fonts.data && (
            <EmbroideryCatalogue
              garments={garments.data}
              motifs={motifs.data}
              fonts={fonts.data}
              filter={filter}
              onFilterChange={setFilter}
            />
          )}
        </div>
      </section>
    </div>
  );
}
