import { Link } from 'react-router-dom';
import { cardClass, linkClass } from '../../components/form-styles';
import { Page } from '../../components/page';
import { ChangePasswordForm } from '../../features/account/components/change-password-form';
import { AccountSummary } from '../../features/account/components/account-summary';
import { SessionList } from '../../features/account/components/session-list';
import { roleLabels } from '../../features/auth/components/role-label';
import { useSignedIn } from '../use-signed-in';

export function AccountRoute() {
  const me = useSignedIn();
  return (
    <Page title="Your account" lead="Who you are on Pinwork, your password, and where you are signed in.">
      <div className="grid items-start gap-8 lg:grid-cols-[1fr_1.3fr]">
        <div className="grid gap-8">
        <section aria-labelledby="account-heading" className={cardClass}>
          <h2 id="account-heading" className="mb-4 text-xl font-extrabold tracking-tight">
            Account
          </h2>
          <AccountSummary me={me} roleLabel={roleLabels[me.user.role]} />
        </section>
        <section aria-labelledby="password-heading" className={cardClass}>
          <h2 id="password-heading" className="mb-1 text-xl font-extrabold tracking-tight">
            Password
          </h2>
          <p className="mb-4 text-sm text-ink-700">
            Forgotten the current one? Sign out and use <Link to="/forgot-password" className={linkClass}>Forgot the password?</Link>; a link goes to your e-mail address.
          </p>
          <ChangePasswordForm email={me.user.email} />
        </section>
        </div>
        <section aria-labelledby="sessions-heading" className={cardClass}>
          <h2 id="sessions-heading" className="text-xl font-extrabold tracking-tight">
            Where you are signed in
          </h2>
          <p className="mt-1 mb-4 text-sm text-ink-700">If you see a device you do not know, sign it out and change your password.</p>
          <SessionList />
        </section>
      </div>
    </Page>
  );
}
