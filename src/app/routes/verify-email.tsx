import { useSearchParams } from 'react-router-dom';
import { NarrowPage } from '../../components/narrow-page';
import { VerifyEmailResult } from '../../features/auth/components/verify-email-result';

export function VerifyEmailRoute() {
  const [params] = useSearchParams();
  return (
    <NarrowPage title="Confirm your e-mail address">
      <VerifyEmailResult token={params.get('token') ?? ''} />
    </NarrowPage>
  );
}
