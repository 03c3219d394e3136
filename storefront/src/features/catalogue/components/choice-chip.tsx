import type { ReactNode } from 'react';

/** A thumb-sized radio chip: a real radio input (arrow keys move within its group) drawn as a pill. */
export function ChoiceChip({
  name,
  value,
  checked,
  onSelect,
  children,
}: {
  name: string;
  value?: string | number;
  checked: boolean;
  onSelect: () => void;
  children: ReactNode;
}) {
  return (
    <label className="cursor-pointer">
      <input type="radio" name={name} value={value} checked={checked} onChange={onSelect} className="peer sr-only" />
      <span className="inline-flex min-h-11 items-center rounded-full border border-linen-300 bg-white px-4 text-sm peer-checked:border-madder-500 peer-checked:bg-madder-50 peer-checked:font-semibold peer-checked:text-madder-700 peer-focus-visible:outline-3 peer-focus-visible:outline-saffron-500">
        {children}
      </span>
    </label>
  );
}
