import { shippedWords, type OrderStatus } from '@server/contracts/order-status.ts';

interface Step {
  label: string;
  hint: string;
  /** Statuses in which this step is done. */
  doneIn: OrderStatus[];
  /** Statuses in which this step is the one under way. */
  currentIn: OrderStatus[];
}

const steps: Step[] = [
  {
    label: 'Card given',
    hint: 'Held or saved, nothing charged yet',
    doneIn: ['authorized', 'proof_sent', 'changes_requested', 'proof_approved', 'in_production', 'stitched', 'shipped'],
    currentIn: ['awaiting_payment'],
  },
  {
    label: 'Proof drawn',
    hint: 'We draw your design on the garment',
    doneIn: ['proof_sent', 'proof_approved', 'in_production', 'stitched', 'shipped'],
    currentIn: ['authorized', 'changes_requested'],
  },
  {
    label: 'You approve',
    hint: 'Or ask for changes',
    doneIn: ['proof_approved', 'in_production', 'stitched', 'shipped'],
    currentIn: ['proof_sent'],
  },
  {
    label: 'Stitching',
    hint: 'Your card is charged now',
    doneIn: ['stitched', 'shipped'],
    currentIn: ['proof_approved', 'in_production'],
  },
  {
    label: shippedWords.either,
    hint: 'Packed and posted, or handed over at the studio',
    doneIn: ['shipped'],
    currentIn: ['stitched'],
  },
];

/**
 * Where the order stands, as a row of stitched steps (a column on a phone): done steps filled, the current one
 * ringed. A cancelled or refunded order has no steps left, so it says so instead.
 */
export function OrderSteps({ status }: { status: OrderStatus }) {
  if (status === 'cancelled' || status === 'refunded') {
    return (
      <p className="rounded-card bg-linen-100 p-4 text-walnut-700">
        {status === 'cancelled' ? 'This order was cancelled.' : 'This order was refunded in full.'}
      </p>
    );
  }
  return (
    <ol aria-label="Where your order is" className="grid gap-3 sm:grid-cols-5 sm:gap-0">
      {steps.map((step, index) => {
        const isDone = step.doneIn.includes(status);
        const isCurrent = step.currentIn.includes(status);
        return (
          <li
            key={step.label}
            aria-current={isCurrent ? 'step' : undefined}
            className="relative flex items-center gap-3 sm:flex-col sm:text-center"
          >
            {index > 0 && (
              <span
                aria-hidden="true"
                className={`absolute hidden h-0.5 sm:right-1/2 sm:top-5 sm:block sm:w-full ${isDone || isCurrent ? 'seam' : 'bg-linen-300'}`}
              />
            )}
            <span
              aria-hidden="true"
              className={`relative z-10 flex h-10 w-10 shrink-0 items-center justify-center rounded-full border-2 text-sm font-semibold ${
                isDone
                  ? 'border-sage-700 bg-sage-700 text-white'
                  : isCurrent
                    ? 'border-madder-600 bg-white text-madder-700 ring-4 ring-madder-50'
                    : 'border-linen-300 bg-white text-walnut-500'
              }`}
            >
              {isDone ? '✓' : index + 1}
            </span>
            <span className="sm:mt-2">
              <span className={`block text-sm font-semibold ${isCurrent ? 'text-madder-700' : ''}`}>
                {step.label}
                <span className="sr-only">{isDone ? ' (done)' : isCurrent ? ' (now)' : ' (to come)'}</span>
              </span>
              <span className="block text-xs text-walnut-500">{step.hint}</span>
            </span>
          </li>
        );
      })}
    </ol>
  );
}
