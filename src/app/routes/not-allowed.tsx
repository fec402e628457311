import { Link } from 'react-router-dom';
import { Page } from '../../components/page';
import { linkClass, primaryButtonClass } from '../../components/form-styles';

/** Shown in place of a page the signed-in role may not use. */
export function NotAllowed({ what, roleLabel, home }: { what: string; roleLabel: string; home: string }) {
  return (
    <Page title="Not allowed for your role" lead={<>You are signed in as <strong>{roleLabel}</strong>. {what}</>}>
      <div className="flex flex-wrap items-center gap-4">
        <Link to={home} className={primaryButtonClass}>
          Go to your start page
        </Link>
        <Link to="/account" className={linkClass}>
          Your account
        </Link>
      </div>
      <p className="mt-6 max-w-2xl text-sm text-ink-700">If you need this page for your work, ask an administrator to change your role.</p>
    </Page>
  );
}
