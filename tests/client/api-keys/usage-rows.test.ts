import { describe, expect, it } from 'vitest';
import type { UsageReport } from '../../../shared/api/v1';
import { MAX_SERIES, quotaWords, usageChartData } from '../../../src/features/api-keys/components/usage-rows';

const row = (apiKeyId: string, endpoint: string, day: string, count: number) => ({ apiKeyId, keyName: `Key ${apiKeyId}`, prefix: `pw_sk_${apiKeyId}`, endpoint, day, count });

const report: UsageReport = {
  from: '2026-11-28',
  to: '2026-12-02',
  rows: [row('a', 'solveTemplate', '2026-11-29', 5), row('a', 'listTemplates', '2026-11-29', 1), row('b', 'solveTemplate', '2026-12-02', 2), row('b', 'sweepTemplate', '2026-12-01', 7)],
  monthly: { used: 9, quota: 100_000 },
};

describe('usage chart rows', () => {
  it('has one row per day of the range, quiet days at zero for every series', () => {
    const data = usageChartData(report, 'endpoint');
    expect(data.rows.map((r) => r.day)).toEqual(['2026-11-28', '2026-11-29', '2026-11-30', '2026-12-01', '2026-12-02']);
    expect(data.rows[0]).toEqual({ day: '2026-11-28', solveTemplate: 0, sweepTemplate: 0, listTemplates: 0 });
    expect(data.rows[1]).toMatchObject({ solveTemplate: 5, listTemplates: 1, sweepTemplate: 0 });
    expect(data.rows[4]).toMatchObject({ solveTemplate: 2 });
  });

  it('splits by endpoint with names in words, largest first, and by key with name and prefix', () => {
    const byEndpoint = usageChartData(report, 'endpoint');
    expect(byEndpoint.series).toEqual([
      { id: 'solveTemplate', label: 'Solve', total: 7 },
      { id: 'sweepTemplate', label: 'Sweep', total: 7 },
      { id: 'listTemplates', label: 'Template list', total: 1 },
    ]);
    expect(byEndpoint.total).toBe(15);
    const byKey = usageChartData(report, 'key');
    expect(byKey.series).toEqual([
      { id: 'b', label: 'Key b (pw_sk_b)', total: 9 },
      { id: 'a', label: 'Key a (pw_sk_a)', total: 6 },
    ]);
    expect(byKey.rows.find((r) => r.day === '2026-12-01')).toEqual({ day: '2026-12-01', a: 0, b: 7 });
  });

  it('sums the smallest keys as one "Other" band when there are too many to tell apart', () => {
    const many: UsageReport = { ...report, rows: Array.from({ length: MAX_SERIES + 2 }, (_, i) => row(`k${i}`, 'solveTemplate', '2026-12-01', i + 1)) };
    const data = usageChartData(many, 'key');
    expect(data.series).toHaveLength(MAX_SERIES);
    expect(data.series.at(-1)).toEqual({ id: 'other', label: 'Other (3)', total: 1 + 2 + 3 });
    expect(data.rows.find((r) => r.day === '2026-12-01')!.other).toBe(6);
    expect(data.total).toBe(((MAX_SERIES + 2) * (MAX_SERIES + 3)) / 2);
  });
});

describe('quota in words', () => {
  it('says used, quota, share and what is left', () => {
    expect(quotaWords({ used: 12_345, quota: 100_000 })).toBe('12,345 calls of 100,000 this month (12%); 87,655 left.');
    expect(quotaWords({ used: 1, quota: 10 })).toBe('1 call of 10 this month (10%); 9 left.');
    expect(quotaWords({ used: 4, quota: 100_000 })).toBe('4 calls of 100,000 this month (under 1%); 99,996 left.');
    expect(quotaWords({ used: 0, quota: 100_000 })).toBe('0 calls of 100,000 this month (0%); 100,000 left.');
  });
  it('says when the quota is used up and when there is none, and nothing for the admin view', () => {
    expect(quotaWords({ used: 10, quota: 10 })).toMatch(/quota of 10 is used up; calls are refused until the first of next month/);
    expect(quotaWords({ used: 3, quota: null })).toBe('3 calls this month; this organisation has no monthly quota.');
    expect(quotaWords(null)).toBeNull();
  });
});
