import type { SweepOutput } from '../mechanics/sensitivity-schema';
import type { Quantity } from '../units/quantities';
import { fromDisplay, toDisplay, unitOf, type UnitSystem } from '../units/unit-systems';
import { seriesLook, type SeriesLook } from './chart-colours';

export type SweepRow = Record<string, number | null | string> & { x: number };

export interface SweepGap {
  from: number;
  to: number;
  message: string;
}

export interface SweepSeries {
  key: string;
  label: string;
  unit: string;
  /** Label with its unit, as the legend shows it. */
  name: string;
  look: SeriesLook;
}

/** A sweep ready to draw: every number in the display system, steps that failed as gaps. */
export interface PreparedSweep {
  input: { key: string; label: string; unit: string };
  series: SweepSeries[];
  rows: SweepRow[];
  gaps: SweepGap[];
  /** Axis titles with units. */
  xLabel: string;
  yLabel: string;
}

const withUnit = (label: string, unit: string) => (unit ? `${label} (${unit})` : label);

/**
 * A number of the payload in the display system. The first-party API answers in SI; the public
 * API answers in the units the request asked for, so the payload's own system is named.
 */
export function displayValue(value: number, quantity: Quantity, system: UnitSystem, payloadUnits: UnitSystem): number {
  if (payloadUnits === system) return value;
  return toDisplay(fromDisplay(value, quantity, payloadUnits), quantity, system);
}

/** Rows of the sweep in display units: the varied input, then each series; a failed step is all gap. */
export function sweepRows(sweep: SweepOutput, system: UnitSystem, payloadUnits: UnitSystem = 'SI'): SweepRow[] {
  return sweep.steps.map((s) => {
    const row: SweepRow = { x: displayValue(s.value, sweep.input.quantity, system, payloadUnits) };
    for (const series of sweep.series) {
      const v = s.ok ? s.values[series.key] : null;
      row[series.key] = v === null || v === undefined ? null : displayValue(v, series.quantity, system, payloadUnits);
    }
    if (!s.ok) row.error = s.error.message;
    return row;
  });
}

/** Runs of consecutive failed steps, for shading and for the note under the chart. */
export function sweepGaps(rows: readonly SweepRow[]): SweepGap[] {
  const out: SweepGap[] = [];
  let open: SweepGap | null = null;
  for (const r of rows) {
    if (typeof r.error === 'string') {
      if (open) open.to = r.x;
      else open = { from: r.x, to: r.x, message: r.error };
    } else if (open) {
      out.push(open);
      open = null;
    }
  }
  if (open) out.push(open);
  return out;
}

export function prepareSweep(sweep: SweepOutput, system: UnitSystem, payloadUnits: UnitSystem = 'SI'): PreparedSweep {
  const rows = sweepRows(sweep, system, payloadUnits);
  const xUnit = unitOf(sweep.input.quantity, system);
  const series = sweep.series.map((s, i) => {
    const unit = unitOf(s.quantity, system);
    return { key: s.key, label: s.label, unit, name: withUnit(s.label, unit), look: seriesLook(i) };
  });
  return {
    input: { key: sweep.input.key, label: sweep.input.label, unit: xUnit },
    series,
    rows,
    gaps: sweepGaps(rows),
    xLabel: withUnit(sweep.input.label, xUnit),
    yLabel: [...new Set(series.map((s) => s.unit))].filter(Boolean).join(', '),
  };
}
