import { NavLink } from 'react-router-dom';
import { ApiError } from '../../../lib/api-client';
import { useMail } from '../api/get-mail';

const tabs = [
  { to: '/admin', label: 'Users', end: true },
  { to: '/admin/organisations', label: 'Organisations' },
  { to: '/admin/api-keys', label: 'API keys' },
  { to: '/admin/audit', label: 'Audit log' },
  { to: '/admin/mail', label: 'Mail outbox' },
];

/** The admin area's own menu; the current page is marked by a bar and by aria-current. */
export function AdminTabs() {
  // The outbox exists only on a development server, which answers 404 elsewhere.
  const mail = useMail({ page: 1, pageSize: 1 });
  const noOutbox = mail.error instanceof ApiError && mail.error.status === 404;
  const shown = tabs.filter((t) => t.to !== '/admin/mail' || !noOutbox);
  return (
    <nav aria-label="Administration" className="border-b border-ink-200">
      <ul className="-mb-px flex flex-wrap gap-x-1">
        {shown.map((t) => (
          <li key={t.to}>
            <NavLink
              to={t.to}
              end={t.end}
              className={({ isActive }) =>
                `inline-block border-b-4 px-3 py-2.5 text-sm font-bold ${isActive ? 'border-ink-700 text-ink-950' : 'border-transparent text-ink-700 hover:border-ink-200 hover:text-ink-950'}`
              }
            >
              {t.label}
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}
