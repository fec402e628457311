import { useState, type FormEvent } from 'react';
import { Link } from 'react-router-dom';
import { authProblemTypes, signInRequestSchema, type SignInResponse } from '../../../../shared/api/auth';
import { linkClass, primaryButtonClass, secondaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { TextField } from '../../../components/text-field';
import { ApiError } from '../../../lib/api-client';
import { fieldErrorsFromIssues, formErrorsFrom, withFieldName } from '../../../lib/form-errors';
import { useResendVerification } from '../api/resend-verification';
import { useSignIn } from '../api/sign-in';

// One message for a wrong e-mail and a wrong password alike, whatever the server adds.
const SIGN_IN_FAILED = 'The e-mail address or the password is not right. Check both and try again.';

function ResendVerification({ email }: { email: string }) {
  const resend = useResendVerification();
  if (resend.isSuccess) {
    return <p className="mt-2 font-semibold">A new link is on its way to {email}, if it needs one.</p>;
  }
  return (
    <button type="button" className={`${secondaryButtonClass} mt-3`} onClick={() => resend.mutate(email)} disabled={resend.isPending}>
      {resend.isPending ? 'Sending…' : 'Send the link again'}
    </button>
  );
}

function SignInProblem({ error, email }: { error: unknown; email: string }) {
  if (error instanceof ApiError) {
    const type = error.problem.type;
    if (type === authProblemTypes.signInFailed || error.status === 401) {
      return <Notice tone="error" title="Not signed in">{SIGN_IN_FAILED}</Notice>;
    }
    if (type === authProblemTypes.emailNotVerified) {
      return (
        <Notice tone="error" title="Confirm your e-mail address first">
          Open the link in the message we sent when you signed up.
          <ResendVerification email={email} />
        </Notice>
      );
    }
    if (type === authProblemTypes.accountDisabled) {
      return (
        <Notice tone="error" title="This account is disabled">
          An administrator has disabled it. Ask them to enable it again.
        </Notice>
      );
    }
    if (error.status === 429) {
      return <Notice tone="error" title="Too many attempts">{error.problem.detail ?? 'Wait a little before you try again.'}</Notice>;
    }
  }
  const { summary } = formErrorsFrom(error);
  return <Notice tone="error" title="Not signed in">{summary}</Notice>;
}

export function SignInForm({ onSignedIn, initialEmail = '' }: { onSignedIn: (me: SignInResponse) => void; initialEmail?: string }) {
  const [email, setEmail] = useState(initialEmail);
  const [password, setPassword] = useState('');
  const [rememberMe, setRememberMe] = useState(true);
  const [localErrors, setLocalErrors] = useState<Record<string, string>>({});
  const signIn = useSignIn();
  const server = error422Fields(signIn.error);
  const errors = { ...server, ...localErrors };

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const parsed = signInRequestSchema.safeParse({ email, password, rememberMe });
    if (!parsed.success) {
      setLocalErrors(fieldErrorsFromIssues(parsed.error.issues));
      return;
    }
    setLocalErrors({});
    signIn.mutate(parsed.data, { onSuccess: onSignedIn });
  };

  return (
    <form onSubmit={submit} noValidate className="grid gap-5" aria-label="Sign in">
      {signIn.isError && Object.keys(server).length === 0 && <SignInProblem error={signIn.error} email={email} />}
      <TextField label="E-mail" name="email" type="email" autoComplete="username" inputMode="email" value={email} onChange={(e) => setEmail(e.target.value)} error={withFieldName('E-mail', errors.email)} required />
      <div>
        <TextField label="Password" name="password" type="password" autoComplete="current-password" value={password} onChange={(e) => setPassword(e.target.value)} error={withFieldName('Password', errors.password)} required />
        <p className="mt-2 text-sm">
          <Link to="/forgot-password" className={linkClass}>
            Forgot the password?
          </Link>
        </p>
      </div>
      <label className="inline-flex items-center gap-2 text-sm text-ink-800">
        <input type="checkbox" checked={rememberMe} onChange={(e) => setRememberMe(e.target.checked)} className="size-4 accent-ink-700" />
        Keep me signed in on this device
      </label>
      <button type="submit" className={primaryButtonClass} disabled={signIn.isPending}>
        {signIn.isPending ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}

/** Only a 422 names fields; every other refusal is shown as one message above the form. */
function error422Fields(error: unknown): Record<string, string> {
  return error instanceof ApiError && error.status === 422 ? formErrorsFrom(error).fields : {};
}
