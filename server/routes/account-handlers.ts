import type { RequestHandler } from 'express';
import { z } from 'zod';
import {
  acceptInvitationRequestSchema,
  adminOrganisationQuerySchema,
  adminUserQuerySchema,
  auditQuerySchema,
  changeRoleRequestSchema,
  createInvitationRequestSchema,
  disableUserRequestSchema,
  mailQuerySchema,
  tokenSchema,
} from '../../shared/api/auth';
import type { DemoApiKey } from '../../shared/api/demo-key';
import { problemTypes } from '../../shared/api/problem';
import { signedIn } from '../middleware/auth-guards';
import { HttpProblem } from '../middleware/http-problem';
import { parseOrThrow } from '../middleware/validate';
import type { AccountService } from '../services/accounts';
import type { AuditLogService } from '../services/audit-log';
import type { DevMailService } from '../services/dev-mail';
import type { OrganisationService } from '../services/organisations';
import type { RouteHandlers } from './access-router';
import type { ApiKeyRouteId } from './route-access';

export interface AccountRouteServices {
  accounts: AccountService;
  organisations: OrganisationService;
  auditLog: AuditLogService;
  devMail: DevMailService;
  /** The seeded demo API key while it is live (development databases only). */
  demoApiKey: () => Promise<DemoApiKey | null>;
}

const idParam = z.string().min(1, 'must not be empty').max(200, 'is too long');
const mailIdParam = z.coerce.number<string>().int('must be a whole number').positive('must be positive');
const auditFilterSchema = auditQuerySchema.omit({ page: true, pageSize: true });

const actorOf = (req: Parameters<RequestHandler>[0]) => ({ userId: signedIn(req).user.id, ip: req.ip ?? null, headers: req.headers });

/** Thin handlers for the route table: parse, call a service, respond. */
export function accountHandlers(s: AccountRouteServices): Omit<RouteHandlers, ApiKeyRouteId> {
  return {
    'me.get': async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json(await s.accounts.me(signedIn(req)));
    },
    'me.sessions.list': async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json({ items: await s.accounts.sessions(signedIn(req)) });
    },
    'me.sessions.revokeOthers': async (req, res) => {
      res.json({ revoked: await s.accounts.revokeOtherSessions(signedIn(req), req.ip ?? null) });
    },
    'me.sessions.revoke': async (req, res) => {
      await s.accounts.revokeSession(signedIn(req), parseOrThrow(idParam, req.params.sessionId), req.ip ?? null);
      res.status(204).end();
    },

    'organisations.mine': async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json({ items: await s.accounts.organisationsOf(signedIn(req).user.id) });
    },
    'organisations.members': async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json(await s.organisations.members(String(req.params.organisationId)));
    },
    'organisations.members.remove': async (req, res) => {
      await s.organisations.removeMember(signedIn(req), req.ip ?? null, String(req.params.organisationId), parseOrThrow(idParam, req.params.userId));
      res.status(204).end();
    },
    'organisations.invitations.create': async (req, res) => {
      const body = parseOrThrow(createInvitationRequestSchema, req.body ?? {});
      res.status(201).json(await s.organisations.invite(signedIn(req), req.ip ?? null, String(req.params.organisationId), body.email, body.role));
    },
    'organisations.invitations.revoke': async (req, res) => {
      await s.organisations.revokeInvitation(signedIn(req), req.ip ?? null, String(req.params.organisationId), parseOrThrow(idParam, req.params.invitationId));
      res.status(204).end();
    },
    'invitations.preview': async (req, res) => {
      const { token } = parseOrThrow(z.object({ token: tokenSchema }), req.query);
      res.setHeader('Cache-Control', 'no-store');
      res.json(await s.organisations.preview(token));
    },
    'invitations.accept': async (req, res) => {
      const { token } = parseOrThrow(acceptInvitationRequestSchema, req.body ?? {});
      res.json(await s.organisations.accept(signedIn(req), req.ip ?? null, token));
    },

    'admin.users.list': async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json(await s.accounts.listUsers(parseOrThrow(adminUserQuerySchema, req.query)));
    },
    'admin.users.role': async (req, res) => {
      const { role } = parseOrThrow(changeRoleRequestSchema, req.body ?? {});
      res.json(await s.accounts.changeRole(actorOf(req), parseOrThrow(idParam, req.params.userId), role));
    },
    'admin.users.disable': async (req, res) => {
      const { reason } = parseOrThrow(disableUserRequestSchema, req.body ?? {});
      res.json(await s.accounts.disable(actorOf(req), parseOrThrow(idParam, req.params.userId), reason));
    },
    'admin.users.enable': async (req, res) => {
      res.json(await s.accounts.enable(actorOf(req), parseOrThrow(idParam, req.params.userId)));
    },
    'admin.organisations.list': async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json(await s.organisations.listForAdmin(parseOrThrow(adminOrganisationQuerySchema, req.query)));
    },
    'admin.audit.list': async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json(await s.auditLog.list(parseOrThrow(auditQuerySchema, req.query)));
    },
    'admin.audit.csv': async (req, res) => {
      const csv = await s.auditLog.csv(parseOrThrow(auditFilterSchema, req.query));
      res.setHeader('Cache-Control', 'no-store');
      res.setHeader('Content-Disposition', `attachment; filename="pinwork-audit-${new Date().toISOString().slice(0, 10)}.csv"`);
      res.type('text/csv; charset=utf-8').send(csv);
    },

    'dev.mail.list': async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json(await s.devMail.list(parseOrThrow(mailQuerySchema, req.query)));
    },
    'dev.mail.get': async (req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      res.json(await s.devMail.get(parseOrThrow(mailIdParam, req.params.mailId)));
    },
    'dev.demoKey.get': async (_req, res) => {
      res.setHeader('Cache-Control', 'no-store');
      const key = await s.demoApiKey();
      if (!key) throw new HttpProblem({ type: problemTypes.notFound, title: 'No demo key', status: 404, detail: 'No live demo API key here: it is seeded at a development start and stays away once revoked.' });
      res.json(key);
    },
    'dev.mail.html': async (req, res) => {
      const message = await s.devMail.get(parseOrThrow(mailIdParam, req.params.mailId));
      res.setHeader('Cache-Control', 'no-store');
      // Shown inside our own page: a sandbox with no scripts, inline styles only, nothing fetched.
      res.setHeader('Content-Security-Policy', "sandbox; default-src 'none'; style-src 'unsafe-inline'; img-src data:; frame-ancestors 'self'");
      res.setHeader('X-Frame-Options', 'SAMEORIGIN');
      res.type('text/html; charset=utf-8').send(message.html ?? `<pre>${(message.text ?? '').replace(/[&<>]/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;' })[c]!)}</pre>`);
    },
  };
}
