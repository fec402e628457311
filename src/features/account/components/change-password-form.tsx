import { useState, type FormEvent } from 'react';
import { changePasswordRequestSchema } from '../../../../shared/api/auth';
import { primaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { TextField } from '../../../components/text-field';
import { fieldErrorsFromIssues, formErrorsFrom, withFieldName } from '../../../lib/form-errors';
import { PasswordHint } from '../../../components/password-hint';
import { useChangePassword } from '../api/change-password';

/** Change the password while signed in: the current one, the new one twice, and whether to end other sessions. */
export function ChangePasswordForm({ email }: { email: string }) {
  const [current, setCurrent] = useState('');
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [signOutOthers, setSignOutOthers] = useState(true);
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const change = useChangePassword();
  const server = formErrorsFrom(change.error);
  const errors = { ...server.fields, ...localErrors };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = changePasswordRequestSchema.safeParse({ currentPassword: current, newPassword: password, signOutOtherSessions: signOutOthers });
    if (!parsed.success) {
      setLocalErrors(fieldErrorsFromIssues(parsed.error.issues));
      return;
    }
    if (repeat !== password) {
      setLocalErrors({ repeat: 'The two new passwords are not the same.' });
      return;
    }
    setLocalErrors({});
    change.mutate(parsed.data, {
      onSuccess: () => {
        setCurrent('');
        setPassword('');
        setRepeat('');
      },
    });
  };

  return (
    <form onSubmit={submit} noValidate className="grid gap-4" aria-label="Change the password">
      {change.isSuccess && (
        <Notice tone="success" title="Your password is changed">
          {change.data.otherSessionsSignedOut ? 'Every other session of the account has been signed out; this one stays signed in.' : 'Your other sessions stay signed in.'}
        </Notice>
      )}
      {change.isError && Object.keys(server.fields).length === 0 && <Notice tone="error">{server.summary}</Notice>}
      <TextField
        label="Current password"
        name="currentPassword"
        type="password"
        autoComplete="current-password"
        value={current}
        onChange={(e) => setCurrent(e.target.value)}
        error={withFieldName('Current password', errors.currentPassword)}
        required
      />
      <TextField
        label="New password"
        name="newPassword"
        type="password"
        autoComplete="new-password"
        value={password}
        onChange={(e) => setPassword(e.target.value)}
        error={withFieldName('New password', errors.newPassword)}
        hint={<PasswordHint password={password} email={email} />}
        required
      />
      <TextField label="The new password again" name="repeat" type="password" autoComplete="new-password" value={repeat} onChange={(e) => setRepeat(e.target.value)} error={errors.repeat} required />
      <label className="flex items-start gap-2 text-sm text-ink-800">
        <input type="checkbox" className="mt-0.5 size-4 accent-ink-800" checked={signOutOthers} onChange={(e) => setSignOutOthers(e.target.checked)} />
        Sign out my other sessions (recommended if the old password may be known to someone else)
      </label>
      <button type="submit" className={primaryButtonClass} disabled={change.isPending}>
        {change.isPending ? 'Saving…' : 'Change the password'}
      </button>
    </form>
  );
}
