import { Link } from 'react-router-dom';
import { authProblemTypes } from '../../../../shared/api/auth';
import { linkClass, primaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { ApiError } from '../../../lib/api-client';
import { formErrorsFrom } from '../../../lib/form-errors';
import { useVerifyEmail } from '../api/verify-email';

/** The landing of the link in the confirmation mail: confirms the address once, then offers sign-in. */
export function VerifyEmailResult({ token }: { token: string }) {
  const verify = useVerifyEmail(token);

  if (!token) {
    return (
      <Notice tone="error" title="This link is incomplete">
        Open the link from the e-mail exactly as it is.
      </Notice>
    );
  }
  if (verify.isPending) return <p role="status" className="text-ink-800">Confirming your e-mail address…</p>;
  if (verify.isError) {
    const invalid = verify.error instanceof ApiError && verify.error.problem.type === authProblemTypes.invalidLink;
    return (
      <Notice tone="error" title={invalid ? 'This link no longer works' : 'The address was not confirmed'}>
        {invalid ? 'It has expired, has been used already or is not complete. ' : `${formErrorsFrom(verify.error).summary} `}
        <Link to="/sign-up/check-email" className={linkClass}>
          Ask for a new link
        </Link>
        , or <Link to="/sign-in" className={linkClass}>sign in</Link> if you have confirmed it already.
      </Notice>
    );
  }
  return (
    <div className="grid gap-5">
      <Notice tone="success" title="Your e-mail address is confirmed">
        <strong>{verify.data.email}</strong> can now sign in.
      </Notice>
      <Link to={`/sign-in?email=${encodeURIComponent(verify.data.email)}`} className={primaryButtonClass}>
        Sign in
      </Link>
    </div>
  );
}
