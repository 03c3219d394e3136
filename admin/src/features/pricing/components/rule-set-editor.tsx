import { useMemo, useState } from 'react';
import { useForm, type FieldErrors, type FieldPath } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import {
  pricingRules,
  updateDraftRequest,
  type RuleSetDetailResponse,
  type UpdateDraftRequest,
} from '@server/contracts/admin-pricing.ts';
import { ApiError } from '@ui/api-client.ts';
import { Button } from '@ui/components/button.tsx';
import { ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { usePricingPreview } from '../api/preview-pricing.ts';
import { usePublishRuleSet } from '../api/publish-rule-set.ts';
import { useSaveDraft } from '../api/save-draft.ts';
import { useDebouncedValue } from '@ui/hooks/use-debounced-value.ts';
import { fromRulesForm, isComplete, toRulesForm, type RulesForm } from '../model/rules-form.ts';
import { RulesFields } from './rules-fields.tsx';
import { SamplePreview } from './sample-preview.tsx';

type RuleSet = RuleSetDetailResponse['ruleSet'];

/** Field errors keyed by the form's own paths: the server names them "rules.<path>". */
function fieldErrorsOf(error: unknown): Record<string, string> {
  if (!(error instanceof ApiError) || !error.fields) return {};
  return Object.fromEntries(
    Object.entries(error.fields).map(([key, message]) => [key.replace(/^rules\./, ''), message]),
  );
}

/** The draft as the form holds it: the rules as typed (see RulesForm) and the notes, checked by the contract. */
const ruleSetFields = z.object({
  rules: z.custom<RulesForm>().transform(fromRulesForm).pipe(pricingRules),
  notes: z
    .string()
    .transform((notes) => notes.trim() || null)
    .pipe(updateDraftRequest.shape.notes),
});
type RuleSetFieldsInput = { rules: RulesForm; notes: string };

/** The form's messages for the rules, keyed by their paths as RulesFields names them ("lettering.minimumCents"). */
function messagesByPath(node: unknown, prefix = ''): Record<string, string> {
  if (!node || typeof node !== 'object') return {};
  const { message, type: _type, ref: _ref, types: _types, ...children } = node as Record<string, unknown>;
  const own = typeof message === 'string' && prefix ? { [prefix]: message } : {};
  return Object.entries(children).reduce<Record<string, string>>(
    (messages, [key, child]) => ({ ...messages, ...messagesByPath(child, prefix ? `${prefix}.${key}` : key) }),
    own,
  );
}

/**
 * One price list: its rules in a form (editable while it is a draft and the owner is signed in), the three sample
 * quotes repriced as the rules change, and saving and publishing for the owner.
 */
export function RuleSetEditor({ ruleSet, canEdit }: { ruleSet: RuleSet; canEdit: boolean }) {
  const isEditable = canEdit && ruleSet.status === 'draft';
  const { register, watch, setValue, setError, formState, handleSubmit } = useForm<
    RuleSetFieldsInput,
    unknown,
    UpdateDraftRequest
  >({
    resolver: zodResolver(ruleSetFields),
    defaultValues: { rules: toRulesForm(ruleSet.rules), notes: ruleSet.notes ?? '' },
  });
  const form = watch('rules');
  const notes = watch('notes');
  const [isConfirming, setIsConfirming] = useState(false);
  const save = useSaveDraft(ruleSet.id);
  const publish = usePublishRuleSet();

  const rules = useMemo(() => fromRulesForm(form), [form]);
  const settled = useDebouncedValue(rules, 350);
  const preview = usePricingPreview(isComplete(settled) ? settled : undefined);
  const isDirty = JSON.stringify(rules) !== JSON.stringify(ruleSet.rules) || (notes || null) !== ruleSet.notes;
  const formErrors: FieldErrors<RuleSetFieldsInput> = formState.errors;
  const previewErrors = fieldErrorsOf(preview.error);
  const errors = { ...previewErrors, ...messagesByPath(formErrors.rules) };
  const notesError = formErrors.notes?.message ?? previewErrors.notes;

  // The engine's own check names the whole price list ("rules"), not one input, so it is shown above the buttons.
  const showSaveErrors = (error: Error) => {
    const serverFields = fieldErrorsOf(error);
    const fields = Object.entries(serverFields).filter(([path]) => path !== 'rules');
    for (const [path, message] of fields)
      setError((path === 'notes' ? path : `rules.${path}`) as FieldPath<RuleSetFieldsInput>, {
        type: 'server',
        message,
      });
    if (!fields.length || 'rules' in serverFields) setError('root.server', { type: 'server', message: error.message });
  };
  const onSave = handleSubmit((draft) => save.mutate(draft, { onError: showSaveErrors }));

  return (
    <div className="grid gap-6 xl:grid-cols-[minmax(0,1fr)_30rem]">
      <form
        className="grid min-w-0 gap-4"
        aria-label={`Price list version ${ruleSet.version}`}
        noValidate
        onSubmit={(event) => {
          if (isEditable) void onSave(event);
          else event.preventDefault();
        }}
      >
        {!isEditable && (
          <p className="rounded-xl bg-linen-100 p-3 text-sm text-walnut-700">
            {ruleSet.status === 'draft'
              ? 'Only the studio owner can change this draft; you can still see how it would change the sample quotes.'
              : `Version ${ruleSet.version} is ${ruleSet.status}, so it stays as it is: quotes priced with it keep these prices. Changes go in a new draft.`}
          </p>
        )}
        <RulesFields
          form={form}
          onChange={(next) => setValue('rules', next, { shouldValidate: formState.isSubmitted })}
          errors={errors}
          isReadOnly={!isEditable}
        />
        <div className="grid gap-1">
          <label htmlFor="rule-set-notes" className="text-sm font-medium text-walnut-700">
            Notes for the studio
          </label>
          <textarea
            id="rule-set-notes"
            rows={2}
            readOnly={!isEditable}
            className="rounded-lg border border-linen-300 p-2.5"
            {...register('notes')}
          />
          {notesError && <p className="text-sm text-madder-700">{notesError}</p>}
        </div>
        {isEditable && (
          <div className="sticky bottom-0 flex flex-wrap items-center gap-3 border-t border-linen-200 bg-white/95 py-3">
            <Button type="submit" disabled={save.isPending || !isDirty}>
              {save.isPending ? 'Saving…' : 'Save draft'}
            </Button>
            {!isConfirming ? (
              <Button tone="quiet" disabled={isDirty || publish.isPending} onClick={() => setIsConfirming(true)}>
                Publish version {ruleSet.version}…
              </Button>
            ) : (
              <span
                role="group"
                aria-label="Confirm publishing"
                className="flex flex-wrap items-center gap-2 rounded-xl bg-saffron-100 px-3 py-2 text-sm"
              >
                New quotes will use version {ruleSet.version}; quotes already made keep theirs.
                <Button
                  className="min-h-9 px-4 py-1"
                  disabled={publish.isPending}
                  onClick={() => publish.mutate(ruleSet.id, { onSettled: () => setIsConfirming(false) })}
                >
                  {publish.isPending ? 'Publishing…' : `Yes, publish version ${ruleSet.version}`}
                </Button>
                <Button tone="quiet" className="min-h-9 px-4 py-1" onClick={() => setIsConfirming(false)}>
                  Not yet
                </Button>
              </span>
            )}
            {isDirty && <span className="text-sm text-walnut-500">Save the draft before publishing it.</span>}
            <span role="status" className="text-sm text-sage-700">
              {save.isSuccess && !isDirty ? 'Draft saved.' : ''}
            </span>
          </div>
        )}
        {formErrors.root?.server?.message && <ErrorNotice message={formErrors.root.server.message} />}
        {publish.isError && <ErrorNotice message={publish.error.message} />}
      </form>
      <section
        aria-labelledby="sample-quotes-heading"
        className="min-w-0 self-start rounded-card border border-linen-200 bg-linen-50 p-4 xl:sticky xl:top-4"
      >
        <h3 id="sample-quotes-heading" className="font-semibold">
          How these prices change three recent quotes
        </h3>
        <p className="mb-3 text-sm text-walnut-500">
          The smallest, a typical and the largest recent quote, priced again with the published list and with these
          rules.
        </p>
        {!isComplete(rules) ? (
          <p className="text-sm text-walnut-700">Fill in every amount to see the samples.</p>
        ) : preview.isPending ? (
          <Loading label="Pricing the samples…" />
        ) : preview.isError ? (
          <ErrorNotice message={preview.error.message} />
        ) : (
          <SamplePreview preview={preview.data} isUpdating={preview.isFetching || settled !== rules} />
        )}
      </section>
    </div>
  );
}
