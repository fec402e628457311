import { useEffect } from 'react';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { linkClass } from '../../components/form-styles';
import { NarrowPage } from '../../components/narrow-page';
import { Notice } from '../../components/notice';
import { useMe } from '../../features/auth/api/get-me';
import { useForgetSession } from '../../features/auth/api/sign-out';
import { SignInForm } from '../../features/auth/components/sign-in-form';
import { safeNext } from './safe-next';

export function SignInRoute() {
  const [params] = useSearchParams();
  const navigate = useNavigate();
  const me = useMe();
  const next = safeNext(params.get('next'));
  const signedOut = params.get('signedOut') !== null;
  const forgetSession = useForgetSession();
  // The sign-out button lands here; only now, outside every guarded page, is the session forgotten.
  useEffect(() => {
    if (signedOut) void forgetSession();
  }, [signedOut]);
  return (
    <NarrowPage
      title="Sign in"
      footer={
        <>
          New to Pinwork? <Link to="/sign-up" className={linkClass}>Create an account</Link>
        </>
      }
    >
      <div className="grid gap-5">
        {signedOut && me.isFetching && <p role="status" className="text-sm text-ink-700">Signing out…</p>}
        {signedOut && !me.data && !me.isFetching && <Notice tone="success">You are signed out.</Notice>}
        {next && !me.data && <Notice>Sign in to open that page.</Notice>}
        {signedOut && me.isFetching ? null : me.data ? (
          <Notice title={`You are signed in as ${me.data.user.email}`}>
            <Link to={next ?? me.data.home} className={linkClass}>
              Continue
            </Link>
          </Notice>
        ) : (
          <SignInForm initialEmail={params.get('email') ?? ''} onSignedIn={(answer) => navigate(next ?? answer.home, { replace: true })} />
        )}
      </div>
    </NarrowPage>
  );
}
