import { Link } from 'react-router-dom';
import { cardClass, primaryButtonClass, secondaryButtonClass } from '../../components/form-styles';
import { Page } from '../../components/page';
import { useSignedIn } from '../use-signed-in';

/** The supplier's start page: their organisation now, embeds and API keys when those arrive. */
export function SupplierHomeRoute() {
  const me = useSignedIn();
  const organisation = me.organisations[0];
  return (
    <Page title={organisation ? organisation.name : 'Supplier start page'} lead={`Signed in as ${me.user.name}.`}>
      <div className="grid max-w-4xl gap-6 md:grid-cols-2">
        <div className={cardClass}>
          <h2 className="text-lg font-extrabold">Your organisation</h2>
          <p className="mt-2 text-sm leading-relaxed text-ink-800">
            {organisation
              ? `You are ${organisation.role === 'owner' ? 'an owner' : 'a member'} of ${organisation.name}. See who else is in it and invite colleagues by e-mail.`
              : 'You are not in an organisation yet. An owner can invite you by e-mail.'}
          </p>
          <Link to="/organisation" className={`${primaryButtonClass} mt-5`}>
            My organisation
          </Link>
        </div>
        <div className={cardClass}>
          <h2 className="text-lg font-extrabold">Embedded calculators and API keys</h2>
          <p className="mt-2 text-sm leading-relaxed text-ink-800">
            Putting a calculator on your own website and holding API keys arrive in a later build. The published templates
            can be tried in the library today.
          </p>
          <Link to="/templates" className={`${secondaryButtonClass} mt-5`}>
            Open the template library
          </Link>
        </div>
      </div>
    </Page>
  );
}
