import { useId, useState } from 'react';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { useLocation, useNavigate } from 'react-router-dom';
import type { GarmentSummary } from '@server/contracts/catalogue.ts';
import { designName, type SaveDesignRequest, type SavedDesign } from '@server/contracts/saved-designs.ts';
import { ApiError } from '@ui/api-client.ts';
import { Button, ButtonLink } from '@ui/components/button.tsx';
import { useCurrentUser } from '@ui/session/get-current-user.ts';
import { signInHref } from '@ui/session/sign-in-href.ts';
import { useCreateDesign } from '../api/create-design.ts';
import { useUpdateDesign } from '../api/update-design.ts';
import type { DesignerState } from '../model/designer-state.ts';
import { paths } from '../../../config/paths.ts';

const MAX_NAME_LENGTH = 80;
/** The panel's one field; the garment, size, colour and document come from the designer. */
const saveDesignFields = z.object({ name: designName });

const requestOf = (garment: GarmentSummary, state: DesignerState, name: string): SaveDesignRequest => ({
  garmentId: garment.id,
  sizeId: state.sizeId,
  colourId: state.colourId,
  name: name.trim(),
  document: state.document,
});

/**
 * Saving for signed-in customers: the first save creates the design, later ones save over it. A visitor is offered
 * sign-in instead; the unsaved design waits in the tab meanwhile (see useDesignDraft).
 */
export function SaveDesignPanel({
  garment,
  state,
  saved,
  onSaved,
}: {
  garment: GarmentSummary;
  state: DesignerState;
  saved: SavedDesign | undefined;
  onSaved: (design: SavedDesign) => void;
}) {
  const nameId = useId();
  const location = useLocation();
  const navigate = useNavigate();
  const me = useCurrentUser();
  const create = useCreateDesign();
  const update = useUpdateDesign();
  const { register, watch, formState, setError, handleSubmit } = useForm({
    resolver: zodResolver(saveDesignFields),
    defaultValues: { name: saved?.name ?? `My ${garment.name.toLowerCase()}` },
  });
  const name = watch('name');
  const nameError = formState.errors.name?.message;
  // What was last saved, as this page sent it: the server's copy may order the same fields differently.
  const [savedAs, setSavedAs] = useState(() =>
    saved ? JSON.stringify(requestOf(garment, state, saved.name)) : undefined,
  );
  const request = requestOf(garment, state, name);
  const isSaved = savedAs === JSON.stringify(request);
  const mutation = saved ? update : create;
  const isOrdered = update.error instanceof ApiError && update.error.kind === 'conflict';

  const save = (asNew: boolean, then?: (design: SavedDesign) => void) => {
    const done = {
      onError: (error: Error) => {
        const message = error instanceof ApiError ? error.fields?.name : undefined;
        if (message) setError('name', { type: 'server', message });
      },
      onSuccess: (design: SavedDesign) => {
        setSavedAs(JSON.stringify(request));
        // A design saved anew after a refusal is the one to save over from now on; the refusal no longer applies.
        update.reset();
        onSaved(design);
        then?.(design);
      },
    };
    if (saved && !asNew) update.mutate({ id: saved.id, request }, done);
    else create.mutate(request, done);
  };
  // Ordering saves first, so the order stitches exactly the design as it stands.
  const orderIt = () => {
    const toCheckout = (design: SavedDesign) => void navigate(paths.checkout.href(design.id));
    if (saved && isSaved) toCheckout(saved);
    else save(false, toCheckout);
  };
  const submit = handleSubmit(() => save(false));

  return (
    <section aria-labelledby="save-heading" className="rounded-card border border-linen-200 bg-linen-100/60 p-5">
      <h2 id="save-heading" className="text-lg font-semibold">
        Keep this design
      </h2>
      {me.isPending ? (
        <p className="mt-2 text-sm text-walnut-500">Checking whether you are signed in…</p>
      ) : !me.data ? (
        <div className="mt-2 space-y-3 text-sm text-walnut-700">
          <p>Sign in to save your design, come back to it and order it. It stays right here while you do.</p>
          <ButtonLink href={signInHref(location.pathname + location.search)}>Sign in to save or order</ButtonLink>
        </div>
      ) : (
        <form onSubmit={submit} noValidate className="mt-3 space-y-3">
          <div>
            <label htmlFor={nameId} className="text-sm font-medium">
              Name this design
            </label>
            <input
              id={nameId}
              maxLength={MAX_NAME_LENGTH}
              aria-invalid={nameError ? true : undefined}
              aria-describedby={nameError ? `${nameId}-error` : undefined}
              className="mt-2 block min-h-11 w-full rounded-lg border border-linen-300 bg-white px-3"
              {...register('name')}
            />
            {nameError && (
              <p id={`${nameId}-error`} className="mt-1 text-sm text-madder-700">
                {nameError}
              </p>
            )}
          </div>
          <div className="flex flex-wrap items-center gap-3">
            <Button
              type="submit"
              disabled={isSaved || mutation.isPending || name.trim() === '' || state.document.placements.length === 0}
            >
              {mutation.isPending ? 'Saving…' : saved ? 'Save changes' : 'Save design'}
            </Button>
            <p role="status" className="text-sm text-sage-700">
              {isSaved && !mutation.isPending ? '✓ Saved' : ''}
            </p>
          </div>
          <Button
            tone="quiet"
            onClick={orderIt}
            disabled={mutation.isPending || name.trim() === '' || state.document.placements.length === 0 || isOrdered}
          >
            {isSaved ? 'Order this design' : 'Save and order'}
          </Button>
          {state.document.placements.length === 0 && (
            <p className="text-sm text-walnut-500">Add something to the garment to save it.</p>
          )}
          {mutation.isError && (
            <div role="alert" className="rounded-lg bg-madder-50 p-3 text-sm text-madder-700">
              <p>{mutation.error.message}</p>
              {isOrdered && (
                <Button tone="quiet" className="mt-2" onClick={() => save(true)}>
                  Save as a new design
                </Button>
              )}
            </div>
          )}
        </form>
      )}
    </section>
  );
}
