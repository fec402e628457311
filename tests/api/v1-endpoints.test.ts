import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { engineProblemTypes } from '../../shared/api/templates';
import {
  apiProblemTypes,
  v1SensitivityResponseSchema,
  v1SolveResponseSchema,
  v1SpecSolveResponseSchema,
  v1SpecValidationSchema,
  v1SweepResponseSchema,
  v1TemplateDetailSchema,
  v1TemplateListSchema,
} from '../../shared/api/v1';
import type { DatabaseHandle } from '../../server/db/database';
import { templates, templateVersions } from '../../server/db/schema/templates';
import { contentHash } from '../../server/services/templates/content-hash';
import { builtInTemplates } from '../../templates/registry';
import { toggleClamp } from '../../templates/toggle-clamp/spec';
import { wallJibTieRod } from '../../templates/wall-jib-tie-rod/spec';
import { openTestDatabase } from '../helpers/test-database';
import { createKey, expectProblem, seedV1, v1App, type V1Test } from './v1-fixture';
import { eq } from 'drizzle-orm';

let database: DatabaseHandle;
let t: V1Test;
let key: string;
beforeAll(async () => {
  database = await openTestDatabase();
  const { supplierOrgId } = await seedV1(database);
  t = await v1App(database, supplierOrgId);
  key = (await createKey(t)).key;
}, 120_000);
afterAll(async () => {
  await database?.close();
});

const jib = '/api/v1/templates/wall-jib-tie-rod';
const auth = () => ({ Authorization: `Bearer ${key}` });
// Exact by definition: 1 in = 25.4 mm; 1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N.
const MM_PER_IN = 25.4;
const N_PER_LBF = 0.45359237 * 9.80665;

describe('API v1 endpoints with a valid key', () => {
  it('lists the published templates with their latest version', async () => {
    const res = await request(t.app).get('/api/v1/templates').set(auth());
    expect(res.status).toBe(200);
    const list = v1TemplateListSchema.parse(res.body);
    expect(list.templates.map((x) => x.slug).sort()).toEqual(builtInTemplates.map((x) => x.slug).sort());
    expect(list.templates.every((x) => x.latestVersion === '1.0.0')).toBe(true);
  });

  it('gives a template for an exact version, a range, and the latest by default', async () => {
    // A second published version, so that a range has something to choose between.
    const [tpl] = await database.db.select().from(templates).where(eq(templates.slug, 'wall-jib-tie-rod'));
    const spec = { ...wallJibTieRod, summary: `${wallJibTieRod.summary} (revised)` };
    await database.db.insert(templateVersions).values({
      templateId: tpl!.id,
      semver: '1.1.0',
      status: 'published',
      spec,
      contentHash: contentHash(spec),
      changelog: 'Summary reworded.',
      publishedAt: new Date(),
    } as typeof templateVersions.$inferInsert);
    await new Promise((r) => setTimeout(r, 1100)); // the version list is cached for a second
    const latest = v1TemplateDetailSchema.parse((await request(t.app).get(jib).set(auth())).body);
    expect(latest.version).toBe('1.1.0');
    expect(latest.versions.map((v) => v.version)).toEqual(['1.1.0', '1.0.0']);
    const tilde = v1TemplateDetailSchema.parse((await request(t.app).get(jib).query({ version: '~1.0.0' }).set(auth())).body);
    expect(tilde.version).toBe('1.0.0');
    const caret = v1TemplateDetailSchema.parse((await request(t.app).get(jib).query({ version: '^1.0.0' }).set(auth())).body);
    expect(caret.version).toBe('1.1.0');
    const exact = await request(t.app).get(jib).query({ version: '1.0.0' }).set(auth());
    expect(exact.body.version).toBe('1.0.0');
    expect(exact.headers['cache-control']).toMatch(/max-age=3600/);
    expect(exact.body.defaults).toMatchObject({ L: 4000, h: 1500 });
    expect(exact.body.inputSchema.properties.L.maximum).toBe(12000);
    expectProblem(await request(t.app).get(jib).query({ version: '^2.0.0' }).set(auth()), 404, engineProblemTypes.unknownVersion);
    const bad = expectProblem(await request(t.app).get(jib).query({ version: 'not a range' }).set(auth()), 422, apiProblemTypes.invalidRange);
    expect(bad.errors?.[0]?.path).toBe('/version');
    expectProblem(await request(t.app).get('/api/v1/templates/no-such-thing').set(auth()), 404, engineProblemTypes.unknownTemplate);
  });

  it('solves in SI and in US customary units, which agree by the exact unit definitions', async () => {
    const si = v1SolveResponseSchema.parse((await request(t.app).post(`${jib}/solve`).set(auth()).send({ version: '1.0.0', inputs: { L: 4000, h: 1500 } })).body);
    expect(si.units).toBe('SI');
    expect(si.contentHash).toMatch(/^[0-9a-f]{64}$/);
    expect(si.result.members.length).toBeGreaterThan(0);
    expect(si.result.joints.length).toBeGreaterThan(0);
    expect(si.result.checks.length).toBeGreaterThan(0);
    expect(si.result.verification).toBeDefined();
    const us = v1SolveResponseSchema.parse(
      (await request(t.app).post(`${jib}/solve`).set(auth()).send({ version: '1.0.0', inputs: { L: 4000 / MM_PER_IN, h: 1500 / MM_PER_IN }, units: 'US' })).body,
    );
    const tSi = si.result.results.find((r) => r.key === 'T')!.value!;
    const tUs = us.result.results.find((r) => r.key === 'T')!.value!;
    expect(tUs * N_PER_LBF).toBeCloseTo(tSi, 6);
    expect(us.result.inputs.L!).toBeCloseTo(4000 / MM_PER_IN, 9);
  });

  it('answers an identical solve with 304 for its ETag, and a different one with a new ETag', async () => {
    const body = { version: '1.0.0', inputs: { L: 4200 } };
    const first = await request(t.app).post(`${jib}/solve`).set(auth()).send(body);
    const tag = first.headers.etag as string;
    expect(tag).toMatch(/^"[A-Za-z0-9_-]+"$/);
    const again = await request(t.app).post(`${jib}/solve`).set(auth()).set('If-None-Match', tag).send(body);
    expect(again.status).toBe(304);
    expect(again.text).toBe('');
    const other = await request(t.app).post(`${jib}/solve`).set(auth()).set('If-None-Match', tag).send({ ...body, inputs: { L: 4300 } });
    expect(other.status).toBe(200);
    expect(other.headers.etag).not.toBe(tag);
  });

  it('refuses inputs out of range and a geometry that cannot close, naming the field', async () => {
    const p = expectProblem(await request(t.app).post(`${jib}/solve`).set(auth()).send({ inputs: { L: 99_999 } }), 422, engineProblemTypes.input);
    expect(p.errors?.[0]?.path).toBe('/inputs/L');
    const shape = expectProblem(await request(t.app).post(`${jib}/solve`).set(auth()).send({ inputs: { L: 'long' } }), 422);
    expect(shape.errors?.[0]?.path).toBe('/inputs/L');
    // Crank 140 at 180° puts A 140 + 340 = 480 mm from O4; coupler + rocker reach 210 + 160 = 370.
    const res = await request(t.app)
      .post('/api/v1/templates/four-bar-linkage/solve')
      .set(auth())
      .send({ inputs: { a: 140, b: 210, c: 160, d: 340, theta2: 180 } });
    const g = expectProblem(res, 422, engineProblemTypes.geometry);
    expect(g.detail).toMatch(/110 mm short/);
  });

  it('sweeps within the step limit and refuses more steps', async () => {
    const res = await request(t.app).post(`${jib}/sweep`).set(auth()).send({ sweep: { input: 'L', from: 2000, to: 6000, steps: 5 } });
    const out = v1SweepResponseSchema.parse(res.body);
    expect(out.sweep.steps.map((s) => s.value)).toEqual([2000, 3000, 4000, 5000, 6000]);
    const us = v1SweepResponseSchema.parse((await request(t.app).post(`${jib}/sweep`).set(auth()).send({ units: 'US', sweep: { input: 'L', from: 100, to: 200, steps: 3 } })).body);
    expect(us.sweep.steps.map((s) => s.value)).toEqual([100, 150, 200].map((x) => expect.closeTo(x, 9)));
    const p = expectProblem(await request(t.app).post(`${jib}/sweep`).set(auth()).send({ sweep: { input: 'L', steps: 201 } }), 422);
    expect(p.errors?.[0]?.path).toBe('/sweep/steps');
  });

  it('ranks inputs for a result and refuses an unknown result', async () => {
    const out = v1SensitivityResponseSchema.parse((await request(t.app).post(`${jib}/sensitivity`).set(auth()).send({ tornado: { result: 'T', percent: 10 } })).body);
    expect(out.tornado.bars.length).toBeGreaterThan(1);
    const swings = out.tornado.bars.map((b) => b.swing);
    expect(swings).toEqual([...swings].sort((a, b) => b - a));
    const p = expectProblem(await request(t.app).post(`${jib}/sensitivity`).set(auth()).send({ tornado: { result: 'nothing' } }), 422);
    expect(JSON.stringify(p)).toMatch(/nothing/);
  });

  it('publishes the spec JSON Schema with its fields', async () => {
    const res = await request(t.app).get('/api/v1/spec-schema');
    expect(res.status).toBe(200);
    expect(Object.keys(res.body.properties)).toEqual(expect.arrayContaining(['slug', 'inputs', 'points', 'joints', 'results']));
  });

  it('validates a spec with every problem and its path, and solves a good one', async () => {
    const good = v1SpecValidationSchema.parse((await request(t.app).post('/api/v1/specs/validate').set(auth()).send({ spec: toggleClamp })).body);
    // The same spec as the published built-in, so the same content hash as the catalogue's.
    const listed = v1TemplateListSchema.parse((await request(t.app).get('/api/v1/templates').set(auth())).body).templates.find((x) => x.slug === 'toggle-clamp')!;
    expect(good).toEqual({ valid: true, contentHash: listed.contentHash, issues: [] });
    const broken = { ...toggleClamp, inputs: [], members: [{ id: 'm', label: 'M', ends: ['NOWHERE', 'A'] }] };
    const bad = v1SpecValidationSchema.parse((await request(t.app).post('/api/v1/specs/validate').set(auth()).send({ spec: broken })).body);
    expect(bad.valid).toBe(false);
    expect(bad.issues.map((i) => i.path)).toContain('/inputs');
    const solved = v1SpecSolveResponseSchema.parse((await request(t.app).post('/api/v1/specs/solve').set(auth()).send({ spec: toggleClamp })).body);
    expect(solved.result.results.length).toBe(toggleClamp.results!.length);
    const refused = expectProblem(await request(t.app).post('/api/v1/specs/solve').set(auth()).send({ spec: broken }), 422, apiProblemTypes.invalidSpec);
    expect(refused.errors?.some((e) => e.path === '/spec/inputs')).toBe(true);
  });

  it('refuses a spec with too many points, and a body over the spec size limit', async () => {
    const points = Object.fromEntries(Array.from({ length: 301 }, (_, i) => [`P${i}`, { at: ['0', String(i)] }]));
    const p = expectProblem(await request(t.app).post('/api/v1/specs/validate').set(auth()).send({ spec: { ...toggleClamp, points } }), 422, apiProblemTypes.specTooLarge);
    expect(p.errors?.[0]?.path).toBe('/spec/points');
    const big = { spec: { ...toggleClamp, summary: 'x'.repeat(60_000) } };
    expectProblem(await request(t.app).post('/api/v1/specs/validate').set(auth()).send(big), 413, '/problems/payload-too-large');
  });

  it('refuses a spec solve that runs past its time budget', async () => {
    const slow = await v1App(database, t.supplierOrgId, { limits: { spec: { solveMs: 0, points: 300, joints: 300, membersAndParts: 300 } } });
    const k = (await createKey(slow)).key;
    const p = expectProblem(await request(slow.app).post('/api/v1/specs/solve').set('Authorization', `Bearer ${k}`).send({ spec: toggleClamp }), 422, apiProblemTypes.specTooSlow);
    expect(p.detail).toMatch(/ms/);
  });

  it('answers 404 and 405 as problems', async () => {
    expectProblem(await request(t.app).get('/api/v1/nothing-here').set(auth()), 404, '/problems/not-found');
    const p = expectProblem(await request(t.app).delete(`${jib}/solve`).set(auth()), 405, '/problems/method-not-allowed');
    expect(p.detail).toMatch(/POST/);
    expectProblem(await request(t.app).post(`${jib}/solve`).set(auth()).set('Content-Type', 'application/json').send('{"inputs":'), 400, '/problems/malformed-json');
  });
});
