import type { Database } from '../db/database';
import { auditLog, type AuditActorKind } from '../db/schema/audit';

export interface AuditEntry {
  actorKind: AuditActorKind;
  actorId?: string | null;
  action: string;
  target?: string | null;
  ip?: string | null;
  details?: Record<string, unknown>;
}

export async function recordAudit(db: Database, entry: AuditEntry): Promise<void> {
  await db.insert(auditLog).values({
    actorKind: entry.actorKind,
    actorId: entry.actorId ?? null,
    action: entry.action,
    target: entry.target ?? null,
    ip: entry.ip ?? null,
    details: entry.details ?? {},
  });
}
