import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { DatabaseHandle } from '../../server/db/database';
import { openTestDatabase } from '../helpers/test-database';
import { appFor } from './app-fixture';

let database: DatabaseHandle;
beforeAll(async () => {
  database = await openTestDatabase();
});
afterAll(async () => {
  await database?.close();
});

function parseCsp(header: string): Map<string, string[]> {
  return new Map(
    header
      .split(';')
      .map((part) => part.trim().split(/\s+/))
      .filter((words) => words[0])
      .map(([name, ...values]) => [name!, values]),
  );
}

describe('security headers', () => {
  it.each(['/api/health', '/api/no-such-endpoint'])('sends a strict Content-Security-Policy on %s', async (url) => {
    const res = await request(appFor(database)).get(url);
    const header = res.headers['content-security-policy'];
    expect(header).toBeTypeOf('string');
    const csp = parseCsp(header as string);
    expect(csp.get('default-src')).toEqual(["'self'"]);
    expect(csp.get('script-src')).toEqual(["'self'"]);
    expect(csp.get('style-src')).toEqual(["'self'"]);
    expect(csp.get('img-src')).toEqual(["'self'", 'data:']);
    expect(csp.get('font-src')).toEqual(["'self'"]);
    expect(csp.get('object-src')).toEqual(["'none'"]);
    expect(csp.get('frame-ancestors')).toEqual(["'none'"]);
    expect(header).not.toMatch(/unsafe-inline|unsafe-eval|wasm-unsafe-eval|\*|https?:/);
  });

  it('sends the other protective headers and hides the framework', async () => {
    const res = await request(appFor(database)).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-frame-options']).toBe('DENY');
    expect(res.headers['referrer-policy']).toBe('no-referrer');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});
