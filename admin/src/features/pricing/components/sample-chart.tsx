import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatMoney } from '@ui/format.ts';

const colours = { published: '#7a6656', draft: '#9c4230' };

/** The sample totals as grouped bars, in currency units; decorative, as the table beside it holds the figures. */
export function SampleChart({
  rows,
  currency,
  publishedVersion,
}: {
  rows: { name: string; published: number; draft: number }[];
  currency: string;
  publishedVersion: number;
}) {
  return (
    <div aria-hidden="true" className="h-56 w-full">
      <ResponsiveContainer width="100%" height="100%">
        <BarChart accessibilityLayer={false} data={rows} margin={{ top: 8, right: 8, bottom: 0, left: 0 }}>
          <CartesianGrid stroke="#efe3cc" vertical={false} />
          <XAxis dataKey="name" tick={{ fontSize: 12 }} />
          <YAxis
            width={52}
            tick={{ fontSize: 12 }}
            allowDecimals={false}
            tickFormatter={(value: number) => `$${value}`}
          />
          <Tooltip formatter={(value) => formatMoney(Math.round(Number(value) * 100), currency)} />
          <Legend />
          <Bar
            dataKey="published"
            name={`Published (v${publishedVersion})`}
            fill={colours.published}
            radius={[4, 4, 0, 0]}
          />
          <Bar dataKey="draft" name="This draft" fill={colours.draft} radius={[4, 4, 0, 0]} />
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
