import type { ApiKeyInfo } from '../../../../shared/api/v1';
import { formatDateTime } from '../../../lib/format-time';

export type KeyState = 'active' | 'rotating' | 'revoked' | 'expired';

export interface KeyStatus {
  state: KeyState;
  /** The words in the table: "Active", "Rotating until 3 Dec 2026, 10:00", "Revoked", "Expired". */
  label: string;
}

export const keyStateNames: Record<KeyState, string> = {
  active: 'Active',
  rotating: 'Rotating',
  revoked: 'Revoked',
  expired: 'Expired',
};

const passed = (iso: string | null, now: Date) => iso !== null && Date.parse(iso) <= now.getTime();

/**
 * A key's state as its owner reads it. A key with a successor (rotation) still works until the
 * end of its grace period, which the server stores as its expiry; after that it is expired.
 */
export function keyStatus(key: ApiKeyInfo, all: readonly ApiKeyInfo[], now = new Date()): KeyStatus {
  if (passed(key.revokedAt, now)) return { state: 'revoked', label: `Revoked ${formatDateTime(key.revokedAt)}` };
  if (passed(key.expiresAt, now)) return { state: 'expired', label: `Expired ${formatDateTime(key.expiresAt)}` };
  const replaced = all.some((k) => k.rotatedFromId === key.id);
  if (replaced && key.expiresAt) return { state: 'rotating', label: `Rotating until ${formatDateTime(key.expiresAt)}` };
  return { state: 'active', label: 'Active' };
}

export const kindNames = { secret: 'Secret', publishable: 'Publishable' } as const;

export const scopeNames = {
  read: 'Read templates',
  solve: 'Solve',
  sweep: 'Sweep',
  sensitivity: 'Sensitivity',
  author: 'Author (specs)',
} as const;
