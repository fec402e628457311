import express from 'express';
import request from 'supertest';
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { fieldErrorsFromZodIssues, problemSchema, problemTypes, toJsonPointer } from '../../shared/api/problem';
import { problemErrorHandler } from '../../server/middleware/error-handler';
import { parseOrThrow } from '../../server/middleware/validate';
import { silentLogger } from './app-fixture';

// A stand-in route shaped like the ones later issues add: parse the body, then answer.
const bodySchema = z.object({
  template: z.string().min(1),
  inputs: z.array(z.object({ key: z.string(), value: z.number().positive() })),
});

function appWithRoute(handler: express.RequestHandler) {
  const app = express();
  app.use(express.json());
  app.post('/api/solve', handler);
  app.use(problemErrorHandler(silentLogger));
  return app;
}

describe('problem details middleware', () => {
  it('turns a failed parse into 422 with one JSON Pointer per bad field', async () => {
    const app = appWithRoute((req, res) => {
      res.json(parseOrThrow(bodySchema, req.body));
    });
    const res = await request(app)
      .post('/api/solve')
      .send({ template: '', inputs: [{ key: 'span', value: 1200 }, { key: 'load', value: -5 }] });
    expect(res.status).toBe(422);
    expect(res.headers['content-type']).toMatch(/^application\/problem\+json/);
    const problem = problemSchema.parse(res.body);
    expect(problem.type).toBe(problemTypes.validation);
    expect(problem.errors?.map((e) => e.path).sort()).toEqual(['/inputs/1/value', '/template']);
    for (const error of problem.errors ?? []) expect(error.message.length).toBeGreaterThan(0);
  });

  it('answers 500 without internals for an unexpected error', async () => {
    const app = appWithRoute(() => {
      throw new Error('secret connection string postgres://u:p@h/db');
    });
    const res = await request(app).post('/api/solve').send({});
    expect(res.status).toBe(500);
    const problem = problemSchema.parse(res.body);
    expect(problem.type).toBe(problemTypes.internal);
    expect(res.text).not.toContain('postgres://');
  });

  it('escapes ~ and / in pointer segments (RFC 6901)', () => {
    expect(toJsonPointer(['derived', 'a/b', 'c~d', 0])).toBe('/derived/a~1b/c~0d/0');
    expect(toJsonPointer([])).toBe('');
  });

  it('maps zod issues from nested objects and the root', () => {
    const root = z.object({ a: z.number() }).safeParse('not an object');
    const nested = z.object({ a: z.object({ b: z.string() }) }).safeParse({ a: { b: 3 } });
    expect(root.success || nested.success).toBe(false);
    expect(fieldErrorsFromZodIssues(root.error!.issues).map((e) => e.path)).toEqual(['']);
    expect(fieldErrorsFromZodIssues(nested.error!.issues).map((e) => e.path)).toEqual(['/a/b']);
  });
});
