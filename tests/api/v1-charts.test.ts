import { XMLValidator } from 'fast-xml-parser';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { v1SensitivityResponseSchema, v1SweepResponseSchema, v1TemplateDetailSchema } from '../../shared/api/v1';
import type { DatabaseHandle } from '../../server/db/database';
import { all, parseSvg, textOf, type Node } from '../drawing/svg-tree';
import { openTestDatabase } from '../helpers/test-database';
import { createKey, expectProblem, seedV1, v1App, type V1Test } from './v1-fixture';

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

const SVG = 'image/svg+xml';
const auth = () => ({ Authorization: `Bearer ${key}` });
// The body as text whatever its type (supertest would hand an image/* body over as bytes).
const asText = (res: request.Response, done: (err: Error | null, body: string) => void) => {
  const stream = res as unknown as NodeJS.ReadableStream;
  let data = '';
  stream.setEncoding('utf8');
  stream.on('data', (chunk: string) => (data += chunk));
  stream.on('end', () => done(null, data));
};

async function post(path: string, body: unknown, accept?: string) {
  const req = request(t.app).post(`/api/v1/templates/${path}`).set(auth());
  if (accept) req.set('Accept', accept);
  return withText(await req.send(body as object).buffer(true).parse(asText));
}

/** The body as text whatever the content type (the custom parser leaves it in body). */
function withText(res: request.Response): request.Response {
  Object.defineProperty(res, 'text', { value: String(res.body ?? ''), configurable: true });
  return res;
}

/** The document as a tree, after checking the whole text (prolog included) is well-formed XML. */
function svgTree(markup: string): Node {
  const valid = XMLValidator.validate(markup);
  if (valid !== true) throw new Error(`not well-formed XML: ${valid.err.msg} (line ${valid.err.line})`);
  expect(markup.startsWith('<?xml version="1.0" encoding="UTF-8"?>')).toBe(true);
  return parseSvg(markup.replace(/^<\?xml[^>]*\?>\s*/, ''));
}

const byClass = (root: Node, name: string) => all(root, (n) => (n.attrs.class ?? '').split(/\s+/).includes(name));
const texts = (nodes: Node[]) => nodes.map((n) => textOf(n).trim());
/** Tick labels of one axis (Recharts draws them in a layer of their own, marked by orientation). */
const tickLabels = (root: Node, orientation: 'bottom' | 'left') =>
  texts(byClass(root, 'recharts-cartesian-axis-tick-value').filter((n) => n.attrs.orientation === orientation));

/** Points of an SVG path of straight segments (M/L), grouped by the runs a moveto starts. */
function pathRuns(d: string): [number, number][][] {
  const runs: [number, number][][] = [];
  for (const [, cmd, args] of d.matchAll(/([MLZ])([^MLZ]*)/g)) {
    const n = (args ?? '').trim().split(/[\s,]+/).filter(Boolean).map(Number);
    if (cmd === 'M') runs.push([]);
    for (let i = 0; i + 1 < n.length; i += 2) runs.at(-1)!.push([n[i]!, n[i + 1]!]);
  }
  return runs;
}

function expectStandalone(markup: string, root: Node) {
  expect(root.tag).toBe('svg');
  expect(root.attrs.xmlns).toBe('http://www.w3.org/2000/svg');
  expect(Number(root.attrs.width)).toBeGreaterThan(0);
  expect(Number(root.attrs.height)).toBeGreaterThan(0);
  expect(all(root, (n) => n.tag === 'script' || n.tag === 'foreignObject' || n.tag === 'image' || n.tag === 'a')).toEqual([]);
  expect(all(root, (n) => Object.keys(n.attrs).some((a) => a === 'href' || a === 'xlink:href' || a.startsWith('on')))).toEqual([]);
  expect(markup).not.toMatch(/url\(\s*['"]?(https?:|\/\/)|@import|<!DOCTYPE|&nbsp;/i);
  expect(root.attrs['font-family']).toMatch(/sans-serif$/);
}

// Four-bar linkage whose crank cannot turn all the way round: a crank sweep has steps that
// cannot be built, shown as a gap.
const fourBar = { inputs: { a: 120, c: 160 }, sweep: { input: 'theta2', steps: 37, results: ['Fout'] } };
const jibSweep = (units: 'SI' | 'US') => ({
  units,
  sweep: { input: 'L', steps: 25, results: ['T', 'C', 'R'], ...(units === 'SI' ? { from: 2000, to: 8000 } : { from: 80, to: 300 }) },
});

describe('API v1 charts as SVG', () => {
  it('draws a sweep: title, axes with units, a legend entry per series, the version in the footer, a line through every step', async () => {
    const detail = v1TemplateDetailSchema.parse((await request(t.app).get('/api/v1/templates/wall-jib-tie-rod').set(auth())).body);
    const jsonRes = await post('wall-jib-tie-rod/sweep', jibSweep('SI'));
    const json = v1SweepResponseSchema.parse(JSON.parse(jsonRes.text));
    const res = await post('wall-jib-tie-rod/sweep', jibSweep('SI'), SVG);
    expect(res.status, res.text).toBe(200);
    expect(res.headers['content-type']).toBe('image/svg+xml; charset=utf-8');
    expect(res.headers.vary).toMatch(/\bAccept\b/i);
    expect(jsonRes.headers.vary).toMatch(/\bAccept\b/i);
    expect(res.headers.etag).toMatch(/^"[^"]+"$/);
    expect(res.headers.etag).not.toBe(jsonRes.headers.etag);

    const root = svgTree(res.text);
    expectStandalone(res.text, root);
    const title = textOf(root.children.find((c) => c.tag === 'title')!);
    expect(title).toContain(detail.title);
    expect(texts(byClass(root, 'chart-heading'))[0]).toContain(detail.title);
    for (const s of json.sweep.series) expect(title).toContain(s.label);

    const axisText = texts(byClass(root, 'recharts-label'));
    expect(axisText).toContain(`${json.sweep.input.label} (mm)`);
    expect(axisText).toContain('N');
    expect(texts(byClass(root, 'chart-legend-entry'))).toEqual(json.sweep.series.map((s) => `${s.label} (N)`));
    const foot = texts(byClass(root, 'chart-footer')).join(' ');
    expect(foot).toContain(`version ${json.version}`);
    expect(foot).toContain(json.contentHash.slice(0, 12));
    expect(foot).toContain('wall-jib-tie-rod');
    expect(texts(byClass(root, 'chart-caution')).join(' ')).toMatch(/ASME B30\.20/);

    // Each series is one unbroken line with a point per step, placed linearly by value.
    const curves = byClass(root, 'recharts-line-curve');
    expect(curves).toHaveLength(json.sweep.series.length);
    json.sweep.series.forEach((s, i) => {
      const values = json.sweep.steps.map((st) => (st.ok ? st.values[s.key]! : NaN));
      const runs = pathRuns(curves[i]!.attrs.d!);
      expect(runs).toHaveLength(1);
      const pts = runs[0]!;
      expect(pts).toHaveLength(json.sweep.steps.length);
      const xs = json.sweep.steps.map((st) => st.value);
      const [x0, xN] = [xs[0]!, xs.at(-1)!];
      const [px0, pxN] = [pts[0]![0], pts.at(-1)![0]];
      const lo = values.indexOf(Math.min(...values));
      const hi = values.indexOf(Math.max(...values));
      pts.forEach(([px, py], k) => {
        expect(px).toBeCloseTo(px0 + ((xs[k]! - x0) / (xN - x0)) * (pxN - px0), 0);
        // Larger values higher up (smaller y), in proportion.
        const expected = pts[lo]![1] + ((values[k]! - values[lo]!) / (values[hi]! - values[lo]!)) * (pts[hi]![1] - pts[lo]![1]);
        expect(py).toBeCloseTo(expected, 0);
      });
      if (values[hi]! > values[lo]!) expect(pts[hi]![1]).toBeLessThan(pts[lo]![1]);
    });
    const ticks = byClass(root, 'recharts-cartesian-axis-tick-value');
    const tickXs = new Set(ticks.map((n) => n.attrs.x));
    expect(tickXs.size).toBeGreaterThan(2);
  }, 90_000);

  it('breaks the line where steps cannot be built, shades the gap and says why', async () => {
    const json = v1SweepResponseSchema.parse(JSON.parse((await post('four-bar-linkage/sweep', fourBar)).text));
    const values = json.sweep.steps.map((s) => (s.ok ? s.values.Fout : null));
    const failed = json.sweep.steps.filter((s) => !s.ok);
    expect(failed.length).toBeGreaterThan(0);
    const runsExpected: number[] = [];
    values.forEach((v, i) => {
      if (v === null || v === undefined) return;
      if (i === 0 || values[i - 1] === null || values[i - 1] === undefined) runsExpected.push(0);
      runsExpected[runsExpected.length - 1]! += 1;
    });

    const res = await post('four-bar-linkage/sweep', fourBar, SVG);
    expect(res.status, res.text).toBe(200);
    const root = svgTree(res.text);
    const runs = pathRuns(byClass(root, 'recharts-line-curve')[0]!.attrs.d!);
    expect(runs.map((r) => r.length)).toEqual(runsExpected);
    expect(byClass(root, 'recharts-reference-area').length).toBeGreaterThan(0);
    const notes = texts(byClass(root, 'chart-note'));
    const first = failed[0]!;
    expect(notes.length).toBeGreaterThan(0);
    expect(notes.join(' ')).toContain(first.ok ? '' : first.error.message.slice(0, 30));
    expect(texts(byClass(root, 'chart-legend-entry'))).toContain('Cannot be built (shaded)');
  }, 90_000);

  it('labels the axes and the legend in US customary units when asked', async () => {
    const json = v1SweepResponseSchema.parse(JSON.parse((await post('wall-jib-tie-rod/sweep', jibSweep('US'))).text));
    const root = svgTree((await post('wall-jib-tie-rod/sweep', jibSweep('US'), SVG)).text);
    const axisText = texts(byClass(root, 'recharts-label'));
    expect(axisText).toContain(`${json.sweep.input.label} (in)`);
    expect(axisText).toContain('lbf');
    expect(axisText.some((x) => x.includes('(mm)'))).toBe(false);
    expect(texts(byClass(root, 'chart-legend-entry'))).toEqual(json.sweep.series.map((s) => `${s.label} (lbf)`));
    expect(texts(byClass(root, 'chart-footer')).join(' ')).toContain('US customary units');
    // The x ticks span the US request's range (80–300 in), not the millimetres.
    const xTicks = tickLabels(root, 'bottom').map((s) => Number(s.replace(/\u202f/g, '')));
    expect(xTicks.length).toBeGreaterThan(2);
    expect(xTicks.every(Number.isFinite)).toBe(true);
    expect(Math.min(...xTicks)).toBeGreaterThanOrEqual(json.sweep.steps[0]!.value - 1e-9);
    expect(Math.max(...xTicks)).toBeLessThanOrEqual(json.sweep.steps.at(-1)!.value + 1e-9);
  }, 90_000);

  it('draws a tornado with one bar per input that moves the result, in ranking order', async () => {
    const body = { tornado: { result: 'T', percent: 10 } };
    const jsonRes = await post('wall-jib-tie-rod/sensitivity', body);
    const json = v1SensitivityResponseSchema.parse(JSON.parse(jsonRes.text));
    const res = await post('wall-jib-tie-rod/sensitivity', body, SVG);
    expect(res.status, res.text).toBe(200);
    expect(res.headers['content-type']).toBe('image/svg+xml; charset=utf-8');
    expect(res.headers.etag).not.toBe(jsonRes.headers.etag);
    const root = svgTree(res.text);
    expectStandalone(res.text, root);
    const moving = json.tornado.bars.filter((b) => b.low.value !== b.high.value);
    expect(moving.length).toBeGreaterThan(1);
    expect(byClass(root, 'recharts-bar-rectangle')).toHaveLength(moving.length);
    // Labels that do not fit the axis wrap onto lines of their own (tspans).
    const squash = (x: string) => x.replace(/\s+/g, '');
    expect(tickLabels(root, 'left').map(squash)).toEqual(json.tornado.bars.map((b) => squash(b.label)));
    expect(texts(byClass(root, 'recharts-label'))).toContain(`${json.tornado.result.label} (N)`);
    expect(texts(byClass(root, 'chart-legend-entry')).some((x) => x.startsWith('As set:'))).toBe(true);
    expect(texts(byClass(root, 'chart-footer')).join(' ')).toContain(`version ${json.version}`);
    // Each bar's length in proportion to the span of its two moved results.
    const widths = byClass(root, 'recharts-bar-rectangle').map((g) => Number(all(g, (n) => n.tag === 'path')[0]!.attrs.width));
    const spans = moving.map((b) => Math.abs((b.high.value ?? json.tornado.base) - (b.low.value ?? json.tornado.base)));
    widths.forEach((w, k) => expect(w / widths[0]!).toBeCloseTo(spans[k]! / spans[0]!, 2));
  }, 90_000);

  it('answers 304 to the SVG ETag, and the JSON ETag does not validate the SVG', async () => {
    const body = jibSweep('SI');
    const svg = await post('wall-jib-tie-rod/sweep', body, SVG);
    const json = await post('wall-jib-tie-rod/sweep', body);
    const again = await request(t.app).post('/api/v1/templates/wall-jib-tie-rod/sweep').set(auth()).set('Accept', SVG).set('If-None-Match', svg.headers.etag!).send(body);
    expect(again.status).toBe(304);
    expect(again.headers.vary).toMatch(/\bAccept\b/i);
    const other = await post('wall-jib-tie-rod/sweep', body, SVG).then(() =>
      request(t.app).post('/api/v1/templates/wall-jib-tie-rod/sweep').set(auth()).set('Accept', SVG).set('If-None-Match', json.headers.etag!).send(body).buffer(true).parse(asText).then(withText),
    );
    expect(other.status).toBe(200);
  }, 90_000);

  it('refuses an Accept that allows neither JSON nor SVG with 406, and keeps errors as problem details', async () => {
    for (const accept of ['text/html', 'image/png', 'application/xml']) {
      const res = await post('wall-jib-tie-rod/sensitivity', { tornado: { result: 'T' } }, accept);
      const p = expectProblem(res, 406, '/problems/not-acceptable');
      expect(p.detail).toContain(accept);
      expect(res.headers.vary).toMatch(/\bAccept\b/i);
    }
    const ok = await post('wall-jib-tie-rod/sensitivity', { tornado: { result: 'T' } }, 'text/html, image/svg+xml;q=0.5');
    expect(ok.headers['content-type']).toBe('image/svg+xml; charset=utf-8');
    const invalid = await post('wall-jib-tie-rod/sweep', { sweep: { input: 'L', steps: 1 } }, SVG);
    expect(expectProblem(invalid, 422).errors?.[0]?.path).toBe('/sweep/steps');
    const unknown = await post('wall-jib-tie-rod/sensitivity', { tornado: { result: 'nope' } }, SVG);
    expect(unknown.status).toBeGreaterThanOrEqual(400);
    expect(unknown.headers['content-type']).toMatch(/^application\/problem\+json/);
  }, 90_000);

  it('declares the SVG answer and the 406 in the OpenAPI document for the two chart operations only', async () => {
    const doc = (await request(t.app).get('/api/v1/openapi.json')).body as { paths: Record<string, { post?: { responses: Record<string, { content?: Record<string, unknown> }> } }> };
    for (const path of ['/templates/{slug}/sweep', '/templates/{slug}/sensitivity']) {
      const responses = doc.paths[path]!.post!.responses;
      expect(Object.keys(responses['200']!.content!)).toEqual(['application/json', 'image/svg+xml']);
      expect(Object.keys(responses['406']!.content!)).toEqual(['application/problem+json']);
    }
    expect(Object.keys(doc.paths['/templates/{slug}/solve']!.post!.responses['200']!.content!)).toEqual(['application/json']);
  });
});
