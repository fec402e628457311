import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import type { ApiKeyInfo } from '../../../shared/api/v1';
import { KeyTable } from '../../../src/features/api-keys/components/key-table';

const now = new Date('2026-12-02T12:00:00Z');
const k = (over: Partial<ApiKeyInfo>): ApiKeyInfo => ({
  id: 'k1',
  organisationId: 'o1',
  name: 'Quoting tool',
  prefix: 'pw_sk_abcdefghij',
  kind: 'secret',
  scopes: ['read', 'solve'],
  allowedOrigins: [],
  createdAt: '2026-11-01T08:00:00Z',
  expiresAt: null,
  revokedAt: null,
  lastUsedAt: null,
  ratePerMinute: null,
  rotatedFromId: null,
  ...over,
});
const keys = [
  k({}),
  k({ id: 'k2', name: 'Shop pages', prefix: 'pw_pk_klmnopqrst', kind: 'publishable', allowedOrigins: ['https://shop.example.com'], lastUsedAt: '2026-12-02T11:00:00Z' }),
  k({ id: 'k3', name: 'Old tool', prefix: 'pw_sk_uvwxyz0123', revokedAt: '2026-11-20T00:00:00Z' }),
];
const html = (canManage: boolean, names?: Record<string, string>) =>
  renderToStaticMarkup(<KeyTable keys={keys} caption="Keys" canManage={canManage} organisationNames={names} onRotate={() => {}} onRevoke={() => {}} now={now} />);
const count = (text: string, part: string) => text.split(part).length - 1;

describe('the key table', () => {
  it('offers rotate and revoke to owners for live keys only (table and card each)', () => {
    const out = html(true);
    expect(count(out, '>Rotate<')).toBe(2 * 2);
    expect(count(out, '>Revoke<')).toBe(2 * 2);
    expect(out).toContain('Revoke<span class="sr-only"> Shop pages (pw_pk_klmnopqrst)</span>');
  });

  it('is read-only for members: no action button at all', () => {
    const out = html(false);
    expect(out).not.toContain('<button');
    expect(out).toContain('pw_pk_klmnopqrst…');
    expect(out).toContain('https://shop.example.com');
    expect(out).toContain('Not yet');
    expect(out).toContain('data-key-state="revoked"');
  });

  it('names each key’s organisation in the admin view, and an admin’s own key as such', () => {
    const out = renderToStaticMarkup(
      <KeyTable keys={[k({}), k({ id: 'k9', organisationId: null })]} caption="All" canManage organisationNames={{ o1: 'Brightwater Rigging Supply' }} onRevoke={() => {}} now={now} />,
    );
    expect(out).toContain('>Organisation</th>');
    expect(count(out, 'Brightwater Rigging Supply')).toBe(2);
    expect(out).toContain('Administrator’s own');
    expect(out).not.toContain('>Rotate<');
  });
});
