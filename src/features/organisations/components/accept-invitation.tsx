import { Link } from 'react-router-dom';
import { authProblemTypes, type MyOrganisation, type UserRole } from '../../../../shared/api/auth';
import { linkClass, primaryButtonClass, secondaryButtonClass } from '../../../components/form-styles';
import { Notice } from '../../../components/notice';
import { ApiError } from '../../../lib/api-client';
import { formErrorsFrom } from '../../../lib/form-errors';
import { formatDateTime } from '../../../lib/format-time';
import { useAcceptInvitation } from '../api/accept-invitation';
import { useInvitationPreview } from '../api/preview-invitation';

interface Props {
  token: string;
  /** The signed-in person's e-mail, or null for a visitor. */
  signedInEmail: string | null;
  onAccepted: (answer: { organisation: MyOrganisation; userRole: UserRole }) => void;
}

function isInvalidLink(error: unknown): boolean {
  return error instanceof ApiError && error.problem.type === authProblemTypes.invalidLink;
}

/** The landing of an invitation link: what it is for, and accepting it as the invited address. */
export function AcceptInvitation({ token, signedInEmail, onAccepted }: Props) {
  const preview = useInvitationPreview(token);
  const accept = useAcceptInvitation();

  if (!token) return <Notice tone="error" title="This link is incomplete">Open the link from the invitation e-mail exactly as it is.</Notice>;
  if (preview.isPending) return <p role="status" className="text-ink-800">Reading the invitation…</p>;
  if (preview.isError || isInvalidLink(accept.error)) {
    const invalid = isInvalidLink(preview.error) || isInvalidLink(accept.error);
    return (
      <Notice tone="error" title={invalid ? 'This invitation no longer works' : 'The invitation could not be read'}>
        {invalid ? 'It has expired, has been used already or was withdrawn. Ask the organisation’s owner to invite you again.' : formErrorsFrom(preview.error).summary}
      </Notice>
    );
  }

  const inv = preview.data;
  const here = `/invitations/accept?token=${encodeURIComponent(token)}`;
  const sameAddress = signedInEmail !== null && signedInEmail.toLowerCase() === inv.email.toLowerCase();
  return (
    <div className="grid gap-5">
      <div>
        <p className="text-lg leading-relaxed text-ink-950">
          You are invited to join <strong>{inv.organisation.name}</strong> as {inv.role === 'owner' ? 'an owner' : 'a member'}.
        </p>
        <p className="mt-1 text-sm text-ink-700">
          The invitation is for <strong className="wrap-anywhere">{inv.email}</strong> and is open until {formatDateTime(inv.expiresAt)}.
        </p>
      </div>
      {accept.isError && <Notice tone="error" title="Not accepted">{formErrorsFrom(accept.error).summary}</Notice>}
      {signedInEmail === null ? (
        <div className="grid gap-3">
          <p className="text-sm text-ink-800">Sign in as {inv.email} to accept it, or create an account with that address first.</p>
          <div className="flex flex-wrap gap-3">
            <Link to={`/sign-in?email=${encodeURIComponent(inv.email)}&next=${encodeURIComponent(here)}`} className={primaryButtonClass}>
              Sign in to accept
            </Link>
            <Link to="/sign-up" className={secondaryButtonClass}>
              Create an account
            </Link>
          </div>
        </div>
      ) : sameAddress ? (
        <button type="button" className={`${primaryButtonClass} justify-self-start`} disabled={accept.isPending} onClick={() => accept.mutate(token, { onSuccess: onAccepted })}>
          {accept.isPending ? 'Joining…' : `Join ${inv.organisation.name}`}
        </button>
      ) : (
        <Notice tone="error" title="Signed in with another address">
          You are signed in as <strong className="wrap-anywhere">{signedInEmail}</strong>, but this invitation is for {inv.email}. Sign out and sign in as{' '}
          {inv.email} to accept it. <Link to="/account" className={linkClass}>Your account</Link>
        </Notice>
      )}
    </div>
  );
}
