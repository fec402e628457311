import { describe, expect, it } from 'vitest';
import { inputJsonSchema, inputZodSchema } from '../../shared/spec/input-schema';
import { specJsonSchema } from '../../shared/spec/spec-json-schema';
import { validateSpec } from '../../shared/spec/validate-spec';
import { toggleSpec } from './fixtures/toggle';

const issuesOf = (spec: unknown) => {
  const v = validateSpec(spec);
  if (v.ok) throw new Error('expected the spec to be refused');
  return v.issues;
};
const paths = (spec: unknown) => issuesOf(spec).map((i) => `${i.path.join('.')}: ${i.message}`);

describe('spec validation', () => {
  it('accepts a sound spec', () => {
    expect(validateSpec(toggleSpec).ok).toBe(true);
  });

  it('reports every problem at once, each with its path', () => {
    const bad = {
      ...toggleSpec,
      points: { ...toggleSpec.points, C: { polar: { from: 'Z', length: 'L', angle: 0 } } },
      joints: [...toggleSpec.joints!, { id: 'X', kind: 'pin', at: 'A', between: ['link1', 'crank'] }],
      results: [{ key: 'bad', label: 'Bad', quantity: 'force', expr: "member('nope') + zeta" }],
    };
    const found = paths(bad);
    expect(found).toContainEqual(expect.stringMatching(/^points\.C\.polar\.from: refers to the point 'Z', which is not defined/));
    expect(found).toContainEqual(expect.stringMatching(/^joints\.3\.between\.1: refers to the part 'crank', which does not exist/));
    expect(found).toContainEqual(expect.stringMatching(/^results\.0\.expr: .*there is no member 'nope'/));
    expect(found.length).toBeGreaterThanOrEqual(3);
  });

  it('finds cycles in point definitions and in derived values', () => {
    const cyclic = {
      ...toggleSpec,
      points: { ...toggleSpec.points, P: { offset: { from: 'Q', dx: 1, dy: 0 } }, Q: { polar: { from: 'P', length: 1, angle: 0 } } },
      derived: [{ key: 'u', expr: 'v + 1' }, { key: 'v', expr: 'u * 2' }],
    };
    const found = paths(cyclic);
    expect(found).toContainEqual(expect.stringMatching(/points are defined from each other in a cycle: (P → Q → P|Q → P → Q)/));
    expect(found).toContainEqual(expect.stringMatching(/derived values refer to each other in a cycle/));
  });

  it('refuses names from a later phase and reserved names', () => {
    const found = paths({
      ...toggleSpec,
      inputs: [...toggleSpec.inputs, { key: 'pi', label: 'Pi', quantity: 'ratio', default: 1, min: 0, max: 2 }],
      derived: [{ key: 'early', expr: "x('B') + member('AB')" }],
    });
    expect(found).toContainEqual(expect.stringMatching(/inputs\.3\.key: the name 'pi' is reserved/));
    expect(found).toContainEqual(expect.stringMatching(/derived\.0\.expr: .*cannot read points/));
  });

  it('reports structural problems through the schema with their paths', () => {
    const found = paths({ ...toggleSpec, slug: 'Bad Slug', inputs: [{ key: '1x', label: '', quantity: 'speed', default: 0, min: 0, max: 1 }] });
    expect(found.some((f) => f.startsWith('slug:'))).toBe(true);
    expect(found.some((f) => f.startsWith('inputs.0.key:'))).toBe(true);
    expect(found.some((f) => f.startsWith('inputs.0.quantity:'))).toBe(true);
  });

  it('refuses defaults outside their bounds and reference cases naming unknown fields', () => {
    const found = paths({
      ...toggleSpec,
      inputs: [{ ...toggleSpec.inputs[0]!, default: 5000 }, ...toggleSpec.inputs.slice(1)],
      references: [{ label: 'r', source: 's', kind: 'closed-form', inputs: { LL: 1 }, expect: { nothing: 1 }, tolerance: 0.01 }],
    });
    expect(found).toContainEqual(expect.stringMatching(/inputs\.0\.default: the default 5000 lies outside 10…1000/));
    expect(found).toContainEqual(expect.stringMatching(/references\.0\.inputs\.LL/));
    expect(found).toContainEqual(expect.stringMatching(/references\.0\.expect\.nothing/));
  });
});

describe('JSON Schemas derived from the zod schemas', () => {
  it("a template's input schema carries its properties, bounds, defaults and descriptions", () => {
    const schema = inputJsonSchema({ inputs: toggleSpec.inputs.map((i) => ({ help: '', control: 'number' as const, ...i })) }) as {
      $schema: string;
      properties: Record<string, { type: string; minimum: number; maximum: number; default: number; title: string; description: string }>;
      additionalProperties: boolean;
    };
    expect(schema.$schema).toMatch(/draft-07/);
    expect(Object.keys(schema.properties)).toEqual(['L', 'alpha', 'Q']);
    expect(schema.properties.alpha).toMatchObject({ type: 'number', minimum: 0, maximum: 80, default: 10, title: 'Link angle' });
    expect(schema.properties.L!.description).toMatch(/mm/);
    expect(schema.additionalProperties).toBe(false);
  });

  it('the input zod schema names the field and the reason', () => {
    const z = inputZodSchema({ inputs: toggleSpec.inputs.map((i) => ({ help: '', control: 'number' as const, ...i })) });
    const r = z.safeParse({ alpha: 95, L: 'long', extra: 1 });
    expect(r.success).toBe(false);
    const msgs = r.error!.issues.map((i) => `${i.path.join('.')}: ${i.message}`);
    expect(msgs).toContainEqual('alpha: must be at most 80 °');
    expect(msgs).toContainEqual('L: must be a finite number');
    expect(msgs.some((m) => m.includes('extra'))).toBe(true);
    expect(z.parse({})).toEqual({ L: 100, alpha: 10, Q: 150 });
  });

  it("the spec's own schema describes its sections for authors", () => {
    const s = specJsonSchema() as { properties: Record<string, unknown>; required: string[] };
    for (const k of ['inputs', 'points', 'parts', 'members', 'joints', 'loads', 'results', 'checks', 'references']) expect(s.properties).toHaveProperty(k);
    expect(s.required).toEqual(expect.arrayContaining(['specVersion', 'slug', 'inputs', 'points', 'parts', 'loads']));
    expect(JSON.stringify(s)).toMatch(/An expression over inputs/);
  });
});
