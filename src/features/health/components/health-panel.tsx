import { ApiError } from '../../../lib/api-client';
import { useHealth } from '../api/get-health';

function StatusDot({ tone }: { tone: 'ok' | 'bad' | 'wait' }) {
  const colour = tone === 'ok' ? 'bg-verdict-pass' : tone === 'bad' ? 'bg-verdict-fail' : 'bg-ink-300';
  return <span aria-hidden="true" className={`inline-block size-2.5 shrink-0 rounded-full ${colour}`} />;
}

function Row({ label, value, note, tone }: { label: string; value: string; note?: string; tone: 'ok' | 'bad' | 'wait' }) {
  return (
    <div className="flex items-center justify-between gap-4 py-2">
      <dt className="text-sm text-ink-700">
        {label}
        {note && <span className="block text-xs text-ink-600">{note}</span>}
      </dt>
      <dd className="flex items-center gap-2 text-sm font-semibold text-ink-950">
        <StatusDot tone={tone} />
        <span data-testid={`health-${label.toLowerCase()}`}>{value}</span>
      </dd>
    </div>
  );
}

export function HealthPanel() {
  const health = useHealth();

  let body;
  if (health.isPending) {
    body = <p className="py-2 text-sm text-ink-700">Asking the server…</p>;
  } else if (health.isError) {
    const error = health.error;
    const reason = error instanceof ApiError ? error.message : 'The request failed.';
    body = (
      <dl className="divide-y divide-ink-100">
        <Row label="Server" value="unreachable" tone="bad" />
        <div className="py-2 text-sm text-verdict-fail">{reason}</div>
      </dl>
    );
  } else {
    const data = health.data;
    const db = data.database;
    const latency = db.latencyMs === null ? undefined : `answered in ${db.latencyMs.toFixed(1)} ms`;
    body = (
      <dl className="divide-y divide-ink-100">
        <Row label="Server" value={data.status} tone={data.status === 'ok' ? 'ok' : 'bad'} />
        <Row
          label="Database"
          value={db.ok ? 'ok' : 'not answering'}
          note={[db.driver === 'pglite' ? 'embedded PGlite' : 'PostgreSQL', latency].filter(Boolean).join(' · ')}
          tone={db.ok ? 'ok' : 'bad'}
        />
        <Row label="Version" value={data.version} tone="wait" />
      </dl>
    );
  }

  return (
    <section
      aria-labelledby="health-heading"
      className="rounded-xl border border-ink-100 bg-paper-50 p-5 shadow-sm"
    >
      <div className="flex items-center justify-between gap-4">
        <h2 id="health-heading" className="text-base font-bold text-ink-900">
          Service status
        </h2>
        <button
          type="button"
          onClick={() => void health.refetch()}
          className="rounded-md px-2 py-1 text-sm font-semibold text-ink-600 hover:bg-ink-50 hover:text-ink-900"
        >
          Check again
        </button>
      </div>
      <div aria-live="polite" aria-busy={health.isFetching} className="mt-2">
        {body}
      </div>
    </section>
  );
}
