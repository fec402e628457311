import type { ReactNode } from 'react';
import { Navigate, Outlet, useLocation } from 'react-router-dom';
import type { MeResponse } from '../../shared/api/auth';
import { useMe } from '../features/auth/api/get-me';
import { roleLabels } from '../features/auth/components/role-label';
import { Notice } from '../components/notice';
import { formErrorsFrom } from '../lib/form-errors';
import { NotAllowed } from './routes/not-allowed';

interface RequireAccessProps {
  /** Who may see the pages below; omitted: anyone signed in. */
  allow?: (me: MeResponse) => boolean;
  /** One sentence on who the pages are for, shown to everyone else. */
  what?: string;
  children?: ReactNode;
}

/**
 * Sends a visitor to sign in (and back here afterwards) and shows a plain "not allowed" page to a
 * role that may not use what is below. It only spares people a page of refusals: the server
 * checks every request again.
 */
export function RequireAccess({ allow, what = 'This page is not for your role.', children }: RequireAccessProps) {
  const me = useMe();
  const location = useLocation();
  if (me.isPending) {
    return (
      <p role="status" className="mx-auto max-w-page px-4 py-14 text-ink-700 sm:px-6">
        Checking your sign-in…
      </p>
    );
  }
  if (me.isError) {
    return (
      <div className="mx-auto max-w-page px-4 py-14 sm:px-6">
        <Notice tone="error" title="Your sign-in could not be checked">{formErrorsFrom(me.error).summary}</Notice>
      </div>
    );
  }
  if (!me.data) {
    const next = `${location.pathname}${location.search}`;
    return <Navigate to={`/sign-in?next=${encodeURIComponent(next)}`} replace />;
  }
  if (allow && !allow(me.data)) return <NotAllowed what={what} roleLabel={roleLabels[me.data.user.role]} home={me.data.home} />;
  return children ?? <Outlet />;
}
