import { sql } from 'drizzle-orm';
import { check, index, jsonb, pgTable, text, timestamp, unique, uuid } from 'drizzle-orm/pg-core';
import { users } from './auth';
import { organisations } from './organisations';

export const templateVersionStatuses = ['draft', 'published', 'deprecated'] as const;
export type TemplateVersionStatus = (typeof templateVersionStatuses)[number];

export const templates = pgTable(
  'templates',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    slug: text('slug').notNull().unique(),
    title: text('title').notNull(),
    category: text('category').notNull(),
    summary: text('summary').notNull().default(''),
    ownerOrganisationId: uuid('owner_organisation_id').references(() => organisations.id, {
      onDelete: 'restrict',
    }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp('updated_at', { withTimezone: true })
      .notNull()
      .defaultNow()
      .$onUpdate(() => new Date()),
  },
  (t) => [
    check('templates_slug_format', sql`${t.slug} ~ '^[a-z0-9]+(-[a-z0-9]+)*$'`),
    index('templates_owner_organisation_id_idx').on(t.ownerOrganisationId),
  ],
);

// Published (and later deprecated) versions are frozen by a trigger in a custom migration
// (drizzle/*_template_version_immutability.sql): results are cached by content hash, so the
// spec behind a hash must never change.
export const templateVersions = pgTable(
  'template_versions',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    templateId: uuid('template_id')
      .notNull()
      .references(() => templates.id, { onDelete: 'restrict' }),
    semver: text('semver').notNull(),
    status: text('status').$type<TemplateVersionStatus>().notNull().default('draft'),
    spec: jsonb('spec').notNull(),
    contentHash: text('content_hash').notNull(),
    changelog: text('changelog').notNull().default(''),
    /**
     * The precompiled input validator (RJSF / ajv standalone code) generated when the version is
     * published, served as a same-origin script so the form validates under a CSP without eval.
     */
    validatorScript: text('validator_script'),
    authorId: text('author_id').references(() => users.id, { onDelete: 'set null' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    publishedAt: timestamp('published_at', { withTimezone: true }),
  },
  (t) => [
    unique('template_versions_template_semver_unique').on(t.templateId, t.semver),
    index('template_versions_content_hash_idx').on(t.contentHash),
    check('template_versions_status_known', sql`${t.status} in ('draft', 'published', 'deprecated')`),
    check(
      'template_versions_semver_format',
      sql`${t.semver} ~ '^(0|[1-9][0-9]*)\\.(0|[1-9][0-9]*)\\.(0|[1-9][0-9]*)(-[0-9A-Za-z.-]+)?$'`,
    ),
    check(
      'template_versions_published_at_set',
      sql`${t.status} = 'draft' or ${t.publishedAt} is not null`,
    ),
  ],
);
