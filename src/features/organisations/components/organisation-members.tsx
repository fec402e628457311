import { useState } from 'react';
import { ConfirmDialog } from '../../../components/confirm-dialog';
import { cardClass, secondaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { formErrorsFrom } from '../../../lib/form-errors';
import { formatDateTime } from '../../../lib/format-time';
import { useMembers } from '../api/get-members';
import { useRemoveMember } from '../api/remove-member';
import { useRevokeInvitation } from '../api/revoke-invitation';
import { InviteForm } from './invite-form';

function RoleTag({ role }: { role: 'owner' | 'member' }) {
  return role === 'owner' ? (
    <span className="rounded-full bg-ink-700 px-2 py-0.5 text-xs font-bold text-paper-50">Owner</span>
  ) : (
    <span className="rounded-full border border-ink-300 px-2 py-0.5 text-xs font-bold text-ink-800">Member</span>
  );
}

interface Props {
  organisationId: string;
  currentUserId: string;
  /** Owners and administrators may invite and remove; the server checks this again. */
  canManage: boolean;
}

export function OrganisationMembers({ organisationId, currentUserId, canManage }: Props) {
  const members = useMembers(organisationId);
  const removeMember = useRemoveMember(organisationId);
  const revokeInvitation = useRevokeInvitation(organisationId);
  const [removing, setRemoving] = useState<{ userId: string; name: string } | null>(null);

  if (members.isPending) return <p role="status" className="text-ink-700">Loading the members…</p>;
  if (members.isError) return <Notice tone="error" title="The members could not be loaded">{formErrorsFrom(members.error).summary}</Notice>;

  const { organisation, items, invitations } = members.data;
  const owners = items.filter((m) => m.role === 'owner');
  return (
    <div className="grid gap-8">
      <section aria-labelledby="members-heading" className={cardClass}>
        <div className="flex flex-wrap items-baseline justify-between gap-2">
          <h2 id="members-heading" className="text-xl font-extrabold tracking-tight">
            Members
          </h2>
          <p className="text-sm text-ink-700">
            {items.length} {items.length === 1 ? 'person' : 'people'} · owned by {owners.map((o) => o.name).join(', ') || 'nobody'}
          </p>
        </div>
        {removeMember.isError && (
          <div className="mt-4">
            <Notice tone="error">{formErrorsFrom(removeMember.error).summary}</Notice>
          </div>
        )}
        <ul className="mt-4 divide-y divide-ink-100" aria-label={`Members of ${organisation.name}`}>
          {items.map((m) => (
            <li key={m.userId} className="flex flex-wrap items-center justify-between gap-3 py-3" data-member={m.email}>
              <div className="min-w-0">
                <p className="flex flex-wrap items-center gap-2 font-bold text-ink-950">
                  {m.name}
                  {m.userId === currentUserId && <span className="text-sm font-semibold text-ink-700">(you)</span>}
                  <RoleTag role={m.role} />
                </p>
                <p className="wrap-anywhere text-sm text-ink-700">
                  {m.email} · joined {formatDateTime(m.joinedAt)}
                </p>
              </div>
              {canManage && m.userId !== currentUserId && (
                <button type="button" className={secondaryButtonClass} onClick={() => setRemoving({ userId: m.userId, name: m.name })}>
                  Remove<span className="sr-only"> {m.name}</span>
                </button>
              )}
            </li>
          ))}
        </ul>
      </section>

      <section aria-labelledby="invitations-heading" className={cardClass}>
        <h2 id="invitations-heading" className="text-xl font-extrabold tracking-tight">
          Pending invitations
        </h2>
        {revokeInvitation.isError && (
          <div className="mt-4">
            <Notice tone="error">{formErrorsFrom(revokeInvitation.error).summary}</Notice>
          </div>
        )}
        {invitations.length === 0 ? (
          <p className="mt-3 text-sm text-ink-700">No invitation is waiting for an answer.</p>
        ) : (
          <ul className="mt-4 divide-y divide-ink-100" aria-label="Pending invitations">
            {invitations.map((inv) => (
              <li key={inv.id} className="flex flex-wrap items-center justify-between gap-3 py-3" data-invitation={inv.email}>
                <div className="min-w-0">
                  <p className="flex flex-wrap items-center gap-2 font-bold wrap-anywhere text-ink-950">
                    {inv.email} <RoleTag role={inv.role} />
                  </p>
                  <p className="text-sm text-ink-700">
                    Sent {formatDateTime(inv.createdAt)}
                    {inv.invitedBy ? ` by ${inv.invitedBy}` : ''} · open until {formatDateTime(inv.expiresAt)}
                  </p>
                </div>
                {canManage && (
                  <button
                    type="button"
                    className={secondaryButtonClass}
                    disabled={revokeInvitation.isPending && revokeInvitation.variables === inv.id}
                    onClick={() => revokeInvitation.mutate(inv.id)}
                  >
                    Withdraw<span className="sr-only"> the invitation to {inv.email}</span>
                  </button>
                )}
              </li>
            ))}
          </ul>
        )}
        {canManage ? (
          <div className="mt-6 border-t border-ink-100 pt-6">
            <h3 className="mb-4 text-base font-bold">Invite someone by e-mail</h3>
            <InviteForm organisationId={organisationId} organisationName={organisation.name} />
          </div>
        ) : (
          <p className="mt-4 text-sm text-ink-700">Only an owner of {organisation.name} can invite people.</p>
        )}
      </section>

      <ConfirmDialog
        open={removing !== null}
        title={`Remove ${removing?.name ?? ''}?`}
        confirmLabel="Remove from the organisation"
        danger
        pending={removeMember.isPending}
        error={removeMember.isError ? formErrorsFrom(removeMember.error).summary : undefined}
        onClose={() => setRemoving(null)}
        onConfirm={() => removing && removeMember.mutate(removing.userId, { onSuccess: () => setRemoving(null) })}
      >
        {removing?.name} will no longer see {organisation.name}’s embeds and keys. They keep their Pinwork account.
      </ConfirmDialog>
    </div>
  );
}
