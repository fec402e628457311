import type { TornadoOutput } from '../mechanics/sensitivity-schema';
import { unitOf, type UnitSystem } from '../units/unit-systems';
import { displayValue } from './sweep-rows';

type Bar = TornadoOutput['bars'][number];

export interface TornadoRow {
  label: string;
  /** [smaller, larger] of the two moved results, the span a bar covers. */
  range: [number, number];
  low: number;
  high: number;
  /** Half the swing in display units: what the label beside a bar says (±). */
  halfSwing: number;
  bar: Bar;
}

export interface PreparedTornado {
  result: { key: string; label: string; unit: string };
  percent: number;
  /** The result at the inputs as set, display units. */
  base: number;
  rows: TornadoRow[];
  /** The value axis title with its unit. */
  axisLabel: string;
}

/** Bars of the tornado in display units; a side that cannot be built collapses onto the base. */
export function prepareTornado(tornado: TornadoOutput, system: UnitSystem, payloadUnits: UnitSystem = 'SI'): PreparedTornado {
  const q = tornado.result.quantity;
  const show = (v: number) => displayValue(v, q, system, payloadUnits);
  const base = show(tornado.base);
  const unit = unitOf(q, system);
  const rows = tornado.bars.map((b) => {
    const low = b.low.value === null ? base : show(b.low.value);
    const high = b.high.value === null ? base : show(b.high.value);
    // A swing is a difference of two results: a scale factor only, no offset to undo.
    const halfSwing = Math.abs(show(b.swing) - show(0)) / 2;
    return { label: b.label, range: [Math.min(low, high), Math.max(low, high)] as [number, number], low, high, halfSwing, bar: b };
  });
  return {
    result: { key: tornado.result.key, label: tornado.result.label, unit },
    percent: tornado.percent,
    base,
    rows,
    axisLabel: unit ? `${tornado.result.label} (${unit})` : tornado.result.label,
  };
}

/** Height that gives each bar room for its label, as the app sizes the box. */
export const tornadoHeight = (bars: number) => Math.max(160, bars * 44 + 60);
