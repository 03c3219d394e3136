import { formatCustomerDateTime } from '@ui/format.ts';
import type { CustomerOrderResponse } from '@server/contracts/orders.ts';

const when = formatCustomerDateTime;

/** Everything that happened to the order, newest last, in the server's words. */
export function OrderTimeline({ timeline }: { timeline: CustomerOrderResponse['timeline'] }) {
  return (
    <ol className="space-y-3 border-l-2 border-dashed border-linen-300 pl-5">
      {timeline.map((entry) => (
        <li key={entry.id} className="relative">
          <span
            aria-hidden="true"
            className="absolute -left-[1.72rem] top-1.5 h-3 w-3 rounded-full border-2 border-madder-500 bg-white"
          />
          <p className="font-medium">{entry.title}</p>
          {entry.note && <p className="text-sm text-walnut-700">“{entry.note}”</p>}
          <p className="text-xs text-walnut-500">
            <time dateTime={entry.at}>{when(entry.at)}</time>
          </p>
        </li>
      ))}
    </ol>
  );
}
