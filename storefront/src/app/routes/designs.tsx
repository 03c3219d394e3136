import { useState } from 'react';
import { Link } from 'react-router-dom';
import type { SavedDesign } from '@server/contracts/saved-designs.ts';
import { ButtonLink } from '@ui/components/button.tsx';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { useCurrentUser } from '@ui/session/get-current-user.ts';
import { signInHref } from '@ui/session/sign-in-href.ts';
import { useGarments } from '../../features/catalogue/api/get-garments.ts';
import { useMotifs } from '../../features/catalogue/api/get-motifs.ts';
import { useFonts } from '../../features/catalogue/api/get-fonts.ts';
import { useThreads } from '../../features/catalogue/api/get-threads.ts';
import { useDesigns } from '../../features/designs/api/get-designs.ts';
import { DesignCard } from '../../features/designs/components/design-card.tsx';
import { drawingOf } from '../../features/designs/model/design-drawing-layout.ts';
import { paths } from '../../config/paths.ts';

const shareLinkOf = (shareToken: string) => `${window.location.origin}${paths.shared.href(shareToken)}`;

export function DesignsPage() {
  const me = useCurrentUser();
  const designs = useDesigns({ enabled: Boolean(me.data) });
  const garments = useGarments();
  const motifs = useMotifs();
  const fonts = useFonts();
  const threads = useThreads();
  const [copied, setCopied] = useState<SavedDesign>();

  const heading = <h1 className="text-3xl font-semibold">My designs</h1>;
  if (me.isPending) return <Loading label="Checking whether you are signed in…" />;
  if (!me.data) {
    return (
      <div className="mx-auto max-w-md space-y-4 text-center">
        {heading}
        <p className="text-walnut-700">Sign in to see the designs you have saved.</p>
        <ButtonLink href={signInHref(paths.designs.href())}>Sign in</ButtonLink>
      </div>
    );
  }
  const failed = [designs, garments, motifs, fonts, threads].find((query) => query.isError);
  if (failed)
    return (
      <div className="space-y-4">
        {heading}
        <ErrorNotice message={failed.error!.message} onRetry={() => void failed.refetch()} />
      </div>
    );
  if (!designs.data || !garments.data || !motifs.data || !fonts.data || !threads.data)
    return (
      <div>
        {heading}
        <Loading label="Fetching your designs…" />
      </div>
    );
  const lists = { garments: garments.data, motifs: motifs.data, fonts: fonts.data, threads: threads.data };

  return (
    <div>
      {heading}
      <p className="mt-2 max-w-2xl text-walnut-700">
        Open a design to carry on, make a copy to try a variation, or share a link so family can see it.
      </p>
      <p role="status" className="mt-3 min-h-6 text-sm text-sage-700">
        {copied ? `Copied as “${copied.name}”: it is first in the list.` : ''}
      </p>
      {designs.data.length === 0 ? (
        <EmptyState title="You have not saved a design yet.">
          <Link to={paths.home.href()} className="inline-flex min-h-11 items-center text-madder-600 underline">
            Choose a garment to start one
          </Link>
        </EmptyState>
      ) : (
        <ul className="mt-4 grid gap-6 sm:grid-cols-2 lg:grid-cols-3">
          {designs.data.map((design) => {
            const { garment, layout } = drawingOf(lists, design);
            return (
              <DesignCard
                key={design.id}
                design={design}
                garment={garment}
                layout={layout}
                openHref={garment ? paths.design.href(garment.slug, design.id) : undefined}
                linkOf={shareLinkOf}
                onDuplicated={setCopied}
              />
            );
          })}
        </ul>
      )}
    </div>
  );
}
