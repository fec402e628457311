import { useEffect, useId, useState } from 'react';
import { useSearchParams } from 'react-router-dom';
import { adminUserSortKeys, userRoles, type AdminUser, type UserRole } from '../../../../shared/api/auth';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { inputClass, secondaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { Pagination } from '../../../components/pagination';
import { formErrorsFrom } from '../../../lib/form-errors';
import { formatDateTime } from '../../../lib/format-time';
import { useDebouncedValue } from '../../../lib/use-debounced-value';
import { useChangeRole } from '../api/change-role';
import { useDisableUser } from '../api/disable-user';
import { useEnableUser } from '../api/enable-user';
import { useUsers, type AdminUserQuery } from '../api/get-users';
import { roleNames, roleOptions } from './role-names';
import { SortHeader } from './sort-header';
import { rowClass, tableClass, tableWrapClass, tdClass, theadClass, thClass } from './table-styles';

type SortKey = (typeof adminUserSortKeys)[number];
const PAGE_SIZE = 20;

function readQuery(params: URLSearchParams): Required<Pick<AdminUserQuery, 'sort' | 'order' | 'page'>> & AdminUserQuery {
  const role = params.get('role');
  const sort = params.get('sort');
  const page = Number(params.get('page'));
  return {
    q: params.get('q') ?? undefined,
    role: (userRoles as readonly string[]).includes(role ?? '') ? (role as UserRole) : undefined,
    sort: (adminUserSortKeys as readonly string[]).includes(sort ?? '') ? (sort as SortKey) : 'createdAt',
    order: params.get('order') === 'asc' ? 'asc' : 'desc',
    page: Number.isInteger(page) && page > 0 ? page : 1,
  };
}

function StatusTag({ user }: { user: AdminUser }) {
  if (user.disabled) return <span className="inline-flex items-center gap-1 rounded-full bg-verdict-fail/10 px-2 py-0.5 text-xs font-bold text-verdict-fail">✕ Disabled</span>;
  if (!user.emailVerified) return <span className="inline-flex items-center gap-1 rounded-full bg-verdict-warn/10 px-2 py-0.5 text-xs font-bold text-verdict-warn">… Not confirmed</span>;
  return <span className="inline-flex items-center gap-1 rounded-full bg-verdict-pass/10 px-2 py-0.5 text-xs font-bold text-verdict-pass">✓ Active</span>;
}

type PendingChange = { kind: 'role'; user: AdminUser; role: UserRole } | { kind: 'disable'; user: AdminUser } | { kind: 'enable'; user: AdminUser };

/** Every account, searched, filtered, sorted and paged by the server; role and access changed with a confirmation. */
export function UsersTable({ currentUserId }: { currentUserId: string }) {
  const [params, setParams] = useSearchParams();
  const query = readQuery(params);
  const [search, setSearch] = useState(query.q ?? '');
  const settledSearch = useDebouncedValue(search, 300);
  const searchId = useId();
  const roleId = useId();
  const reasonId = useId();
  const users = useUsers({ ...query, pageSize: PAGE_SIZE });
  const changeRole = useChangeRole();
  const disable = useDisableUser();
  const enable = useEnableUser();
  const [pending, setPending] = useState<PendingChange | null>(null);
  const [reason, setReason] = useState('');
  const [done, setDone] = useState<string>();

  const update = (changes: Record<string, string | undefined>) => {
    const next = new URLSearchParams(params);
    for (const [key, value] of Object.entries(changes)) {
      if (value) next.set(key, value);
      else next.delete(key);
    }
    setParams(next, { replace: true });
  };

  useEffect(() => {
    if ((settledSearch || undefined) !== query.q) update({ q: settledSearch.trim() || undefined, page: undefined });
    // Only a settled change of the search box moves the URL.
  }, [settledSearch]);

  const close = () => {
    setPending(null);
    setReason('');
    changeRole.reset();
    disable.reset();
    enable.reset();
  };

  const confirm = () => {
    if (!pending) return;
    const { user } = pending;
    if (pending.kind === 'role') {
      changeRole.mutate({ userId: user.id, role: pending.role }, { onSuccess: () => { setDone(`${user.name} is now ${roleNames[pending.role]}.`); close(); } });
    } else if (pending.kind === 'disable') {
      disable.mutate({ userId: user.id, reason: reason.trim() || undefined }, { onSuccess: () => { setDone(`${user.name} is disabled and signed out everywhere.`); close(); } });
    } else {
      enable.mutate(user.id, { onSuccess: () => { setDone(`${user.name} can sign in again.`); close(); } });
    }
  };

  const mutation = pending?.kind === 'role' ? changeRole : pending?.kind === 'disable' ? disable : enable;
  const onSort = (sort: SortKey, order: 'asc' | 'desc') => update({ sort, order, page: undefined });

  return (
    <div className="grid gap-4">
      <div role="search" aria-label="Find users" className="grid gap-4 rounded-2xl border border-ink-100 bg-paper-50 p-4 sm:grid-cols-[1fr_14rem]">
        <div>
          <label htmlFor={searchId} className="block text-sm font-bold text-ink-900">
            Search by name or e-mail
          </label>
          <input id={searchId} type="search" value={search} onChange={(e) => setSearch(e.target.value)} className={`${inputClass} mt-1.5`} placeholder="e.g. Okafor or @example.com" />
        </div>
        <div>
          <label htmlFor={roleId} className="block text-sm font-bold text-ink-900">
            Role
          </label>
          <select id={roleId} value={query.role ?? ''} onChange={(e) => update({ role: e.target.value || undefined, page: undefined })} className={`${inputClass} mt-1.5`}>
            <option value="">All roles</option>
            {roleOptions.map((r) => (
              <option key={r.value} value={r.value}>
                {r.label}
              </option>
            ))}
          </select>
        </div>
      </div>

      {done && <Notice tone="success">{done}</Notice>}
      {users.isError && <Notice tone="error" title="The users could not be loaded">{formErrorsFrom(users.error).summary}</Notice>}
      {users.isPending && <p role="status" className="text-sm text-ink-700">Loading the users…</p>}

      {users.data && (
        <>
          <div className={tableWrapClass} aria-busy={users.isFetching}>
            <table className={`${tableClass} min-w-[52rem]`}>
              <caption className="sr-only">Users, sorted by {query.sort} {query.order === 'asc' ? 'ascending' : 'descending'}</caption>
              <thead className={theadClass}>
                <tr>
                  <SortHeader label="Name" sortKey="name" sort={query.sort} order={query.order} onSort={onSort} />
                  <SortHeader label="E-mail" sortKey="email" sort={query.sort} order={query.order} onSort={onSort} />
                  <SortHeader label="Role" sortKey="role" sort={query.sort} order={query.order} onSort={onSort} />
                  <th scope="col" className={thClass}>Status</th>
                  <th scope="col" className={thClass}>Organisations</th>
                  <SortHeader label="Created" sortKey="createdAt" sort={query.sort} order={query.order} onSort={onSort} />
                  <th scope="col" className={thClass}>
                    <span className="sr-only">Actions</span>
                  </th>
                </tr>
              </thead>
              <tbody>
                {users.data.items.length === 0 && (
                  <tr>
                    <td colSpan={7} className="px-3 py-6 text-center text-ink-700">
                      No user matches these filters.
                    </td>
                  </tr>
                )}
                {users.data.items.map((u) => {
                  const self = u.id === currentUserId;
                  return (
                    <tr key={u.id} className={rowClass} data-user-email={u.email}>
                      <td className={`${tdClass} font-bold text-ink-950`}>
                        {u.name}
                        {self && <span className="ml-1 font-semibold text-ink-700">(you)</span>}
                      </td>
                      <td className={`${tdClass} wrap-anywhere`}>{u.email}</td>
                      <td className={tdClass}>
                        <label className="sr-only" htmlFor={`role-${u.id}`}>
                          Role of {u.name}
                        </label>
                        <select
                          id={`role-${u.id}`}
                          value={u.role}
                          disabled={self}
                          title={self ? 'You cannot change your own role' : undefined}
                          onChange={(e) => setPending({ kind: 'role', user: u, role: e.target.value as UserRole })}
                          className="rounded-md border border-ink-200 bg-paper-50 px-2 py-1.5 text-sm font-semibold disabled:opacity-70"
                          data-role-select
                        >
                          {roleOptions.map((r) => (
                            <option key={r.value} value={r.value}>
                              {r.label}
                            </option>
                          ))}
                        </select>
                      </td>
                      <td className={tdClass}>
                        <StatusTag user={u} />
                        {u.disabled && u.disabledReason && <p className="mt-1 text-xs text-ink-700">{u.disabledReason}</p>}
                      </td>
                      <td className={tdClass}>{u.organisations.length ? u.organisations.map((o) => `${o.name}${o.role === 'owner' ? ' (owner)' : ''}`).join(', ') : <span className="text-ink-600">—</span>}</td>
                      <td className={`${tdClass} whitespace-nowrap`}>{formatDateTime(u.createdAt)}</td>
                      <td className={`${tdClass} text-right`}>
                        {!self &&
                          (u.disabled ? (
                            <button type="button" className={secondaryButtonClass} onClick={() => setPending({ kind: 'enable', user: u })}>
                              Enable<span className="sr-only"> {u.name}</span>
                            </button>
                          ) : (
                            <button type="button" className={secondaryButtonClass} onClick={() => setPending({ kind: 'disable', user: u })}>
                              Disable<span className="sr-only"> {u.name}</span>
                            </button>
                          ))}
                      </td>
                    </tr>
                  );
                })}
              </tbody>
            </table>
          </div>
          <Pagination page={users.data.page} pageSize={users.data.pageSize} total={users.data.total} noun="users" onPage={(page) => update({ page: page > 1 ? String(page) : undefined })} />
        </>
      )}

      <ConfirmDialog
        open={pending !== null}
        title={
          pending?.kind === 'role'
            ? `Make ${pending.user.name} ${roleNames[pending.role]}?`
            : pending?.kind === 'disable'
              ? `Disable ${pending.user.name}?`
              : `Enable ${pending?.user.name ?? ''}?`
        }
        confirmLabel={pending?.kind === 'role' ? 'Change the role' : pending?.kind === 'disable' ? 'Disable the account' : 'Enable the account'}
        danger={pending?.kind === 'disable' || (pending?.kind === 'role' && pending.role === 'admin')}
        pending={mutation.isPending}
        error={mutation.isError ? formErrorsFrom(mutation.error).summary : undefined}
        onClose={close}
        onConfirm={confirm}
      >
        {pending?.kind === 'role' && (
          <p>
            {pending.user.name} ({pending.user.email}) changes from {roleNames[pending.user.role]} to {roleNames[pending.role]}
            {pending.role === 'admin' ? ', and can then manage every user, organisation and key' : ''}. The change is recorded in the audit log.
          </p>
        )}
        {pending?.kind === 'disable' && (
          <div className="grid gap-3">
            <p>{pending.user.name} is signed out everywhere at once and cannot sign in until an administrator enables the account again.</p>
            <div>
              <label htmlFor={reasonId} className="block text-sm font-bold text-ink-900">
                Reason (optional, kept in the audit log)
              </label>
              <textarea id={reasonId} value={reason} onChange={(e) => setReason(e.target.value)} maxLength={500} rows={2} className={`${inputClass} mt-1.5`} />
            </div>
          </div>
        )}
        {pending?.kind === 'enable' && <p>{pending.user.name} can sign in again with their password.</p>}
      </ConfirmDialog>
    </div>
  );
}
