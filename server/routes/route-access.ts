import type { MemberRole, UserRole } from '../../shared/api/auth';

/**
 * Every route of the accounts, organisations and admin API with who may call it. This one
 * table both registers the guards (access-router.ts) and drives the authorisation matrix test,
 * and a handler can only be registered under an id from it, so no route goes unguarded.
 * Paths are relative to /api.
 */
export type RouteAccess =
  | { kind: 'public' }
  | { kind: 'signed-in' }
  | { kind: 'roles'; roles: readonly UserRole[] }
  /** Members (or only owners) of the organisation in the path; admins always pass. */
  | { kind: 'organisation'; orgRole: MemberRole | 'any'; param: 'organisationId' };

export type RouteMethod = 'GET' | 'POST' | 'PATCH' | 'DELETE';

export interface AccessRule {
  id: string;
  method: RouteMethod;
  path: string;
  access: RouteAccess;
  /** Served in development and test only; absent (404) in production. */
  devOnly?: boolean;
}

const signedIn = { kind: 'signed-in' } as const;
const adminOnly = { kind: 'roles', roles: ['admin'] } as const;

export const routeTable = [
  { id: 'me.get', method: 'GET', path: '/me', access: signedIn },
  { id: 'me.sessions.list', method: 'GET', path: '/me/sessions', access: signedIn },
  { id: 'me.sessions.revokeOthers', method: 'POST', path: '/me/sessions/revoke-others', access: signedIn },
  { id: 'me.sessions.revoke', method: 'DELETE', path: '/me/sessions/:sessionId', access: signedIn },

  { id: 'organisations.mine', method: 'GET', path: '/organisations/mine', access: signedIn },
  { id: 'organisations.members', method: 'GET', path: '/organisations/:organisationId/members', access: { kind: 'organisation', orgRole: 'any', param: 'organisationId' } },
  { id: 'organisations.members.remove', method: 'DELETE', path: '/organisations/:organisationId/members/:userId', access: { kind: 'organisation', orgRole: 'owner', param: 'organisationId' } },
  { id: 'organisations.invitations.create', method: 'POST', path: '/organisations/:organisationId/invitations', access: { kind: 'organisation', orgRole: 'owner', param: 'organisationId' } },
  { id: 'organisations.invitations.revoke', method: 'DELETE', path: '/organisations/:organisationId/invitations/:invitationId', access: { kind: 'organisation', orgRole: 'owner', param: 'organisationId' } },
  { id: 'invitations.preview', method: 'GET', path: '/invitations/preview', access: { kind: 'public' } },
  { id: 'invitations.accept', method: 'POST', path: '/invitations/accept', access: signedIn },

  { id: 'admin.users.list', method: 'GET', path: '/admin/users', access: adminOnly },
  { id: 'admin.users.role', method: 'PATCH', path: '/admin/users/:userId/role', access: adminOnly },
  { id: 'admin.users.disable', method: 'POST', path: '/admin/users/:userId/disable', access: adminOnly },
  { id: 'admin.users.enable', method: 'POST', path: '/admin/users/:userId/enable', access: adminOnly },
  { id: 'admin.organisations.list', method: 'GET', path: '/admin/organisations', access: adminOnly },
  { id: 'admin.audit.list', method: 'GET', path: '/admin/audit', access: adminOnly },
  { id: 'admin.audit.csv', method: 'GET', path: '/admin/audit.csv', access: adminOnly },

  { id: 'apiKeys.list', method: 'GET', path: '/organisations/:organisationId/api-keys', access: { kind: 'organisation', orgRole: 'any', param: 'organisationId' } },
  { id: 'apiKeys.create', method: 'POST', path: '/organisations/:organisationId/api-keys', access: { kind: 'organisation', orgRole: 'owner', param: 'organisationId' } },
  { id: 'apiKeys.rotate', method: 'POST', path: '/organisations/:organisationId/api-keys/:keyId/rotate', access: { kind: 'organisation', orgRole: 'owner', param: 'organisationId' } },
  { id: 'apiKeys.revoke', method: 'POST', path: '/organisations/:organisationId/api-keys/:keyId/revoke', access: { kind: 'organisation', orgRole: 'owner', param: 'organisationId' } },
  { id: 'apiKeys.usage', method: 'GET', path: '/organisations/:organisationId/api-usage', access: { kind: 'organisation', orgRole: 'any', param: 'organisationId' } },
  { id: 'apiKeys.admin.list', method: 'GET', path: '/admin/api-keys', access: adminOnly },
  { id: 'apiKeys.admin.create', method: 'POST', path: '/admin/api-keys', access: adminOnly },
  { id: 'apiKeys.admin.rotate', method: 'POST', path: '/admin/api-keys/:keyId/rotate', access: adminOnly },
  { id: 'apiKeys.admin.revoke', method: 'POST', path: '/admin/api-keys/:keyId/revoke', access: adminOnly },
  { id: 'apiKeys.admin.usage', method: 'GET', path: '/admin/api-usage', access: adminOnly },

  { id: 'dev.mail.list', method: 'GET', path: '/dev/mail', access: adminOnly, devOnly: true },
  { id: 'dev.mail.get', method: 'GET', path: '/dev/mail/:mailId', access: adminOnly, devOnly: true },
  { id: 'dev.mail.html', method: 'GET', path: '/dev/mail/:mailId/html', access: adminOnly, devOnly: true },
  // Public, unlike the outbox: the demo key is printed at start and listed in README.md anyway,
  // opens only the demo supplier's API, and the reference page (public) fills it in for visitors.
  { id: 'dev.demoKey.get', method: 'GET', path: '/dev/demo-key', access: { kind: 'public' }, devOnly: true },
] as const satisfies readonly AccessRule[];

export type RouteId = (typeof routeTable)[number]['id'];
/** The API-key management rows (handled in api-key-handlers.ts). */
export type ApiKeyRouteId = Extract<RouteId, `apiKeys.${string}`>;
