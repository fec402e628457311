import { sql } from 'drizzle-orm';
import { bigint, check, index, jsonb, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

export const auditActorKinds = ['user', 'api_key', 'system'] as const;
export type AuditActorKind = (typeof auditActorKinds)[number];

// No foreign keys on purpose: an audit row must outlive the user or key it names.
export const auditLog = pgTable(
  'audit_log',
  {
    id: bigint('id', { mode: 'number' }).primaryKey().generatedAlwaysAsIdentity(),
    actorKind: text('actor_kind').$type<AuditActorKind>().notNull(),
    actorId: text('actor_id'),
    action: text('action').notNull(),
    target: text('target'),
    ip: text('ip'),
    at: timestamp('at', { withTimezone: true }).notNull().defaultNow(),
    details: jsonb('details').$type<Record<string, unknown>>().notNull().default({}),
  },
  (t) => [
    check('audit_log_actor_kind_known', sql`${t.actorKind} in ('user', 'api_key', 'system')`),
    index('audit_log_at_idx').on(t.at),
    index('audit_log_action_idx').on(t.action),
  ],
);
