import { formatStudioDateTime } from '@ui/format.ts';
import type { OrderDetailResponse } from '@server/contracts/admin-orders.ts';
import { statusLabels } from '../../../lib/order-status-labels.ts';
import { eventLabel } from '../../../lib/order-event-labels.ts';

/** The order's history, oldest first, as a line of stitches down the page. */
export function OrderTimeline({ events }: { events: OrderDetailResponse['events'] }) {
  return (
    <ol className="relative ml-2 border-l-2 border-dashed border-madder-500/50">
      {events.map((event) => (
        <li key={event.id} className="relative pb-4 pl-5 last:pb-0">
          <span
            className="absolute -left-[7px] top-1.5 h-3 w-3 rounded-full border-2 border-white bg-madder-500"
            aria-hidden="true"
          />
          <p className="text-sm">
            <span className="font-medium">{eventLabel(event.type)}</span>
            {event.actorName && <span className="text-walnut-500"> · {event.actorName}</span>}
            {event.toStatus && event.toStatus !== event.fromStatus && (
              <span className="ml-2 rounded-full bg-linen-100 px-2 py-0.5 text-xs text-walnut-700">
                now: {statusLabels[event.toStatus]}
              </span>
            )}
          </p>
          {event.note && <p className="text-sm text-walnut-700">{event.note}</p>}
          <p className="text-xs text-walnut-500">
            <time dateTime={event.createdAt}>{formatStudioDateTime(event.createdAt)}</time>
          </p>
        </li>
      ))}
    </ol>
  );
}
