import { Link, useParams } from 'react-router-dom';
import { ApiError } from '@ui/api-client.ts';
import { buttonClassName } from '@ui/components/button.tsx';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { useGarments } from '../../features/catalogue/api/get-garments.ts';
import { useMotifs } from '../../features/catalogue/api/get-motifs.ts';
import { useFonts } from '../../features/catalogue/api/get-fonts.ts';
import { useThreads } from '../../features/catalogue/api/get-threads.ts';
import { useSharedDesign } from '../../features/designs/api/get-shared-design.ts';
import { DesignDrawing } from '../../features/designs/components/design-drawing.tsx';
import { drawingOf } from '../../features/designs/model/design-drawing-layout.ts';
import { paths } from '../../config/paths.ts';

/** A design someone shared: drawn on its garment, read-only, with a way to start one's own. No canvas library loads. */
export function SharedDesignPage() {
  const { token = '' } = useParams();
  const shared = useSharedDesign(token);
  const garments = useGarments();
  const motifs = useMotifs();
  const fonts = useFonts();
  const threads = useThreads();
  const browse = (
    <Link to={paths.home.href()} className="inline-flex min-h-11 items-center text-madder-600 underline">
      See all our garments
    </Link>
  );

  if (shared.isError) {
    const isGone =
      shared.error instanceof ApiError && (shared.error.kind === 'not-found' || shared.error.kind === 'invalid');
    return (
      <div className="space-y-4">
        <h1 className="text-2xl font-semibold">A shared design</h1>
        <ErrorNotice
          message={
            isGone
              ? 'This link does not open a design: whoever shared it may have stopped sharing it.'
              : shared.error.message
          }
          onRetry={isGone ? undefined : () => void shared.refetch()}
        />
        {browse}
      </div>
    );
  }
  const failed = [garments, motifs, fonts, threads].find((query) => query.isError);
  if (failed) return <ErrorNotice message={failed.error!.message} onRetry={() => void failed.refetch()} />;
  if (!shared.data || !garments.data || !motifs.data || !fonts.data || !threads.data)
    return <Loading label="Opening the shared design…" />;

  const design = shared.data;
  const { garment, layout } = drawingOf(
    { garments: garments.data, motifs: motifs.data, fonts: fonts.data, threads: threads.data },
    design,
  );
  if (!garment || !layout) {
    return (
      <div className="space-y-4">
        <h1 className="text-2xl font-semibold">{design.name}</h1>
        <ErrorNotice message="This design is for a garment or size the studio no longer offers." />
        {browse}
      </div>
    );
  }
  const size = garment.sizes.find((candidate) => candidate.id === design.sizeId);
  const colour = garment.colours.find((candidate) => candidate.id === design.colourId);
  return (
    <div className="grid gap-8 lg:grid-cols-[3fr_2fr]">
      <div className="flex items-center justify-center rounded-card bg-linen-100 p-4">
        <DesignDrawing
          layout={layout}
          garment={garment}
          colourHex={colour?.hex}
          title={`${design.name}, drawn on the ${garment.name.toLowerCase()}`}
          className="max-h-[36rem] w-full"
        />
      </div>
      <div>
        <p className="text-sm font-medium uppercase tracking-wider text-sage-700">A design shared with you</p>
        <h1 className="mt-1 text-3xl font-semibold break-words">{design.name}</h1>
        <p className="mt-2 text-walnut-700">
          On the {garment.name.toLowerCase()}
          {size ? `, size ${size.label}` : ''}
          {colour ? `, in ${colour.name}` : ''}.
        </p>
        <h2 className="mt-6 font-semibold">What is on it</h2>
        <ul className="mt-2 list-disc space-y-1 pl-5 text-walnut-700">
          {layout.placements.map((placement) => (
            <li key={placement.id}>{placement.label}</li>
          ))}
        </ul>
        <p className="mt-6 text-sm text-walnut-500">
          This is a look-only copy: nothing here can be changed or ordered.
        </p>
        <div className="mt-4 flex flex-wrap items-center gap-4">
          <Link to={paths.design.href(garment.slug)} className={buttonClassName()}>
            Design your own {garment.name.toLowerCase()}
          </Link>
          {browse}
        </div>
      </div>
    </div>
  );
}
