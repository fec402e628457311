import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { AnswerCache } from '../../server/services/api-v1/answer-cache';
import { V1Catalogue } from '../../server/services/api-v1/v1-catalogue';
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
});
afterAll(async () => {
  vi.restoreAllMocks();
  await database?.close();
});

const solve = (inputs: Record<string, number>) =>
  request(t.app).post('/api/v1/templates/wall-jib-tie-rod/solve').set('Authorization', `Bearer ${key}`).send({ inputs });

describe('answers kept by their ETag', () => {
  it('solves a question once and answers its repeats with the same bytes, and a new question anew', async () => {
    const spy = vi.spyOn(V1Catalogue.prototype, 'solve');
    const first = await solve({ L: 3100, h: 1400 });
    const again = await solve({ h: 1400, L: 3100 });
    expect(first.status).toBe(200);
    expect(again.status).toBe(200);
    expect(again.text).toBe(first.text);
    expect(again.headers.etag).toBe(first.headers.etag);
    expect(again.headers['content-type']).toBe('application/json; charset=utf-8');
    expect(spy).toHaveBeenCalledTimes(1);

    const other = await solve({ L: 3200, h: 1400 });
    expect(other.status).toBe(200);
    expect(other.body.result.inputs.L).toBe(3200);
    expect(spy).toHaveBeenCalledTimes(2);
    spy.mockRestore();
  });

  it('draws a chart once and sweeps for it once, however often it is asked for', async () => {
    const spy = vi.spyOn(V1Catalogue.prototype, 'sweep');
    const ask = () =>
      request(t.app)
        .post('/api/v1/templates/wall-jib-tie-rod/sweep')
        .set('Authorization', `Bearer ${key}`)
        .set('Accept', 'image/svg+xml')
        .send({ sweep: { input: 'L', from: 2100, to: 3900, steps: 5 } })
        .buffer(true)
        .parse((res, done) => {
          let text = '';
          res.on('data', (chunk: Buffer) => (text += chunk.toString('utf8')));
          res.on('end', () => done(null, text));
        });
    const first = await ask();
    const again = await ask();
    expect(first.status).toBe(200);
    expect(again.body).toBe(first.body);
    expect(spy).toHaveBeenCalledTimes(1);
    spy.mockRestore();
  }, 60_000);

  it('keeps no refusal: a question the engine refuses is asked of it each time', async () => {
    const spy = vi.spyOn(V1Catalogue.prototype, 'solve');
    expectProblem(await solve({ L: 5 }), 422);
    expectProblem(await solve({ L: 5 }), 422);
    expect(spy).toHaveBeenCalledTimes(2);
    spy.mockRestore();
  });

  it('holds answers up to its size in bytes, dropping the least recently used first', () => {
    const cache = new AnswerCache(100);
    cache.set('a', 'x'.repeat(40));
    cache.set('b', 'y'.repeat(40));
    expect(cache.get('a')).toBe('x'.repeat(40)); // a is now the more recent
    cache.set('c', 'z'.repeat(40));
    expect(cache.get('b')).toBeUndefined();
    expect(cache.get('a')).toBeDefined();
    expect(cache.get('c')).toBeDefined();
    cache.set('huge', 'h'.repeat(500));
    expect(cache.get('huge')).toBeUndefined();
  });
});
