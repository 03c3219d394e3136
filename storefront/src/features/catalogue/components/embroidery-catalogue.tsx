import { useId, useState, type ReactNode } from 'react';
import type { GarmentSummary, LetteringFontSummary, MotifSummary } from '@server/contracts/catalogue.ts';
import { EmptyState } from '@ui/components/page-state.tsx';
import { useLetteringFaces } from '@store/lib/load-lettering-faces.ts';
import { showsKind, type CatalogueFilter, type CatalogueKind } from '../model/catalogue-filter.ts';
import { garmentTakesLettering, motifSuitsGarment } from '../model/motif-suits-garment.ts';
import { MotifCard } from './motif-card.tsx';
import { FontSample } from './font-sample.tsx';

const SAMPLE_TEXT = 'Eliza Rose';
const MAX_SAMPLE_LENGTH = 40;

const sectionNames: Record<CatalogueKind, { title: string; plural: string; intro: string }> = {
  border: {
    title: 'Borders',
    plural: 'borders',
    intro: 'One small picture repeated end to end round a hem. We resize it a touch so whole repeats meet exactly.',
  },
  single: {
    title: 'Single motifs',
    plural: 'single motifs',
    intro: 'One picture on its own: on a yoke, a bib or a brim.',
  },
  lettering: {
    title: 'Lettering',
    plural: 'lettering fonts',
    intro: 'A name or a short word, stitched in one of these faces.',
  },
};

function CatalogueSection({
  kind,
  count,
  garmentName,
  onShowAll,
  children,
}: {
  kind: CatalogueKind;
  count: number;
  garmentName: string | undefined;
  onShowAll: () => void;
  children: ReactNode;
}) {
  const headingId = useId();
  const { title, plural, intro } = sectionNames[kind];
  return (
    <section aria-labelledby={headingId} className="mt-8">
      <h3 id={headingId} className="text-lg font-semibold">
        {title} <span className="text-sm font-normal text-walnut-500">({count})</span>
      </h3>
      <p className="mt-1 max-w-2xl text-sm text-walnut-700">{intro}</p>
      <div className="mt-4">
        {count > 0 ? (
          children
        ) : (
          <EmptyState
            title={
              garmentName
                ? `No ${plural} suit the ${garmentName.toLowerCase()}.`
                : `The studio has no ${plural} on offer right now.`
            }
          >
            {garmentName && (
              <button type="button" onClick={onShowAll} className="min-h-11 text-madder-600 underline">
                Show {plural} for every garment
              </button>
            )}
          </EmptyState>
        )}
      </div>
    </section>
  );
}

/**
 * The studio's embroidery by kind (border repeats, single motifs, lettering), narrowed by the filter to what suits
 * one garment. Stitch counts are explained once, in plain words, above the lists.
 */
export function EmbroideryCatalogue({
  garments,
  motifs,
  fonts,
  filter,
  onFilterChange,
}: {
  garments: GarmentSummary[];
  motifs: MotifSummary[];
  fonts: LetteringFontSummary[];
  filter: CatalogueFilter;
  onFilterChange: (filter: CatalogueFilter) => void;
}) {
  const [sample, setSample] = useState(SAMPLE_TEXT);
  const garment = garments.find((candidate) => candidate.slug === filter.garment);
  const suits = (motif: MotifSummary) => !garment || motifSuitsGarment(motif, garment);
  const ofKind = (kind: MotifSummary['kind']) => motifs.filter((motif) => motif.kind === kind && suits(motif));
  const shownFonts = !garment || garmentTakesLettering(garment) ? fonts : [];
  const showAll = () => onFilterChange({ ...filter, garment: undefined });
  const sectionProps = { garmentName: garment?.name, onShowAll: showAll };
  useLetteringFaces(showsKind(filter, 'lettering') && shownFonts.length > 0);

  return (
    <div>
      {(showsKind(filter, 'border') || showsKind(filter, 'single')) && (
        <p className="mt-4 max-w-2xl text-sm text-walnut-700">
          Every picture here is stitched from the studio's own machine file. Its{' '}
          <strong className="font-medium">stitch count</strong> is how many times the needle goes through the fabric:
          more stitches mean a fuller picture and a little longer on the machine.
        </p>
      )}
      {(['border', 'single'] as const)
        .filter((kind) => showsKind(filter, kind))
        .map((kind) => {
          const shown = ofKind(kind);
          return (
            <CatalogueSection key={kind} kind={kind} count={shown.length} {...sectionProps}>
              <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
                {shown.map((motif) => (
                  <MotifCard key={motif.id} motif={motif} />
                ))}
              </ul>
            </CatalogueSection>
          );
        })}
      {showsKind(filter, 'lettering') && (
        <CatalogueSection kind="lettering" count={shownFonts.length} {...sectionProps}>
          <label className="mb-4 flex max-w-sm flex-col gap-1.5 text-sm font-medium">
            Try a name
            <input
              value={sample}
              maxLength={MAX_SAMPLE_LENGTH}
              onChange={(event) => setSample(event.target.value)}
              className="min-h-11 rounded-lg border border-linen-300 bg-white px-3 text-base font-normal"
            />
          </label>
          <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
            {shownFonts.map((font) => (
              <FontSample key={font.id} font={font} sample={sample.trim() || font.name} />
            ))}
          </ul>
        </CatalogueSection>
      )}
    </div>
  );
}
