import { toJsonPointer } from '../../../shared/api/problem';
import { apiProblemTypes, v1Limits, type V1SpecValidation } from '../../../shared/api/v1';
import type { SpecIssue } from '../../../shared/mechanics/errors';
import { prepare, solve } from '../../../shared/mechanics/solve';
import type { SolveResult } from '../../../shared/mechanics/solve-result';
import { validateSpec } from '../../../shared/spec/validate-spec';
import { HttpProblem } from '../../middleware/http-problem';
import { engineProblem } from '../templates/catalogue';
import { contentHash } from '../templates/content-hash';

export interface SpecCheckLimits {
  points: number;
  joints: number;
  membersAndParts: number;
  /** Wall-clock budget of one spec solve (validate, compile, solve). */
  solveMs: number;
}

export const defaultSpecCheckLimits: SpecCheckLimits = {
  points: v1Limits.specPoints,
  joints: v1Limits.specJoints,
  membersAndParts: v1Limits.specMembersAndParts,
  solveMs: v1Limits.specSolveMs,
};

const sizeOf = (v: unknown) => (Array.isArray(v) ? v.length : v && typeof v === 'object' ? Object.keys(v).length : 0);

/** Counted before anything else is done with the spec, so a huge one costs no compile. */
function refuseOversized(spec: unknown, limits: SpecCheckLimits): void {
  if (!spec || typeof spec !== 'object') return;
  const s = spec as Record<string, unknown>;
  const over: { path: string; message: string }[] = [];
  const check = (field: string, n: number, max: number) => {
    if (n > max) over.push({ path: `/spec/${field}`, message: `has ${n} entries; at most ${max} are accepted here` });
  };
  check('points', sizeOf(s.points), limits.points);
  check('joints', sizeOf(s.joints), limits.joints);
  check('members', sizeOf(s.members), limits.membersAndParts);
  check('parts', sizeOf(s.parts), limits.membersAndParts);
  if (over.length) {
    throw new HttpProblem({
      type: apiProblemTypes.specTooLarge,
      title: 'Spec too large',
      status: 422,
      detail: `The spec is larger than the API checks: ${over.map((o) => `${o.path.slice(6)} ${o.message}`).join('; ')}.`,
      errors: over,
    });
  }
}

const issuesOf = (issues: SpecIssue[]) => issues.map((i) => ({ path: toJsonPointer(i.path), message: i.message }));

export function validateSpecForApi(spec: unknown, limits = defaultSpecCheckLimits): V1SpecValidation {
  refuseOversized(spec, limits);
  const checked = validateSpec(spec);
  return checked.ok ? { valid: true, contentHash: contentHash(checked.spec), issues: [] } : { valid: false, contentHash: null, issues: issuesOf(checked.issues) };
}

/**
 * Validates, compiles and solves a spec that is not stored. The engine runs synchronously, so
 * the time budget is checked between the phases: the size limits above bound each phase, and
 * a spec whose phases together run past the budget is refused rather than answered.
 */
export function solveSpecForApi(spec: unknown, inputs: Record<string, number>, limits = defaultSpecCheckLimits): { contentHash: string; result: SolveResult } {
  const started = performance.now();
  refuseOversized(spec, limits);
  const checked = validateSpec(spec);
  if (!checked.ok) {
    throw new HttpProblem({
      type: apiProblemTypes.invalidSpec,
      title: 'Invalid spec',
      status: 422,
      detail: `The spec has ${checked.issues.length} problem(s); see errors.`,
      errors: issuesOf(checked.issues).map((e) => ({ ...e, path: `/spec${e.path}` })),
    });
  }
  const overBudget = (phase: string) => {
    const ms = performance.now() - started;
    if (ms > limits.solveMs) {
      throw new HttpProblem({
        type: apiProblemTypes.specTooSlow,
        title: 'Spec solve too long',
        status: 422,
        detail: `Checking this spec took ${Math.round(ms)} ms by the end of the ${phase} step; the API allows ${limits.solveMs} ms. Simplify the spec or solve it with the engine locally.`,
      });
    }
  };
  overBudget('validation');
  const compiled = prepare(checked.spec);
  overBudget('compile');
  const outcome = solve(compiled, inputs);
  overBudget('solve');
  if (!outcome.ok) throw new HttpProblem(engineProblem(outcome.error));
  return { contentHash: contentHash(checked.spec), result: outcome };
}
