import { useId, useMemo, useState } from 'react';
import { formatNumber } from '../../../../shared/units/format';
import { TornadoPlot } from '../../../../shared/charts/tornado-plot';
import { prepareTornado, tornadoHeight } from '../../../../shared/charts/tornado-rows';
import type { UnitSystem } from '../../../../shared/units/unit-systems';
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

  const chart = useMemo(() => (tornado ? prepareTornado(tornado, system) : null), [tornado, system]);
  const rows = chart?.rows ?? [];
  const unit = chart?.result.unit ?? '';
  const base = chart?.base ?? 0;

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
      {tornado && chart && (
        <figure className={`grid gap-2 transition-opacity ${query.isPlaceholderData ? 'opacity-60' : ''}`} data-chart="tornado" aria-busy={query.isFetching}>
          <div className="w-full rounded-xl border border-ink-100 bg-paper-50 p-2" style={{ height: `${tornadoHeight(rows.length)}px` }} aria-hidden="true">
            <TornadoPlot chart={chart} />
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
