/**
 * What can go wrong in one solve, as data. The engine never throws these across its public
 * boundary: solve() returns { ok: false, error } so the API, the calculator and the sweep can
 * each show the reason beside the field or the chart step it belongs to.
 */
export type EngineErrorKind =
  | 'input' // an input value out of range, missing or unknown
  | 'expression' // an expression could not be evaluated to a finite number
  | 'geometry' // a construction cannot close (links too short, coincident points)
  | 'parallel' // two lines meant to intersect are parallel
  | 'indeterminate' // more independent unknowns than equations
  | 'mechanism' // a free motion the loads drive: not in equilibrium
  | 'dead-centre' // a singular configuration: forces grow without bound here
  | 'numeric'; // a number that is not finite would have left the engine

export interface EngineErrorInfo {
  kind: EngineErrorKind;
  message: string;
  /** Where in the spec or the inputs the cause lies, e.g. ['inputs', 'L1'] or ['points', 'D']. */
  path?: (string | number)[];
  details?: Record<string, unknown>;
}

export class EngineError extends Error {
  constructor(readonly info: EngineErrorInfo) {
    super(info.message);
    this.name = 'EngineError';
  }
}

export interface SpecIssue {
  path: (string | number)[];
  message: string;
}

/** A spec that cannot be compiled: every problem found, each with its path. */
export class SpecError extends Error {
  constructor(readonly issues: SpecIssue[]) {
    super(`The template spec has ${issues.length} problem(s): ${issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`);
    this.name = 'SpecError';
  }
}
