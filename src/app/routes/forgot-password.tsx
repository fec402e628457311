import { Link } from 'react-router-dom';
import { linkClass } from '../../components/form-styles';
import { NarrowPage } from '../../components/narrow-page';
import { ForgotPasswordForm } from '../../features/auth/components/forgot-password-form';

export function ForgotPasswordRoute() {
  return (
    <NarrowPage
      title="Forgot the password?"
      lead="Give the e-mail address of your account and we send a link to choose a new password."
      footer={<Link to="/sign-in" className={linkClass}>Back to sign-in</Link>}
    >
      <ForgotPasswordForm />
    </NarrowPage>
  );
}
