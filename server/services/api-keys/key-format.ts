import { hash, randomBytes, timingSafeEqual } from 'node:crypto';
import type { ApiKeyKind } from '../../db/schema/api-access';

/**
 * A key reads `pw_sk_<id>_<secret>` (secret) or `pw_pk_<id>_<secret>` (publishable). The part up
 * to the id is its visible prefix (stored, shown in the key table, used to find the row); the
 * whole key is stored only as a SHA-256 hash: with 192 random bits no slow hash is needed.
 */
const pattern = /^(pw_(sk|pk)_[0-9a-z]{10})_([A-Za-z0-9_-]{32})$/;

export interface NewKey {
  key: string;
  prefix: string;
  hash: string;
}

export function newKey(kind: ApiKeyKind): NewKey {
  const id = [...randomBytes(10)].map((b) => '0123456789abcdefghijklmnopqrstuvwxyz'[b % 36]).join('');
  const prefix = `pw_${kind === 'secret' ? 'sk' : 'pk'}_${id}`;
  const key = `${prefix}_${randomBytes(24).toString('base64url')}`;
  return { key, prefix, hash: hashKey(key) };
}

export function hashKey(key: string): string {
  return hash('sha256', key, 'hex');
}

/** The prefix of a well-formed key, or null. */
export function prefixOf(key: string): string | null {
  return pattern.exec(key)?.[1] ?? null;
}

export function hashMatches(key: string, storedHash: string): boolean {
  const a = Buffer.from(hashKey(key), 'hex');
  const b = Buffer.from(storedHash, 'hex');
  return a.length === b.length && timingSafeEqual(a, b);
}
