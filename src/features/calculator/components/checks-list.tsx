import type { SolveResult } from '../../../../shared/mechanics/solve-result';
import { VerdictMark } from './verdict-mark';

/** Each design check with its verdict in a mark and a word, and the advice when it does not pass. */
export function ChecksList({ checks }: { checks: SolveResult['checks'] }) {
  if (checks.length === 0) return null;
  return (
    <ul className="grid gap-2.5">
      {checks.map((c) => (
        <li key={c.key} data-check={c.key} data-verdict={c.verdict} className="rounded-xl border border-ink-100 bg-paper-50 p-3.5">
          <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
            <VerdictMark verdict={c.verdict} />
            <span className="font-bold text-ink-950">{c.label}</span>
          </div>
          {(c.verdict !== 'pass' || c.note) && (
            <p className="mt-1.5 text-sm leading-relaxed text-ink-800">{c.note ? `${c.note} ` : ''}{c.verdict !== 'pass' ? c.advice : ''}</p>
          )}
          {c.verdict === 'pass' && (
            <details className="mt-1 text-sm text-ink-700 print:hidden">
              <summary className="cursor-pointer font-semibold text-ink-600">Why this check</summary>
              <p className="mt-1 leading-relaxed">{c.advice}</p>
            </details>
          )}
        </li>
      ))}
    </ul>
  );
}
