// Every API route and who may call it. A route registered on the app but missing here (or listed
// here but gone) fails this suite, and each route is called as nobody and as each role.
import request from 'supertest';

import { type Access, listRoutes } from '@/server/auth/access';
import { startTestServer, type TestServer } from '@/__tests__/support/test-server';
import { createUser, signIn } from '@/__tests__/support/users';
import { type Role, ROLES } from '@/shared/auth';

type Rule = 'open' | 'signed-in' | Role[];

const MATRIX: Record<string, Rule> = {
  'GET /api/health': 'open',
  'GET /api/auth/options': 'open',
  'POST /api/auth/sign-in': 'open',
  'POST /api/auth/sign-out': 'open',
  'POST /api/auth/password-resets': 'open',
  'GET /api/auth/password-resets/:token': 'open',
  'POST /api/auth/password-resets/:token': 'open',
  'GET /api/auth/invitations/:token': 'open',
  'POST /api/auth/invitations/:token': 'open',
  'GET /api/me': 'signed-in',
  'PATCH /api/me': 'signed-in',
  'POST /api/me/password': 'signed-in',
  'POST /api/me/sign-out-everywhere': 'signed-in',
  'GET /api/team/people': ['admin'],
  'PATCH /api/team/people/:id': ['admin'],
  'GET /api/team/invitations': ['admin'],
  'POST /api/team/invitations': ['admin'],
  'POST /api/team/invitations/:id/resend': ['admin'],
  'DELETE /api/team/invitations/:id': ['admin'],
  'GET /api/team/audit': ['admin'],
  'GET /api/dev/outbox': ['admin'],
  'GET /api/species': 'signed-in',
  'GET /api/constants': 'signed-in',
  'GET /api/constants/export.csv': 'signed-in',
  'GET /api/constants/:id': 'signed-in',
  'POST /api/constants': ['chemist'],
  'POST /api/constants/:id/revisions': ['chemist'],
  'POST /api/constants/:id/review': ['reviewer'],
  'POST /api/constants/:id/retire': ['reviewer'],
  'POST /api/constants/import': ['chemist'],
  'POST /api/systems/build': 'signed-in',
  'POST /api/runs': ['chemist', 'technician'],
  'GET /api/runs': 'signed-in',
  'GET /api/runs/:id': 'signed-in',
  'DELETE /api/runs/:id': 'signed-in',
  'POST /api/solve': 'signed-in',
  'POST /api/calculations': 'signed-in',
  'GET /api/baths': 'signed-in',
  'POST /api/baths': ['chemist', 'technician'],
  'GET /api/baths/:id': 'signed-in',
  'PATCH /api/baths/:id': ['chemist', 'technician'],
  'POST /api/baths/:id/archive': ['admin'],
  'POST /api/baths/:id/restore': ['admin'],
  'GET /api/baths/:id/analyses': 'signed-in',
  'POST /api/baths/:id/analyses': ['chemist', 'technician'],
  'POST /api/baths/:id/analyses/import': ['chemist', 'technician'],
  'GET /api/baths/:id/attachments': 'signed-in',
  'POST /api/baths/:id/attachments': ['chemist', 'technician'],
  'GET /api/baths/:id/attachments/:attachmentId': 'signed-in',
  'GET /api/safety/thresholds': 'signed-in',
  'GET /api/safety/thresholds/history': 'signed-in',
  'POST /api/safety/thresholds': ['safety'],
  'GET /api/safety/reviews': 'signed-in',
  'GET /api/safety/reviews/:id': 'signed-in',
  'POST /api/safety/reviews/:id/sign-off': ['safety'],
  'POST /api/safety/reviews/:id/send-back': ['safety'],
  'POST /api/safety/reviews/:id/resubmit': 'signed-in',
  'POST /api/runs/:id/release': 'signed-in',
};

function ruleOf(access: Access | null): Rule | null {
  if (!access) return null;
  if (access.kind === 'open') return 'open';
  if (access.kind === 'signed-in') return 'signed-in';
  return [...access.roles].sort();
}

/** A concrete URL for a route pattern: ids and tokens that exist nowhere. */
function concrete(path: string): string {
  return path.replace(':id', '00000000-0000-4000-8000-00000000beef').replace(':token', 'n0t-a-real-token-but-well-formed-0123456789');
}

function call(agent: request.Agent, method: string, url: string) {
  const m = method.toLowerCase() as 'get' | 'post' | 'patch' | 'delete' | 'put';
  const req = agent[m](url);
  return method === 'GET' || method === 'DELETE' ? req : req.send({});
}

describe('role matrix over every API route', () => {
  let t: TestServer;
  const agents = new Map<Role, request.Agent>();
  beforeAll(async () => {
    t = await startTestServer();
    for (const role of ROLES) {
      const person = await createUser(t.db.db, { roles: [role] });
      const agent = t.agent();
      await signIn(agent, person.email);
      agents.set(role, agent);
    }
  });
  afterAll(async () => {
    await t.close();
  });

  it('lists exactly the registered routes, each with the access it declares', () => {
    const registered = listRoutes(t.app).filter((r) => r.path.startsWith('/api'));
    const declared = Object.fromEntries(registered.map((r) => [`${r.method} ${r.path}`, ruleOf(r.access)]));
    const expected = Object.fromEntries(Object.entries(MATRIX).map(([k, v]) => [k, Array.isArray(v) ? [...v].sort() : v]));
    expect(declared).toEqual(expected);
  });

  const guarded = Object.entries(MATRIX).filter(([, rule]) => rule !== 'open');

  it.each(guarded)('%s refuses a caller who is not signed in (401)', async (key) => {
    const [method, path] = key.split(' ') as [string, string];
    const res = await call(t.agent(), method, concrete(path));
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  const byRole = Object.entries(MATRIX).filter((e): e is [string, Role[]] => Array.isArray(e[1]));

  it.each(byRole)('%s answers each role as the matrix says', async (key, allowed) => {
    const [method, path] = key.split(' ') as [string, string];
    for (const role of ROLES) {
      const res = await call(agents.get(role) as request.Agent, method, concrete(path));
      if (allowed.includes(role)) expect([role, [401, 403].includes(res.status)]).toEqual([role, false]);
      else expect([role, res.status, res.body.error?.code]).toEqual([role, 403, 'forbidden']);
    }
  });

  it('an unknown API path is a JSON 404 for everyone', async () => {
    const res = await t.agent().get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});

describe('deny by default', () => {
  it('an /api route without an access declaration stops the app from being built', () => {
    const { assertEveryRouteDeclared, allow } = jest.requireActual('@/server/auth/access') as typeof import('@/server/auth/access');
    const express = jest.requireActual('express') as typeof import('express');
    const app = express();
    const api = express.Router();
    api.get('/declared', allow('chemist'), (_req, res) => res.json({}));
    api.post('/forgotten', (_req, res) => res.json({}));
    app.use('/api', api);
    expect(() => assertEveryRouteDeclared(app)).toThrow('Routes without an access declaration (open, signedIn or allow(...)): POST /api/forgotten');
  });
});
