import { Bar, BarChart, CartesianGrid, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import type { AdminOverviewResponse } from '@server/contracts/admin-overview.ts';
import { formatMoney } from '@ui/format.ts';
import { weekLabel } from './week-label.ts';
import { WeeklyTable } from './weekly-table.tsx';

/** Takings per week: captured payments minus refunds, by the week the money moved. The table is the text alternative. */
export function RevenueChart({ revenue }: { revenue: AdminOverviewResponse['revenue'] }) {
  const { weeks, currency } = revenue;
  const money = (cents: number) => formatMoney(cents, currency);
  const rows = weeks.map((week) => ({ ...week, label: weekLabel(week.weekStart), net: week.netCents / 100 }));
  const total = weeks.reduce((sum, week) => sum + week.netCents, 0);
  const refunded = weeks.reduce((sum, week) => sum + week.refundedCents, 0);
  return (
    <figure className="grid gap-3">
      <figcaption className="text-sm text-walnut-700">
        {`${money(total)} taken over the last ${weeks.length} weeks`}
        {refunded ? `, after ${money(refunded)} of refunds.` : '.'}
      </figcaption>
      <div aria-hidden="true" className="h-56 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <BarChart accessibilityLayer={false} data={rows} margin={{ top: 16, right: 8, bottom: 0, left: 0 }}>
            <CartesianGrid stroke="#efe3cc" vertical={false} />
            <XAxis dataKey="label" tick={{ fontSize: 11 }} interval="preserveStartEnd" />
            <YAxis width={52} tick={{ fontSize: 12 }} tickFormatter={(value: number) => `$${value}`} />
            <ReferenceLine y={0} stroke="#7a6656" />
            <Tooltip
              formatter={(value) => money(Math.round(Number(value) * 100))}
              labelFormatter={(label) => `Week of ${label}`}
            />
            <Bar dataKey="net" name="Taken" fill="#9c4230" radius={[4, 4, 0, 0]} />
          </BarChart>
        </ResponsiveContainer>
      </div>
      <WeeklyTable
        summary="Takings as a table"
        columns={['Charged', 'Refunded', 'Taken']}
        rows={weeks.map((week) => ({
          weekStart: week.weekStart,
          cells: [
            money(week.capturedCents),
            week.refundedCents ? `−${money(week.refundedCents)}` : money(0),
            money(week.netCents),
          ],
        }))}
      />
    </figure>
  );
}
