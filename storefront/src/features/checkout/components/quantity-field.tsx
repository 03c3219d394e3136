import { useId } from 'react';

const MAX_QUANTITY = 50;

/** How many of the garment, each stitched the same; the price is worked out again on every change. */
export function QuantityField({ quantity, onChange }: { quantity: number; onChange: (quantity: number) => void }) {
  const id = useId();
  const set = (value: number) => onChange(Math.min(MAX_QUANTITY, Math.max(1, Math.round(value) || 1)));
  return (
    <div>
      <label htmlFor={id} className="text-sm font-medium">
        How many?
      </label>
      <div className="mt-1 flex items-center gap-2">
        <button
          type="button"
          aria-label="One fewer"
          onClick={() => set(quantity - 1)}
          disabled={quantity <= 1}
          className="h-11 w-11 rounded-full border border-linen-300 bg-white text-lg disabled:opacity-50"
        >
          −
        </button>
        <input
          id={id}
          type="number"
          inputMode="numeric"
          min={1}
          max={MAX_QUANTITY}
          value={quantity}
          onChange={(e) => set(Number(e.target.value))}
          className="h-11 w-20 rounded-lg border border-linen-300 bg-white text-center"
        />
        <button
          type="button"
          aria-label="One more"
          onClick={() => set(quantity + 1)}
          disabled={quantity >= MAX_QUANTITY}
          className="h-11 w-11 rounded-full border border-linen-300 bg-white text-lg disabled:opacity-50"
        >
          +
        </button>
      </div>
    </div>
  );
}
