import { useId, useState } from 'react';
import { inputClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { Pagination } from '../../../components/pagination';
import { formErrorsFrom } from '../../../lib/form-errors';
import { formatDateTime } from '../../../lib/format-time';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useOrganisations } from '../api/get-organisations';
import { rowClass, tableClass, tableWrapClass, tdClass, theadClass, thClass } from './table-styles';

const PAGE_SIZE = 20;
const kindNames = { supplier: 'Supplier', engineering: 'Engineering' } as const;

export function OrganisationsTable() {
  const [search, setSearch] = useState('');
  const [kind, setKind] = useState<'' | 'supplier' | 'engineering'>('');
  const [page, setPage] = useState(1);
  const q = useDebouncedValue(search.trim(), 300);
  const organisations = useOrganisations({ q: q || undefined, kind: kind || undefined, page, pageSize: PAGE_SIZE });
  const searchId = useId();
  const kindId = useId();

  return (
    <div className="grid gap-4">
      <div role="search" aria-label="Find organisations" className="grid gap-4 rounded-2xl border border-ink-100 bg-paper-50 p-4 sm:grid-cols-[1fr_14rem]">
        <div>
          <label htmlFor={searchId} className="block text-sm font-bold text-ink-900">
            Search by name
          </label>
          <input id={searchId} type="search" value={search} onChange={(e) => { setSearch(e.target.value); setPage(1); }} className={`${inputClass} mt-1.5`} />
        </div>
        <div>
          <label htmlFor={kindId} className="block text-sm font-bold text-ink-900">
            Kind
          </label>
          <select id={kindId} value={kind} onChange={(e) => { setKind(e.target.value as typeof kind); setPage(1); }} className={`${inputClass} mt-1.5`}>
            <option value="">All kinds</option>
            <option value="supplier">Supplier</option>
            <option value="engineering">Engineering</option>
          </select>
        </div>
      </div>
      {organisations.isError && <Notice tone="error" title="The organisations could not be loaded">{formErrorsFrom(organisations.error).summary}</Notice>}
      {organisations.isPending && <p role="status" className="text-sm text-ink-700">Loading the organisations…</p>}
      {organisations.data && (
        <>
          <div className={tableWrapClass} aria-busy={organisations.isFetching}>
            <table className={`${tableClass} min-w-[40rem]`}>
              <caption className="sr-only">Organisations</caption>
              <thead className={theadClass}>
                <tr>
                  <th scope="col" className={thClass}>Name</th>
                  <th scope="col" className={thClass}>Kind</th>
                  <th scope="col" className={thClass}>Members</th>
                  <th scope="col" className={thClass}>Owners</th>
                  <th scope="col" className={thClass}>Created</th>
                </tr>
              </thead>
              <tbody>
                {organisations.data.items.length === 0 && (
                  <tr>
                    <td colSpan={5} className="px-3 py-6 text-center text-ink-700">No organisation matches.</td>
                  </tr>
                )}
                {organisations.data.items.map((o) => (
                  <tr key={o.id} className={rowClass}>
                    <td className={tdClass}>
                      <span className="font-bold text-ink-950">{o.name}</span>
                      <span className="block text-xs text-ink-700">{o.slug}</span>
                    </td>
                    <td className={tdClass}>{kindNames[o.kind]}</td>
                    <td className={`${tdClass} tabular-nums`}>{o.memberCount}</td>
                    <td className={tdClass}>{o.owners.length ? o.owners.map((w) => `${w.name} <${w.email}>`).join(', ') : '—'}</td>
                    <td className={`${tdClass} whitespace-nowrap`}>{formatDateTime(o.createdAt)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          <Pagination page={organisations.data.page} pageSize={organisations.data.pageSize} total={organisations.data.total} noun="organisations" onPage={setPage} />
        </>
      )}
    </div>
  );
}
