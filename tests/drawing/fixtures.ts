import { solve } from '../../shared/mechanics/solve';
import type { SolveResult } from '../../shared/mechanics/solve-result';
import type { TemplateSpecInput } from '../../shared/spec/template-spec';
import { builtInTemplates } from '../../templates/registry';
import { fivePartFrame } from '../../bench/fixtures/five-part-frame';
import { toggleSpec } from '../engine/fixtures/toggle';
import { makeSpec } from '../engine/helpers';

export function solved(spec: TemplateSpecInput, inputs: Record<string, number> = {}): SolveResult {
  const r = solve(spec, inputs);
  if (!r.ok) throw new Error(`${spec.slug} does not solve: ${r.error.message}`);
  return r;
}

export const wallJib = builtInTemplates.find((t) => t.slug === 'wall-jib-tie-rod')!;

/** A cantilever held up by a strut from below: the strut is in compression. */
export const proppedBoom = makeSpec({
  slug: 'test-propped-boom',
  title: 'Propped boom',
  inputs: [{ key: 'W', label: 'Tip load', quantity: 'force', default: 1000, min: 0, max: 1e6 }],
  points: { A: { at: [0, 0] }, E: { at: [1000, 0] }, D: { at: [0, -600] } },
  parts: [{ id: 'boom', label: 'Boom', outline: ['A', 'E'] }],
  members: [{ id: 'strut', label: 'Strut', ends: ['E', 'D'], connects: ['boom', 'ground'] }],
  joints: [{ id: 'wall', label: 'Wall pin', kind: 'pin', at: 'A', between: ['boom', 'ground'] }],
  loads: [{ id: 'W', label: 'Tip load', on: 'boom', at: 'E', force: { magnitude: 'W', direction: { angle: -90 } } }],
});

/** Every spec the drawing tests run over: the built-ins present now and the engine's fixtures. */
export const allSpecs: TemplateSpecInput[] = [...builtInTemplates, toggleSpec, fivePartFrame, proppedBoom];
export { toggleSpec, fivePartFrame };
