import { Link, useNavigate } from 'react-router-dom';
import { useMe } from '../api/get-me';
import { useSignOut } from '../api/sign-out';
import { roleLabels } from './role-label';

const headerLink = 'rounded-md px-3 py-2 text-sm font-semibold text-ink-100 hover:bg-ink-800 hover:text-paper-50';

/** The header's corner: who is signed in and as what, or the way in. */
export function AccountMenu() {
  const me = useMe();
  const signOut = useSignOut();
  const navigate = useNavigate();

  if (me.isPending) return <span className="px-3 py-2 text-sm text-ink-300">…</span>;
  if (!me.data) {
    return (
      <div className="flex items-center gap-1">
        <Link to="/sign-in" className={headerLink}>
          Sign in
        </Link>
        <Link to="/sign-up" className="rounded-md bg-paper-50 px-3 py-2 text-sm font-bold text-ink-900 hover:bg-paper-200">
          Create account
        </Link>
      </div>
    );
  }
  const { user } = me.data;
  return (
    <div className="flex items-center gap-2" data-signed-in-role={user.role}>
      <Link to="/account" className="flex min-w-0 items-center gap-2 rounded-md px-2 py-1.5 hover:bg-ink-800">
        <span className="sr-only">Your account: </span>
        <span aria-hidden="true" className="inline-flex size-8 shrink-0 items-center justify-center rounded-full bg-ink-600 text-sm font-extrabold text-paper-50">
          {user.name.trim().charAt(0).toUpperCase() || '?'}
        </span>
        <span className="flex min-w-0 flex-col leading-tight">
          <span className="max-w-[10rem] truncate text-sm font-bold text-paper-50">{user.name}</span>
          <span className="sr-only">, signed in as </span>
          <span className="text-xs font-semibold text-ink-200">{roleLabels[user.role]}</span>
        </span>
      </Link>
      <button
        type="button"
        className="rounded-md border border-ink-600 px-3 py-1.5 text-sm font-semibold text-ink-100 hover:bg-ink-800 hover:text-paper-50"
        disabled={signOut.isPending}
        onClick={() => signOut.mutate(undefined, { onSuccess: () => navigate('/sign-in?signedOut=1') })}
      >
        Sign out
      </button>
    </div>
  );
}
