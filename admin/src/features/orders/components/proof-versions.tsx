import { formatStudioDateTime } from '@ui/format.ts';
import type { OrderDetailResponse } from '@server/contracts/admin-orders.ts';
import { formatMoney } from '@ui/format.ts';

type Proof = OrderDetailResponse['proofs'][number];

const statusWords: Record<string, string> = {
  sent: 'Waiting for the customer',
  approved: 'Approved by the customer',
  changes_requested: 'Customer asked for changes',
  superseded: 'Replaced by a later version',
};

/** The picture with the customer's pins drawn where they pointed, numbered to match the comments below it. */
function PinnedPicture({ proof }: { proof: Proof }) {
  if (!proof.imageUrl)
    return <p className="rounded-md bg-linen-50 p-3 text-xs text-walnut-500">No picture was kept for this version.</p>;
  return (
    <figure className="relative overflow-hidden rounded-md border border-linen-200">
      <img
        src={proof.imageUrl}
        alt={`Proof ${proof.version}${proof.source === 'photo' ? ', a photo of the stitch-out' : ', the design drawn on the garment'}`}
        className="block h-auto w-full"
        loading="lazy"
      />
      {proof.commentPins.map((pin, index) => (
        <span
          key={index}
          aria-hidden="true"
          className="absolute flex h-7 w-7 -translate-x-1/2 -translate-y-1/2 items-center justify-center rounded-full border-2 border-white bg-madder-600 text-xs font-semibold text-white shadow"
          style={{ left: `${pin.xPct}%`, top: `${pin.yPct}%` }}
        >
          {index + 1}
        </span>
      ))}
    </figure>
  );
}

/** Every version sent, newest first, with what the customer said about it. */
export function ProofVersions({ proofs, currency }: { proofs: OrderDetailResponse['proofs']; currency: string }) {
  if (proofs.length === 0) return <p className="text-sm text-walnut-500">No proof sent yet.</p>;
  return (
    <ol className="grid gap-4" aria-label="Proof versions">
      {[...proofs].reverse().map((proof) => (
        <li key={proof.version} className="grid gap-2 rounded-lg bg-linen-100 p-3 text-sm">
          <div className="flex flex-wrap items-baseline justify-between gap-2">
            <p className="font-medium">
              Proof {proof.version} · {proof.source === 'photo' ? 'stitch-out photo' : 'drawing'}
            </p>
            <p className="text-xs text-walnut-500">Sent {formatStudioDateTime(proof.sentAt)}</p>
          </div>
          <p
            className={
              proof.status === 'changes_requested'
                ? 'font-medium text-madder-700'
                : proof.status === 'approved'
                  ? 'font-medium text-sage-700'
                  : 'text-walnut-700'
            }
          >
            {statusWords[proof.status] ?? proof.status}
          </p>
          {proof.status !== 'superseded' && <PinnedPicture proof={proof} />}
          {proof.message && <p className="text-walnut-700">“{proof.message}”</p>}
          {proof.price && proof.price.totalCents !== proof.price.previousTotalCents && (
            <p>
              Price with this proof: <strong>{formatMoney(proof.price.totalCents, currency)}</strong> (was{' '}
              {formatMoney(proof.price.previousTotalCents, currency)})
            </p>
          )}
          {proof.changes.length > 0 && (
            <ul className="list-disc pl-5" aria-label={`Changes in proof ${proof.version}`}>
              {proof.changes.map((change) => (
                <li key={change}>{change}</li>
              ))}
            </ul>
          )}
          {proof.customerComment && <p className="rounded-md bg-white p-2">Customer: {proof.customerComment}</p>}
          {proof.commentPins.length > 0 && (
            <ol className="grid gap-1" aria-label={`Comments on proof ${proof.version}`}>
              {proof.commentPins.map((pin, index) => (
                <li key={index} className="flex gap-2">
                  <span className="flex h-5 w-5 shrink-0 items-center justify-center rounded-full bg-madder-600 text-xs font-semibold text-white">
                    {index + 1}
                  </span>
                  {pin.comment}
                </li>
              ))}
            </ol>
          )}
        </li>
      ))}
    </ol>
  );
}
