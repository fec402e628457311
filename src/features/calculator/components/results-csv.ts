import type { SolveResult } from '../../../../shared/mechanics/solve-result';
import type { InputDef } from '../../../../shared/spec/template-spec';
import { toDisplay, unitOf, type UnitSystem } from '../../../../shared/units/unit-systems';
import { toCsv } from '../../../lib/csv';
import { resultRows } from './result-rows';

const exact = (v: number | null) => (v === null ? null : Number(v.toPrecision(10)));

/** The results sheet as CSV: what was solved (template, version, inputs), then every number and check. */
export function resultsCsv(
  meta: { title: string; slug: string; version: string },
  inputs: readonly InputDef[],
  result: SolveResult,
  system: UnitSystem,
): string {
  const rows: (string | number | null)[][] = [
    ['Section', 'Quantity', 'Value', 'Unit', 'Note'],
    ['Template', meta.title, meta.version, '', meta.slug],
  ];
  for (const input of inputs) {
    const v = result.inputs[input.key];
    rows.push(['Inputs', input.label, v === undefined ? null : exact(toDisplay(v, input.quantity, system)), unitOf(input.quantity, system), '']);
  }
  for (const row of resultRows(result, system)) rows.push([row.section, row.label, exact(row.value), row.unit, row.note ?? '']);
  for (const c of result.checks) rows.push(['Checks', c.label, c.verdict, '', c.verdict === 'pass' ? '' : c.advice]);
  return toCsv(rows);
}
