import { useMemo, useState } from 'react';
import { Link, useLocation, useNavigate, useParams, useSearchParams } from 'react-router-dom';
import type {
  GarmentSummary,
  LetteringFontSummary,
  MotifSummary,
  ThreadColourSummary,
} from '@server/contracts/catalogue.ts';
import type { QuotePreviewRequest } from '@server/contracts/quotes.ts';
import type { SavedDesign } from '@server/contracts/saved-designs.ts';
import { ApiError } from '@ui/api-client.ts';
import { ButtonLink } from '@ui/components/button.tsx';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { signInHref } from '@ui/session/sign-in-href.ts';
import { useGarments } from '../../features/catalogue/api/get-garments.ts';
import { useMotifs } from '../../features/catalogue/api/get-motifs.ts';
import { useFonts } from '../../features/catalogue/api/get-fonts.ts';
import { useThreads } from '../../features/catalogue/api/get-threads.ts';
import { SizePicker } from '../../features/catalogue/components/size-picker.tsx';
import { FabricColourPicker } from '../../features/catalogue/components/fabric-colour-picker.tsx';
import { useSavedDesign } from '../../features/designer/api/get-saved-design.ts';
import { DesignerWorkspace } from '../../features/designer/components/designer-workspace.tsx';
import { useDesigner } from '../../features/designer/hooks/use-designer.ts';
import { useDesignSetting } from '../../features/designer/hooks/use-design-setting.ts';
import { useInitialDesign } from '../../features/designer/hooks/use-initial-design.ts';
import { useLetteringFontsReady } from '../../features/designer/hooks/use-lettering-fonts.ts';
import { DesignQuote } from '../../features/quote/components/design-quote.tsx';
import { DesignQuoteTotal } from '../../features/quote/components/design-quote-total.tsx';
import { ReadyDatesNote } from '../../features/quote/components/ready-dates-note.tsx';
import { paths } from '../../config/paths.ts';
import { usePageTitle } from '@ui/hooks/use-page-title.ts';
import { SHOP_TITLE } from '../../config/shop-title.ts';

interface Catalogue {
  garment: GarmentSummary;
  motifs: MotifSummary[];
  fonts: LetteringFontSummary[];
  threads: ThreadColourSummary[];
}

/** The designer once everything it needs has arrived: it composes the catalogue's pickers and the quote around it. */
function LoadedDesigner({
  garment,
  motifs,
  fonts,
  threads,
  saved: opened,
}: Catalogue & { saved: SavedDesign | undefined }) {
  const navigate = useNavigate();
  const { state: navigationState } = useLocation();
  usePageTitle(`Design your ${garment.name.toLowerCase()}`, SHOP_TITLE);
  const setting = useDesignSetting(garment, motifs, fonts);
  const designer = useDesigner(setting, useInitialDesign(garment, opened, navigationState));
  const [saved, setSaved] = useState(opened);
  const { sizeId, colourId, document } = designer.state;
  const request = useMemo<QuotePreviewRequest>(
    () => ({ garmentId: garment.id, sizeId, colourId, quantity: 1, isRush: false, document }),
    [garment.id, sizeId, colourId, document],
  );
  const onSaved = (design: SavedDesign) => {
    setSaved(design);
    // The address then opens this design, so a reload or a shared bookmark comes back to it.
    if (design.id !== saved?.id) void navigate(paths.design.href(garment.slug, design.id), { replace: true });
  };
  return (
    <DesignerWorkspace
      garment={garment}
      setting={setting}
      threads={threads}
      designer={designer}
      saved={saved}
      onSaved={onSaved}
      header={
        <div>
          <Link to={paths.garment.href(garment.slug)} className="text-sm text-walnut-500 hover:text-madder-600">
            ← {garment.name}
          </Link>
          <h1 className="mt-1 text-2xl font-semibold sm:text-3xl">Design your {garment.name.toLowerCase()}</h1>
          {saved && <p className="mt-1 text-sm text-walnut-500">Saved as “{saved.name}”</p>}
        </div>
      }
      garmentOptions={
        <div className="space-y-5">
          <SizePicker
            sizes={garment.sizes}
            selectedId={sizeId}
            onSelect={(id) => designer.dispatch('change-size', { sizeId: id })}
          />
          <FabricColourPicker
            colours={garment.colours}
            selected={garment.colours.find((colour) => colour.id === colourId)}
            onSelect={(id) => designer.dispatch('set-fabric-colour', { colourId: id })}
          />
        </div>
      }
      price={
        <>
          <DesignQuote request={request} />
          <ReadyDatesNote isRush={request.isRush} />
        </>
      }
      priceTotal={<DesignQuoteTotal request={request} />}
    />
  );
}

/** A saved design number from the address, or undefined when none is asked for. */
function designIdOf(raw: string | null): number | undefined | 'bad' {
  if (raw === null) return undefined;
  return /^[1-9]\d{0,9}$/.test(raw) ? Number(raw) : 'bad';
}

export function DesignPage() {
  const { slug } = useParams();
  const [params] = useSearchParams();
  const designId = designIdOf(params.get('design'));
  const garments = useGarments();
  const motifs = useMotifs();
  const fonts = useFonts();
  const threads = useThreads();
  const saved = useSavedDesign(typeof designId === 'number' ? designId : undefined);
  const isFontsReady = useLetteringFontsReady(fonts.data ?? []);
  const startAfresh = slug ? (
    <Link to={paths.design.href(slug)} className="mt-4 inline-block text-madder-600 underline">
      Start a new design instead
    </Link>
  ) : null;

  const failed = [garments, motifs, fonts, threads].find((query) => query.isError);
  if (failed) return <ErrorNotice message={failed.error!.message} onRetry={() => void failed.refetch()} />;
  if (!garments.data) return <Loading label="Setting out the garment…" />;
  const garment = garments.data.find((candidate) => candidate.slug === slug);
  if (!garment || garment.sizes.length === 0 || garment.colours.length === 0) {
    return (
      <div>
        <ErrorNotice message="We could not find that garment to design; it may no longer be offered." />
        <Link to={paths.home.href()} className="mt-4 inline-block text-madder-600 underline">
          Back to all garments
        </Link>
      </div>
    );
  }
  if (designId === 'bad') {
    return (
      <div>
        <ErrorNotice message="That link does not point to a saved design." />
        {startAfresh}
      </div>
    );
  }
  if (saved.isError) {
    const isSignedOut = saved.error instanceof ApiError && saved.error.kind === 'unauthenticated';
    return (
      <div className="space-y-4">
        <ErrorNotice
          message={isSignedOut ? 'Sign in to open your saved design.' : saved.error.message}
          onRetry={isSignedOut ? undefined : () => void saved.refetch()}
        />
        {isSignedOut && <ButtonLink href={signInHref(paths.design.href(garment.slug, designId))}>Sign in</ButtonLink>}
        <div>{startAfresh}</div>
      </div>
    );
  }
  if (saved.data && saved.data.garmentId !== garment.id) {
    const itsGarment = garments.data.find((candidate) => candidate.id === saved.data.garmentId);
    return (
      <div>
        <ErrorNotice message={`This saved design is for the ${itsGarment?.name.toLowerCase() ?? 'another garment'}.`} />
        {itsGarment && (
          <Link
            to={paths.design.href(itsGarment.slug, saved.data.id)}
            className="mt-4 inline-block text-madder-600 underline"
          >
            Open it on the {itsGarment.name.toLowerCase()}
          </Link>
        )}
      </div>
    );
  }
  if (!motifs.data || !fonts.data || !threads.data) return <Loading label="Laying out the threads and motifs…" />;
  if (designId !== undefined && saved.isPending) return <Loading label="Opening your saved design…" />;
  if (!isFontsReady) return <Loading label="Getting the lettering ready…" />;
  return (
    <LoadedDesigner
      key={garment.slug}
      garment={garment}
      motifs={motifs.data}
      fonts={fonts.data}
      threads={threads.data}
      saved={saved.data}
    />
  );
}
