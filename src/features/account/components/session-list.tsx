import { useState } from 'react';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { secondaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { formErrorsFrom } from '../../../lib/form-errors';
import { formatDateTime } from '../../../lib/format-time';
import { useSessions } from '../api/get-sessions';
import { useRevokeOtherSessions } from '../api/revoke-other-sessions';
import { useRevokeSession } from '../api/revoke-session';
import { describeDevice } from './describe-device';

/** Every place the account is signed in, this one marked, with a way to end the others. */
export function SessionList() {
  const sessions = useSessions();
  const revokeOthers = useRevokeOtherSessions();
  const revokeOne = useRevokeSession();
  const [confirming, setConfirming] = useState(false);

  if (sessions.isPending) return <p role="status" className="text-sm text-ink-700">Loading your sessions…</p>;
  if (sessions.isError) return <Notice tone="error" title="The sessions could not be loaded">{formErrorsFrom(sessions.error).summary}</Notice>;

  const items = sessions.data.items;
  const others = items.filter((s) => !s.current).length;
  return (
    <div className="grid gap-4">
      {revokeOthers.isSuccess && (
        <Notice tone="success">
          {revokeOthers.data.revoked === 1 ? '1 other session was signed out.' : `${revokeOthers.data.revoked} other sessions were signed out.`}
        </Notice>
      )}
      {revokeOne.isError && <Notice tone="error">{formErrorsFrom(revokeOne.error).summary}</Notice>}
      <ul className="divide-y divide-ink-100 rounded-xl border border-ink-100" aria-label="Sessions">
        {items.map((s) => (
          <li key={s.id} className="flex flex-wrap items-center justify-between gap-3 p-4" data-session-current={s.current || undefined}>
            <div className="min-w-0">
              <p className="flex flex-wrap items-center gap-2 font-bold text-ink-950">
                {describeDevice(s.userAgent)}
                {s.current && <span className="rounded-full bg-ink-700 px-2 py-0.5 text-xs font-bold text-paper-50">This device</span>}
              </p>
              <p className="mt-0.5 text-sm text-ink-700">
                Signed in {formatDateTime(s.createdAt)} · from {s.ipAddress ?? 'an unknown address'} · ends {formatDateTime(s.expiresAt)}
              </p>
            </div>
            {!s.current && (
              <button
                type="button"
                className={secondaryButtonClass}
                disabled={revokeOne.isPending && revokeOne.variables === s.id}
                onClick={() => revokeOne.mutate(s.id)}
                aria-label={`Sign out the session from ${describeDevice(s.userAgent)} started ${formatDateTime(s.createdAt)}`}
              >
                Sign out
              </button>
            )}
          </li>
        ))}
      </ul>
      <div>
        <button type="button" className={secondaryButtonClass} disabled={others === 0} onClick={() => setConfirming(true)}>
          Sign out all other sessions
        </button>
        {others === 0 && <p className="mt-2 text-sm text-ink-700">This is the only session of your account.</p>}
      </div>
      <ConfirmDialog
        open={confirming}
        title="Sign out the other sessions?"
        confirmLabel={`Sign out ${others} other session${others === 1 ? '' : 's'}`}
        pending={revokeOthers.isPending}
        error={revokeOthers.isError ? formErrorsFrom(revokeOthers.error).summary : undefined}
        onClose={() => setConfirming(false)}
        onConfirm={() => revokeOthers.mutate(undefined, { onSuccess: () => setConfirming(false) })}
      >
        Every browser and device signed in to your account, except this one, will need to sign in again.
      </ConfirmDialog>
    </div>
  );
}
