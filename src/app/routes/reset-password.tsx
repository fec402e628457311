import { useSearchParams } from 'react-router-dom';
import { NarrowPage } from '../../components/narrow-page';
import { ResetPasswordForm } from '../../features/auth/components/reset-password-form';

export function ResetPasswordRoute() {
  const [params] = useSearchParams();
  return (
    <NarrowPage title="Choose a new password" lead="After the change, every place the account is signed in has to sign in again.">
      <ResetPasswordForm token={params.get('token') ?? ''} />
    </NarrowPage>
  );
}
