import type { CustomerOrderResponse } from '@server/contracts/orders.ts';

type Placement = CustomerOrderResponse['design']['document']['placements'][number];

function describe(placement: Placement): string {
  switch (placement.kind) {
    case 'border':
      return placement.run === 'circumference'
        ? 'A border all the way round the hem'
        : 'A border along the front of the hem';
    case 'lettering':
      return `The name “${placement.text}”`;
    case 'motif':
      return 'A motif';
    case 'artwork':
      return 'Your own artwork';
  }
}

/** What is on the garment, in words, beside the garment's drawing. */
export function DesignSummary({ design }: { design: CustomerOrderResponse['design'] }) {
  return (
    <div className="text-sm">
      <p className="font-semibold">{design.name}</p>
      <p className="text-walnut-500">
        {design.garmentName}, {design.sizeLabel}, {design.colourName}
      </p>
      <ul className="mt-2 list-disc pl-5">
        {design.document.placements.map((placement) => (
          <li key={placement.id}>{describe(placement)}</li>
        ))}
      </ul>
    </div>
  );
}
