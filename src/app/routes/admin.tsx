import type { ReactNode } from 'react';
import { Outlet } from 'react-router-dom';
import { Page } from '../../components/page';
import { AdminTabs } from '../../features/admin/components/admin-tabs';
import { AdminApiKeys } from '../../features/api-keys/components/admin-api-keys';
import { AuditTable } from '../../features/admin/components/audit-table';
import { MailOutbox } from '../../features/admin/components/mail-outbox';
import { OrganisationsTable } from '../../features/admin/components/organisations-table';
import { UsersTable } from '../../features/admin/components/users-table';
import { useSignedIn } from '../use-signed-in';

// The admin area loads as one chunk of its own, only for those who open it.

export function AdminLayoutRoute() {
  return (
    <Page title="Administration" lead="Accounts, roles and organisations, and the record of who did what.">
      <AdminTabs />
      <div className="mt-6">
        <Outlet />
      </div>
    </Page>
  );
}

function Section({ title, children }: { title: string; children: ReactNode }) {
  return (
    <section aria-labelledby="admin-section-heading">
      <h2 id="admin-section-heading" className="mb-4 text-xl font-extrabold tracking-tight">
        {title}
      </h2>
      {children}
    </section>
  );
}

export function AdminUsersRoute() {
  const me = useSignedIn();
  return (
    <Section title="Users">
      <UsersTable currentUserId={me.user.id} />
    </Section>
  );
}

export function AdminOrganisationsRoute() {
  return (
    <Section title="Organisations">
      <OrganisationsTable />
    </Section>
  );
}

export function AdminApiKeysRoute() {
  return (
    <Section title="API keys">
      <AdminApiKeys />
    </Section>
  );
}

export function AdminAuditRoute() {
  return (
    <Section title="Audit log">
      <AuditTable />
    </Section>
  );
}

export function AdminMailRoute() {
  return (
    <Section title="Mail outbox">
      <p className="-mt-2 mb-4 max-w-3xl text-sm text-ink-700">
        Development only: every message the local mail server received, as it was sent. A production server sends through its
        SMTP relay and keeps nothing here.
      </p>
      <MailOutbox />
    </Section>
  );
}
