import { index, pgTable, text, timestamp, uuid } from 'drizzle-orm/pg-core';
import { sql } from 'drizzle-orm';
import { organisations } from './organisations';
import { templates, templateVersions } from './templates';

// A supplier's permission to show one template's calculator in an iframe on its own origins.
export const embeds = pgTable(
  'embeds',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    organisationId: uuid('organisation_id')
      .notNull()
      .references(() => organisations.id, { onDelete: 'cascade' }),
    templateId: uuid('template_id')
      .notNull()
      .references(() => templates.id, { onDelete: 'cascade' }),
    // Null follows the latest published version; set, it pins one.
    templateVersionId: uuid('template_version_id').references(() => templateVersions.id, {
      onDelete: 'restrict',
    }),
    allowedOrigins: text('allowed_origins').array().notNull().default(sql`'{}'::text[]`),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
  },
  (t) => [
    index('embeds_organisation_id_idx').on(t.organisationId),
    index('embeds_template_id_idx').on(t.templateId),
  ],
);
