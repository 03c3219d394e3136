import { useId, useState, type MouseEvent } from 'react';
import { MAX_PROOF_PINS, type CustomerProof, type ProofPin } from '@server/contracts/orders.ts';
import { ApiError } from '@ui/api-client.ts';
import { Button } from '@ui/components/button.tsx';
import { useAnswerProof } from '../api/order-actions.ts';
import { ProofPins } from './proof-pins.tsx';

const round = (value: number) => Math.round(Math.min(100, Math.max(0, value)) * 10) / 10;

/**
 * Answering the latest proof: tap or click the picture to drop a pin and say what to change there (or add a pin
 * from the keyboard and set where it goes), add a comment, then approve or ask for the changes.
 */
export function ProofAnswerForm({
  number,
  proof,
}: {
  number: string;
  proof: CustomerProof & { imageUrl: string | null };
}) {
  const commentId = useId();
  const answer = useAnswerProof(number);
  const [pins, setPins] = useState<ProofPin[]>([]);
  const [comment, setComment] = useState('');
  // Approving with pins on the picture asks first: the pins either go with the approval or become a change request.
  const [isChoosing, setIsChoosing] = useState(false);
  const fields = answer.error instanceof ApiError ? (answer.error.fields ?? {}) : {};
  const isFull = pins.length >= MAX_PROOF_PINS;

  const addPin = (xPct: number, yPct: number) => {
    if (!isFull) setPins((current) => [...current, { xPct: round(xPct), yPct: round(yPct), comment: '' }]);
  };
  const dropPin = (event: MouseEvent<HTMLDivElement>) => {
    const box = event.currentTarget.getBoundingClientRect();
    addPin(((event.clientX - box.left) / box.width) * 100, ((event.clientY - box.top) / box.height) * 100);
  };
  const changePin = (index: number, change: Partial<ProofPin>) =>
    setPins((current) => current.map((pin, i) => (i === index ? { ...pin, ...change } : pin)));
  const send = (isApproved: boolean) =>
    answer.mutate({ version: proof.version, isApproved, answer: { comment, pins } });
  const approve = () => (pins.length > 0 ? setIsChoosing(true) : send(true));
  const notes = pins.length === 1 ? 'this note' : 'these notes';

  return (
    <div className="space-y-4">
      {proof.imageUrl && (
        <div className="relative cursor-crosshair overflow-hidden rounded-lg border border-linen-200" onClick={dropPin}>
          <img
            src={proof.imageUrl}
            alt={`Proof version ${proof.version}: click or tap to pin a comment`}
            className="block w-full"
          />
          <ProofPins pins={pins} tone="draft" />
        </div>
      )}
      <p className="text-sm text-walnut-500">
        Tap the picture where something should change to pin a comment there, or add a pin here and set where it goes.
      </p>
      <Button tone="quiet" onClick={() => addPin(50, 50)} disabled={isFull}>
        Add a pin
      </Button>
      {pins.length > 0 && (
        <ol className="space-y-3">
          {pins.map((pin, index) => (
            <li key={index} className="rounded-lg border border-linen-200 bg-linen-50 p-3">
              <p className="text-sm font-semibold">Pin {index + 1}</p>
              <div className="mt-2 flex flex-wrap gap-3 text-sm">
                <label className="flex items-center gap-2">
                  Across (%)
                  <input
                    type="number"
                    min={0}
                    max={100}
                    step={1}
                    value={pin.xPct}
                    onChange={(e) => changePin(index, { xPct: round(Number(e.target.value)) })}
                    className="w-20 rounded border border-linen-300 px-2 py-1"
                  />
                </label>
                <label className="flex items-center gap-2">
                  Down (%)
                  <input
                    type="number"
                    min={0}
                    max={100}
                    step={1}
                    value={pin.yPct}
                    onChange={(e) => changePin(index, { yPct: round(Number(e.target.value)) })}
                    className="w-20 rounded border border-linen-300 px-2 py-1"
                  />
                </label>
                <button
                  type="button"
                  className="text-madder-700 underline"
                  onClick={() => setPins((current) => current.filter((_, i) => i !== index))}
                >
                  Remove pin {index + 1}
                </button>
              </div>
              <label className="mt-2 block text-sm">
                What should change at pin {index + 1}?
                <input
                  value={pin.comment}
                  maxLength={300}
                  onChange={(e) => changePin(index, { comment: e.target.value })}
                  className="mt-1 block min-h-11 w-full rounded-lg border border-linen-300 bg-white px-3"
                />
              </label>
              {fields[`pins.${index}.comment`] && (
                <p className="mt-1 text-sm text-madder-700">{fields[`pins.${index}.comment`]}</p>
              )}
            </li>
          ))}
        </ol>
      )}
      <div>
        <label htmlFor={commentId} className="text-sm font-medium">
          A note to the studio (optional when approving)
        </label>
        <textarea
          id={commentId}
          value={comment}
          maxLength={2000}
          rows={3}
          onChange={(e) => setComment(e.target.value)}
          className="mt-1 block w-full rounded-lg border border-linen-300 bg-white p-3"
          aria-describedby={fields.comment ? `${commentId}-error` : undefined}
        />
        {fields.comment && (
          <p id={`${commentId}-error`} className="mt-1 text-sm text-madder-700">
            {fields.comment}
          </p>
        )}
      </div>
      {answer.isError && (
        <p role="alert" className="rounded-lg bg-madder-50 p-3 text-sm text-madder-700">
          {answer.error.message}
        </p>
      )}
      {isChoosing && pins.length > 0 ? (
        <div role="group" aria-labelledby={`${commentId}-choice`} className="space-y-3 rounded-lg bg-saffron-100 p-3">
          <p id={`${commentId}-choice`} className="text-sm">
            You pinned {pins.length === 1 ? 'a note' : `${pins.length} notes`} to the picture. Should we stitch the
            proof as it is and follow {notes}, or draw a new proof with the changes first?
          </p>
          <div className="flex flex-wrap gap-3">
            <Button onClick={() => send(true)} disabled={answer.isPending}>
              Approve with {notes}
            </Button>
            <Button tone="quiet" onClick={() => send(false)} disabled={answer.isPending}>
              Ask for changes and a new proof
            </Button>
            <Button tone="quiet" onClick={() => setIsChoosing(false)} disabled={answer.isPending}>
              Go back
            </Button>
          </div>
        </div>
      ) : null}
      <div className="flex flex-wrap gap-3">
        <Button onClick={approve} disabled={answer.isPending || isChoosing}>
          Approve this proof
        </Button>
        <Button
          tone="quiet"
          onClick={() => send(false)}
          disabled={answer.isPending || (pins.length === 0 && comment.trim() === '')}
        >
          Ask for {pins.length > 0 ? `${pins.length === 1 ? 'this change' : 'these changes'}` : 'changes'}
        </Button>
      </div>
      <p className="text-xs text-walnut-500">
        Approving lets us charge your card the order’s total and start stitching exactly what the proof shows.
      </p>
    </div>
  );
}
