import { integer, pgTable, text, timestamp } from 'drizzle-orm/pg-core';

// Rate-limit counters live in the database so every server instance counts the same hits.
export const rateLimitHits = pgTable('rate_limit_hits', {
  key: text('key').primaryKey(),
  hits: integer('hits').notNull().default(0),
  resetAt: timestamp('reset_at', { withTimezone: true }).notNull(),
});
