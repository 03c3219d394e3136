import type { ProductionSheet } from '@server/contracts/production-sheet.ts';

/** The order the placements are stitched in, step by step, with the rule behind it. */
export function SewingOrderList({ sewingOrder }: { sewingOrder: ProductionSheet['sewingOrder'] }) {
  return (
    <>
      <p className="mb-3 text-sm text-walnut-700">{sewingOrder.rule}</p>
      <ol aria-label="Stitching steps" className="grid gap-1 text-sm">
        {sewingOrder.steps.map((step) => (
          <li key={step.order} className="flex gap-2">
            <strong className="w-6 shrink-0 text-right font-semibold tabular-nums">{step.order}.</strong>
            <span>{step.text}</span>
          </li>
        ))}
      </ol>
    </>
  );
}
