import { z } from 'zod';

/**
 * Accounts, sessions, organisations and administration: every request and response shape the
 * client and the server share. Paths below are relative to the site root. All errors are RFC
 * 9457 problem details (shared/api/problem.ts); the auth-specific `type`s are in
 * `authProblemTypes`. Cookie sessions: the browser sends the session cookie itself
 * (`credentials: 'same-origin'`); every state-changing request must come from our own origin
 * (the Origin header is checked), so call these from the app's pages with fetch.
 *
 * The sign-up, sign-in, verification and reset flows are served under /api/auth/* (the auth
 * library's paths; ours adds validation, rate limits and uniform answers in front of them).
 */

// ---------------------------------------------------------------- roles and capabilities

export const userRoles = ['admin', 'engineer', 'supplier', 'user'] as const;
export const userRoleSchema = z.enum(userRoles);
export type UserRole = z.infer<typeof userRoleSchema>;

export const organisationKindSchema = z.enum(['engineering', 'supplier']);
export const memberRoleSchema = z.enum(['owner', 'member']);
export type MemberRole = z.infer<typeof memberRoleSchema>;

/** What a role may do, so the client can hide what the server would refuse anyway. */
export const capabilities = ['templates:author', 'embeds:manage', 'api-keys:manage', 'admin'] as const;
export const capabilitySchema = z.enum(capabilities);
export type Capability = z.infer<typeof capabilitySchema>;

export const capabilitiesByRole: Record<UserRole, readonly Capability[]> = {
  admin: ['templates:author', 'embeds:manage', 'api-keys:manage', 'admin'],
  engineer: ['templates:author'],
  supplier: ['embeds:manage', 'api-keys:manage'],
  user: [],
};

/** Where each role lands after signing in (client routes). */
export const homeByRole: Record<UserRole, string> = {
  admin: '/admin',
  engineer: '/workbench',
  supplier: '/supplier',
  user: '/',
};

// ---------------------------------------------------------------- field rules

export const PASSWORD_MIN_LENGTH = 10;
export const PASSWORD_MAX_LENGTH = 128;

export const emailSchema = z
  .string({ error: 'is required' })
  .trim()
  .toLowerCase()
  .max(254, 'must be at most 254 characters')
  .pipe(z.email({ error: 'must be an e-mail address such as name@example.com' }));

export const nameSchema = z
  .string({ error: 'is required' })
  .trim()
  .min(1, 'must not be empty')
  .max(100, 'must be at most 100 characters');

/**
 * A new password. The server also refuses one that contains the e-mail's local part or is a
 * well-known weak password (422, path /password or /newPassword).
 */
export const newPasswordSchema = z
  .string({ error: 'is required' })
  .min(PASSWORD_MIN_LENGTH, `must be at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(PASSWORD_MAX_LENGTH, `must be at most ${PASSWORD_MAX_LENGTH} characters`)
  .refine((value) => new Set(value).size >= 5, 'must use at least 5 different characters');

export const tokenSchema = z.string({ error: 'is required' }).min(1, 'must not be empty').max(2048, 'is too long');

// ---------------------------------------------------------------- /api/auth/* flows

/** POST /api/auth/sign-up/email — anonymous. 200 `signUpResponse` (the same answer when the
 *  address already has an account: its owner gets a "you already have an account" mail
 *  instead, so sign-up never tells who is registered). 422 field errors, 429. */
export const signUpRequestSchema = z.object({
  name: nameSchema,
  email: emailSchema,
  password: newPasswordSchema,
});
export type SignUpRequest = z.infer<typeof signUpRequestSchema>;
export const signUpResponseSchema = z.object({
  status: z.literal('verification-sent'),
  email: z.string(),
});
export type SignUpResponse = z.infer<typeof signUpResponseSchema>;

/** POST /api/auth/sign-in/email — anonymous. 200 sets the session cookie and answers
 *  `signInResponse`. 401 `/problems/sign-in-failed` for any wrong e-mail or password (one
 *  message for both); 403 `/problems/email-not-verified` or `/problems/account-disabled`
 *  (only after a right password); 422; 429. */
export const signInRequestSchema = z.object({
  email: emailSchema,
  password: z.string({ error: 'is required' }).min(1, 'must not be empty').max(PASSWORD_MAX_LENGTH, 'is too long'),
  /** false: a browser-session cookie that ends when the browser closes. Default true. */
  rememberMe: z.boolean().optional(),
});
export type SignInRequest = z.infer<typeof signInRequestSchema>;

/** POST /api/auth/sign-out — body `{}`. 200 `{ success: true }`; clears the cookie. */
export const signOutResponseSchema = z.object({ success: z.literal(true) });

/** GET /api/auth/verify-email?token=… — anonymous; the mail's link opens the client page
 *  `/verify-email?token=…`, which calls this. 200 `verifyEmailResponse`; 400
 *  `/problems/invalid-link` when the token is unknown, expired or spoilt. */
export const verifyEmailQuerySchema = z.object({ token: tokenSchema });
export const verifyEmailResponseSchema = z.object({ status: z.literal('verified'), email: z.string() });
export type VerifyEmailResponse = z.infer<typeof verifyEmailResponseSchema>;

/** POST /api/auth/send-verification-email — anonymous. Always 200 `mailAcceptedResponse`
 *  (sent only if the address has an unverified account). 422, 429. */
export const resendVerificationRequestSchema = z.object({ email: emailSchema });

/** POST /api/auth/request-password-reset — anonymous. Always 200 `mailAcceptedResponse`
 *  (sent only if the address has an account). The mail's link opens the client page
 *  `/reset-password?token=…`. 422, 429. */
export const requestPasswordResetSchema = z.object({ email: emailSchema });

export const mailAcceptedResponseSchema = z.object({ status: z.literal('accepted') });
export type MailAcceptedResponse = z.infer<typeof mailAcceptedResponseSchema>;

/** POST /api/auth/reset-password — anonymous. 200 `{ status: 'password-changed' }`, every
 *  session of the account is ended; 400 `/problems/invalid-link` when the token is unknown,
 *  expired or already used; 422 (weak password at /newPassword); 429. */
export const resetPasswordRequestSchema = z.object({
  token: tokenSchema,
  newPassword: newPasswordSchema,
});
export type ResetPasswordRequest = z.infer<typeof resetPasswordRequestSchema>;
export const resetPasswordResponseSchema = z.object({ status: z.literal('password-changed') });

/** POST /api/auth/change-password — signed in. 200 `changePasswordResponse`; 401 without a
 *  session; 422 when the current password is not right (/currentPassword) or the new one is weak
 *  (/newPassword); 429. Other sessions are signed out unless `signOutOtherSessions` is false. */
export const changePasswordRequestSchema = z.object({
  currentPassword: z.string({ error: 'is required' }).min(1, 'must not be empty').max(PASSWORD_MAX_LENGTH, `must be at most ${PASSWORD_MAX_LENGTH} characters`),
  newPassword: newPasswordSchema,
  signOutOtherSessions: z.boolean({ error: 'must be true or false' }).default(true),
});
export type ChangePasswordRequest = z.input<typeof changePasswordRequestSchema>;
export const changePasswordResponseSchema = z.object({ status: z.literal('password-changed'), otherSessionsSignedOut: z.boolean() });
export type ChangePasswordResponse = z.infer<typeof changePasswordResponseSchema>;

// ---------------------------------------------------------------- the signed-in user

export const myOrganisationSchema = z.object({
  id: z.string(),
  slug: z.string(),
  name: z.string(),
  kind: organisationKindSchema,
  role: memberRoleSchema,
});
export type MyOrganisation = z.infer<typeof myOrganisationSchema>;

export const sessionUserSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: userRoleSchema,
  emailVerified: z.boolean(),
  createdAt: z.string(),
});
export type SessionUser = z.infer<typeof sessionUserSchema>;

/** GET /api/me — signed in (401 `/problems/unauthorized` otherwise). Also the answer of a
 *  successful POST /api/auth/sign-in/email. */
export const meResponseSchema = z.object({
  user: sessionUserSchema,
  organisations: z.array(myOrganisationSchema),
  capabilities: z.array(capabilitySchema),
  home: z.string(),
  session: z.object({ id: z.string(), expiresAt: z.string() }),
});
export type MeResponse = z.infer<typeof meResponseSchema>;
export const signInResponseSchema = meResponseSchema;
export type SignInResponse = MeResponse;

export const sessionInfoSchema = z.object({
  id: z.string(),
  createdAt: z.string(),
  expiresAt: z.string(),
  ipAddress: z.string().nullable(),
  userAgent: z.string().nullable(),
  current: z.boolean(),
});
export type SessionInfo = z.infer<typeof sessionInfoSchema>;

/** GET /api/me/sessions — signed in. Newest first. */
export const sessionListSchema = z.object({ items: z.array(sessionInfoSchema) });
export type SessionList = z.infer<typeof sessionListSchema>;

/** POST /api/me/sessions/revoke-others — signed in, body `{}`. Ends every session but this one. */
export const revokeOthersResponseSchema = z.object({ revoked: z.number().int().nonnegative() });

/** DELETE /api/me/sessions/:sessionId — signed in; one of one's own sessions. 204; 404. */

// ---------------------------------------------------------------- organisations

/** GET /api/organisations/mine — signed in. */
export const myOrganisationListSchema = z.object({ items: z.array(myOrganisationSchema) });

export const memberSchema = z.object({
  userId: z.string(),
  name: z.string(),
  email: z.string(),
  role: memberRoleSchema,
  joinedAt: z.string(),
});
export type Member = z.infer<typeof memberSchema>;

export const invitationSchema = z.object({
  id: z.string(),
  email: z.string(),
  role: memberRoleSchema,
  invitedBy: z.string().nullable(),
  createdAt: z.string(),
  expiresAt: z.string(),
});
export type Invitation = z.infer<typeof invitationSchema>;

/** GET /api/organisations/:organisationId/members — a member of that organisation, or admin.
 *  `invitations` lists the open ones (not accepted, not expired). */
export const memberListSchema = z.object({
  organisation: z.object({ id: z.string(), slug: z.string(), name: z.string(), kind: organisationKindSchema }),
  items: z.array(memberSchema),
  invitations: z.array(invitationSchema),
});
export type MemberList = z.infer<typeof memberListSchema>;

/** POST /api/organisations/:organisationId/invitations — that organisation's owner, or admin.
 *  201 `invitation`; sends the mail with the link `/invitations/accept?token=…` (valid 7 days,
 *  once). 409 `/problems/conflict` when the address is already a member. */
export const createInvitationRequestSchema = z.object({
  email: emailSchema,
  role: memberRoleSchema.default('member'),
});
export type CreateInvitationRequest = z.input<typeof createInvitationRequestSchema>;

/** DELETE /api/organisations/:organisationId/invitations/:invitationId — owner or admin. 204. */
/** DELETE /api/organisations/:organisationId/members/:userId — owner or admin. 204; 409 when
 *  it would leave the organisation without an owner. */

/** GET /api/invitations/preview?token=… — anonymous; for the accept page before signing in.
 *  400 `/problems/invalid-link` when unknown, expired or used. */
export const invitationPreviewSchema = z.object({
  organisation: z.object({ name: z.string(), kind: organisationKindSchema }),
  email: z.string(),
  role: memberRoleSchema,
  expiresAt: z.string(),
});
export type InvitationPreview = z.infer<typeof invitationPreviewSchema>;

/** POST /api/invitations/accept — signed in as the invited address (403 otherwise). 200
 *  `acceptInvitationResponse`; 400 `/problems/invalid-link` when unknown, expired or used.
 *  A plain `user` joining a supplier organisation becomes `supplier`, joining an engineering
 *  organisation becomes `engineer`. */
export const acceptInvitationRequestSchema = z.object({ token: tokenSchema });
export const acceptInvitationResponseSchema = z.object({
  organisation: myOrganisationSchema,
  userRole: userRoleSchema,
});

// ---------------------------------------------------------------- administration (role admin)

export const pageQuerySchema = z.object({
  page: z.coerce.number<string | number>().int().min(1, 'must be 1 or more').default(1),
  pageSize: z.coerce.number<string | number>().int().min(1, 'must be 1 or more').max(100, 'must be at most 100').default(20),
});

export const adminUserSchema = z.object({
  id: z.string(),
  name: z.string(),
  email: z.string(),
  role: userRoleSchema,
  emailVerified: z.boolean(),
  disabled: z.boolean(),
  disabledReason: z.string().nullable(),
  createdAt: z.string(),
  organisations: z.array(z.object({ id: z.string(), name: z.string(), role: memberRoleSchema })),
});
export type AdminUser = z.infer<typeof adminUserSchema>;

export const adminUserSortKeys = ['name', 'email', 'role', 'createdAt'] as const;

/** GET /api/admin/users?q=&role=&sort=&order=&page=&pageSize= — q matches name or e-mail. */
export const adminUserQuerySchema = pageQuerySchema.extend({
  q: z.string().trim().max(200, 'must be at most 200 characters').optional(),
  role: userRoleSchema.optional(),
  sort: z.enum(adminUserSortKeys).default('createdAt'),
  order: z.enum(['asc', 'desc']).default('desc'),
});
export type AdminUserQuery = z.input<typeof adminUserQuerySchema>;

export function pageOf<T extends z.ZodType>(item: T) {
  return z.object({
    items: z.array(item),
    total: z.number().int().nonnegative(),
    page: z.number().int().min(1),
    pageSize: z.number().int().min(1),
  });
}
export const adminUserPageSchema = pageOf(adminUserSchema);
export type AdminUserPage = z.infer<typeof adminUserPageSchema>;

/** PATCH /api/admin/users/:userId/role — 200 `adminUser`. 409 when an admin demotes themself. */
export const changeRoleRequestSchema = z.object({ role: userRoleSchema });

/** POST /api/admin/users/:userId/disable — 200 `adminUser`; every session of the user ends at
 *  once. 409 when an admin disables themself. */
export const disableUserRequestSchema = z.object({
  reason: z.string().trim().max(500, 'must be at most 500 characters').optional(),
});
/** POST /api/admin/users/:userId/enable — body `{}`. 200 `adminUser`. */

export const adminOrganisationSchema = z.object({
  id: z.string(),
  slug: z.string(),
  name: z.string(),
  kind: organisationKindSchema,
  memberCount: z.number().int().nonnegative(),
  owners: z.array(z.object({ userId: z.string(), name: z.string(), email: z.string() })),
  createdAt: z.string(),
});
export type AdminOrganisation = z.infer<typeof adminOrganisationSchema>;

/** GET /api/admin/organisations?q=&kind=&page=&pageSize= */
export const adminOrganisationQuerySchema = pageQuerySchema.extend({
  q: z.string().trim().max(200, 'must be at most 200 characters').optional(),
  kind: organisationKindSchema.optional(),
});
export const adminOrganisationPageSchema = pageOf(adminOrganisationSchema);
export type AdminOrganisationPage = z.infer<typeof adminOrganisationPageSchema>;

/** Actions the audit log records (others may be added by later features). */
export const auditActions = [
  'auth.sign-up',
  'auth.sign-in',
  'auth.sign-in-failed',
  'auth.sign-out',
  'auth.email-verified',
  'auth.password-reset-requested',
  'auth.password-reset',
  'auth.sessions-revoked',
  'user.role-changed',
  'user.disabled',
  'user.enabled',
  'organisation.invitation-created',
  'organisation.invitation-accepted',
  'organisation.invitation-revoked',
  'organisation.member-removed',
  'api-key.created',
  'api-key.rotated',
  'api-key.revoked',
  'template.published',
  'server.start',
  'server.stop',
] as const;

export const auditEntrySchema = z.object({
  id: z.number().int(),
  at: z.string(),
  actorKind: z.enum(['user', 'api_key', 'system']),
  actorId: z.string().nullable(),
  /** The actor's e-mail when the actor is a user who still exists. */
  actorEmail: z.string().nullable(),
  action: z.string(),
  target: z.string().nullable(),
  ip: z.string().nullable(),
  details: z.record(z.string(), z.unknown()),
});
export type AuditEntry = z.infer<typeof auditEntrySchema>;

/** GET /api/admin/audit?action=&actor=&target=&from=&to=&page=&pageSize= — newest first.
 *  `action` exact or a prefix ending in '.' (e.g. `auth.`); `actor` an actor id or e-mail;
 *  `from` / `to` ISO 8601 instants (inclusive / exclusive). */
export const auditQuerySchema = pageQuerySchema.extend({
  action: z.string().trim().max(100, 'must be at most 100 characters').optional(),
  actor: z.string().trim().max(254, 'must be at most 254 characters').optional(),
  target: z.string().trim().max(254, 'must be at most 254 characters').optional(),
  from: z.iso.datetime({ offset: true, error: 'must be an ISO 8601 date-time such as 2026-01-31T00:00:00Z' }).optional(),
  to: z.iso.datetime({ offset: true, error: 'must be an ISO 8601 date-time such as 2026-01-31T00:00:00Z' }).optional(),
});
export type AuditQuery = z.input<typeof auditQuerySchema>;
export const auditPageSchema = pageOf(auditEntrySchema);
export type AuditPage = z.infer<typeof auditPageSchema>;

/** GET /api/admin/audit.csv?<the same filters, no paging> — text/csv attachment, up to 10 000
 *  rows, columns: at,actor_kind,actor_id,actor_email,action,target,ip,details. */
export const AUDIT_CSV_PATH = '/api/admin/audit.csv';

// ---------------------------------------------------------------- dev mail outbox (admin, development only)

export const mailSummarySchema = z.object({
  id: z.number().int(),
  to: z.string(),
  from: z.string(),
  subject: z.string(),
  receivedAt: z.string(),
});
export type MailSummary = z.infer<typeof mailSummarySchema>;

/** GET /api/dev/mail?to=&page=&pageSize= — newest first. 404 in production. */
export const mailQuerySchema = pageQuerySchema.extend({
  to: z.string().trim().max(254, 'must be at most 254 characters').optional(),
});
export const mailPageSchema = pageOf(mailSummarySchema);
export type MailPage = z.infer<typeof mailPageSchema>;

/** GET /api/dev/mail/:mailId — the whole message. GET /api/dev/mail/:mailId/html serves the
 *  HTML part alone as text/html under a sandboxing CSP, to show in an <iframe src> on our page. */
export const mailMessageSchema = mailSummarySchema.extend({
  html: z.string().nullable(),
  text: z.string().nullable(),
});
export type MailMessage = z.infer<typeof mailMessageSchema>;

// ---------------------------------------------------------------- problem types

export const authProblemTypes = {
  unauthorized: '/problems/unauthorized',
  forbidden: '/problems/forbidden',
  crossOrigin: '/problems/cross-origin',
  signInFailed: '/problems/sign-in-failed',
  emailNotVerified: '/problems/email-not-verified',
  accountDisabled: '/problems/account-disabled',
  invalidLink: '/problems/invalid-link',
  rateLimited: '/problems/rate-limited',
} as const;
