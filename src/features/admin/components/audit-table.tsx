import { useId, useState, type FormEvent } from 'react';
import { auditActions } from '../../../../shared/api/auth';
import { inputClass, primaryButtonClass, secondaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { Pagination } from '../../../components/pagination';
import { formErrorsFrom, withFieldName } from '../../../lib/form-errors';
import { formatDateTime } from '../../../lib/format-time';
import { auditCsvHref, useAudit, type AuditQuery } from '../api/get-audit';
import { rowClass, tableClass, tableWrapClass, tdClass, theadClass, thClass } from './table-styles';

const PAGE_SIZE = 25;
const actionGroups = [...new Set(auditActions.map((a) => `${a.split('.')[0]}.`))];

interface Filters {
  action: string;
  actor: string;
  target: string;
  from: string;
  to: string;
}
const noFilters: Filters = { action: '', actor: '', target: '', from: '', to: '' };

/** `datetime-local` gives the reader's wall time; the server wants an instant. */
function toInstant(local: string): string | undefined {
  if (!local) return undefined;
  const date = new Date(local);
  return Number.isNaN(date.getTime()) ? undefined : date.toISOString();
}

function toQuery(f: Filters, page: number): AuditQuery {
  return {
    action: f.action || undefined,
    actor: f.actor.trim() || undefined,
    target: f.target.trim() || undefined,
    from: toInstant(f.from),
    to: toInstant(f.to),
    page,
    pageSize: PAGE_SIZE,
  };
}

function details(value: Record<string, unknown>): string {
  const entries = Object.entries(value);
  if (entries.length === 0) return '—';
  return entries.map(([k, v]) => `${k}: ${typeof v === 'string' ? v : JSON.stringify(v)}`).join(' · ');
}

export function AuditTable() {
  const [draft, setDraft] = useState<Filters>(noFilters);
  const [applied, setApplied] = useState<Filters>(noFilters);
  const [page, setPage] = useState(1);
  const query = toQuery(applied, page);
  const audit = useAudit(query);
  const ids = { action: useId(), actor: useId(), target: useId(), from: useId(), to: useId() };
  const server = formErrorsFrom(audit.error);
  const set = (key: keyof Filters) => (e: { target: { value: string } }) => setDraft((d) => ({ ...d, [key]: e.target.value }));

  const apply = (event: FormEvent) => {
    event.preventDefault();
    setApplied(draft);
    setPage(1);
  };

  const fieldError = (key: keyof Filters, label: string) => {
    const message = withFieldName(label, server.fields[key]);
    return message ? <p className="mt-1 text-sm font-semibold text-verdict-fail">✕ {message}</p> : null;
  };

  return (
    <div className="grid gap-4">
      <form onSubmit={apply} aria-label="Filter the audit log" className="grid gap-4 rounded-2xl border border-ink-100 bg-paper-50 p-4 sm:grid-cols-2 lg:grid-cols-5">
        <div>
          <label htmlFor={ids.action} className="block text-sm font-bold text-ink-900">Action</label>
          <select id={ids.action} value={draft.action} onChange={set('action')} className={`${inputClass} mt-1.5`}>
            <option value="">All actions</option>
            <optgroup label="Groups">
              {actionGroups.map((g) => (
                <option key={g} value={g}>Every {g}* action</option>
              ))}
            </optgroup>
            <optgroup label="One action">
              {auditActions.map((a) => (
                <option key={a} value={a}>{a}</option>
              ))}
            </optgroup>
          </select>
          {fieldError('action', 'Action')}
        </div>
        <div>
          <label htmlFor={ids.actor} className="block text-sm font-bold text-ink-900">Who (e-mail or id)</label>
          <input id={ids.actor} value={draft.actor} onChange={set('actor')} className={`${inputClass} mt-1.5`} aria-invalid={server.fields.actor ? true : undefined} />
          {fieldError('actor', 'Who')}
        </div>
        <div>
          <label htmlFor={ids.target} className="block text-sm font-bold text-ink-900">What (target)</label>
          <input id={ids.target} value={draft.target} onChange={set('target')} className={`${inputClass} mt-1.5`} aria-invalid={server.fields.target ? true : undefined} />
          {fieldError('target', 'Target')}
        </div>
        <div>
          <label htmlFor={ids.from} className="block text-sm font-bold text-ink-900">From</label>
          <input id={ids.from} type="datetime-local" value={draft.from} onChange={set('from')} className={`${inputClass} mt-1.5`} aria-invalid={server.fields.from ? true : undefined} />
          {fieldError('from', 'From')}
        </div>
        <div>
          <label htmlFor={ids.to} className="block text-sm font-bold text-ink-900">Until</label>
          <input id={ids.to} type="datetime-local" value={draft.to} onChange={set('to')} className={`${inputClass} mt-1.5`} aria-invalid={server.fields.to ? true : undefined} />
          {fieldError('to', 'Until')}
        </div>
        <div className="flex flex-wrap items-center gap-3 sm:col-span-2 lg:col-span-5">
          <button type="submit" className={primaryButtonClass}>Apply the filters</button>
          <button type="button" className={secondaryButtonClass} onClick={() => { setDraft(noFilters); setApplied(noFilters); setPage(1); }}>
            Clear
          </button>
          <a href={auditCsvHref(query)} download className={`${secondaryButtonClass} sm:ml-auto`} data-audit-csv>
            Download these entries as CSV
          </a>
        </div>
      </form>

      {audit.isError && <Notice tone="error" title="The audit log could not be loaded">{server.summary}</Notice>}
      {audit.isPending && <p role="status" className="text-sm text-ink-700">Loading the audit log…</p>}
      {audit.data && (
        <>
          <div className={tableWrapClass} aria-busy={audit.isFetching}>
            <table className={`${tableClass} min-w-[56rem]`}>
              <caption className="sr-only">Audit log, newest first</caption>
              <thead className={theadClass}>
                <tr>
                  <th scope="col" className={thClass}>When</th>
                  <th scope="col" className={thClass}>Who</th>
                  <th scope="col" className={thClass}>Action</th>
                  <th scope="col" className={thClass}>What</th>
                  <th scope="col" className={thClass}>From IP</th>
                  <th scope="col" className={thClass}>Details</th>
                </tr>
              </thead>
              <tbody>
                {audit.data.items.length === 0 && (
                  <tr>
                    <td colSpan={6} className="px-3 py-6 text-center text-ink-700">No entry matches these filters.</td>
                  </tr>
                )}
                {audit.data.items.map((e) => (
                  <tr key={e.id} className={rowClass} data-audit-action={e.action}>
                    <td className={`${tdClass} whitespace-nowrap`}>{formatDateTime(e.at)}</td>
                    <td className={`${tdClass} wrap-anywhere`}>
                      {e.actorEmail ?? e.actorId ?? '—'}
                      <span className="block text-xs text-ink-700">{e.actorKind === 'api_key' ? 'API key' : e.actorKind}</span>
                    </td>
                    <td className={tdClass}>
                      <code className="rounded bg-paper-200 px-1.5 py-0.5 text-xs font-semibold">{e.action}</code>
                    </td>
                    <td className={`${tdClass} wrap-anywhere`}>{e.target ?? '—'}</td>
                    <td className={`${tdClass} whitespace-nowrap tabular-nums`}>{e.ip ?? '—'}</td>
                    <td className={`${tdClass} max-w-[20rem] break-words text-xs text-ink-800`}>{details(e.details)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <Pagination page={audit.data.page} pageSize={audit.data.pageSize} total={audit.data.total} noun="entries" onPage={setPage} />
        </>
      )}
    </div>
  );
}
