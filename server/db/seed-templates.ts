import { and, eq, inArray } from 'drizzle-orm';
import { inputJsonSchema } from '../../shared/spec/input-schema';
import { templateSpecSchema, type TemplateSpecInput } from '../../shared/spec/template-spec';
import { validateSpec } from '../../shared/spec/validate-spec';
import { recordAudit } from '../services/audit';
import { contentHash } from '../services/templates/content-hash';
import { inputValidatorScript } from '../services/templates/input-validator';
import { compareSemver } from '../services/templates/template-store';
import type { Database } from './database';
import { organisations } from './schema/organisations';
import { templates, templateVersions } from './schema/templates';

export interface TemplateSeedReport {
  templates: number;
  versions: number;
}

/** 1.4.2 → 1.5.0: a changed built-in is a new minor version (same inputs and results promised). */
const nextMinor = (v: string) => {
  const [major, minor] = v.split(/[.-]/).map(Number);
  return `${major}.${(minor ?? 0) + 1}.0`;
};

/**
 * Seeds the built-in templates as published versions owned by the demo engineering
 * organisation. Idempotent: a spec whose content hash is already the latest version adds
 * nothing; a changed spec becomes a new version (published versions are frozen by a trigger,
 * so an overwrite could not happen even by mistake). Each version written is audited as
 * template.published by the system.
 */
export async function seedBuiltInTemplates(db: Database, specs: readonly TemplateSpecInput[], ownerSlug: string): Promise<TemplateSeedReport> {
  const report = { templates: 0, versions: 0 };
  const [owner] = await db.select({ id: organisations.id }).from(organisations).where(eq(organisations.slug, ownerSlug));
  // Every start comes through here: one query answers "already stored?" for all built-ins, so a
  // restart validates, compiles and writes nothing.
  const stored = new Set(
    (
      await db
        .select({ hash: templateVersions.contentHash })
        .from(templateVersions)
        .innerJoin(templates, eq(templates.id, templateVersions.templateId))
        .where(inArray(templates.slug, specs.map((s) => s.slug)))
    ).map((r) => r.hash),
  );
  for (const input of specs) {
    const parsed = templateSpecSchema.safeParse(input);
    if (parsed.success && stored.has(contentHash(parsed.data))) continue;
    const checked = validateSpec(input);
    if (!checked.ok) {
      throw new Error(`Built-in template ${input.slug} is not valid: ${checked.issues.map((i) => `${i.path.join('.')}: ${i.message}`).join('; ')}`);
    }
    const spec = templateSpecSchema.parse(input);
    const hash = contentHash(spec);
    await db.transaction(async (tx) => {
      const inserted = await tx
        .insert(templates)
        .values({ slug: spec.slug, title: spec.title, summary: spec.summary, category: spec.category, ownerOrganisationId: owner?.id ?? null })
        .onConflictDoNothing({ target: templates.slug })
        .returning({ id: templates.id });
      report.templates += inserted.length;
      const [template] = await tx.select({ id: templates.id }).from(templates).where(eq(templates.slug, spec.slug));
      const versions = await tx
        .select({ semver: templateVersions.semver, contentHash: templateVersions.contentHash })
        .from(templateVersions)
        .where(eq(templateVersions.templateId, template!.id));
      if (versions.some((v) => v.contentHash === hash)) return;
      const latest = versions.map((v) => v.semver).sort(compareSemver).at(-1);
      const semver = latest ? nextMinor(latest) : '1.0.0';
      await tx.insert(templateVersions).values({
        templateId: template!.id,
        semver,
        status: 'published',
        spec,
        contentHash: hash,
        changelog: latest ? `Built-in template updated (was ${latest}).` : 'First published version of the built-in template.',
        publishedAt: new Date(),
        validatorScript: await inputValidatorScript(inputJsonSchema(spec), hash),
      });
      // Only a version written here is a publication: a restart that finds it stored records nothing.
      await recordAudit(tx, {
        actorKind: 'system',
        action: 'template.published',
        target: `template:${spec.slug}`,
        details: { slug: spec.slug, version: semver, contentHash: hash, source: 'built-in' },
      });
      if (latest) {
        await tx.update(templates).set({ title: spec.title, summary: spec.summary, category: spec.category }).where(and(eq(templates.id, template!.id)));
      }
      report.versions++;
    });
  }
  return report;
}
