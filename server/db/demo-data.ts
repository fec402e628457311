import type { UserRole } from './schema/auth';
import type { MemberRole, OrganisationKind } from './schema/organisations';

// Invented people and companies for the demo. `.example` addresses can never reach anyone.
// No passwords or other secrets here: sign-in arrives with a later issue.

export interface DemoOrganisation {
  slug: string;
  name: string;
  kind: OrganisationKind;
}

export interface DemoUser {
  id: string;
  name: string;
  email: string;
  role: UserRole;
  memberOf: { organisationSlug: string; role: MemberRole }[];
}

export const demoOrganisations: readonly DemoOrganisation[] = [
  { slug: 'tallow-ridge-engineering', name: 'Tallow Ridge Engineering', kind: 'engineering' },
  { slug: 'brightwater-rigging-supply', name: 'Brightwater Rigging Supply', kind: 'supplier' },
];

export const demoUsers: readonly DemoUser[] = [
  {
    id: 'demo-admin',
    name: 'Maren Okafor',
    email: 'admin@tallow-ridge.example',
    role: 'admin',
    memberOf: [{ organisationSlug: 'tallow-ridge-engineering', role: 'owner' }],
  },
  {
    id: 'demo-engineer',
    name: 'Teodor Lindqvist',
    email: 'engineer@tallow-ridge.example',
    role: 'engineer',
    memberOf: [{ organisationSlug: 'tallow-ridge-engineering', role: 'member' }],
  },
  {
    id: 'demo-supplier',
    name: 'Priya Castellane',
    email: 'sales@brightwater-rigging.example',
    role: 'supplier',
    memberOf: [{ organisationSlug: 'brightwater-rigging-supply', role: 'owner' }],
  },
];
