import { Bar, BarChart, CartesianGrid, Legend, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { USAGE_FILLS } from './usage-colours';
import { formatCount, shortDay, type UsageChartData } from './usage-rows';

/** Loaded on its own (Recharts is large), after the key table is on screen. */
export default function UsageChart({ data }: { data: UsageChartData }) {
  return (
    <div className="h-72 w-full rounded-xl border border-ink-100 bg-paper-50 p-2" aria-hidden="true" data-usage-chart>
      <ResponsiveContainer width="100%" height="100%">
        <BarChart accessibilityLayer={false} data={data.rows} margin={{ top: 8, right: 8, bottom: 4, left: 0 }}>
          <CartesianGrid stroke="#d5e6e6" vertical={false} />
          <XAxis dataKey="day" tickFormatter={shortDay} stroke="#357174" fontSize={11} minTickGap={12} />
          <YAxis allowDecimals={false} tickFormatter={(v: number) => formatCount(v)} stroke="#357174" fontSize={11} width={48} />
          <Tooltip labelFormatter={(d) => shortDay(String(d))} formatter={(v) => (typeof v === 'number' ? formatCount(v) : String(v))} />
          <Legend verticalAlign="top" height={40} wrapperStyle={{ fontSize: 12 }} />
          {data.series.map((s, i) => (
            <Bar key={s.id} dataKey={s.id} name={s.label} stackId="calls" fill={USAGE_FILLS[i % USAGE_FILLS.length]} isAnimationActive={false} />
          ))}
        </BarChart>
      </ResponsiveContainer>
    </div>
  );
}
