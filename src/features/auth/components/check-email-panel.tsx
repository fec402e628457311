import { useState, type FormEvent } from 'react';
import { resendVerificationRequestSchema } from '../../../../shared/api/auth';
import { secondaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { TextField } from '../../../components/text-field';
import { fieldErrorsFromIssues, formErrorsFrom, withFieldName } from '../../../lib/form-errors';
import { useResendVerification } from '../api/resend-verification';

/** After sign-up: where the link went, and a way to ask for it again. */
export function CheckEmailPanel({ email: initialEmail }: { email: string }) {
  const [email, setEmail] = useState(initialEmail);
  const [localError, setLocalError] = useState<string>();
  const resend = useResendVerification();
  const server = formErrorsFrom(resend.error);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = resendVerificationRequestSchema.safeParse({ email });
    if (!parsed.success) {
      setLocalError(fieldErrorsFromIssues(parsed.error.issues).email);
      return;
    }
    setLocalError(undefined);
    resend.mutate(parsed.data.email);
  };

  return (
    <div className="grid gap-6">
      <div className="flex gap-4">
        <svg viewBox="0 0 48 48" className="size-12 shrink-0 text-ink-600" aria-hidden="true" fill="none" stroke="currentColor" strokeWidth="2.5" strokeLinejoin="round">
          <rect x="5" y="11" width="38" height="27" rx="3" />
          <path d="M6 13l18 14 18-14" />
          <circle cx="39" cy="12" r="6" className="fill-signal-400 stroke-paper-50" />
        </svg>
        <p className="leading-relaxed text-ink-900">
          {initialEmail ? (
            <>
              We have sent a message to <strong className="wrap-anywhere">{initialEmail}</strong>.
            </>
          ) : (
            'We have sent you a message.'
          )}{' '}
          Open the link in it to confirm the address; then you can sign in. The link works once and for a limited time.
        </p>
      </div>
      <form onSubmit={submit} noValidate className="grid gap-3 border-t border-ink-100 pt-5" aria-label="Send the link again">
        <p className="text-sm font-bold text-ink-900">Nothing arrived? Check the spam folder, or ask for the link again.</p>
        {resend.isSuccess && <Notice tone="success">If {resend.variables} has an account that still needs confirming, a new link is on its way.</Notice>}
        {resend.isError && !server.fields.email && <Notice tone="error">{server.summary}</Notice>}
        <TextField label="E-mail" name="email" type="email" autoComplete="email" value={email} onChange={(e) => setEmail(e.target.value)} error={withFieldName('E-mail', localError ?? server.fields.email)} />
        <button type="submit" className={`${secondaryButtonClass} justify-self-start`} disabled={resend.isPending}>
          {resend.isPending ? 'Sending…' : 'Send the link again'}
        </button>
      </form>
    </div>
  );
}
