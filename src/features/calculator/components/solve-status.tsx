import type { SolveProblem } from '../hooks/use-live-solve';

const headings: Record<SolveProblem['kind'], string> = {
  input: 'An input is not accepted',
  expression: 'A value cannot be worked out for these inputs',
  geometry: 'The mechanism cannot be built with these dimensions',
  parallel: 'The mechanism cannot be built: two lines that must cross are parallel',
  indeterminate: 'The forces cannot be found by statics alone',
  mechanism: 'The mechanism is not in equilibrium in this position',
  'dead-centre': 'The mechanism is at (or too near) dead centre',
  numeric: 'A force is not finite for these inputs',
  request: 'The solve did not go through',
};

interface SolveStatusProps {
  updating: boolean;
  stale: boolean;
  hasResult: boolean;
  problem: SolveProblem | null;
  invalidInputs: boolean;
  /** The inputs (engine units, as JSON) the results on screen were solved for. */
  solvedFor: string;
}

/** One line that says whether the results on screen belong to the inputs on screen, and why not. */
export function SolveStatus({ updating, stale, hasResult, problem, invalidInputs, solvedFor }: SolveStatusProps) {
  let body;
  if (problem) {
    body = (
      <div role="alert" className="rounded-xl border-2 border-verdict-fail/60 bg-paper-50 p-4" data-solve-problem={problem.kind}>
        <p className="flex items-center gap-2 font-extrabold text-verdict-fail">
          <span aria-hidden="true" className="inline-flex size-5 items-center justify-center rounded-full bg-verdict-fail text-xs text-paper-50">✕</span>
          {headings[problem.kind]}
        </p>
        <p className="mt-1.5 text-sm leading-relaxed text-ink-900" data-engine-message>{problem.detail}</p>
        {hasResult && <p className="mt-1.5 text-sm text-ink-700">The results below are for the last inputs that could be solved.</p>}
      </div>
    );
  } else if (invalidInputs) {
    body = (
      <p className="rounded-xl bg-signal-50 px-4 py-2.5 text-sm font-semibold text-ink-900">
        Correct the marked input to update the results{hasResult ? '; those below are for the last valid inputs' : ''}.
      </p>
    );
  } else if (updating || stale) {
    body = (
      <p className="flex items-center gap-2 rounded-xl bg-ink-50 px-4 py-2.5 text-sm font-semibold text-ink-800" data-solve-state="updating">
        <span aria-hidden="true" className="size-2.5 animate-pulse rounded-full bg-signal-500" />
        Updating — the results shown are for the previous inputs.
      </p>
    );
  } else if (hasResult) {
    body = (
      <p className="flex items-center gap-2 px-1 py-1 text-sm font-semibold text-verdict-pass" data-solve-state="current" data-solved-for={solvedFor}>
        <span aria-hidden="true">✓</span> Results match the inputs.
      </p>
    );
  }
  return (
    <div id="results-status" aria-live="polite" className="print:hidden">
      {body}
    </div>
  );
}
