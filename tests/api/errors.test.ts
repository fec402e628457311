import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { problemSchema, problemTypes } from '../../shared/api/problem';
import type { DatabaseHandle } from '../../server/db/database';
import { openTestDatabase } from '../helpers/test-database';
import { appFor } from './app-fixture';

let database: DatabaseHandle;
let app: ReturnType<typeof appFor>;
beforeAll(async () => {
  database = await openTestDatabase();
  app = appFor(database, { jsonLimit: '1kb' });
});
afterAll(async () => {
  await database?.close();
});

function expectProblem(res: request.Response, status: number) {
  expect(res.status).toBe(status);
  expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
  expect(res.text).not.toMatch(/<html|<!doctype/i);
  const problem = problemSchema.parse(JSON.parse(res.text));
  expect(problem.status).toBe(status);
  expect(problem.title.length).toBeGreaterThan(0);
  expect(problem.detail?.length).toBeGreaterThan(0);
  return problem;
}

describe('problem details for bad requests', () => {
  it('answers malformed JSON with 400', async () => {
    const res = await request(app)
      .post('/api/health')
      .set('Content-Type', 'application/json')
      .send('{"load": 12.5,');
    const problem = expectProblem(res, 400);
    expect(problem.type).toBe(problemTypes.malformedJson);
    expect(problem.instance).toBe('/api/health');
  });

  it('answers a body over the limit with 413 and names the limit', async () => {
    const res = await request(app)
      .post('/api/anything')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ note: 'x'.repeat(2048) }));
    const problem = expectProblem(res, 413);
    expect(problem.type).toBe(problemTypes.payloadTooLarge);
    expect(problem.detail).toContain('1024');
  });

  it('keeps the default limit at 100 kB', async () => {
    const defaultApp = appFor(database);
    const under = await request(defaultApp)
      .post('/api/no-such-endpoint')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ note: 'x'.repeat(90 * 1024) }));
    expectProblem(under, 404);
    const over = await request(defaultApp)
      .post('/api/no-such-endpoint')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ note: 'x'.repeat(110 * 1024) }));
    expectProblem(over, 413);
  });

  it('answers an unsupported content encoding with 415', async () => {
    const res = await request(app)
      .post('/api/health')
      .set('Content-Type', 'application/json')
      .set('Content-Encoding', 'compress-me-not')
      .send('{}');
    const problem = expectProblem(res, 415);
    expect(problem.detail).toContain('compress-me-not');
  });

  it.each([
    ['GET', '/api/no-such-endpoint'],
    ['GET', '/api'],
    ['DELETE', '/api/no-such-area/unknown'],
    ['POST', '/api/health/extra'],
  ])('answers %s %s with a 404 problem, also when the client asks for HTML', async (method, url) => {
    const res = await request(app)[method.toLowerCase() as 'get'](url).set('Accept', 'text/html');
    const problem = expectProblem(res, 404);
    expect(problem.type).toBe(problemTypes.notFound);
    expect(problem.detail).toContain(method);
  });

  it('does not let caches keep problem responses', async () => {
    const res = await request(app).get('/api/no-such-endpoint');
    expect(res.headers['cache-control']).toBe('no-store');
  });
});
