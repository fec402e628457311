import type { ReactElement } from 'react';
import { CartesianGrid, Legend, Line, LineChart, ReferenceArea, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { formatNumber } from '../units/format';
import { CHART_INK } from './chart-colours';
import type { PreparedSweep } from './sweep-rows';

export interface SweepPlotProps {
  chart: PreparedSweep;
  /** A fixed size (a document on the server); without one the plot fills its box. */
  size?: { width: number; height: number };
  /** The app's hover tooltip and HTML legend; a standalone document draws its own legend. */
  interactive?: boolean;
}

const tick = (v: number) => formatNumber(v, { significant: 3 });

/** The sweep lines, props only: the app and the server's SVG answer draw this same tree. */
export function SweepPlot({ chart, size, interactive = false }: SweepPlotProps) {
  const plot: ReactElement = (
    <LineChart
      accessibilityLayer={false}
      data={chart.rows}
      margin={{ top: 10, right: 16, bottom: 24, left: 12 }}
      {...(size ? { width: size.width, height: size.height } : {})}
    >
      <CartesianGrid stroke={CHART_INK.grid} />
      <XAxis
        dataKey="x"
        type="number"
        domain={['dataMin', 'dataMax']}
        tickFormatter={tick}
        label={{ value: chart.xLabel, position: 'insideBottom', offset: -14, fill: CHART_INK.label, fontSize: 12 }}
        stroke={CHART_INK.axis}
        fontSize={12}
      />
      <YAxis
        tickFormatter={tick}
        stroke={CHART_INK.axis}
        fontSize={12}
        width={64}
        label={{ value: chart.yLabel, angle: -90, position: 'insideLeft', fill: CHART_INK.label, fontSize: 12 }}
      />
      {chart.gaps.map((h) => (
        <ReferenceArea
          key={h.from}
          x1={h.from}
          x2={h.to === h.from ? h.from + 1e-9 : h.to}
          fill={CHART_INK.gapFill}
          fillOpacity={0.8}
          stroke={CHART_INK.gapEdge}
          strokeDasharray="3 3"
          className="chart-gap"
        />
      ))}
      {interactive && (
        <Tooltip
          formatter={(v) => (typeof v === 'number' ? formatNumber(v) : String(v))}
          labelFormatter={(v) => `${chart.input.label}: ${formatNumber(Number(v))} ${chart.input.unit}`}
        />
      )}
      {interactive && <Legend verticalAlign="top" height={28} />}
      {chart.series.map((s) => (
        <Line
          key={s.key}
          dataKey={s.key}
          name={s.name}
          stroke={s.look.stroke}
          strokeDasharray={s.look.dash}
          strokeWidth={2.25}
          dot={false}
          connectNulls={false}
          isAnimationActive={false}
          className={`chart-series chart-series-${s.key}`}
        />
      ))}
    </LineChart>
  );
  if (size) return plot;
  return (
    <ResponsiveContainer width="100%" height="100%">
      {plot}
    </ResponsiveContainer>
  );
}
