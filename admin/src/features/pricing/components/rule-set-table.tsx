import { formatStudioDate } from '@ui/format.ts';
import type { RuleSetSummary } from '@server/contracts/admin-pricing.ts';

const day = (iso: string | null) => (iso ? formatStudioDate(iso) : '—');

const statusLook: Record<RuleSetSummary['status'], { label: string; className: string }> = {
  draft: { label: 'Draft', className: 'bg-saffron-100 text-walnut-900' },
  published: { label: 'Published', className: 'bg-sage-50 text-sage-700' },
  retired: { label: 'Retired', className: 'bg-linen-100 text-walnut-500' },
};

/** Every price list version, newest first; choosing one opens it below. */
export function RuleSetTable({
  ruleSets,
  selectedId,
  onSelect,
}: {
  ruleSets: RuleSetSummary[];
  selectedId: number | undefined;
  onSelect: (id: number) => void;
}) {
  return (
    <div className="overflow-x-auto">
      <table className="w-full min-w-[34rem] text-left text-sm">
        <thead className="text-walnut-500">
          <tr>
            <th scope="col" className="py-1.5 font-medium">
              Version
            </th>
            <th scope="col" className="py-1.5 font-medium">
              Status
            </th>
            <th scope="col" className="py-1.5 font-medium">
              Started
            </th>
            <th scope="col" className="py-1.5 font-medium">
              Published
            </th>
            <th scope="col" className="py-1.5 text-right font-medium">
              Quotes priced
            </th>
          </tr>
        </thead>
        <tbody>
          {ruleSets.map((ruleSet) => (
            <tr
              key={ruleSet.id}
              className={`border-t border-linen-200 ${ruleSet.id === selectedId ? 'bg-linen-100' : ''}`}
            >
              <td className="py-2">
                <button
                  type="button"
                  className="font-semibold text-madder-700 underline-offset-2 hover:underline"
                  aria-current={ruleSet.id === selectedId ? 'true' : undefined}
                  onClick={() => onSelect(ruleSet.id)}
                >
                  Version {ruleSet.version}
                </button>
                {ruleSet.notes && (
                  <span className="block max-w-xs truncate text-xs text-walnut-500">{ruleSet.notes}</span>
                )}
              </td>
              <td className="py-2">
                <span
                  className={`rounded-full px-2 py-0.5 text-xs font-medium ${statusLook[ruleSet.status].className}`}
                >
                  {statusLook[ruleSet.status].label}
                </span>
              </td>
              <td className="py-2">
                {day(ruleSet.createdAt)}
                {ruleSet.createdByName ? ` by ${ruleSet.createdByName}` : ''}
              </td>
              <td className="py-2">{day(ruleSet.publishedAt)}</td>
              <td className="py-2 text-right tabular-nums">{ruleSet.quoteCount}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
