import { Link, useNavigate } from 'react-router-dom';
import { linkClass } from '../../components/form-styles';
import { NarrowPage } from '../../components/narrow-page';
import { Notice } from '../../components/notice';
import { useMe } from '../../features/auth/api/get-me';
import { SignUpForm } from '../../features/auth/components/sign-up-form';

export function SignUpRoute() {
  const navigate = useNavigate();
  const me = useMe();
  return (
    <NarrowPage
      title="Create an account"
      lead="An account lets engineers keep and version templates and lets suppliers manage their embedded calculators. Using the published calculators needs no account."
      footer={
        <>
          Have an account already? <Link to="/sign-in" className={linkClass}>Sign in</Link>
        </>
      }
    >
      {me.data ? (
        <Notice title={`You are signed in as ${me.data.user.email}`}>
          Sign out first to create another account. <Link to={me.data.home} className={linkClass}>Go to your start page</Link>
        </Notice>
      ) : (
        <SignUpForm onSignedUp={(email) => navigate(`/sign-up/check-email?email=${encodeURIComponent(email)}`)} />
      )}
    </NarrowPage>
  );
}
