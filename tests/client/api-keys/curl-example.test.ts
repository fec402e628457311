import { describe, expect, it } from 'vitest';
import { curlExample } from '../../../src/features/api-keys/components/curl-example';

const key = 'pw_sk_abcdefghij_' + 'x'.repeat(32);

describe('the first curl call shown with a new key', () => {
  it('solves the wall jib as docs/api.md does for a key with the solve scope', () => {
    const line = curlExample('http://localhost:3000/', key, { kind: 'secret', scopes: ['read', 'solve'], allowedOrigins: [] });
    expect(line).toBe(
      `curl -s "http://localhost:3000/api/v1/templates/wall-jib-tie-rod/solve" \\\n` +
        `  -H "Authorization: Bearer ${key}" -H "Content-Type: application/json" \\\n` +
        `  -d '{"version":"^1.0.0","inputs":{"L":4000,"h":1500},"units":"SI"}'`,
    );
  });

  it('lists templates for a read-only key and sends a publishable key’s first origin', () => {
    const line = curlExample('https://pinwork.example', 'pw_pk_k', { kind: 'publishable', scopes: ['read'], allowedOrigins: ['https://shop.example.com', 'https://b.example'] });
    expect(line).toBe(`curl -s "https://pinwork.example/api/v1/templates" \\\n  -H "Authorization: Bearer pw_pk_k" -H "Origin: https://shop.example.com"`);
  });

  it('reaches sweep, sensitivity or spec validation when that is all the key may do', () => {
    const base = { kind: 'secret' as const, allowedOrigins: [] };
    expect(curlExample('http://h', key, { ...base, scopes: ['sweep'] })).toContain('/api/v1/templates/wall-jib-tie-rod/sweep');
    expect(curlExample('http://h', key, { ...base, scopes: ['sensitivity'] })).toContain('"tornado":{"result":"T","percent":10}');
    expect(curlExample('http://h', key, { ...base, scopes: ['author'] })).toContain('/api/v1/specs/validate');
  });
});
