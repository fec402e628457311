import type { ApiKeyInfo } from '../../../../shared/api/v1';
import { secondaryButtonClass } from '../../../components/form-styles';
import { formatDateTime } from '../../../lib/format-time';
import { keyStateNames, keyStatus, kindNames, scopeNames, type KeyState, type KeyStatus } from './key-status';
import { rowClass, tableClass, tableWrapClass, tdClass, theadClass, thClass } from './key-table-styles';

const stateLook: Record<KeyState, { box: string; mark: string }> = {
  active: { box: 'bg-verdict-pass/10 text-verdict-pass', mark: '✓' },
  rotating: { box: 'bg-verdict-warn/10 text-verdict-warn', mark: '↻' },
  revoked: { box: 'bg-verdict-fail/10 text-verdict-fail', mark: '✕' },
  expired: { box: 'bg-ink-100 text-ink-800', mark: '–' },
};

export function StatusTag({ status }: { status: KeyStatus }) {
  const look = stateLook[status.state];
  return (
    <span className="inline-grid justify-items-start gap-0.5" data-key-state={status.state}>
      <span className={`inline-flex items-center gap-1 rounded-full px-2 py-0.5 text-xs font-bold whitespace-nowrap ${look.box}`}>
        <span aria-hidden="true">{look.mark}</span>
        {keyStateNames[status.state]}
      </span>
      {status.detail && <span className="text-xs text-ink-700">{status.detail}</span>}
    </span>
  );
}

interface KeyTableProps {
  keys: readonly ApiKeyInfo[];
  /** Every key the reader can see, so a rotated key knows its successor. */
  all?: readonly ApiKeyInfo[];
  caption: string;
  canManage: boolean;
  /** Admin view: each key's organisation (null: an admin's own key). */
  organisationNames?: Record<string, string> | undefined;
  onRotate?: (key: ApiKeyInfo) => void;
  onRevoke: (key: ApiKeyInfo) => void;
  now?: Date;
}

function Scopes({ k }: { k: ApiKeyInfo }) {
  return <>{k.scopes.map((s) => scopeNames[s]).join(', ')}</>;
}

function Origins({ k }: { k: ApiKeyInfo }) {
  if (k.kind !== 'publishable') return <span className="text-ink-600">any server</span>;
  return (
    <ul>
      {k.allowedOrigins.map((o) => (
        <li key={o} className="font-mono text-xs wrap-anywhere">
          {o}
        </li>
      ))}
    </ul>
  );
}

function Actions({ k, status, canManage, onRotate, onRevoke }: { k: ApiKeyInfo; status: KeyStatus; canManage: boolean; onRotate?: KeyTableProps['onRotate']; onRevoke: KeyTableProps['onRevoke'] }) {
  if (!canManage || status.state === 'revoked' || status.state === 'expired') return null;
  return (
    <div className="flex flex-wrap gap-2">
      {onRotate && status.state === 'active' && (
        <button type="button" className={secondaryButtonClass} onClick={() => onRotate(k)}>
          Rotate<span className="sr-only"> {k.name} ({k.prefix})</span>
        </button>
      )}
      <button type="button" className={`${secondaryButtonClass} border-verdict-fail/50 text-verdict-fail`} onClick={() => onRevoke(k)}>
        Revoke<span className="sr-only"> {k.name} ({k.prefix})</span>
      </button>
    </div>
  );
}

const ownerName = (k: ApiKeyInfo, names: Record<string, string> | undefined) =>
  k.organisationId === null ? 'Administrator’s own' : (names?.[k.organisationId] ?? 'Unknown organisation');

/**
 * The keys as a table from large widths up and as a list of cards below, so a phone reads every
 * field without scrolling sideways. Only one of the two is displayed (the other is display:none,
 * so it is also hidden from assistive technology).
 */
export function KeyTable({ keys, all = keys, caption, canManage, organisationNames, onRotate, onRevoke, now = new Date() }: KeyTableProps) {
  const admin = organisationNames !== undefined;
  const rows = keys.map((k) => ({ k, status: keyStatus(k, all, now) }));
  const columns = 8 + (admin ? 1 : 0) + (canManage ? 1 : 0);
  return (
    <>
      <div className={`${tableWrapClass} hidden lg:block`}>
        <table className={`${tableClass} min-w-[58rem]`}>
          <caption className="sr-only">{caption}</caption>
          <thead className={theadClass}>
            <tr>
              <th scope="col" className={thClass}>Name</th>
              {admin && <th scope="col" className={thClass}>Organisation</th>}
              <th scope="col" className={thClass}>Kind</th>
              <th scope="col" className={thClass}>Scopes</th>
              <th scope="col" className={thClass}>Origins</th>
              <th scope="col" className={thClass}>Created</th>
              <th scope="col" className={thClass}>Expires</th>
              <th scope="col" className={thClass}>Last used</th>
              <th scope="col" className={thClass}>Status</th>
              {canManage && (
                <th scope="col" className={thClass}>
                  <span className="sr-only">Actions</span>
                </th>
              )}
            </tr>
          </thead>
          <tbody>
            {rows.length === 0 && (
              <tr>
                <td colSpan={columns} className="px-3 py-6 text-center text-ink-700">
                  No key here.
                </td>
              </tr>
            )}
            {rows.map(({ k, status }) => (
              <tr key={k.id} className={rowClass} data-key-prefix={k.prefix}>
                <th scope="row" className={`${tdClass} text-left`}>
                  <span className="block font-bold text-ink-950">{k.name}</span>
                  <span className="block font-mono text-xs font-normal whitespace-nowrap text-ink-800">
                    <span className="sr-only">starts with </span>
                    {k.prefix}…
                  </span>
                </th>
                {admin && <td className={tdClass}>{ownerName(k, organisationNames)}</td>}
                <td className={tdClass}>{kindNames[k.kind]}</td>
                <td className={tdClass}><Scopes k={k} /></td>
                <td className={tdClass}><Origins k={k} /></td>
                <td className={tdClass}>{formatDateTime(k.createdAt)}</td>
                <td className={tdClass}>{k.expiresAt ? formatDateTime(k.expiresAt) : 'Never'}</td>
                <td className={tdClass} data-last-used>{k.lastUsedAt ? formatDateTime(k.lastUsedAt) : 'Not yet'}</td>
                <td className={tdClass}><StatusTag status={status} /></td>
                {canManage && (
                  <td className={tdClass}>
                    <Actions k={k} status={status} canManage={canManage} onRotate={onRotate} onRevoke={onRevoke} />
                  </td>
                )}
              </tr>
            ))}
          </tbody>
        </table>
      </div>

      <ul className="grid gap-3 sm:grid-cols-2 lg:hidden" aria-label={caption}>
        {rows.length === 0 && <li className="rounded-xl border border-ink-100 p-4 text-sm text-ink-700">No key here.</li>}
        {rows.map(({ k, status }) => (
          <li key={k.id} className="rounded-xl border border-ink-100 bg-paper-50 p-4" data-key-prefix={k.prefix}>
            <div className="flex flex-wrap items-start justify-between gap-2">
              <p className="font-bold text-ink-950 wrap-anywhere">{k.name}</p>
              <StatusTag status={status} />
            </div>
            <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-3 gap-y-1 text-sm">
              {admin && (
                <>
                  <dt className="font-semibold text-ink-700">Organisation</dt>
                  <dd>{ownerName(k, organisationNames)}</dd>
                </>
              )}
              <dt className="font-semibold text-ink-700">Kind</dt>
              <dd>{kindNames[k.kind]}</dd>
              <dt className="font-semibold text-ink-700">Starts with</dt>
              <dd className="font-mono text-xs wrap-anywhere">{k.prefix}…</dd>
              <dt className="font-semibold text-ink-700">Scopes</dt>
              <dd><Scopes k={k} /></dd>
              <dt className="font-semibold text-ink-700">Origins</dt>
              <dd className="min-w-0"><Origins k={k} /></dd>
              <dt className="font-semibold text-ink-700">Created</dt>
              <dd>{formatDateTime(k.createdAt)}</dd>
              <dt className="font-semibold text-ink-700">Expires</dt>
              <dd>{k.expiresAt ? formatDateTime(k.expiresAt) : 'Never'}</dd>
              <dt className="font-semibold text-ink-700">Last used</dt>
              <dd data-last-used>{k.lastUsedAt ? formatDateTime(k.lastUsedAt) : 'Not yet'}</dd>
            </dl>
            {canManage && (
              <div className="mt-3">
                <Actions k={k} status={status} canManage={canManage} onRotate={onRotate} onRevoke={onRevoke} />
              </div>
            )}
          </li>
        ))}
      </ul>
    </>
  );
}
