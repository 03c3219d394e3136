import {
  Bar,
  BarChart,
  CartesianGrid,
  Cell,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import type { AdminOverviewResponse } from '@server/contracts/admin-overview.ts';
import { weekLabel } from './week-label.ts';
import { WeeklyTable } from './weekly-table.tsx';

const hours = (value: number) => `${value.toLocaleString('en-US', { maximumFractionDigits: 2 })} h`;

/**
 * Machine hours booked for each coming week (orders not yet stitched, in the week they are due) against the
 * studio's weekly capacity; a week over capacity is drawn in red. The table below is the chart's text alternative.
 */
export function MachineHoursChart({ machineHours }: { machineHours: AdminOverviewResponse['machineHours'] }) {
  const { weeks, capacityHours } = machineHours;
  const rows = weeks.map((week) => ({
    ...week,
    label: weekLabel(week.weekStart),
    isOver: week.bookedHours > capacityHours,
  }));
  const busiest = rows.reduce((top, row) => (row.bookedHours > top.bookedHours ? row : top), rows[0]!);
  const total = rows.reduce((sum, row) => sum + row.bookedHours, 0);
  // Round ticks (every 2, 5 or 10 h) up to a little above the capacity line or the busiest week.
  const headroom = Math.max(busiest.bookedHours, capacityHours) * 1.1;
  const step = headroom <= 10 ? 2 : headroom <= 25 ? 5 : 10;
  const ticks = Array.from({ length: Math.ceil(headroom / step) + 1 }, (_, i) => i * step);
  return (
    <figure className="grid gap-3">
      <figcaption className="text-sm text-walnut-700">
        {total === 0
          ? `No machine time booked in the next ${rows.length} weeks; capacity is ${hours(capacityHours)} a week.`
          : `${hours(Math.round(total * 100) / 100)} booked over the next ${rows.length} weeks; the busiest is the week of ${busiest.label} with ${hours(busiest.bookedHours)} of ${hours(capacityHours)}.`}
      </figcaption>
      <div aria-hidden="true" className="h-56 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <BarChart accessibilityLayer={false} data={rows} margin={{ top: 16, right: 8, bottom: 0, left: 0 }}>
            <CartesianGrid stroke="#efe3cc" vertical={false} />
            <XAxis dataKey="label" tick={{ fontSize: 12 }} interval={0} />
            <YAxis width={40} tick={{ fontSize: 12 }} domain={[0, ticks.at(-1)!]} ticks={ticks} />
            <Tooltip formatter={(value) => hours(Number(value))} labelFormatter={(label) => `Week of ${label}`} />
            <ReferenceLine
              y={capacityHours}
              stroke="#d9a21b"
              strokeDasharray="6 4"
              strokeWidth={2}
              label={{
                value: `capacity ${hours(capacityHours)}`,
                position: 'insideTopRight',
                fontSize: 12,
                fill: '#4d3d32',
              }}
            />
            <Bar dataKey="bookedHours" name="Booked" radius={[4, 4, 0, 0]}>
              {rows.map((row) => (
                <Cell key={row.weekStart} fill={row.isOver ? '#9c4230' : '#6c8a66'} />
              ))}
            </Bar>
          </BarChart>
        </ResponsiveContainer>
      </div>
      <WeeklyTable
        summary="Machine hours as a table"
        columns={['Orders', 'Booked', 'Capacity']}
        rows={rows.map((row) => ({
          weekStart: row.weekStart,
          isMarked: row.isOver,
          cells: [row.orderCount, hours(row.bookedHours), hours(capacityHours)],
        }))}
      />
    </figure>
  );
}
