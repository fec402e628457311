import { useId, useState } from 'react';
import type { ApiKeyInfo } from '../../../../shared/api/v1';
import { cardClass, inputClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { formErrorsFrom } from '../../../lib/form-errors';
import { useKeys } from '../api/get-keys';
import type { KeyOwner } from '../api/key-owner';
import { KeyTable } from './key-table';
import { keyStateNames, keyStatus, type KeyState } from './key-status';
import { RevokeKeyDialog } from './revoke-key-dialog';
import { UsagePanel } from './usage-panel';

const owner: KeyOwner = { admin: true };
const OWN = 'own';

/** Every API key, filtered by organisation and state, with revocation and the usage of all keys. */
export function AdminApiKeys() {
  const keys = useKeys(owner);
  const [organisation, setOrganisation] = useState('');
  const [state, setState] = useState<'' | KeyState>('');
  const [revoking, setRevoking] = useState<ApiKeyInfo | null>(null);
  const [done, setDone] = useState<string>();
  const orgId = useId();
  const stateId = useId();

  const names = keys.data?.organisationNames ?? {};
  const organisations = Object.entries(names).sort((a, b) => a[1].localeCompare(b[1]));
  const now = new Date();
  const all = keys.data?.items ?? [];
  const shown = all.filter(
    (k) =>
      (!organisation || (organisation === OWN ? k.organisationId === null : k.organisationId === organisation)) &&
      (!state || keyStatus(k, all, now).state === state),
  );

  return (
    <div className="grid gap-8">
      <div className="grid gap-4">
        <div role="search" aria-label="Filter the keys" className="grid gap-4 rounded-2xl border border-ink-100 bg-paper-50 p-4 sm:grid-cols-2">
          <div>
            <label htmlFor={orgId} className="block text-sm font-bold text-ink-900">
              Organisation
            </label>
            <select id={orgId} value={organisation} onChange={(e) => setOrganisation(e.target.value)} className={`${inputClass} mt-1.5`}>
              <option value="">All organisations</option>
              {organisations.map(([id, name]) => (
                <option key={id} value={id}>
                  {name}
                </option>
              ))}
              <option value={OWN}>Administrators’ own keys</option>
            </select>
          </div>
          <div>
            <label htmlFor={stateId} className="block text-sm font-bold text-ink-900">
              Status
            </label>
            <select id={stateId} value={state} onChange={(e) => setState(e.target.value as typeof state)} className={`${inputClass} mt-1.5`}>
              <option value="">Any status</option>
              {(Object.keys(keyStateNames) as KeyState[]).map((s) => (
                <option key={s} value={s}>
                  {keyStateNames[s]}
                </option>
              ))}
            </select>
          </div>
        </div>
        {done && <Notice tone="success">{done}</Notice>}
        {keys.isPending && <p role="status" className="text-sm text-ink-700">Loading the keys…</p>}
        {keys.isError && <Notice tone="error" title="The keys could not be loaded">{formErrorsFrom(keys.error).summary}</Notice>}
        {keys.data && (
          <>
            <p className="text-sm text-ink-700" aria-live="polite">
              {shown.length} of {all.length} {all.length === 1 ? 'key' : 'keys'} shown.
            </p>
            <KeyTable
              keys={shown}
              all={all}
              caption="Every API key"
              canManage
              organisationNames={names}
              now={now}
              onRevoke={setRevoking}
            />
          </>
        )}
      </div>

      <section aria-labelledby="admin-api-usage-heading" className={cardClass}>
        <UsagePanel owner={owner} headingId="admin-api-usage-heading" title="Usage of every key" />
      </section>

      <RevokeKeyDialog
        owner={owner}
        apiKey={revoking}
        onClose={() => setRevoking(null)}
        onRevoked={(key) => {
          setRevoking(null);
          setDone(`${key.name} (${key.prefix}…) is revoked.`);
        }}
      />
    </div>
  );
}
