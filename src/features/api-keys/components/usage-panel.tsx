import { lazy, Suspense, useId, useMemo, useState } from 'react';
import { Notice } from '../../../components/notice';
import { formErrorsFrom } from '../../../lib/form-errors';
import { useNearViewport } from '../../../lib/use-near-viewport';
import { useUsage } from '../api/get-usage';
import type { KeyOwner } from '../api/key-owner';
import { formatCount, quotaWords, shortDay, usageChartData, type UsageSplit } from './usage-rows';

const UsageChart = lazy(() => import('./usage-chart'));

/** Calls a day over the last 30 days, stacked by endpoint or by key, with the month's quota in words. */
export function UsagePanel({ owner, headingId, title }: { owner: KeyOwner; headingId: string; title: string }) {
  const usage = useUsage(owner);
  const [split, setSplit] = useState<UsageSplit>('endpoint');
  const [ref, near] = useNearViewport<HTMLDivElement>();
  const id = useId();
  const data = useMemo(() => (usage.data ? usageChartData(usage.data, split) : null), [usage.data, split]);

  return (
    <div ref={ref} className="grid gap-4">
      <div className="flex flex-wrap items-baseline justify-between gap-2">
        <h2 id={headingId} className="text-xl font-extrabold tracking-tight">
          {title}
        </h2>
        <button type="button" className="text-sm font-semibold text-ink-700 underline decoration-ink-300 underline-offset-2 hover:text-ink-900" onClick={() => void usage.refetch()} disabled={usage.isFetching}>
          {usage.isFetching ? 'Reading the figures…' : 'Read the figures again'}
        </button>
      </div>
      {usage.isPending && <p role="status" className="text-sm text-ink-700">Loading the usage…</p>}
      {usage.isError && <Notice tone="error" title="The usage could not be loaded">{formErrorsFrom(usage.error).summary}</Notice>}
      {usage.data && data && (
        <>
          <div className="grid gap-1 text-sm text-ink-800" data-usage-summary>
            <p>
              <strong className="text-ink-950" data-usage-total>{formatCount(data.total)}</strong> {data.total === 1 ? 'call' : 'calls'} from {shortDay(usage.data.from)} to{' '}
              {shortDay(usage.data.to)} (days in UTC; the figures trail the calls by about a second).
            </p>
            {quotaWords(usage.data.monthly) && <p data-quota>{quotaWords(usage.data.monthly)}</p>}
          </div>
          <fieldset className="flex flex-wrap items-center gap-x-4 gap-y-1 text-sm">
            <legend className="sr-only">Split the calls</legend>
            <span aria-hidden="true" className="font-bold text-ink-900">Split by</span>
            {(['endpoint', 'key'] as const).map((s) => (
              <label key={s} className="inline-flex items-center gap-1.5">
                <input type="radio" name={`${id}-split`} value={s} checked={split === s} onChange={() => setSplit(s)} className="size-4 accent-ink-700" />
                {s === 'endpoint' ? 'Endpoint' : 'Key'}
              </label>
            ))}
          </fieldset>
          {data.total === 0 ? (
            <p className="rounded-xl border border-dashed border-ink-200 p-6 text-center text-sm text-ink-700">No call in these 30 days yet.</p>
          ) : (
            <figure className="grid gap-2" aria-labelledby={`${id}-caption`}>
              {near ? (
                <Suspense fallback={<div className="h-72 rounded-xl border border-ink-100 bg-paper-100" />}>
                  <UsageChart data={data} />
                </Suspense>
              ) : (
                <div className="h-72 rounded-xl border border-ink-100 bg-paper-100" />
              )}
              <figcaption id={`${id}-caption`} className="text-sm text-ink-800">
                Calls a day, stacked by {split === 'endpoint' ? 'endpoint' : 'key'}:{' '}
                {data.series.map((s) => `${s.label} ${formatCount(s.total)}`).join(', ')}.
              </figcaption>
              <details className="text-sm">
                <summary className="cursor-pointer font-semibold text-ink-700">The calls as a table</summary>
                <div className="mt-2 max-h-80 overflow-auto rounded-lg border border-ink-100">
                  <table className="w-full text-right tabular-nums" data-usage-table>
                    <caption className="sr-only">Calls a day by {split}</caption>
                    <thead className="sticky top-0 bg-paper-100">
                      <tr className="border-b border-ink-200">
                        <th scope="col" className="p-1.5 text-left">Day</th>
                        {data.series.map((s) => (
                          <th key={s.id} scope="col" className="p-1.5">{s.label}</th>
                        ))}
                      </tr>
                    </thead>
                    <tbody>
                      {data.rows
                        .filter((r) => data.series.some((s) => (r[s.id] as number) > 0))
                        .map((r) => (
                          <tr key={r.day} className="border-b border-ink-50">
                            <th scope="row" className="p-1.5 text-left font-semibold">{shortDay(r.day)}</th>
                            {data.series.map((s) => (
                              <td key={s.id} className="p-1.5">{formatCount(r[s.id] as number)}</td>
                            ))}
                          </tr>
                        ))}
                    </tbody>
                  </table>
                </div>
                <p className="mt-1 text-xs text-ink-700">Days without a call are left out.</p>
              </details>
            </figure>
          )}
        </>
      )}
    </div>
  );
}
