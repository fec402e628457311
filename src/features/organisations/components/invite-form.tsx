import { useState, type FormEvent } from 'react';
import { createInvitationRequestSchema, type MemberRole } from '../../../../shared/api/auth';
import { inputClass, primaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { TextField } from '../../../components/text-field';
import { ApiError } from '../../../lib/api-client';
import { fieldErrorsFromIssues, formErrorsFrom, withFieldName } from '../../../lib/form-errors';
import { useCreateInvitation } from '../api/create-invitation';

export function InviteForm({ organisationId, organisationName }: { organisationId: string; organisationName: string }) {
  const [email, setEmail] = useState('');
  const [role, setRole] = useState<MemberRole>('member');
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const invite = useCreateInvitation(organisationId);
  const server = formErrorsFrom(invite.error);
  const errors = { ...server.fields, ...localErrors };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = createInvitationRequestSchema.safeParse({ email, role });
    if (!parsed.success) {
      setLocalErrors(fieldErrorsFromIssues(parsed.error.issues));
      return;
    }
    setLocalErrors({});
    invite.mutate(parsed.data, { onSuccess: () => setEmail('') });
  };

  const conflict = invite.error instanceof ApiError && invite.error.status === 409;
  return (
    <form onSubmit={submit} noValidate className="grid gap-4" aria-label={`Invite someone to ${organisationName}`}>
      {invite.isSuccess && (
        <Notice tone="success">
          An invitation is on its way to <strong>{invite.data.email}</strong>. The link in it works once, until {new Date(invite.data.expiresAt).toLocaleDateString()}.
        </Notice>
      )}
      {invite.isError && !errors.email && (
        <Notice tone="error" title={conflict ? 'Already a member' : 'The invitation was not sent'}>
          {server.summary}
        </Notice>
      )}
      <div className="grid gap-4 sm:grid-cols-[1fr_12rem]">
        <TextField label="E-mail address to invite" name="email" type="email" autoComplete="off" value={email} onChange={(e) => setEmail(e.target.value)} error={withFieldName('E-mail', errors.email)} />
        <div>
          <label htmlFor="invite-role" className="block text-sm font-bold text-ink-900">
            As
          </label>
          <select id="invite-role" value={role} onChange={(e) => setRole(e.target.value as MemberRole)} className={`${inputClass} mt-1.5`}>
            <option value="member">Member</option>
            <option value="owner">Owner</option>
          </select>
        </div>
      </div>
      <button type="submit" className={`${primaryButtonClass} justify-self-start`} disabled={invite.isPending}>
        {invite.isPending ? 'Sending…' : 'Send the invitation'}
      </button>
    </form>
  );
}
