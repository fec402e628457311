import { eq } from 'drizzle-orm';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { UserRole } from '../../shared/api/auth';
import type { DatabaseHandle } from '../../server/db/database';
import { members, organisations } from '../../server/db/schema/organisations';
import { seedDemoData } from '../../server/db/seed';
import { routeTable, type AccessRule } from '../../server/routes/route-access';
import { ORIGIN, authApp, setRole, signUpVerified, signedInAgent, uniqueEmail, type AuthTestApp } from '../helpers/auth-fixture';
import { openTestDatabase } from '../helpers/test-database';

// Every row of the route table × every kind of caller. The expected answer comes from the
// row's access rule and the caller's role and memberships; a new row is tested by being added.

type Persona = 'anonymous' | Exclude<UserRole, never>;
const personas: Persona[] = ['anonymous', 'user', 'supplier', 'engineer', 'admin'];

let database: DatabaseHandle;
let t: AuthTestApp;
let supplierOrgId: string;
const agents = new Map<Persona, ReturnType<typeof request.agent>>();

beforeAll(async () => {
  database = await openTestDatabase();
  await seedDemoData(database.db);
  t = authApp(database);
  const [supplierOrg] = await database.db.select().from(organisations).where(eq(organisations.slug, 'brightwater-rigging-supply'));
  const [engineeringOrg] = await database.db.select().from(organisations).where(eq(organisations.slug, 'tallow-ridge-engineering'));
  supplierOrgId = supplierOrg!.id;
  for (const persona of personas) {
    if (persona === 'anonymous') {
      agents.set(persona, request.agent(t.app));
      continue;
    }
    const email = uniqueEmail(`matrix-${persona}`);
    const id = await signUpVerified(t, database, email, `Matrix ${persona}`);
    await setRole(database, id, persona);
    if (persona === 'supplier') await database.db.insert(members).values({ organisationId: supplierOrgId, userId: id, role: 'owner' });
    if (persona === 'engineer') await database.db.insert(members).values({ organisationId: engineeringOrg!.id, userId: id, role: 'member' });
    agents.set(persona, await signedInAgent(t, email));
  }
}, 120_000);
afterAll(async () => {
  await database?.close();
});

/** What the rule lets this caller do, given the fixture: the supplier owns the organisation in the path. */
function expected(rule: AccessRule, persona: Persona): 'allowed' | 401 | 403 {
  const access = rule.access;
  if (access.kind === 'public') return 'allowed';
  if (persona === 'anonymous') return 401;
  if (access.kind === 'signed-in') return 'allowed';
  if (access.kind === 'roles') return access.roles.includes(persona) ? 'allowed' : 403;
  return persona === 'admin' || persona === 'supplier' ? 'allowed' : 403;
}

function concretePath(path: string): string {
  const params: Record<string, string> = {
    organisationId: supplierOrgId,
    userId: 'no-such-user',
    sessionId: 'no-such-session',
    invitationId: '00000000-0000-4000-8000-000000000000',
    mailId: '999999',
  };
  return `/api${path.replace(/:(\w+)/g, (_m, name: string) => params[name] ?? 'x')}`;
}

const cases = routeTable.flatMap((rule) => personas.map((persona) => ({ rule: rule as AccessRule, persona })));

describe('authorisation matrix', () => {
  it('covers every row of the route table for every caller', () => {
    expect(cases).toHaveLength(routeTable.length * personas.length);
    expect(new Set(routeTable.map((r) => r.id)).size).toBe(routeTable.length);
  });

  it.each(cases.map((c) => [`${c.rule.method} ${c.rule.path}`, c.persona, c] as const))('%s as %s', async (_name, persona, { rule }) => {
    const agent = agents.get(persona)!;
    const path = concretePath(rule.path);
    const method = rule.method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete';
    const res = method === 'get' ? await agent.get(path) : await agent[method](path).set('Origin', ORIGIN).send({});
    const want = expected(rule, persona);
    if (want === 'allowed') {
      expect([401, 403], `${res.status} ${JSON.stringify(res.body)}`).not.toContain(res.status);
      expect(res.status).toBeLessThan(500);
    } else {
      expect(res.status, JSON.stringify(res.body)).toBe(want);
      expect(res.headers['content-type']).toMatch(/problem\+json/);
      expect(res.body.type).toBe(want === 401 ? '/problems/unauthorized' : '/problems/forbidden');
    }
  });

  it('refuses every change from a foreign origin before looking at the caller', async () => {
    const admin = agents.get('admin')!;
    for (const rule of routeTable.filter((r) => r.method !== 'GET')) {
      const res = await admin[rule.method.toLowerCase() as 'post'](concretePath(rule.path)).set('Origin', 'https://evil.example').send({});
      expect(res.status, `${rule.method} ${rule.path}`).toBe(403);
      expect(res.body.type).toBe('/problems/cross-origin');
    }
    const signIn = await request(t.app).post('/api/auth/sign-in/email').set('Origin', 'https://evil.example').send({ email: 'a@example.com', password: 'whatever-12345' });
    expect(signIn.status).toBe(403);
  });

  it('registers exactly the table: no route outside it, none of it missing', () => {
    const router = t.system.apiRouter as unknown as { stack: { route?: { path: string; methods: Record<string, boolean> } }[] };
    const registered = router.stack
      .filter((layer) => layer.route && !layer.route.methods._all)
      .flatMap((layer) => Object.keys(layer.route!.methods).filter((m) => m !== 'head').map((m) => `${m.toUpperCase()} ${layer.route!.path}`));
    expect(registered.sort()).toEqual(routeTable.map((r) => `${r.method} ${r.path}`).sort());
  });

  it('leaves the dev outbox out of a production app', async () => {
    const prod = authApp(database, { mode: 'production' });
    const res = await request(prod.app).get('/api/dev/mail');
    expect(res.status).toBe(404);
  });
});
