import { formatStudioDate } from '@ui/format.ts';
import type { BoardOrder } from '@server/contracts/studio-orders.ts';

/** A due date (YYYY-MM-DD) as people read it. */
export const formatDueDay = (isoDay: string) => formatStudioDate(isoDay);

/** "Rush" and "Overdue" flags, in words as well as colour. */
export function DueFlags({ order }: { order: Pick<BoardOrder, 'isRush' | 'isOverdue'> }) {
  return (
    <>
      {order.isOverdue && (
        <span className="ml-1 rounded-full bg-madder-600 px-2 py-0.5 text-xs font-medium text-white">Overdue</span>
      )}
      {order.isRush && (
        <span className="ml-1 rounded-full bg-saffron-500 px-2 py-0.5 text-xs font-medium text-walnut-900">Rush</span>
      )}
    </>
  );
}
