import { expect } from 'vitest';
import type { SolveOutcome, SolveResult } from '../../shared/mechanics/solve-result';
import type { TemplateSpecInput } from '../../shared/spec/template-spec';

/** A spec with the bookkeeping fields filled, for tests that only care about the mechanism. */
export function makeSpec(body: Omit<TemplateSpecInput, 'specVersion' | 'slug' | 'title' | 'summary' | 'category'> & Partial<TemplateSpecInput>): TemplateSpecInput {
  return { specVersion: 1, slug: 'test-case', title: 'Test case', summary: 'A mechanism under test.', category: 'frames', ...body };
}

export function ok(r: SolveOutcome): SolveResult {
  if (!r.ok) throw new Error(`expected a solution, got ${r.error.kind}: ${r.error.message}`);
  return r;
}

/** A result's value; takes a solve outcome too (and fails on an error) so a test can pass solve(...) straight in. */
export const result = (r: SolveOutcome, key: string): number => {
  const v = ok(r).results.find((x) => x.key === key);
  if (!v || v.value === null) throw new Error(`no value for result ${key}`);
  return v.value;
};
export const verdict = (r: SolveOutcome, key: string) => {
  const c = ok(r).checks.find((x) => x.key === key);
  if (!c) throw new Error(`no check ${key}`);
  return c.verdict;
};
export const joint = (r: SolveResult, id: string) => {
  const j = r.joints.find((x) => x.id === id);
  if (!j) throw new Error(`no joint ${id}`);
  return j;
};
export const member = (r: SolveResult, id: string) => {
  const m = r.members.find((x) => x.id === id);
  if (!m) throw new Error(`no member ${id}`);
  return m;
};
export const load = (r: SolveResult, id: string) => {
  const l = r.loads.find((x) => x.id === id);
  if (!l) throw new Error(`no load ${id}`);
  return l;
};

/** Relative closeness with a floor, so that an expected zero compares by absolute size. */
export function expectClose(actual: number, expected: number, rel = 1e-9, scale = Math.abs(expected)) {
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(rel * Math.max(scale, 1e-12) + 1e-12);
}

/** Every solve must close on itself: part equilibrium and global balance. */
export function expectBalanced(r: SolveResult, tol = 1e-9) {
  expect(r.verification.maxResidual).toBeLessThan(tol);
  expect(r.verification.globalBalance.relative).toBeLessThan(tol);
}

export const D = Math.PI / 180;
