import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { authProblemTypes, resetPasswordRequestSchema } from '../../../../shared/api/auth';
import { linkClass, primaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { TextField } from '../../../components/text-field';
import { ApiError } from '../../../lib/api-client';
import { fieldErrorsFromIssues, formErrorsFrom, withFieldName } from '../../../lib/form-errors';
import { useResetPassword } from '../api/reset-password';
import { PasswordHint } from '../../../components/password-hint';

export function ResetPasswordForm({ token }: { token: string }) {
  const [password, setPassword] = useState('');
  const [repeat, setRepeat] = useState('');
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const reset = useResetPassword();
  const server = formErrorsFrom(reset.error);
  const errors = { ...server.fields, ...localErrors };

  if (!token) {
    return (
      <Notice tone="error" title="This link is incomplete">
        Open the link from the e-mail exactly as it is, or <Link to="/forgot-password" className={linkClass}>ask for a new one</Link>.
      </Notice>
    );
  }
  if (reset.isSuccess) {
    return (
      <Notice tone="success" title="Your password is changed">
        Every session of the account has been signed out. <Link to="/sign-in" className={linkClass}>Sign in with the new password</Link>.
      </Notice>
    );
  }
  if (reset.error instanceof ApiError && reset.error.problem.type === authProblemTypes.invalidLink) {
    return (
      <Notice tone="error" title="This link no longer works">
        It has expired or has been used already. <Link to="/forgot-password" className={linkClass}>Ask for a new link</Link>.
      </Notice>
    );
  }

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = resetPasswordRequestSchema.safeParse({ token, newPassword: password });
    if (!parsed.success) {
      setLocalErrors(fieldErrorsFromIssues(parsed.error.issues));
      return;
    }
    if (repeat !== password) {
      setLocalErrors({ repeat: 'The two passwords are not the same.' });
      return;
    }
    setLocalErrors({});
    reset.mutate(parsed.data);
  };

  return (
    <form onSubmit={submit} noValidate className="grid gap-5" aria-label="Choose a new password">
      {reset.isError && Object.keys(server.fields).length === 0 && <Notice tone="error">{server.summary}</Notice>}
      {errors.token && <Notice tone="error">{withFieldName('The link', errors.token)}</Notice>}
      <TextField
        label="New password"
        name="newPassword"
        type="password"
        autoComplete="new-password"
        value={password}
        onChange={(e) => setPassword(e.target.value)}
        error={withFieldName('New password', errors.newPassword)}
        hint={<PasswordHint password={password} />}
        required
      />
      <TextField label="The new password again" name="repeat" type="password" autoComplete="new-password" value={repeat} onChange={(e) => setRepeat(e.target.value)} error={errors.repeat} required />
      <button type="submit" className={primaryButtonClass} disabled={reset.isPending}>
        {reset.isPending ? 'Saving…' : 'Save the new password'}
      </button>
    </form>
  );
}
