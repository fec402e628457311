import type { ReactElement } from 'react';
import { Bar, BarChart, CartesianGrid, LabelList, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from 'recharts';
import { formatNumber } from '../units/format';
import { CHART_INK } from './chart-colours';
import type { PreparedTornado } from './tornado-rows';

export interface TornadoPlotProps {
  chart: PreparedTornado;
  /** A fixed size (a document on the server); without one the plot fills its box. */
  size?: { width: number; height: number };
  /** Value axis title under the bars; the app states it in the caption instead. */
  axisTitle?: boolean;
}


/** The tornado bars, props only: the app and the server's SVG answer draw this same tree. */
export function TornadoPlot({ chart, size, axisTitle = false }: TornadoPlotProps) {
  const plot: ReactElement = (
    <BarChart
      accessibilityLayer={false}
      data={chart.rows}
      layout="vertical"
      margin={{ top: 8, right: 56, bottom: axisTitle ? 24 : 8, left: 8 }}
      barCategoryGap="22%"
      {...(size ? { width: size.width, height: size.height } : {})}
    >
      <CartesianGrid stroke={CHART_INK.grid} horizontal={false} />
      <XAxis
        type="number"
        domain={['auto', 'auto']}
        tickFormatter={(v: number) => formatNumber(v, { significant: 3 })}
        stroke={CHART_INK.axis}
        fontSize={12}
        {...(axisTitle ? { label: { value: chart.axisLabel, position: 'insideBottom', offset: -14, fill: CHART_INK.label, fontSize: 12 } } : {})}
      />
      <YAxis type="category" dataKey="label" width={150} stroke={CHART_INK.axis} fontSize={12} tick={{ fill: CHART_INK.text }} />
      <ReferenceLine
        x={chart.base}
        stroke={CHART_INK.baseLine}
        strokeWidth={2}
        strokeDasharray="4 3"
        label={{ value: 'as set', position: 'top', fill: CHART_INK.baseLabel, fontSize: 11 }}
      />
      <Bar dataKey="range" fill={CHART_INK.bar} isAnimationActive={false} radius={3} className="chart-bar">
        <LabelList
          dataKey="halfSwing"
          position="right"
          fontSize={11}
          fill={CHART_INK.text}
          formatter={(v) => (typeof v === 'number' ? `±${formatNumber(v, { significant: 2 })}` : '')}
        />
      </Bar>
    </BarChart>
  );
  if (size) return plot;
  return (
    <ResponsiveContainer width="100%" height="100%">
      {plot}
    </ResponsiveContainer>
  );
}
