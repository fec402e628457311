import { useQueryClient } from '@tanstack/react-query';
import { useNavigate, useSearchParams } from 'react-router-dom';
import { NarrowPage } from '../../components/narrow-page';
import { meQueryKey, useMe } from '../../features/auth/api/get-me';
import { AcceptInvitation } from '../../features/organisations/components/accept-invitation';

export function AcceptInvitationRoute() {
  const [params] = useSearchParams();
  const me = useMe();
  const queryClient = useQueryClient();
  const navigate = useNavigate();
  return (
    <NarrowPage title="Join an organisation">
      {me.isPending ? (
        <p role="status" className="text-ink-800">Checking your sign-in…</p>
      ) : (
        <AcceptInvitation
          token={params.get('token') ?? ''}
          signedInEmail={me.data?.user.email ?? null}
          onAccepted={async () => {
            // Joining can change the role (a plain account becomes supplier or engineer).
            await queryClient.invalidateQueries({ queryKey: meQueryKey });
            queryClient.removeQueries({ queryKey: ['organisations'] });
            navigate('/organisation');
          }}
        />
      )}
    </NarrowPage>
  );
}
