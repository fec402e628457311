import type { MeResponse } from '../../../../shared/api/auth';
import { formatDateTime } from '../../../lib/format-time';

/** Who this account is; the role's name comes from the caller so the words stay in one place. */
export function AccountSummary({ me, roleLabel }: { me: MeResponse; roleLabel: string }) {
  const { user } = me;
  const rows: [string, string][] = [
    ['Name', user.name],
    ['E-mail', `${user.email}${user.emailVerified ? ' (confirmed)' : ' (not confirmed yet)'}`],
    ['Role', roleLabel],
    ['Organisations', me.organisations.length ? me.organisations.map((o) => `${o.name} (${o.role})`).join(', ') : 'None'],
    ['Account created', formatDateTime(user.createdAt)],
  ];
  return (
    <dl className="grid gap-x-6 gap-y-3 sm:grid-cols-[10rem_1fr]">
      {rows.map(([label, value]) => (
        <div key={label} className="contents">
          <dt className="text-sm font-bold text-ink-700">{label}</dt>
          <dd className="break-words text-ink-950">{value}</dd>
        </div>
      ))}
    </dl>
  );
}
