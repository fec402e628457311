import { useId, useMemo, useState } from 'react';
import { Bar, BarChart, CartesianGrid, LabelList, ReferenceLine, ResponsiveContainer, XAxis, YAxis } from 'recharts';
import { formatNumber } from '../../../../shared/units/format';
import { toDisplay, unitOf, type UnitSystem } from '../../../../shared/units/unit-systems';
import { ApiError } from '../../../lib/api-client';
import { useSensitivity } from '../api/get-sensitivity';
import type { ChartResult } from './sweep-chart';

interface TornadoChartProps {
  slug: string;
  version: string;
  inputs: Record<string, number>;
  system: UnitSystem;
  results: ChartResult[];
}

const PERCENTS = [5, 10, 20];

/** Which inputs move a chosen result most when each is moved by ± a percentage. */
export function TornadoChart({ slug, version, inputs, system, results }: TornadoChartProps) {
  const [resultKey, setResultKey] = useState(results[0]?.key ?? '');
  const [percent, setPercent] = useState(10);
  const resultId = useId();
  const percentId = useId();
  const query = useSensitivity({ slug, version, inputs, result: resultKey, percent }, resultKey !== '');
  const tornado = query.data?.tornado;

  const unit = tornado ? unitOf(tornado.result.quantity, system) : '';
  const rows = useMemo(() => {
    if (!tornado) return [];
    const q = tornado.result.quantity;
    const base = toDisplay(tornado.base, q, system);
    return tornado.bars.map((b) => {
      const low = b.low.value === null ? base : toDisplay(b.low.value, q, system);
      const high = b.high.value === null ? base : toDisplay(b.high.value, q, system);
      return { label: b.label, range: [Math.min(low, high), Math.max(low, high)] as [number, number], low, high, bar: b };
    });
  }, [tornado, system]);
  const base = tornado ? toDisplay(tornado.base, tornado.result.quantity, system) : 0;

  return (
    <section aria-labelledby="tornado-heading" className="grid gap-4">
      <h3 id="tornado-heading" className="text-lg font-extrabold text-ink-950">What moves the result most</h3>
      <div className="flex flex-wrap gap-4">
        <div className="min-w-48 flex-1">
          <label htmlFor={resultId} className="block text-sm font-bold text-ink-900">Result</label>
          <select id={resultId} value={resultKey} onChange={(e) => setResultKey(e.target.value)}
            className="mt-1.5 w-full rounded-lg border border-ink-200 bg-paper-50 px-3 py-2 text-base">
            {results.map((r) => (
              <option key={r.key} value={r.key}>{r.label}</option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor={percentId} className="block text-sm font-bold text-ink-900">Move each input by</label>
          <select id={percentId} value={percent} onChange={(e) => setPercent(Number(e.target.value))}
            className="mt-1.5 rounded-lg border border-ink-200 bg-paper-50 px-3 py-2 text-base">
            {PERCENTS.map((p) => (
              <option key={p} value={p}>± {p} %</option>
            ))}
          </select>
        </div>
      </div>
      {query.isError && (
        <p role="alert" className="rounded-lg bg-signal-50 p-3 text-sm text-ink-900">
          The ranking could not be made: {query.error instanceof ApiError ? query.error.problem.detail ?? query.error.message : 'the request failed.'}
        </p>
      )}
      {tornado && (
        <figure className={`grid gap-2 transition-opacity ${query.isPlaceholderData ? 'opacity-60' : ''}`} data-chart="tornado" aria-busy={query.isFetching}>
          <div className="w-full rounded-xl border border-ink-100 bg-paper-50 p-2" style={{ height: `${Math.max(160, rows.length * 44 + 60)}px` }} aria-hidden="true">
            <ResponsiveContainer width="100%" height="100%">
              <BarChart accessibilityLayer={false} data={rows} layout="vertical" margin={{ top: 8, right: 56, bottom: 8, left: 8 }} barCategoryGap="22%">
                <CartesianGrid stroke="#d5e6e6" horizontal={false} />
                <XAxis type="number" domain={['auto', 'auto']} tickFormatter={(v: number) => formatNumber(v, { significant: 3 })} stroke="#357174" fontSize={12} />
                <YAxis type="category" dataKey="label" width={150} stroke="#357174" fontSize={12} tick={{ fill: '#142e32' }} />
                <ReferenceLine x={base} stroke="#dd6a1f" strokeWidth={2} strokeDasharray="4 3" label={{ value: 'as set', position: 'top', fill: '#933f14', fontSize: 11 }} />
                <Bar dataKey="range" fill="#357174" isAnimationActive={false} radius={3}>
                  <LabelList dataKey="bar.swing" position="right" fontSize={11} fill="#142e32"
                    formatter={(v) => (typeof v === 'number' ? `±${formatNumber(toDisplay(v, tornado.result.quantity, system) / 2, { significant: 2 })}` : '')} />
                </Bar>
              </BarChart>
            </ResponsiveContainer>
          </div>
          <figcaption className="text-sm text-ink-800">
            {tornado.result.label} is {formatNumber(base)} {unit} as set. Each bar spans the result with one input moved {tornado.percent} % down and up, the others held; the longest bar moves it most.
          </figcaption>
          <div className="overflow-x-auto">
            <table className="w-full min-w-[28rem] text-sm tabular-nums" data-tornado-table>
              <caption className="sr-only">Sensitivity of {tornado.result.label}, largest swing first</caption>
              <thead>
                <tr className="border-b border-ink-200 text-left text-xs tracking-wide text-ink-700 uppercase">
                  <th scope="col" className="py-1.5 pr-2">Input</th>
                  <th scope="col" className="py-1.5 pr-2 text-right">−{tornado.percent} %</th>
                  <th scope="col" className="py-1.5 pr-2 text-right">+{tornado.percent} %</th>
                  <th scope="col" className="py-1.5 text-right">Elasticity</th>
                </tr>
              </thead>
              <tbody>
                {rows.map((r) => (
                  <tr key={r.bar.input} className="border-b border-ink-50 align-top">
                    <th scope="row" className="py-1.5 pr-2 text-left font-semibold">
                      {r.bar.label}
                      {[r.bar.low.note, r.bar.high.note].filter(Boolean).map((n) => (
                        <span key={n} className="block text-xs font-normal text-ink-700">{n}</span>
                      ))}
                    </th>
                    <td className="py-1.5 pr-2 text-right">{r.bar.low.value === null ? '—' : `${formatNumber(r.low)} ${unit}`}</td>
                    <td className="py-1.5 pr-2 text-right">{r.bar.high.value === null ? '—' : `${formatNumber(r.high)} ${unit}`}</td>
                    <td className="py-1.5 text-right">{r.bar.elasticity === null ? '—' : formatNumber(r.bar.elasticity, { significant: 3 })}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <p className="text-xs text-ink-700">Elasticity: the percentage change of the result for a 1 % change of the input, at the values as set.</p>
        </figure>
      )}
    </section>
  );
}
