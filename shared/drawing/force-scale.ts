import type { SolveResult } from '../mechanics/solve-result';

/** The longest force arrow in any free body, drawing units, unless told otherwise. */
export const LONGEST_ARROW = 96;

/**
 * Drawing units per newton shared by every free-body view of one result, so arrows compare
 * across parts: the largest force on any part is drawn `longest` long. Zero when nothing
 * carries a force.
 */
export function commonForceScale(result: SolveResult, longest = LONGEST_ARROW): number {
  let max = 0;
  for (const b of result.freeBodies) for (const f of b.forces) max = Math.max(max, Math.abs(f.magnitude));
  return max > 0 && Number.isFinite(max) ? longest / max : 0;
}
