import type { ReactNode } from 'react';
import { weekLabel } from './week-label.ts';

export interface WeeklyRow {
  weekStart: string;
  /** One figure per column after "Week of", already formatted. */
  cells: ReactNode[];
  /** Set on a week the chart marks (over capacity, say), so the table marks it too. */
  isMarked?: boolean;
}

/** A chart's figures as a table behind a disclosure: the text alternative for people who can't see the chart. */
export function WeeklyTable({ summary, columns, rows }: { summary: string; columns: string[]; rows: WeeklyRow[] }) {
  return (
    <details className="text-sm">
      <summary className="cursor-pointer text-walnut-700">{summary}</summary>
      <table className="mt-2 w-full text-left">
        <thead className="text-walnut-500">
          <tr>
            <th scope="col" className="py-1 font-medium">
              Week of
            </th>
            {columns.map((column) => (
              <th key={column} scope="col" className="py-1 text-right font-medium">
                {column}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr
              key={row.weekStart}
              className={`border-t border-linen-200 ${row.isMarked ? 'font-semibold text-madder-700' : ''}`}
            >
              <th scope="row" className="py-1 font-normal">
                {weekLabel(row.weekStart)}
              </th>
              {row.cells.map((cell, index) => (
                <td key={columns[index]} className="py-1 text-right tabular-nums">
                  {cell}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </details>
  );
}
