import { useCallback, useMemo, useRef, useState } from 'react';
import type { DesignDocument } from '@server/contracts/designs.ts';
import type { SavedDesign } from '@server/contracts/saved-designs.ts';
import { Link, useParams } from 'react-router-dom';
import { ApiError } from '@ui/api-client.ts';
import { Button, ButtonLink } from '@ui/components/button.tsx';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { formatMoney, formatCustomerDate } from '@ui/format.ts';
import { signInHref } from '@ui/session/sign-in-href.ts';
import { useCurrentUser } from '@ui/session/get-current-user.ts';
import { useGarments } from '../../features/catalogue/api/get-garments.ts';
import { GarmentPicture } from '../../features/catalogue/components/garment-picture.tsx';
import { useSavedDesign } from '../../features/designer/api/get-saved-design.ts';
import { updateDesign } from '../../features/designer/api/update-design.ts';
import { createDesign } from '../../features/designer/api/create-design.ts';
import { useMotifs } from '../../features/catalogue/api/get-motifs.ts';
import { useFonts } from '../../features/catalogue/api/get-fonts.ts';
import { SizePicker } from '../../features/catalogue/components/size-picker.tsx';
import { createQuote } from '../../features/checkout/api/create-quote.ts';
import { QuoteLines } from '../../features/quote/components/quote-lines.tsx';
import { usePlaceOrder } from '../../features/checkout/api/place-order.ts';
import { CheckoutForm, type CheckoutFields } from '../../features/checkout/components/checkout-form.tsx';
import { QuantityField } from '../../features/checkout/components/quantity-field.tsx';
import { ShippingChoice } from '../../features/checkout/components/shipping-choice.tsx';
import type { ShippingMethod } from '@server/contracts/shipping.ts';
import { useCheckoutQuote, type OrderedDesign } from '../../features/checkout/hooks/use-checkout-quote.ts';
import { SafetyAcknowledgement } from '../../features/checkout/components/safety-acknowledgement.tsx';
import { paths } from '../../config/paths.ts';
// Straight from its module: the engine's entry also registers colour spaces at load, which checkout does not need.
import { needsSafetyAcknowledgement } from '@server/engine/garment-cautions.ts';

/** What the server said when it priced the order again (an expired quote, or a date that needs a rush). */
interface Repriced {
  quoteId: number;
  previousTotalCents: number;
  totalCents: number;
  currency: string;
  message: string;
}

const localToday = () => new Date().toLocaleDateString('en-CA');

function repricedOf(error: unknown): Repriced | undefined {
  if (!(error instanceof ApiError) || error.kind !== 'conflict' || typeof error.details?.quoteId !== 'number')
    return undefined;
  const { quoteId, previousTotalCents, totalCents, currency } = error.details as Omit<Repriced, 'message'>;
  return { quoteId, previousTotalCents, totalCents, currency, message: error.message };
}

export function CheckoutPage() {
  const { designId: rawId = '' } = useParams();
  const designId = /^[1-9]\d{0,9}$/.test(rawId) ? Number(rawId) : undefined;
  const me = useCurrentUser();
  const saved = useSavedDesign(me.data ? designId : undefined);
  const garments = useGarments();
  const motifs = useMotifs();
  const fonts = useFonts();
  const [quantity, setQuantity] = useState(1);
  const [neededBy, setNeededBy] = useState('');
  // Another size chosen here: the design carried to it, saved only when the order is placed.
  const [resized, setResized] = useState<{ sizeId: number; document: DesignDocument }>();
  const [resizeProblem, setResizeProblem] = useState<string>();
  const [isSavingDesign, setIsSavingDesign] = useState(false);
  // Which safety notes the customer ticked as read: a change of size or design brings new notes to read.
  const [readSafetyNotes, setReadSafetyNotes] = useState<string>();
  const ordered = useMemo<OrderedDesign | undefined>(
    () =>
      saved.data && {
        id: saved.data.id,
        garmentId: saved.data.garmentId,
        colourId: saved.data.colourId,
        sizeId: resized?.sizeId ?? saved.data.sizeId,
        document: resized?.document ?? saved.data.document,
      },
    [saved.data, resized],
  );
  // Unset until the customer chooses: the server then prices the shop's first way (delivery, when offered).
  const [shippingMethod, setShippingMethod] = useState<ShippingMethod>();
  const priced = useCheckoutQuote(ordered, quantity, false, shippingMethod);
  const readyDates = priced.quote?.readyDates;
  const isRush = readyDates !== undefined && neededBy !== '' && neededBy < readyDates.earliestReadyDate;
  const rushPriced = useCheckoutQuote(isRush ? ordered : undefined, quantity, true, shippingMethod);
  const shown = isRush ? rushPriced : priced;
  const place = usePlaceOrder();
  const [repriced, setRepriced] = useState<Repriced>();
  const lastFields = useRef<CheckoutFields>(undefined);
  const onNeededByChange = useCallback((date: string) => setNeededBy(date), []);

  if (me.isPending) return <Loading />;
  if (!me.data) {
    return (
      <div className="mx-auto max-w-md space-y-4 text-center">
        <h1 className="text-2xl font-semibold">Sign in to order</h1>
        <p className="text-walnut-700">
          Orders belong to an account, so we can send you the proof and keep you posted.
        </p>
        <ButtonLink href={signInHref(designId ? paths.checkout.href(designId) : paths.home.href())}>Sign in</ButtonLink>
      </div>
    );
  }
  if (designId === undefined) return <ErrorNotice message="That link does not point to one of your saved designs." />;
  if (saved.isError) return <ErrorNotice message={saved.error.message} onRetry={() => void saved.refetch()} />;
  if (garments.isError) return <ErrorNotice message={garments.error.message} onRetry={() => void garments.refetch()} />;
  if (!saved.data || !garments.data) return <Loading label="Getting your design ready to order…" />;
  const design = saved.data;
  const garment = garments.data.find((candidate) => candidate.id === design.garmentId);
  const sizeId = ordered?.sizeId ?? design.sizeId;
  const size = garment?.sizes.find((candidate) => candidate.id === sizeId);
  const colour = garment?.colours.find((candidate) => candidate.id === design.colourId);

  const changeSize = async (toSizeId: number) => {
    if (!garment || !motifs.data || !fonts.data) return;
    setResizeProblem(undefined);
    if (toSizeId === design.sizeId) return setResized(undefined);
    const { resizeDocument } = await import('../../features/designer/render/resize-document.ts');
    const document = await resizeDocument({
      garment,
      motifs: motifs.data,
      fonts: fonts.data,
      sizeId: design.sizeId,
      colourId: design.colourId,
      document: design.document,
      toSizeId,
    });
    setResized({ sizeId: toSizeId, document });
  };

  /** Keeps the design in the size chosen here; a design an earlier order stitches is kept, so this one is saved anew. */
  const saveResized = async (): Promise<SavedDesign> => {
    const request = {
      garmentId: design.garmentId,
      sizeId: resized!.sizeId,
      colourId: design.colourId,
      name: design.name,
      document: resized!.document,
    };
    try {
      return await updateDesign({ id: design.id, request });
    } catch (error) {
      if (error instanceof ApiError && error.kind === 'conflict') return createDesign(request);
      throw error;
    }
  };

  const cautions = shown.quote?.cautions ?? [];
  const needsSafetyTick = needsSafetyAcknowledgement(cautions);
  const safetyNotesKey = `${sizeId}:${cautions.map((caution) => caution.code).join(',')}`;
  const hasTickedSafety = needsSafetyTick && readSafetyNotes === safetyNotesKey;

  const submit = async (fields: CheckoutFields, quoteId = shown.quote?.quoteId) => {
    if (quoteId === undefined) return;
    lastFields.current = fields;
    // The way the shown price ships; the server checks the shop still offers it.
    const chosenShipping = shown.quote?.quote.shipping?.method;
    setRepriced(undefined);
    let designId = design.id;
    if (resized) {
      setIsSavingDesign(true);
      try {
        const kept = await saveResized();
        if (kept.id !== design.id) {
          designId = kept.id;
          quoteId = (
            await createQuote({
              designId,
              garmentId: kept.garmentId,
              sizeId: kept.sizeId,
              colourId: kept.colourId,
              document: kept.document,
              quantity,
              isRush,
              ...(chosenShipping ? { shippingMethod: chosenShipping } : {}),
            })
          ).quoteId;
        }
      } catch (error) {
        setResizeProblem(error instanceof Error ? error.message : 'Your design could not be saved in the new size.');
        return;
      } finally {
        setIsSavingDesign(false);
      }
    }
    place.mutate(
      {
        quoteId,
        designId,
        ...fields,
        ...(chosenShipping ? { shippingMethod: chosenShipping } : {}),
        ...(needsSafetyTick ? { hasReadSafetyNotes: hasTickedSafety } : {}),
      },
      {
        onSuccess: (started) => window.location.assign(started.checkoutUrl),
        onError: (error) => setRepriced(repricedOf(error)),
      },
    );
  };
  const serverFields = place.error instanceof ApiError ? place.error.fields : undefined;
  const quote = shown.quote;

  return (
    <div className="space-y-6">
      <div>
        {garment && (
          <Link
            to={paths.design.href(garment.slug, design.id)}
            className="text-sm text-walnut-500 hover:text-madder-600"
          >
            ← Back to the design
          </Link>
        )}
        <h1 className="mt-1 text-2xl font-semibold sm:text-3xl">Order “{design.name}”</h1>
      </div>
      <div className="grid items-start gap-6 lg:grid-cols-[minmax(0,3fr)_minmax(18rem,2fr)]">
        <section
          aria-labelledby="details-heading"
          className="min-w-0 rounded-card border border-linen-200 bg-white p-5 shadow-sm"
        >
          <h2 id="details-heading" className="sr-only">
            Your details
          </h2>
          <CheckoutForm
            readyDates={readyDates}
            today={localToday()}
            onNeededByChange={onNeededByChange}
            onSubmit={(fields) => void submit(fields)}
            serverFields={serverFields}
            shippingMethod={quote?.quote.shipping?.method}
            isSubmitting={place.isPending || isSavingDesign}
            canSubmit={quote !== undefined && !shown.isPricing && (!needsSafetyTick || hasTickedSafety)}
            summary={
              <div className="space-y-3">
                {quote && (
                  <SafetyAcknowledgement
                    cautions={cautions}
                    sizeLabel={size?.label}
                    needsTick={needsSafetyTick}
                    isTicked={hasTickedSafety}
                    onTick={(isTicked) => setReadSafetyNotes(isTicked ? safetyNotesKey : undefined)}
                  />
                )}
                {quote && (
                  <p className="text-base">
                    We will hold{' '}
                    <strong className="font-semibold">
                      {formatMoney(quote.quote.totalCents, quote.quote.currency)}
                    </strong>{' '}
                    on your card.
                  </p>
                )}
                {repriced && (
                  <div role="alert" className="rounded-lg border border-saffron-500 bg-saffron-100 p-4 text-sm">
                    <p className="font-semibold">The price has changed</p>
                    <p className="mt-1">{repriced.message}</p>
                    <p className="mt-1">
                      Was <s>{formatMoney(repriced.previousTotalCents, repriced.currency)}</s>, now{' '}
                      <strong>{formatMoney(repriced.totalCents, repriced.currency)}</strong>.
                    </p>
                    <Button
                      className="mt-3"
                      onClick={() => lastFields.current && void submit(lastFields.current, repriced.quoteId)}
                      disabled={place.isPending}
                    >
                      Confirm {formatMoney(repriced.totalCents, repriced.currency)} and pay
                    </Button>
                  </div>
                )}
                {place.isError && !repriced && (
                  <p role="alert" className="rounded-lg bg-madder-50 p-3 text-sm text-madder-700">
                    {place.error.message}
                  </p>
                )}
              </div>
            }
          />
        </section>
        <aside
          aria-labelledby="order-heading"
          className="min-w-0 space-y-4 rounded-card border border-linen-200 bg-white p-5 shadow-sm"
        >
          <h2 id="order-heading" className="text-lg font-semibold">
            Your order
          </h2>
          {garment && <GarmentPicture garment={garment} colourHex={colour?.hex} imageClassName="max-h-48" />}
          <p className="text-sm text-walnut-700">
            {garment?.name}, size {size?.label}, {colour?.name}.{' '}
            {garment && (
              <Link to={paths.design.href(garment.slug, design.id)} className="text-madder-600 underline">
                Change the design
              </Link>
            )}
          </p>
          {garment && motifs.data && fonts.data && (
            <SizePicker sizes={garment.sizes} selectedId={sizeId} onSelect={(id) => void changeSize(id)} />
          )}
          {resized && (
            <p className="text-sm text-walnut-500">
              Your design is carried to this size and saved that way when you order.
            </p>
          )}
          {resizeProblem && (
            <p role="alert" className="text-sm text-madder-700">
              {resizeProblem}
            </p>
          )}
          <QuantityField quantity={quantity} onChange={setQuantity} />
          <ShippingChoice
            shipping={quote?.quote.shipping}
            currency={quote?.quote.currency}
            chosen={shippingMethod}
            onChoose={setShippingMethod}
          />
          {serverFields?.shippingMethod && (
            <p role="alert" className="text-sm text-madder-700">
              {serverFields.shippingMethod}
            </p>
          )}
          <div aria-live="polite" className={shown.isPricing ? 'opacity-60' : ''}>
            <p role="status" className="text-sm text-walnut-500">
              {shown.isPricing ? 'Pricing…' : isRush ? 'Priced as a rush order' : ''}
            </p>
            {quote && <QuoteLines quote={quote.quote} caption="What the order costs" />}
          </div>
          {shown.error && <ErrorNotice message={shown.error.message} />}
          {quote && (
            <p className="text-xs text-walnut-500">This price is held until {formatCustomerDate(quote.expiresAt)}.</p>
          )}
        </aside>
      </div>
    </div>
  );
}
