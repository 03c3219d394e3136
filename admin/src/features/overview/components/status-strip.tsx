import { orderStatuses } from '@server/contracts/admin-overview.ts';
import { statusLabels } from '../../../lib/order-status-labels.ts';

/** One bar per status, its length the share of orders in that status: the day's workload at a glance. */
export function StatusStrip({ counts }: { counts: Record<string, number> }) {
  const largest = Math.max(1, ...orderStatuses.map((s) => counts[s] ?? 0));
  return (
    <ol className="grid gap-2" aria-label="Orders by status">
      {orderStatuses.map((status) => {
        const n = counts[status] ?? 0;
        return (
          <li key={status} className="grid grid-cols-[10rem_1fr_2.5rem] items-center gap-3 text-sm">
            <span className="text-walnut-700">{statusLabels[status]}</span>
            <span className="h-3 rounded-full bg-linen-200">
              <span className="block h-3 rounded-full bg-sage-500" style={{ width: `${(n / largest) * 100}%` }} />
            </span>
            <span className="text-right font-semibold tabular-nums">{n}</span>
          </li>
        );
      })}
    </ol>
  );
}
