import { useState, type FormEvent } from 'react';
import { requestPasswordResetSchema } from '../../../../shared/api/auth';
import { primaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { TextField } from '../../../components/text-field';
import { fieldErrorsFromIssues, formErrorsFrom, withFieldName } from '../../../lib/form-errors';
import { useRequestPasswordReset } from '../api/request-password-reset';

export function ForgotPasswordForm() {
  const [email, setEmail] = useState('');
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const request = useRequestPasswordReset();
  const server = formErrorsFrom(request.error);
  const errors = { ...server.fields, ...localErrors };

  if (request.isSuccess) {
    return (
      <Notice tone="success" title="Check your e-mail">
        If <strong>{request.variables}</strong> belongs to an account, a message with a link to choose a new password is on its
        way. The link works once and for a limited time.
      </Notice>
    );
  }

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = requestPasswordResetSchema.safeParse({ email });
    if (!parsed.success) {
      setLocalErrors(fieldErrorsFromIssues(parsed.error.issues));
      return;
    }
    setLocalErrors({});
    request.mutate(parsed.data.email);
  };

  return (
    <form onSubmit={submit} noValidate className="grid gap-5" aria-label="Ask for a password reset link">
      {request.isError && !errors.email && <Notice tone="error">{server.summary}</Notice>}
      <TextField label="E-mail" name="email" type="email" autoComplete="email" inputMode="email" value={email} onChange={(e) => setEmail(e.target.value)} error={withFieldName('E-mail', errors.email)} required />
      <button type="submit" className={primaryButtonClass} disabled={request.isPending}>
        {request.isPending ? 'Sending…' : 'Send me a reset link'}
      </button>
    </form>
  );
}
