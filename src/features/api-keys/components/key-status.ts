import type { ApiKeyInfo } from '../../../../shared/api/v1';
import { formatDateTime } from '../../../lib/format-time';

export type KeyState = 'active' | 'rotating' | 'revoked' | 'expired';

export interface KeyStatus {
  state: KeyState;
  /** The whole phrase: "Active", "Rotating until 3 Dec 2026, 10:00", "Revoked 1 Dec 2026, 09:30", "Expired …". */
  label: string;
  /** The part after the state's name ("until …", the moment), shown on its own line; empty for an active key. */
  detail: string;
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
  const status = (state: KeyState, detail: string): KeyStatus => ({ state, detail, label: detail ? `${keyStateNames[state]} ${detail}` : keyStateNames[state] });
  if (passed(key.revokedAt, now)) return status('revoked', formatDateTime(key.revokedAt));
  if (passed(key.expiresAt, now)) return status('expired', formatDateTime(key.expiresAt));
  const replaced = all.some((k) => k.rotatedFromId === key.id);
  if (replaced && key.expiresAt) return status('rotating', `until ${formatDateTime(key.expiresAt)}`);
  return status('active', '');
}

export const kindNames = { secret: 'Secret', publishable: 'Publishable' } as const;

export const scopeNames = {
  read: 'Read templates',
  solve: 'Solve',
  sweep: 'Sweep',
  sensitivity: 'Sensitivity',
  author: 'Author (specs)',
} as const;
