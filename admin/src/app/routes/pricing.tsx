import { useState } from 'react';
import { Button } from '@ui/components/button.tsx';
import { EmptyState, ErrorNotice, Loading } from '@ui/components/page-state.tsx';
import { useRuleSets } from '../../features/pricing/api/get-rule-sets.ts';
import { useRuleSet } from '../../features/pricing/api/get-rule-set.ts';
import { useStartDraft } from '../../features/pricing/api/start-draft.ts';
import { RuleSetTable } from '../../features/pricing/components/rule-set-table.tsx';
import { RuleSetEditor } from '../../features/pricing/components/rule-set-editor.tsx';

export function PricingPage() {
  const list = useRuleSets();
  const [chosenId, setChosenId] = useState<number>();
  const startDraft = useStartDraft();
  const ruleSets = list.data?.ruleSets ?? [];
  // The draft when there is one, else the published list.
  const selectedId =
    chosenId ?? (ruleSets.find((r) => r.status === 'draft') ?? ruleSets.find((r) => r.status === 'published'))?.id;
  const detail = useRuleSet(selectedId);

  if (list.isPending) return <Loading label="Opening the price lists…" />;
  if (list.isError) return <ErrorNotice message={list.error.message} onRetry={() => void list.refetch()} />;
  const { canEdit } = list.data;
  const hasDraft = ruleSets.some((r) => r.status === 'draft');

  return (
    <div className="grid min-w-0 gap-6">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <div>
          <h1 className="text-2xl font-semibold">Pricing</h1>
          <p className="text-sm text-walnut-500">
            Price lists are versions: change a draft, see what it does to real quotes, then publish it.
          </p>
        </div>
        {canEdit && !hasDraft && (
          <Button
            disabled={startDraft.isPending}
            onClick={() => startDraft.mutate(undefined, { onSuccess: (created) => setChosenId(created.ruleSet.id) })}
          >
            {startDraft.isPending ? 'Starting…' : 'Start a new draft'}
          </Button>
        )}
      </div>
      {startDraft.isError && <ErrorNotice message={startDraft.error.message} />}
      <section className="min-w-0 rounded-card border border-linen-200 bg-white p-5">
        <h2 className="mb-3 text-lg font-semibold">Versions</h2>
        {ruleSets.length === 0 ? (
          <EmptyState title="No price lists yet." />
        ) : (
          <RuleSetTable ruleSets={ruleSets} selectedId={selectedId} onSelect={setChosenId} />
        )}
      </section>
      {selectedId !== undefined && (
        <section className="min-w-0 rounded-card border border-linen-200 bg-white p-5">
          {detail.isPending ? (
            <Loading label="Opening the price list…" />
          ) : detail.isError ? (
            <ErrorNotice message={detail.error.message} onRetry={() => void detail.refetch()} />
          ) : (
            <>
              <h2 className="mb-4 text-lg font-semibold">
                Version {detail.data.ruleSet.version}{' '}
                <span className="font-normal text-walnut-500">· {detail.data.ruleSet.status}</span>
              </h2>
              {/* Keyed by id and status, so the form starts afresh on another version or once a draft is published. */}
              <RuleSetEditor
                key={`${detail.data.ruleSet.id}-${detail.data.ruleSet.status}`}
                ruleSet={detail.data.ruleSet}
                canEdit={canEdit}
              />
            </>
          )}
        </section>
      )}
    </div>
  );
}
