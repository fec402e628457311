import { useEffect, useMemo, useRef, useState } from 'react';
import { engineErrorSchema, type SolveResult } from '../../../../shared/mechanics/solve-result';
import { ApiError } from '../../../lib/api-client';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useSolve } from '../api/solve-template';

export const SOLVE_DEBOUNCE_MS = 250;

export type EngineErrorInfo = ReturnType<typeof engineErrorSchema.parse>;

export interface SolveProblem {
  title: string;
  detail: string;
  kind: EngineErrorInfo['kind'] | 'request';
  /** Messages by input key, from the problem's `errors` (`/inputs/<key>`). */
  fieldErrors: Record<string, string[]>;
}

function describeProblem(error: unknown): SolveProblem {
  if (!(error instanceof ApiError)) {
    return { title: 'The solve failed', detail: error instanceof Error ? error.message : 'The request failed.', kind: 'request', fieldErrors: {} };
  }
  const { problem } = error;
  const fieldErrors: Record<string, string[]> = {};
  for (const e of problem.errors) {
    const match = /^\/inputs\/([^/]+)$/.exec(e.path);
    if (match?.[1]) (fieldErrors[match[1]] ??= []).push(e.message);
  }
  const engine = engineErrorSchema.safeParse((problem as Record<string, unknown>).engineError);
  if (engine.success) {
    const key = engine.data.path?.[0] === 'inputs' ? String(engine.data.path[1] ?? '') : '';
    if (key && !fieldErrors[key]) fieldErrors[key] = [engine.data.message];
    return { title: problem.title, detail: problem.detail ?? engine.data.message, kind: engine.data.kind, fieldErrors };
  }
  return { title: problem.title, detail: problem.detail ?? error.message, kind: 'request', fieldErrors };
}

/**
 * Solves as the inputs change, 250 ms after the last change, through TanStack Query. The last
 * good result stays on screen while the next is on its way (marked stale), and also when the
 * new inputs cannot be solved, so the visitor still sees what they are comparing against.
 */
export function useLiveSolve(slug: string, version: string, inputs: Record<string, number>, inputsValid: boolean) {
  const key = JSON.stringify(inputs);
  // Validity settles together with the inputs: a request is only ever made for inputs that
  // were valid when they settled (not for old inputs that a later, valid edit replaced).
  const settledPair = useDebouncedValue(JSON.stringify([key, inputsValid]), SOLVE_DEBOUNCE_MS);
  const [settledKey, settledValid] = useMemo(() => JSON.parse(settledPair) as [string, boolean], [settledPair]);
  const settled = useMemo(() => JSON.parse(settledKey) as Record<string, number>, [settledKey]);
  const query = useSolve({ slug, version, inputs: settled }, settledValid);

  const [lastGood, setLastGood] = useState<{ result: SolveResult; key: string } | null>(null);
  const current = query.data && !query.isPlaceholderData ? query.data.result : null;
  const lastKey = useRef<string | null>(null);
  useEffect(() => {
    if (current && lastKey.current !== settledKey) {
      lastKey.current = settledKey;
      setLastGood({ result: current, key: settledKey });
    }
  }, [current, settledKey]);

  const problem = query.isError && !query.isFetching ? describeProblem(query.error) : null;
  const result = current ?? lastGood?.result ?? null;
  const upToDate = current !== null && settledKey === key && inputsValid;
  return {
    result,
    /** The result shown belongs to other inputs than those on screen. */
    stale: result !== null && !upToDate,
    updating: inputsValid && (key !== settledKey || query.isFetching),
    problem: settledKey === key ? problem : null,
    settledKey,
    settledInputs: settled,
    /** The settled inputs passed the form's checks (so charts may ask for them too). */
    settledValid,
  };
}
