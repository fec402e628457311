import { Link } from 'react-router-dom';
import { cardClass, primaryButtonClass, secondaryButtonClass } from '../../components/form-styles';
import { Page } from '../../components/page';
import { useSignedIn } from '../use-signed-in';

/** The supplier's start page: their organisation with its API keys, the API reference, the library. */
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
              ? `You are ${organisation.role === 'owner' ? 'an owner' : 'a member'} of ${organisation.name}. See who else is in it, invite colleagues by e-mail and manage its API keys.`
              : 'You are not in an organisation yet. An owner can invite you by e-mail.'}
          </p>
          <Link to="/organisation" className={`${primaryButtonClass} mt-5`}>
            My organisation
          </Link>
        </div>
        <div className={cardClass}>
          <h2 className="text-lg font-extrabold">Results in your own systems</h2>
          <p className="mt-2 text-sm leading-relaxed text-ink-800">
            Your organisation's API keys, their calls and limits are on its page; the reference shows every endpoint with examples you
            can run. Putting a calculator on your own website comes in a later build.
          </p>
          <div className="mt-5 flex flex-wrap gap-3">
            <Link to="/developers/api" className={secondaryButtonClass}>
              API reference
            </Link>
            <Link to="/templates" className={secondaryButtonClass}>
              Template library
            </Link>
          </div>
        </div>
      </div>
    </Page>
  );
}
