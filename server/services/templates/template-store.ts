import { and, desc, eq } from 'drizzle-orm';
import type { Database } from '../../db/database';
import { templates, templateVersions, type TemplateVersionStatus } from '../../db/schema/templates';

export interface StoredVersion {
  slug: string;
  title: string;
  summary: string;
  category: string;
  semver: string;
  status: TemplateVersionStatus;
  spec: unknown;
  contentHash: string;
  changelog: string;
  publishedAt: Date | null;
  validatorScript: string | null;
}

export interface VersionInfo {
  semver: string;
  status: TemplateVersionStatus;
  publishedAt: Date | null;
  changelog: string;
}

const columns = {
  slug: templates.slug,
  title: templates.title,
  summary: templates.summary,
  category: templates.category,
  semver: templateVersions.semver,
  status: templateVersions.status,
  spec: templateVersions.spec,
  contentHash: templateVersions.contentHash,
  changelog: templateVersions.changelog,
  publishedAt: templateVersions.publishedAt,
  validatorScript: templateVersions.validatorScript,
};

/** Compares semver strings numerically (1.10.0 after 1.9.0); pre-releases sort before their release. */
export function compareSemver(a: string, b: string): number {
  const [ma, pa = ''] = a.split('-', 2);
  const [mb, pb = ''] = b.split('-', 2);
  const na = ma!.split('.').map(Number);
  const nb = mb!.split('.').map(Number);
  for (let i = 0; i < 3; i++) if (na[i] !== nb[i]) return na[i]! - nb[i]!;
  if (pa === pb) return 0;
  if (!pa) return 1;
  if (!pb) return -1;
  return pa < pb ? -1 : 1;
}

/** The newest version of each slug among the given rows, in the order slugs first appear. */
export function latestPerSlug(rows: readonly StoredVersion[]): StoredVersion[] {
  const latest = new Map<string, StoredVersion>();
  for (const r of rows) {
    const seen = latest.get(r.slug);
    if (!seen || compareSemver(r.semver, seen.semver) > 0) latest.set(r.slug, r);
  }
  return [...latest.values()];
}

/** A version as the version lists of both APIs show it. */
export function versionInfo(r: StoredVersion) {
  return { version: r.semver, status: r.status, publishedAt: r.publishedAt ? r.publishedAt.toISOString() : null, changelog: r.changelog };
}

/** Data access for templates and their versions; no rules beyond "published" here. */
export class TemplateStore {
  constructor(private readonly db: Database) {}

  /** Every published version of every template (the catalogue picks the latest per slug). */
  async publishedVersions(): Promise<StoredVersion[]> {
    return this.db
      .select(columns)
      .from(templateVersions)
      .innerJoin(templates, eq(templates.id, templateVersions.templateId))
      .where(eq(templateVersions.status, 'published'))
      .orderBy(templates.slug, desc(templateVersions.publishedAt));
  }

  async versionsOf(slug: string): Promise<StoredVersion[]> {
    return this.db
      .select(columns)
      .from(templateVersions)
      .innerJoin(templates, eq(templates.id, templateVersions.templateId))
      .where(and(eq(templates.slug, slug)));
  }
}
