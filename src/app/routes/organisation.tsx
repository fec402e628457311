import { Page } from '../../components/page';
import { OrganisationApiKeys } from '../../features/api-keys/components/organisation-api-keys';
import { MyOrganisation } from '../../features/organisations/components/my-organisation';
import { useSignedIn } from '../use-signed-in';

export function OrganisationRoute() {
  const me = useSignedIn();
  return (
    <Page title="My organisation" lead="The people who manage your organisation’s embedded calculators and API keys, and the invitations still open.">
      <MyOrganisation
        currentUserId={me.user.id}
        isAdmin={me.user.role === 'admin'}
        more={(o) =>
          o.kind === 'supplier' && <OrganisationApiKeys key={o.id} organisationId={o.id} organisationName={o.name} canManage={o.role === 'owner' || me.user.role === 'admin'} />
        }
      />
    </Page>
  );
}
