import { and, asc, eq, gte, inArray, lte, sql } from 'drizzle-orm';
import type { UsageReport } from '../../../shared/api/v1';
import type { Database } from '../../db/database';
import { apiKeys, apiQuotas, usageCounters } from '../../db/schema/api-access';
import { organisations } from '../../db/schema/organisations';

const day = (d: Date) => d.toISOString().slice(0, 10);

/** Calls per key, endpoint and day (as flushed by the usage recorder), for the usage chart. */
export class UsageReportService {
  constructor(
    private readonly db: Database,
    private readonly defaultMonthlyQuota: number | null,
  ) {}

  /** One organisation's usage (with its month against its quota), or every key's for an admin. */
  async report(scope: { organisationId: string } | { all: true }, range: { from?: string | undefined; to?: string | undefined }, now = new Date()): Promise<UsageReport> {
    const to = range.to ?? day(now);
    const from = range.from ?? day(new Date(Date.parse(`${to}T00:00:00Z`) - 29 * 86_400_000));
    const rows = await this.db
      .select({
        apiKeyId: usageCounters.apiKeyId,
        keyName: apiKeys.name,
        prefix: apiKeys.prefix,
        endpoint: usageCounters.endpoint,
        day: usageCounters.day,
        count: usageCounters.count,
      })
      .from(usageCounters)
      .innerJoin(apiKeys, eq(apiKeys.id, usageCounters.apiKeyId))
      .where(
        and(
          gte(usageCounters.day, from),
          lte(usageCounters.day, to),
          'organisationId' in scope ? eq(apiKeys.organisationId, scope.organisationId) : undefined,
        ),
      )
      .orderBy(asc(usageCounters.day), asc(apiKeys.prefix), asc(usageCounters.endpoint));
    let monthly: UsageReport['monthly'] = null;
    if ('organisationId' in scope) {
      const monthStart = `${day(now).slice(0, 7)}-01`;
      const [sum] = await this.db
        .select({ used: sql<string>`coalesce(sum(${usageCounters.count}), 0)` })
        .from(usageCounters)
        .innerJoin(apiKeys, eq(apiKeys.id, usageCounters.apiKeyId))
        .where(and(eq(apiKeys.organisationId, scope.organisationId), gte(usageCounters.day, monthStart)));
      const [quota] = await this.db.select().from(apiQuotas).where(eq(apiQuotas.organisationId, scope.organisationId));
      monthly = { used: Number(sum?.used ?? 0), quota: quota ? quota.monthlyRequests : this.defaultMonthlyQuota };
    }
    return { from, to, rows: rows.map((r) => ({ ...r, day: String(r.day) })), monthly };
  }

  /** Names of the organisations that own keys, by id (the admin key list and usage name their owners). */
  async organisationNames(ids: readonly string[]): Promise<Record<string, string>> {
    if (ids.length === 0) return {};
    const rows = await this.db.select({ id: organisations.id, name: organisations.name }).from(organisations).where(inArray(organisations.id, [...ids]));
    return Object.fromEntries(rows.map((r) => [r.id, r.name]));
  }
}
