import { eq } from 'drizzle-orm';
import request from 'supertest';

import { auditLog, users } from '@/db/schema';
import { startTestServer, type TestServer } from '@/__tests__/support/test-server';
import { createUser, signIn, TEST_PASSWORD } from '@/__tests__/support/users';

describe('team administration', () => {
  let t: TestServer;
  let admin: request.Agent;
  let adminId: string;
  beforeAll(async () => {
    t = await startTestServer();
    const row = await createUser(t.db.db, { roles: ['admin'] });
    adminId = row.id;
    admin = t.agent();
    await signIn(admin, row.email);
  });
  afterAll(async () => {
    await t.close();
  });

  it('lists people with roles, state and last sign-in', async () => {
    const person = await createUser(t.db.db, { roles: ['technician'], name: 'Listed Person' });
    const res = await admin.get('/api/team/people');
    expect(res.status).toBe(200);
    const found = res.body.find((p: { id: string }) => p.id === person.id);
    expect(found).toMatchObject({ email: person.email, name: 'Listed Person', roles: ['technician'], active: true, lastSignInAt: null });
  });

  it('changes roles: the person gets them on the next request, and the change is audited', async () => {
    const person = await createUser(t.db.db, { roles: ['technician'] });
    const agent = t.agent();
    await signIn(agent, person.email);
    expect((await agent.get('/api/team/people')).status).toBe(403);
    const res = await admin.patch(`/api/team/people/${person.id}`).send({ roles: ['technician', 'chemist'] });
    expect(res.status).toBe(200);
    expect(res.body.roles).toEqual(['chemist', 'technician']);
    expect((await agent.get('/api/me')).body.roles).toEqual(['chemist', 'technician']);
    const [entry] = await t.db.db.select().from(auditLog).where(eq(auditLog.action, 'team.roles_changed'));
    expect(entry).toMatchObject({ actor: adminId, subject: `user:${person.id}`, payload: { from: ['technician'], to: ['chemist', 'technician'] } });
  });

  it('deactivating ends the sessions at once and blocks sign-in; the row stays; reactivating lets them back', async () => {
    const person = await createUser(t.db.db, { roles: ['chemist'] });
    const agent = t.agent();
    await signIn(agent, person.email);
    const off = await admin.patch(`/api/team/people/${person.id}`).send({ active: false });
    expect(off.status).toBe(200);
    expect(off.body.active).toBe(false);
    expect((await agent.get('/api/me')).status).toBe(401);
    expect((await t.agent().post('/api/auth/sign-in').send({ email: person.email, password: TEST_PASSWORD })).status).toBe(401);
    const [row] = await t.db.db.select().from(users).where(eq(users.id, person.id));
    expect(row?.active).toBe(false);
    const on = await admin.patch(`/api/team/people/${person.id}`).send({ active: true });
    expect(on.body.active).toBe(true);
    await signIn(t.agent(), person.email);
    const actions = (await t.db.db.select().from(auditLog).where(eq(auditLog.subject, `user:${person.id}`))).map((a) => a.action);
    expect(actions).toEqual(expect.arrayContaining(['team.deactivated', 'team.reactivated']));
  });

  it('people are never deleted: the database refuses', async () => {
    const person = await createUser(t.db.db, { roles: ['reviewer'] });
    await expect(t.db.db.delete(users).where(eq(users.id, person.id))).rejects.toThrow();
  });

  it('an admin cannot lock themselves out', async () => {
    const self = await admin.patch(`/api/team/people/${adminId}`).send({ active: false });
    expect(self.status).toBe(409);
    expect(self.body.error.message).toMatch(/cannot deactivate your own account/);
    const roles = await admin.patch(`/api/team/people/${adminId}`).send({ roles: ['chemist'] });
    expect(roles.status).toBe(409);
    expect(roles.body.error.message).toMatch(/cannot remove your own admin role/);
  });

  it.each([
    [{}, ''],
    [{ roles: ['alchemist'] }, 'roles.0'],
    [{ roles: ['chemist', 'chemist'] }, 'roles'],
    [{ active: 'no' }, 'active'],
  ])('refuses %j naming the field', async (body, field) => {
    const person = await createUser(t.db.db, { roles: ['chemist'] });
    const res = await admin.patch(`/api/team/people/${person.id}`).send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe(field);
  });

  it('answers 404 for an unknown person', async () => {
    expect((await admin.patch('/api/team/people/00000000-0000-4000-8000-00000000dead').send({ active: true })).status).toBe(404);
    expect((await admin.patch('/api/team/people/not-an-id').send({ active: true })).status).toBe(404);
  });

  it('pages through the audit log, newest first, with names', async () => {
    const first = await admin.get('/api/team/audit?limit=2');
    expect(first.status).toBe(200);
    expect(first.body.entries).toHaveLength(2);
    expect(first.body.entries[0].id).toBeGreaterThan(first.body.entries[1].id);
    const next = await admin.get(`/api/team/audit?limit=2&before=${first.body.nextBefore}`);
    expect(next.body.entries[0].id).toBeLessThan(first.body.entries[1].id);
    const named = [...first.body.entries, ...next.body.entries].find((e: { actor: string }) => e.actor === adminId);
    if (named) expect(named.actorName).toBe('Test admin');
    const bad = await admin.get('/api/team/audit?limit=0');
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('limit');
  });

  it('shows the outbox to admins', async () => {
    const res = await admin.get('/api/dev/outbox');
    expect(res.status).toBe(200);
    expect(Array.isArray(res.body)).toBe(true);
    expect((await t.agent().get('/api/auth/options')).body).toEqual({ outbox: true });
  });
});

describe('with a real SMTP server configured (no local outbox)', () => {
  let t: TestServer;
  beforeAll(async () => {
    t = await startTestServer({ outbox: false });
  });
  afterAll(async () => {
    await t.close();
  });

  it('has no outbox, and says so to the screens', async () => {
    const admin = await createUser(t.db.db, { roles: ['admin'] });
    const agent = t.agent();
    await signIn(agent, admin.email);
    const res = await agent.get('/api/dev/outbox');
    expect(res.status).toBe(404);
    expect(res.body.error.message).toMatch(/SMTP_URL/);
    expect((await agent.get('/api/auth/options')).body).toEqual({ outbox: false });
  });
});
