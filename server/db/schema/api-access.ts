import { sql } from 'drizzle-orm';
import {
  check,
  date,
  index,
  integer,
  pgTable,
  primaryKey,
  text,
  timestamp,
  uuid,
} from 'drizzle-orm/pg-core';
import { users } from './auth';
import { organisations } from './organisations';

export const apiKeyKinds = ['secret', 'publishable'] as const;
export type ApiKeyKind = (typeof apiKeyKinds)[number];

// A key is shown once at creation; only its public prefix (to find the row) and a hash of the
// whole key are stored.
export const apiKeys = pgTable(
  'api_keys',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    // Null for an admin's own key (not an organisation's).
    organisationId: uuid('organisation_id').references(() => organisations.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    prefix: text('prefix').notNull().unique(),
    hash: text('hash').notNull(),
    kind: text('kind').$type<ApiKeyKind>().notNull(),
    scopes: text('scopes').array().notNull().default(sql`'{}'::text[]`),
    allowedOrigins: text('allowed_origins').array().notNull().default(sql`'{}'::text[]`),
    createdBy: text('created_by').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    expiresAt: timestamp('expires_at', { withTimezone: true }),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
    lastUsedAt: timestamp('last_used_at', { withTimezone: true }),
    /** Requests a minute for this key; null: the server's default. */
    ratePerMinute: integer('rate_per_minute'),
    /** The key this one replaced by rotation (the old one stays valid until its grace ends). */
    rotatedFromId: uuid('rotated_from_id'),
  },
  (t) => [
    check('api_keys_kind_known', sql`${t.kind} in ('secret', 'publishable')`),
    index('api_keys_organisation_id_idx').on(t.organisationId),
  ],
);

export const usageCounters = pgTable(
  'usage_counters',
  {
    apiKeyId: uuid('api_key_id')
      .notNull()
      .references(() => apiKeys.id, { onDelete: 'cascade' }),
    endpoint: text('endpoint').notNull(),
    day: date('day').notNull(),
    count: integer('count').notNull().default(0),
  },
  (t) => [
    primaryKey({ name: 'usage_counters_key_endpoint_day_pk', columns: [t.apiKeyId, t.endpoint, t.day] }),
    check('usage_counters_count_non_negative', sql`${t.count} >= 0`),
  ],
);

// A monthly request quota per organisation for the public API; no row: the server's default.
export const apiQuotas = pgTable(
  'api_quotas',
  {
    organisationId: uuid('organisation_id')
      .primaryKey()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    monthlyRequests: integer('monthly_requests').notNull(),
  },
  (t) => [check('api_quotas_monthly_non_negative', sql`${t.monthlyRequests} >= 0`)],
);
