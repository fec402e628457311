import { Link } from 'react-router-dom';
import { cardClass, primaryButtonClass } from '../../components/form-styles';
import { Page } from '../../components/page';
import { useSignedIn } from '../use-signed-in';

/** The engineer's start page: authoring arrives in a later build, so it says so plainly. */
export function WorkbenchRoute() {
  const me = useSignedIn();
  return (
    <Page title="Your workbench" lead={`Signed in as ${me.user.name}. This is where you will write, test and version templates.`}>
      <div className={`${cardClass} max-w-2xl`}>
        <h2 className="text-lg font-extrabold">Template authoring is not in this build yet</h2>
        <p className="mt-2 text-sm leading-relaxed text-ink-800">
          Until it arrives, every published template can be opened, solved and checked in the library, with its free-body
          diagrams, design checks and reference cases.
        </p>
        <Link to="/templates" className={`${primaryButtonClass} mt-5`}>
          Open the template library
        </Link>
      </div>
    </Page>
  );
}
