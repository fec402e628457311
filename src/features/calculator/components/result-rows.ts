import type { SolveResult } from '../../../../shared/mechanics/solve-result';
import type { Quantity } from '../../../../shared/units/quantities';
import { toDisplay, unitOf, type UnitSystem } from '../../../../shared/units/unit-systems';

export interface ResultRow {
  section: 'Results' | 'Member forces' | 'Joint forces' | 'Derived values';
  key: string;
  label: string;
  /** In the chosen unit system; null where the value is not a finite number. */
  value: number | null;
  unit: string;
  quantity: Quantity;
  /** Why there is no value, a member's state, or a help text. */
  note?: string | undefined;
  plain?: string | undefined;
}

const isFriction = (key: string, label: string) => /friction|\bmu\b|μ/i.test(`${key} ${label}`);

/** A sentence for the results a visitor should not have to interpret: friction, design factor, margin. */
export function plainReading(key: string, label: string, quantity: Quantity, value: number | null, unit: string): string | undefined {
  if (value === null) return undefined;
  const n = Number(value.toPrecision(3));
  if (quantity === 'coefficient' && isFriction(key, label)) {
    return value <= 0
      ? 'No friction is needed to hold here.'
      : `The contact holds only if its friction coefficient is at least ${n}; below that it slips.`;
  }
  if (/margin/i.test(label)) {
    const amount = `${Math.abs(n)}${unit ? ` ${unit}` : ''}`;
    return value >= 0 ? `${amount} to spare before the limit.` : `Short of the limit by ${amount}.`;
  }
  if (/design factor/i.test(label) && quantity !== 'ratio') return `The force multiplied by the design factor, for sizing the part.`;
  if (/design factor|safety factor/i.test(label) && quantity === 'ratio') {
    return value >= 1 ? `The part carries ${n} times the load it sees.` : `The part carries less than the load it sees (${n} times).`;
  }
  return undefined;
}

/** Every number of a solve that a table shows, in the visitor's units, in a fixed order. */
export function resultRows(result: SolveResult, system: UnitSystem): ResultRow[] {
  const rows: ResultRow[] = [];
  for (const r of result.results) {
    const unit = unitOf(r.quantity, system);
    const value = r.value === null ? null : toDisplay(r.value, r.quantity, system);
    rows.push({ section: 'Results', key: r.key, label: r.label, value, unit, quantity: r.quantity, note: r.note ?? r.help, plain: plainReading(r.key, r.label, r.quantity, value, unit) });
  }
  const force = unitOf('force', system);
  for (const m of result.members) {
    rows.push({ section: 'Member forces', key: m.id, label: m.label, value: toDisplay(m.axial, 'force', system), unit: force, quantity: 'force', note: m.state === 'unloaded' ? 'unloaded' : `${m.state} (tension positive)` });
  }
  for (const j of result.joints) {
    const kind = j.kind === 'pin' ? 'pin' : j.kind;
    rows.push({ section: 'Joint forces', key: j.id, label: `${j.label} (${kind})`, value: toDisplay(j.resultant, 'force', system), unit: force, quantity: 'force', note: j.muRequired != null ? `needs friction coefficient ≥ ${Number(j.muRequired.toPrecision(3))}` : undefined });
  }
  for (const d of result.derived) {
    const unit = unitOf(d.quantity, system);
    rows.push({ section: 'Derived values', key: d.key, label: d.label, value: d.value === null ? null : toDisplay(d.value, d.quantity, system), unit, quantity: d.quantity, note: d.note });
  }
  return rows;
}
