import { eq, inArray } from 'drizzle-orm';
import type { Database } from './database';
import { demoOrganisations, demoUsers } from './demo-data';
import { users } from './schema/auth';
import { members, organisations } from './schema/organisations';
import { templates, templateVersions } from './schema/templates';

export interface SeedReport {
  organisations: number;
  users: number;
  members: number;
}

/**
 * Runs on every start. Each insert is keyed on a unique column and skips rows that exist, so a
 * second run inserts nothing and never overwrites what users have changed since.
 */
export async function seedDemoData(db: Database): Promise<SeedReport> {
  return db.transaction(async (tx) => {
    const insertedOrganisations = await tx
      .insert(organisations)
      .values(demoOrganisations.map((o) => ({ slug: o.slug, name: o.name, kind: o.kind })))
      .onConflictDoNothing({ target: organisations.slug })
      .returning({ id: organisations.id });

    const insertedUsers = await tx
      .insert(users)
      .values(demoUsers.map((u) => ({ id: u.id, name: u.name, email: u.email, role: u.role })))
      .onConflictDoNothing()
      .returning({ id: users.id });

    const organisationRows = await tx
      .select({ id: organisations.id, slug: organisations.slug })
      .from(organisations)
      .where(inArray(organisations.slug, demoOrganisations.map((o) => o.slug)));
    const organisationIdBySlug = new Map(organisationRows.map((row) => [row.slug, row.id]));
    const userRows = await tx
      .select({ id: users.id, email: users.email })
      .from(users)
      .where(inArray(users.email, demoUsers.map((u) => u.email)));
    const userIdByEmail = new Map(userRows.map((row) => [row.email, row.id]));

    const membershipRows = demoUsers.flatMap((user) =>
      user.memberOf.flatMap((membership) => {
        const organisationId = organisationIdBySlug.get(membership.organisationSlug);
        const userId = userIdByEmail.get(user.email);
        return organisationId && userId ? [{ organisationId, userId, role: membership.role }] : [];
      }),
    );
    const insertedMembers = membershipRows.length
      ? await tx
          .insert(members)
          .values(membershipRows)
          .onConflictDoNothing({ target: [members.organisationId, members.userId] })
          .returning({ id: members.id })
      : [];

    return {
      organisations: insertedOrganisations.length,
      users: insertedUsers.length,
      members: insertedMembers.length,
    };
  });
}

/** One built-in template as the templates issue will hand it over: a spec with its hash. */
export interface BuiltInTemplate {
  slug: string;
  title: string;
  category: string;
  summary: string;
  semver: string;
  changelog: string;
  spec: unknown;
  /** Hash of the spec's canonical form, computed by whoever owns the spec format. */
  contentHash: string;
  /** Slug of the organisation that owns it; built-ins belong to the demo engineering org. */
  ownerOrganisationSlug: string;
}

/**
 * Hook for the built-in templates issue: inserts each template and its version as published,
 * once. A spec change must come with a new semver (published versions are frozen), and an
 * existing (slug, semver) is left exactly as it is.
 */
export async function seedBuiltInTemplates(
  db: Database,
  builtIns: readonly BuiltInTemplate[],
): Promise<{ templates: number; versions: number }> {
  let insertedTemplates = 0;
  let insertedVersions = 0;
  await db.transaction(async (tx) => {
    for (const builtIn of builtIns) {
      const [owner] = await tx
        .select({ id: organisations.id })
        .from(organisations)
        .where(eq(organisations.slug, builtIn.ownerOrganisationSlug));
      if (!owner) throw new Error(`built-in template ${builtIn.slug}: no organisation ${builtIn.ownerOrganisationSlug}`);

      const inserted = await tx
        .insert(templates)
        .values({
          slug: builtIn.slug,
          title: builtIn.title,
          category: builtIn.category,
          summary: builtIn.summary,
          ownerOrganisationId: owner.id,
        })
        .onConflictDoNothing({ target: templates.slug })
        .returning({ id: templates.id });
      insertedTemplates += inserted.length;

      const [template] = await tx
        .select({ id: templates.id })
        .from(templates)
        .where(eq(templates.slug, builtIn.slug));
      if (!template) throw new Error(`built-in template ${builtIn.slug} vanished while seeding`);

      const version = await tx
        .insert(templateVersions)
        .values({
          templateId: template.id,
          semver: builtIn.semver,
          status: 'published',
          spec: builtIn.spec,
          contentHash: builtIn.contentHash,
          changelog: builtIn.changelog,
          publishedAt: new Date(),
        })
        .onConflictDoNothing({ target: [templateVersions.templateId, templateVersions.semver] })
        .returning({ id: templateVersions.id });
      insertedVersions += version.length;
    }
  });
  return { templates: insertedTemplates, versions: insertedVersions };
}
