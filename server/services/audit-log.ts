import { and, count, desc, eq, gte, like, lt, or, type SQL } from 'drizzle-orm';
import type { AuditEntry, AuditPage } from '../../shared/api/auth';
import type { Database } from '../db/database';
import { auditLog } from '../db/schema/audit';
import { users } from '../db/schema/auth';

export interface AuditFilter {
  action?: string | undefined;
  actor?: string | undefined;
  target?: string | undefined;
  from?: string | undefined;
  to?: string | undefined;
}

export const AUDIT_CSV_MAX_ROWS = 10_000;

/** Reading the audit log for admins: filters, pages, CSV. Writing stays in audit.ts. */
export class AuditLogService {
  constructor(private readonly db: Database) {}

  private where(filter: AuditFilter): SQL | undefined {
    const parts: SQL[] = [];
    if (filter.action) {
      parts.push(filter.action.endsWith('.') ? like(auditLog.action, `${filter.action.replace(/[\\%_]/g, (c) => `\\${c}`)}%`) : eq(auditLog.action, filter.action));
    }
    if (filter.actor) parts.push(or(eq(auditLog.actorId, filter.actor), eq(users.email, filter.actor.toLowerCase()))!);
    if (filter.target) parts.push(eq(auditLog.target, filter.target));
    if (filter.from) parts.push(gte(auditLog.at, new Date(filter.from)));
    if (filter.to) parts.push(lt(auditLog.at, new Date(filter.to)));
    return parts.length ? and(...parts) : undefined;
  }

  private select(filter: AuditFilter) {
    return this.db
      .select({ entry: auditLog, actorEmail: users.email })
      .from(auditLog)
      .leftJoin(users, and(eq(auditLog.actorKind, 'user'), eq(users.id, auditLog.actorId)))
      .where(this.where(filter))
      .orderBy(desc(auditLog.at), desc(auditLog.id));
  }

  async list(filter: AuditFilter & { page: number; pageSize: number }): Promise<AuditPage> {
    const [rows, [total]] = await Promise.all([
      this.select(filter).limit(filter.pageSize).offset((filter.page - 1) * filter.pageSize),
      this.db
        .select({ n: count() })
        .from(auditLog)
        .leftJoin(users, and(eq(auditLog.actorKind, 'user'), eq(users.id, auditLog.actorId)))
        .where(this.where(filter)),
    ]);
    return { items: rows.map(toEntry), total: total?.n ?? 0, page: filter.page, pageSize: filter.pageSize };
  }

  async csv(filter: AuditFilter): Promise<string> {
    const rows = (await this.select(filter).limit(AUDIT_CSV_MAX_ROWS)).map(toEntry);
    const header = ['at', 'actor_kind', 'actor_id', 'actor_email', 'action', 'target', 'ip', 'details'];
    const lines = rows.map((e) => [e.at, e.actorKind, e.actorId, e.actorEmail, e.action, e.target, e.ip, JSON.stringify(e.details)].map(csvCell).join(','));
    return [header.join(','), ...lines].join('\r\n') + '\r\n';
  }
}

function toEntry(row: { entry: typeof auditLog.$inferSelect; actorEmail: string | null }): AuditEntry {
  const e = row.entry;
  return { id: e.id, at: e.at.toISOString(), actorKind: e.actorKind, actorId: e.actorId, actorEmail: row.actorEmail, action: e.action, target: e.target, ip: e.ip, details: e.details };
}

/** RFC 4180 quoting, and a leading quote on cells a spreadsheet would run as a formula. */
export function csvCell(value: string | null): string {
  if (value === null) return '';
  const safe = /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
  return /[",\r\n]/.test(safe) ? `"${safe.replaceAll('"', '""')}"` : safe;
}
