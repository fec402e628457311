import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { prepare, solve } from '../../shared/mechanics/solve';
import { validateSpec } from '../../shared/spec/validate-spec';
import { LIFTING_STANDARDS } from '../../templates/common/cautions';
import { builtInTemplates } from '../../templates/registry';

/**
 * What every built-in template must satisfy: a valid spec; its reference cases reproduced;
 * solved across the whole range of every input with the others at their defaults; a precise
 * error just outside each range; cautions and a design factor where it can lift or clamp a
 * load; a README with its reasoning and sources. Each template's own hand check lives in
 * tests/templates/<slug>.test.ts.
 */
describe.each(builtInTemplates.map((s) => [s.slug, s] as const))('%s', (slug, spec) => {
  it('is a valid spec', () => {
    const v = validateSpec(spec);
    expect(v.ok ? [] : v.issues).toEqual([]);
  });

  it('solves its defaults, balanced, with every number finite', () => {
    const r = solve(spec);
    if (!r.ok) throw new Error(r.error.message);
    expect(r.verification.maxResidual).toBeLessThan(1e-9);
    expect(r.verification.globalBalance.relative).toBeLessThan(1e-9);
    expect(r.results.every((x) => x.value !== null)).toBe(true);
    expect(JSON.stringify(r)).not.toMatch(/NaN|Infinity/);
    if (r.verification.virtualWork) expect(r.verification.virtualWork.relativeDifference).toBeLessThan(1e-5);
  });

  it('reproduces each of its reference cases', () => {
    expect(spec.references!.length).toBeGreaterThanOrEqual(2);
    for (const ref of spec.references!) {
      const r = solve(spec, ref.inputs);
      if (!r.ok) throw new Error(`${ref.label}: ${r.error.message}`);
      for (const [key, expected] of Object.entries(ref.expect)) {
        const got = r.results.find((x) => x.key === key)?.value;
        expect(got, `${ref.label}: ${key}`).not.toBeNull();
        expect(Math.abs(got! - expected), `${ref.label}: ${key} = ${got}, expected ${expected}`).toBeLessThanOrEqual(ref.tolerance * Math.max(Math.abs(expected), 1e-9));
      }
    }
  });

  it('solves across the whole range of every input', () => {
    const t = prepare(spec);
    for (const inp of t.inputs) {
      const values = inp.control === 'choice' && inp.choices ? inp.choices.map((c) => c.value) : Array.from({ length: 13 }, (_, i) => inp.min + ((inp.max - inp.min) * i) / 12);
      for (const v of values) {
        const r = solve(t, { [inp.key]: v });
        expect(r.ok ? 'ok' : `${inp.key} = ${v}: ${r.error.kind}: ${r.error.message}`).toBe('ok');
      }
    }
  });

  it('refuses a value just outside each range, naming the input', () => {
    const t = prepare(spec);
    for (const inp of t.inputs) {
      const r = solve(t, { [inp.key]: inp.max + Math.max(1, Math.abs(inp.max) * 0.01) });
      expect(r.ok).toBe(false);
      if (r.ok) continue;
      expect(r.error.kind).toBe('input');
      expect(r.error.path).toEqual(['inputs', inp.key]);
      expect(r.error.message).toContain(inp.label);
    }
  });

  it('carries cautions, and for lifting devices the standards and a design factor', () => {
    expect(spec.cautions!.length).toBeGreaterThan(0);
    if (spec.category === 'lifting') {
      expect(spec.cautions).toContain(LIFTING_STANDARDS);
      expect(spec.inputs.some((i) => i.key === 'Nd')).toBe(true);
      expect(spec.results!.some((r) => /design factor/i.test(r.label))).toBe(true);
    }
  });

  it('has a README with its assumptions, free-body reasoning and sources', () => {
    const path = join(__dirname, '../../templates', slug, 'README.md');
    expect(existsSync(path)).toBe(true);
    const text = readFileSync(path, 'utf8');
    for (const heading of ['## Assumptions', '## Free-body reasoning', '## Sources']) expect(text).toContain(heading);
  });
});
