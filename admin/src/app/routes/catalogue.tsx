import type { ReactNode } from 'react';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { useStudioCatalog } from '../../features/catalogue/api/get-studio-catalog.ts';
import { MotifTable } from '../../features/catalogue/components/motif-table.tsx';
import { HoopFields } from '../../features/catalogue/components/hoop-fields.tsx';
import { ThreadPalette } from '../../features/catalogue/components/thread-palette.tsx';
import { LetteringSamples } from '../../features/catalogue/components/lettering-samples.tsx';

function Panel({ title, note, children }: { title: string; note?: string; children: ReactNode }) {
  return (
    <section className="min-w-0 rounded-card border border-linen-200 bg-white p-5">
      <h2 className="text-lg font-semibold">{title}</h2>
      {note && <p className="mb-3 text-sm text-walnut-500">{note}</p>}
      {children}
    </section>
  );
}

export function CataloguePage() {
  const catalog = useStudioCatalog();
  if (catalog.isPending) return <Loading label="Opening the catalogue…" />;
  if (catalog.isError) return <ErrorNotice message={catalog.error.message} onRetry={() => void catalog.refetch()} />;
  const { motifs, threads, hoops, fonts } = catalog.data;
  return (
    <div className="grid min-w-0 gap-6">
      <h1 className="text-2xl font-semibold">Catalogue</h1>
      <Panel title="Motifs" note="Stitch counts are measured from each digitized file at 100 %; quotes scale them with the size.">
        {motifs.length ? <MotifTable motifs={motifs} threads={threads} /> : <EmptyState title="No motifs yet." />}
      </Panel>
      <div className="grid gap-6 lg:grid-cols-2">
        <Panel title="Hoops" note="Sewing fields, drawn to the same scale.">
          {hoops.length ? <HoopFields hoops={hoops} /> : <EmptyState title="No hoops yet." />}
        </Panel>
        <Panel title="Lettering">
          {fonts.length ? <LetteringSamples fonts={fonts} /> : <EmptyState title="No lettering fonts yet." />}
        </Panel>
      </div>
      <Panel title="Thread palette" note={`${threads.length} colours on the shelf.`}>
        {threads.length ? <ThreadPalette threads={threads} /> : <EmptyState title="No threads yet." />}
      </Panel>
    </div>
  );
}
