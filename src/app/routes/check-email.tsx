import { Link, useSearchParams } from 'react-router-dom';
import { linkClass } from '../../components/form-styles';
import { NarrowPage } from '../../components/narrow-page';
import { CheckEmailPanel } from '../../features/auth/components/check-email-panel';

export function CheckEmailRoute() {
  const [params] = useSearchParams();
  return (
    <NarrowPage
      title="Check your e-mail"
      footer={
        <>
          Confirmed already? <Link to="/sign-in" className={linkClass}>Sign in</Link>
        </>
      }
    >
      <CheckEmailPanel email={params.get('email') ?? ''} />
    </NarrowPage>
  );
}
