import { formatCustomerDate } from '@ui/format.ts';
import { useState } from 'react';
import type { CustomerProof } from '@server/contracts/orders.ts';
import { ProofAnswerForm } from './proof-answer-form.tsx';
import { ProofPins } from './proof-pins.tsx';
import { ProofPriceAndChanges } from './proof-price-and-changes.tsx';

const statusWords: Record<CustomerProof['status'], string> = {
  sent: 'Waiting for your answer',
  approved: 'You approved this one',
  changes_requested: 'You asked for changes',
  superseded: 'Replaced by a newer version',
};

const day = formatCustomerDate;

/** Every proof the studio sent, newest first to look at; the latest unanswered one takes an answer. */
export function ProofReview({
  number,
  proofs,
  currency,
}: {
  number: string;
  proofs: CustomerProof[];
  currency: string;
}) {
  const [shownVersion, setShownVersion] = useState(proofs.at(-1)?.version);
  const proof = proofs.find((p) => p.version === shownVersion) ?? proofs.at(-1);
  if (!proof) {
    return (
      <p className="text-walnut-700">
        Your proof is being drawn. We will e-mail you as soon as it is ready to look at.
      </p>
    );
  }
  return (
    <div className="space-y-4">
      {proofs.length > 1 && (
        <div role="group" aria-label="Proof versions" className="flex flex-wrap gap-2">
          {proofs.map((p) => (
            <button
              key={p.version}
              type="button"
              aria-pressed={p.version === proof.version}
              onClick={() => setShownVersion(p.version)}
              className={`min-h-11 rounded-full border px-4 text-sm font-medium ${p.version === proof.version ? 'border-madder-600 bg-madder-600 text-white' : 'border-linen-300 bg-white'}`}
            >
              Version {p.version}
            </button>
          ))}
        </div>
      )}
      <div>
        <h3 className="font-semibold">
          Version {proof.version} · {statusWords[proof.status]}
        </h3>
        <p className="text-sm text-walnut-500">
          Sent {day(proof.sentAt)} ·{' '}
          {proof.source === 'photo' ? 'a photo of a test stitch-out' : 'drawn to scale on your garment'}
        </p>
        {proof.message && <p className="mt-2 rounded-lg bg-linen-100 p-3 text-sm">“{proof.message}”</p>}
        <div className="mt-2">
          <ProofPriceAndChanges proof={proof} currency={currency} />
        </div>
      </div>
      {proof.isAnswerable ? (
        <ProofAnswerForm key={proof.version} number={number} proof={proof} />
      ) : (
        <>
          {proof.imageUrl ? (
            <div className="relative overflow-hidden rounded-lg border border-linen-200">
              <img src={proof.imageUrl} alt={`Proof version ${proof.version}`} className="block w-full" />
              <ProofPins pins={proof.pins} tone="saved" />
            </div>
          ) : (
            <p className="text-sm text-walnut-500">This version was sent without a picture.</p>
          )}
          {(proof.customerComment || proof.pins.length > 0) && (
            <div className="text-sm">
              <p className="font-medium">What you said</p>
              {proof.customerComment && <p>“{proof.customerComment}”</p>}
              <ol className="mt-1 list-decimal pl-5">
                {proof.pins.map((pin, index) => (
                  <li key={index}>{pin.comment}</li>
                ))}
              </ol>
            </div>
          )}
        </>
      )}
    </div>
  );
}
