import { useId, useMemo, useState } from 'react';
import { formatNumber } from '../../../../shared/units/format';
import type { Quantity } from '../../../../shared/units/quantities';
import { prepareSweep } from '../../../../shared/charts/sweep-rows';
import { SweepPlot } from '../../../../shared/charts/sweep-plot';
import { unitOf, type UnitSystem } from '../../../../shared/units/unit-systems';
import { ApiError } from '../../../lib/api-client';
import { downloadCsv, toCsv } from '../../../lib/csv';
import { useSweep, type SweepResponse } from '../api/sweep-template';

export interface ChartInput {
  key: string;
  label: string;
  quantity: Quantity;
  control: 'number' | 'slider' | 'choice';
}
export interface ChartResult {
  key: string;
  label: string;
  quantity: Quantity;
}

interface SweepChartProps {
  slug: string;
  version: string;
  inputs: Record<string, number>;
  system: UnitSystem;
  specInputs: ChartInput[];
  results: ChartResult[];
}

const STEPS = 41;

type Sweep = SweepResponse['sweep'];

export function sweepCsv(sweep: Sweep, system: UnitSystem): string {
  const chart = prepareSweep(sweep, system);
  const header = [chart.xLabel, ...chart.series.map((s) => s.name), 'Note'];
  const rows = chart.rows.map((r) => [
    r.x,
    ...chart.series.map((s) => (r[s.key] === null ? null : Number((r[s.key] as number).toPrecision(10)))),
    (r.error as string | undefined) ?? '',
  ]);
  return toCsv([header, ...rows]);
}

export function SweepChart({ slug, version, inputs, system, specInputs, results }: SweepChartProps) {
  const sweepable = specInputs.filter((i) => i.control !== 'choice');
  const [inputKey, setInputKey] = useState(sweepable[0]?.key ?? '');
  const [picked, setPicked] = useState<string[]>(() => results.slice(0, 2).map((r) => r.key));
  const inputId = useId();
  const chosen = picked.filter((k) => results.some((r) => r.key === k));
  const sweep = useSweep({ slug, version, inputs, input: inputKey, steps: STEPS, results: chosen }, chosen.length > 0 && inputKey !== '');
  const data = sweep.data?.sweep;
  const chart = useMemo(() => (data ? prepareSweep(data, system) : null), [data, system]);
  const rows = chart?.rows ?? [];
  const holes = chart?.gaps ?? [];

  const toggle = (key: string) => setPicked((p) => (p.includes(key) ? p.filter((k) => k !== key) : [...p, key].slice(-4)));
  const xUnit = chart?.input.unit ?? '';

  return (
    <section aria-labelledby="sweep-heading" className="grid gap-4">
      <div className="flex flex-wrap items-end justify-between gap-3">
        <h3 id="sweep-heading" className="text-lg font-extrabold text-ink-950">Sweep one input</h3>
        <button
          type="button"
          disabled={!data}
          onClick={() => data && downloadCsv(`${slug}-${version}-sweep-${data.input.key}.csv`, sweepCsv(data, system))}
          className="rounded-lg border border-ink-300 bg-paper-50 px-3 py-1.5 text-sm font-bold text-ink-800 hover:bg-ink-50 disabled:opacity-50"
        >
          Download sweep CSV
        </button>
      </div>
      <div className="grid gap-4 sm:grid-cols-[14rem_1fr]">
        <div>
          <label htmlFor={inputId} className="block text-sm font-bold text-ink-900">Input to vary</label>
          <select
            id={inputId}
            value={inputKey}
            onChange={(e) => setInputKey(e.target.value)}
            className="mt-1.5 w-full rounded-lg border border-ink-200 bg-paper-50 px-3 py-2 text-base"
          >
            {sweepable.map((i) => (
              <option key={i.key} value={i.key}>{i.label}</option>
            ))}
          </select>
          <p className="mt-1 text-xs text-ink-700">Across its whole range, {STEPS} steps, the other inputs as set.</p>
        </div>
        <fieldset>
          <legend className="text-sm font-bold text-ink-900">Results to plot (up to four)</legend>
          <div className="mt-1.5 flex flex-wrap gap-x-4 gap-y-1.5">
            {results.map((r) => (
              <label key={r.key} className="flex items-center gap-2 text-sm text-ink-900">
                <input type="checkbox" checked={chosen.includes(r.key)} onChange={() => toggle(r.key)} className="size-4 accent-ink-700" />
                {r.label}
              </label>
            ))}
          </div>
        </fieldset>
      </div>

      {chosen.length === 0 && <p className="text-sm text-ink-700">Pick at least one result to draw the sweep.</p>}
      {sweep.isError && (
        <p role="alert" className="rounded-lg bg-signal-50 p-3 text-sm text-ink-900">
          The sweep could not be drawn: {sweep.error instanceof ApiError ? sweep.error.problem.detail ?? sweep.error.message : 'the request failed.'}
        </p>
      )}
      {data && chart && chosen.length > 0 && (
        <figure className={`grid gap-2 transition-opacity ${sweep.isPlaceholderData ? 'opacity-60' : ''}`} data-chart="sweep" aria-busy={sweep.isFetching}>
          <div className="h-72 w-full rounded-xl border border-ink-100 bg-paper-50 p-2" aria-hidden="true">
            <SweepPlot chart={chart} interactive />
          </div>
          <figcaption className="text-sm text-ink-800">
            {data.series.map((s) => s.label).join(', ')} as {data.input.label.toLowerCase()} runs from {formatNumber(rows[0]?.x as number)} to{' '}
            {formatNumber(rows.at(-1)?.x as number)} {xUnit}.
            {holes.length > 0 && (
              <span className="mt-1 block font-semibold text-signal-800" data-sweep-gaps>
                {holes.map((h) => (
                  <span key={h.from} className="block">
                    Gap from {formatNumber(h.from)} to {formatNumber(h.to)} {xUnit} (shaded): {h.message}
                  </span>
                ))}
              </span>
            )}
          </figcaption>
          <details className="text-sm">
            <summary className="cursor-pointer font-semibold text-ink-700">The sweep as a table</summary>
            <div className="mt-2 max-h-64 overflow-auto">
              <table className="w-full text-right tabular-nums">
                <thead>
                  <tr className="border-b border-ink-200">
                    <th scope="col" className="p-1">{data.input.label} {xUnit && `(${xUnit})`}</th>
                    {data.series.map((s) => (
                      <th key={s.key} scope="col" className="p-1">{s.label} {unitOf(s.quantity, system) && `(${unitOf(s.quantity, system)})`}</th>
                    ))}
                  </tr>
                </thead>
                <tbody>
                  {rows.map((r) => (
                    <tr key={String(r.x)} className="border-b border-ink-50">
                      <th scope="row" className="p-1 font-semibold">{formatNumber(r.x as number)}</th>
                      {data.series.map((s) => (
                        <td key={s.key} className="p-1">{r[s.key] === null ? 'cannot be built' : formatNumber(r[s.key] as number)}</td>
                      ))}
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </details>
        </figure>
      )}
    </section>
  );
}
