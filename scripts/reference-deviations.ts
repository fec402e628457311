import { solve } from '../shared/mechanics/solve';
import { builtInTemplates } from '../templates/registry';

/**
 * Prints, for every built-in template and each of its reference cases, the largest relative
 * deviation of the engine from the expected values (`npm run references`).
 */
const rows: string[][] = [['template', 'reference', 'kind', 'largest relative deviation', 'tolerance']];
for (const spec of builtInTemplates) {
  for (const ref of spec.references ?? []) {
    const r = solve(spec, ref.inputs);
    let worst = 0;
    let note = '';
    if (!r.ok) note = `fails: ${r.error.message}`;
    else {
      for (const [key, expected] of Object.entries(ref.expect)) {
        const got = r.results.find((x) => x.key === key)?.value;
        if (got == null) note = `no value for ${key}`;
        else worst = Math.max(worst, Math.abs(got - expected) / Math.max(Math.abs(expected), 1e-300));
      }
    }
    rows.push([spec.slug, ref.label.slice(0, 60), ref.kind, note || worst.toExponential(2), String(ref.tolerance)]);
  }
}
const widths = rows[0]!.map((_, c) => Math.max(...rows.map((r) => r[c]!.length)));
for (const [i, r] of rows.entries()) {
  console.log(r.map((cell, c) => cell.padEnd(widths[c]!)).join('  '));
  if (i === 0) console.log(widths.map((w) => '-'.repeat(w)).join('  '));
}
