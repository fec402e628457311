import { describe, expect, it } from 'vitest';
import type { ApiKeyInfo } from '../../../shared/api/v1';
import { keyStatus } from '../../../src/features/api-keys/components/key-status';
import { formatDateTime } from '../../../src/lib/format-time';

const now = new Date('2026-12-02T12:00:00Z');
const base: ApiKeyInfo = {
  id: 'k1',
  organisationId: 'o1',
  name: 'Quoting tool',
  prefix: 'pw_sk_abcdefghij',
  kind: 'secret',
  scopes: ['solve'],
  allowedOrigins: [],
  createdAt: '2026-11-01T08:00:00Z',
  expiresAt: null,
  revokedAt: null,
  lastUsedAt: null,
  ratePerMinute: null,
  rotatedFromId: null,
};
const key = (over: Partial<ApiKeyInfo>): ApiKeyInfo => ({ ...base, ...over });

describe('key status wording', () => {
  it('calls a live key without expiry, and one expiring later, active', () => {
    expect(keyStatus(base, [base], now)).toEqual({ state: 'active', label: 'Active', detail: '' });
    const later = key({ expiresAt: '2027-01-01T00:00:00Z' });
    expect(keyStatus(later, [later], now).state).toBe('active');
  });

  it('names revocation before expiry, with the moment it happened', () => {
    const k = key({ revokedAt: '2026-12-01T09:30:00Z', expiresAt: '2026-11-30T00:00:00Z' });
    expect(keyStatus(k, [k], now)).toEqual({ state: 'revoked', label: `Revoked ${formatDateTime('2026-12-01T09:30:00Z')}`, detail: formatDateTime('2026-12-01T09:30:00Z') });
  });

  it('calls a key past its expiry expired', () => {
    const k = key({ expiresAt: '2026-12-02T11:59:59Z' });
    expect(keyStatus(k, [k], now)).toEqual({ state: 'expired', label: `Expired ${formatDateTime('2026-12-02T11:59:59Z')}`, detail: formatDateTime('2026-12-02T11:59:59Z') });
  });

  it('says until when a rotated key keeps working, and only while its successor exists', () => {
    const old = key({ expiresAt: '2026-12-03T12:00:00Z' });
    const successor = key({ id: 'k2', prefix: 'pw_sk_klmnopqrst', rotatedFromId: 'k1' });
    expect(keyStatus(old, [successor, old], now)).toEqual({ state: 'rotating', label: `Rotating until ${formatDateTime('2026-12-03T12:00:00Z')}`, detail: `until ${formatDateTime('2026-12-03T12:00:00Z')}` });
    expect(keyStatus(successor, [successor, old], now).state).toBe('active');
    expect(keyStatus(old, [old], now).state).toBe('active');
    expect(keyStatus(old, [successor, old], new Date('2026-12-04T00:00:00Z')).state).toBe('expired');
  });
});
