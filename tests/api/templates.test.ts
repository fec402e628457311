import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { problemSchema } from '../../shared/api/problem';
import {
  engineProblemTypes,
  sensitivityResponseSchema,
  solveResponseSchema,
  sweepResponseSchema,
  templateDetailSchema,
  templateListSchema,
} from '../../shared/api/templates';
import type { DatabaseHandle } from '../../server/db/database';
import { seedDemoData } from '../../server/db/seed';
import { seedBuiltInTemplates } from '../../server/db/seed-templates';
import { builtInTemplates } from '../../templates/registry';
import { toggleSpec } from '../engine/fixtures/toggle';
import { openTestDatabase } from '../helpers/test-database';
import { appFor } from './app-fixture';

let database: DatabaseHandle;
let app: ReturnType<typeof appFor>;
beforeAll(async () => {
  database = await openTestDatabase();
  await seedDemoData(database.db);
  await seedBuiltInTemplates(database.db, builtInTemplates, 'tallow-ridge-engineering');
  app = appFor(database);
}, 60_000);
afterAll(async () => {
  await database?.close();
});

function problem(res: request.Response, status: number) {
  expect(res.status).toBe(status);
  expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
  return problemSchema.parse(JSON.parse(res.text));
}

const jib = '/api/templates/wall-jib-tie-rod';

describe('template routes', () => {
  it('list every published built-in with a thumbnail drawing', async () => {
    const res = await request(app).get('/api/templates');
    expect(res.status).toBe(200);
    const list = templateListSchema.parse(res.body);
    expect(list.templates.map((t) => t.slug).sort()).toEqual(builtInTemplates.map((t) => t.slug).sort());
    for (const t of list.templates) {
      expect(t.version).toBe('1.0.0');
      expect(t.contentHash).toMatch(/^[0-9a-f]{64}$/);
      expect(t.thumbnailSvg).toMatch(/^<svg[\s\S]*<\/svg>\s*$/);
    }
  });

  it('give one template with its input schema, defaults and validator address', async () => {
    const res = await request(app).get(jib);
    expect(res.status).toBe(200);
    const detail = templateDetailSchema.parse(res.body);
    expect(detail.versions.map((v) => v.version)).toEqual(['1.0.0']);
    expect(detail.defaults).toMatchObject({ L: 4000, h: 1500 });
    expect((detail.inputSchema as { properties: Record<string, { maximum: number }> }).properties.L!.maximum).toBe(12000);
    const script = await request(app).get(detail.validatorUrl);
    expect(script.status).toBe(200);
    expect(script.headers['content-type']).toMatch(/javascript/);
    expect(script.headers['cache-control']).toMatch(/immutable/);
    expect(script.text).toContain(`registry[${JSON.stringify(detail.contentHash)}]`);
  });

  it('run the precompiled validator script: it refuses an out-of-range value without eval', async () => {
    const detail = templateDetailSchema.parse((await request(app).get(jib)).body);
    const script = (await request(app).get(detail.validatorUrl)).text;
    // Run the served script as a browser would, in a scope with `self`, then call the validator.
    const self: { pinworkInputValidators?: Record<string, Record<string, (data: unknown) => boolean>> } = {};
    new Function('self', script)(self); // test-only: the server's code, evaluated outside the app
    const fns = self.pinworkInputValidators![detail.contentHash]!;
    const validate = Object.values(fns)[0]! as ((data: unknown) => boolean) & { errors?: unknown[] };
    expect(validate({ L: 4000 })).toBe(true);
    expect(validate({ L: 99999 })).toBe(false);
    expect(JSON.stringify(validate.errors)).toMatch(/maximum/);
  });

  it('solve with defaults and with given inputs', async () => {
    const res = await request(app).post(`${jib}/solve`).send({ inputs: { m: 1000, trolley: 100, mb: 0, L: 3000, h: 3000 } });
    expect(res.status).toBe(200);
    const body = solveResponseSchema.parse(res.body);
    const T = body.result.results.find((r) => r.key === 'T')!.value!;
    expect(T).toBeCloseTo(Math.SQRT2 * 1000 * 9.80665, 6);
    expect(body.version).toBe('1.0.0');
    expect((await request(app).post(`${jib}/solve`).send({})).status).toBe(200);
  });

  it('answer an out-of-range, a mistyped and an unknown input with 422 naming the field', async () => {
    const out = problem(await request(app).post(`${jib}/solve`).send({ inputs: { L: 50 } }), 422);
    expect(out.errors).toEqual([{ path: '/inputs/L', message: expect.stringContaining('outside the allowed range 500 to 12000') }]);
    const typed = problem(await request(app).post(`${jib}/solve`).send({ inputs: { L: 'long' } }), 422);
    expect(typed.errors![0]!.path).toBe('/inputs/L');
    const unknown = problem(await request(app).post(`${jib}/solve`).send({ inputs: { span: 3 } }), 422);
    expect(unknown.errors![0]).toEqual({ path: '/inputs/span', message: expect.stringContaining('no input of that name') });
    const extra = problem(await request(app).post(`${jib}/solve`).send({ inputs: {}, colour: 'red' }), 422);
    expect(JSON.stringify(extra.errors)).toMatch(/colour/);
    const version = problem(await request(app).post(`${jib}/solve`).send({ version: 'latest' }), 422);
    expect(version.errors![0]!.path).toBe('/version');
  });

  it('answer a configuration the engine cannot solve with a 422 engine problem', async () => {
    // The plain toggle of the engine tests, seeded as an extra template: exactly straight it is
    // at a dead centre.
    await seedBuiltInTemplates(database.db, [toggleSpec], 'tallow-ridge-engineering');
    const dead = problem(await request(app).post('/api/templates/test-toggle/solve').send({ inputs: { alpha: 0 } }), 422);
    expect(dead.type).toBe(engineProblemTypes['dead-centre']);
    expect(dead.title).toBe('At a dead centre');
    expect(dead.detail).toMatch(/dead centre/);
    expect((dead as { engineError?: { kind: string } }).engineError?.kind).toBe('dead-centre');
    expect(dead.errors).toBeUndefined();
    const fine = await request(app).post('/api/templates/test-toggle/solve').send({ inputs: { alpha: 3, Q: 150 } });
    expect(fine.status).toBe(200);
  });

  it('answer unknown templates and versions with 404 problems', async () => {
    const t = problem(await request(app).post('/api/templates/no-such-thing/solve').send({}), 404);
    expect(t.type).toBe(engineProblemTypes.unknownTemplate);
    const v = problem(await request(app).get(`${jib}?version=9.9.9`), 404);
    expect(v.type).toBe(engineProblemTypes.unknownVersion);
    expect(v.detail).toMatch(/published: 1\.0\.0/);
    const bad = problem(await request(app).get('/api/templates/Bad_Slug'), 422);
    expect(bad.errors).toBeDefined();
  });

  it('sweep an input, and refuse a sweep outside its range naming the sweep field', async () => {
    const res = await request(app).post(`${jib}/sweep`).send({ inputs: {}, sweep: { input: 'trolley', steps: 5, results: ['T'] } });
    expect(res.status).toBe(200);
    const body = sweepResponseSchema.parse(res.body);
    expect(body.sweep.steps.map((s) => s.value)).toEqual([0, 25, 50, 75, 100]);
    const tensions = body.sweep.steps.map((s) => (s.ok ? s.values.T! : NaN));
    // Linear in the trolley position: equal steps, equal increments.
    expect(tensions[2]! - tensions[1]!).toBeCloseTo(tensions[1]! - tensions[0]!, 6);
    const out = problem(await request(app).post(`${jib}/sweep`).send({ sweep: { input: 'trolley', from: -10, steps: 5 } }), 422);
    expect(out.errors![0]!.path).toBe('/sweep/from');
    const steps = problem(await request(app).post(`${jib}/sweep`).send({ sweep: { input: 'trolley', steps: 100000 } }), 422);
    expect(steps.errors![0]!.path).toBe('/sweep/steps');
    const input = problem(await request(app).post(`${jib}/sweep`).send({ sweep: { input: 'colour', steps: 5 } }), 422);
    expect(input.errors![0]!.path).toBe('/sweep/input');
  });

  it('rank the inputs for a result', async () => {
    const res = await request(app).post(`${jib}/sensitivity`).send({ inputs: {}, tornado: { result: 'T', percent: 10 } });
    expect(res.status).toBe(200);
    const body = sensitivityResponseSchema.parse(res.body);
    const swings = body.tornado.bars.map((b) => b.swing);
    expect([...swings].sort((a, b) => b - a)).toEqual(swings);
    // T is proportional to the rated load: elasticity 1 at a weightless... with boom weight, below 1.
    const m = body.tornado.bars.find((b) => b.input === 'm')!;
    expect(m.elasticity).toBeGreaterThan(0.8);
    expect(m.elasticity).toBeLessThan(1);
    const bad = problem(await request(app).post(`${jib}/sensitivity`).send({ tornado: { result: 'nope' } }), 422);
    expect(bad.errors![0]!.path).toBe('/tornado/result');
  });

  it('answer a wrong method with 405 and an unknown sub-route with 404', async () => {
    problem(await request(app).delete(`${jib}/solve`), 405);
    problem(await request(app).get(`${jib}/nothing-here`), 404);
  });
});
