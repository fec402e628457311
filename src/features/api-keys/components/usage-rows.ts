import type { UsageReport } from '../../../../shared/api/v1';

export type UsageSplit = 'endpoint' | 'key';

export interface UsageSeries {
  id: string;
  label: string;
  total: number;
}

export interface UsageChartData {
  /** One row per day from `from` to `to`, every series present (0 on a quiet day). */
  rows: ({ day: string } & Record<string, number | string>)[];
  series: UsageSeries[];
  total: number;
}

/** The v1 operation ids the server counts under, in words. */
export const endpointNames: Record<string, string> = {
  listTemplates: 'Template list',
  getTemplate: 'Template detail',
  solveTemplate: 'Solve',
  sweepTemplate: 'Sweep',
  sensitivityTemplate: 'Sensitivity',
  validateSpec: 'Spec validation',
  solveSpec: 'Spec solve',
};

/** More series than this and the smallest are summed as "Other", so the stack stays readable. */
export const MAX_SERIES = 6;
const OTHER = 'other';

function daysBetween(from: string, to: string): string[] {
  const days: string[] = [];
  const end = Date.parse(`${to}T00:00:00Z`);
  for (let t = Date.parse(`${from}T00:00:00Z`); t <= end && days.length < 400; t += 86_400_000) days.push(new Date(t).toISOString().slice(0, 10));
  return days;
}

/** Calls per day, split by endpoint or by key, for a stacked bar chart and its table. */
export function usageChartData(report: UsageReport, split: UsageSplit): UsageChartData {
  const totals = new Map<string, UsageSeries>();
  for (const r of report.rows) {
    const id = split === 'endpoint' ? r.endpoint : r.apiKeyId;
    const label = split === 'endpoint' ? (endpointNames[r.endpoint] ?? r.endpoint) : `${r.keyName} (${r.prefix})`;
    const s = totals.get(id) ?? { id, label, total: 0 };
    s.total += r.count;
    totals.set(id, s);
  }
  let series = [...totals.values()].sort((a, b) => b.total - a.total || a.label.localeCompare(b.label));
  const kept = new Set(series.slice(0, series.length > MAX_SERIES ? MAX_SERIES - 1 : MAX_SERIES).map((s) => s.id));
  if (series.length > MAX_SERIES) {
    const rest = series.filter((s) => !kept.has(s.id));
    series = [...series.filter((s) => kept.has(s.id)), { id: OTHER, label: `Other (${rest.length})`, total: rest.reduce((n, s) => n + s.total, 0) }];
  }
  const rows = daysBetween(report.from, report.to).map((day) => {
    const row: { day: string } & Record<string, number | string> = { day };
    for (const s of series) row[s.id] = 0;
    return row;
  });
  const byDay = new Map(rows.map((r) => [r.day, r]));
  for (const r of report.rows) {
    const row = byDay.get(r.day);
    if (!row) continue;
    const raw = split === 'endpoint' ? r.endpoint : r.apiKeyId;
    const id = kept.has(raw) ? raw : OTHER;
    row[id] = (row[id] as number) + r.count;
  }
  return { rows, series, total: series.reduce((n, s) => n + s.total, 0) };
}

const count = new Intl.NumberFormat('en-GB');
export const formatCount = (n: number) => count.format(n);

/** The month's calls against the quota, in a sentence. */
export function quotaWords(monthly: UsageReport['monthly']): string | null {
  if (!monthly) return null;
  const used = `${formatCount(monthly.used)} ${monthly.used === 1 ? 'call' : 'calls'}`;
  if (monthly.quota === null) return `${used} this month; this organisation has no monthly quota.`;
  const left = Math.max(0, monthly.quota - monthly.used);
  const share = monthly.quota > 0 ? (monthly.used / monthly.quota) * 100 : 100;
  const percent = monthly.used > 0 && share < 1 ? 'under 1' : String(Math.min(100, Math.round(share)));
  if (left === 0) return `${used} this month: the monthly quota of ${formatCount(monthly.quota)} is used up; calls are refused until the first of next month.`;
  return `${used} of ${formatCount(monthly.quota)} this month (${percent}%); ${formatCount(left)} left.`;
}

/** "2 Dec" for an axis tick, in UTC like the server's days. */
export function shortDay(day: string): string {
  return new Date(`${day}T00:00:00Z`).toLocaleDateString('en-GB', { day: 'numeric', month: 'short', timeZone: 'UTC' });
}
