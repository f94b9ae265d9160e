import { eq } from 'drizzle-orm';
import request from 'supertest';

import { auditLog, invitations } from '@/db/schema';
import { startTestServer, type TestServer } from '@/__tests__/support/test-server';
import { createUser, linkPath, mailCount, signIn, uniqueEmail, waitForMail } from '@/__tests__/support/users';

describe('invitations through the local mail server', () => {
  let t: TestServer;
  let admin: request.Agent;
  let adminId: string;
  beforeAll(async () => {
    t = await startTestServer();
    const row = await createUser(t.db.db, { roles: ['admin'], name: 'Olu Admin' });
    adminId = row.id;
    admin = t.agent();
    await signIn(admin, row.email);
  });
  afterAll(async () => {
    await t.close();
  });

  async function invite(email: string, roles: string[]) {
    const res = await admin.post('/api/team/invitations').send({ email, roles });
    expect(res.status).toBe(201);
    const mail = await waitForMail(t.db.db, email.toLowerCase(), /invited you to Ligandry/);
    return { invitation: res.body, mail, path: linkPath(mail.text, '/welcome/') };
  }

  it('mails a one-time link; accepting sets name and password, signs in with the invited roles, and the link then refuses', async () => {
    const email = uniqueEmail('newcomer');
    const { invitation, mail, path } = await invite(email.toUpperCase(), ['technician', 'chemist']);
    expect(invitation).toMatchObject({ email, roles: ['chemist', 'technician'], invitedBy: 'Olu Admin', mailed: true });
    expect(new Date(invitation.expiresAt).getTime() - Date.now()).toBeGreaterThan(6.9 * 86_400_000);
    expect(mail.text).toMatch(/Olu Admin has invited you .* as: Chemist, Technician/);
    const token = path.split('/').pop() as string;

    const info = await request(t.server).get(`/api/auth/invitations/${token}`);
    expect(info.status).toBe(200);
    expect(info.body).toMatchObject({ email, roles: ['chemist', 'technician'], invitedBy: 'Olu Admin' });

    const newcomer = t.agent();
    const short = await newcomer.post(`/api/auth/invitations/${token}`).send({ name: 'Ada Brook', password: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.details).toEqual([{ path: 'password', message: 'must be at least 10 characters' }]);

    const accepted = await newcomer.post(`/api/auth/invitations/${token}`).send({ name: 'Ada Brook', password: 'a long enough secret' });
    expect(accepted.status).toBe(201);
    expect(accepted.body).toMatchObject({ email, name: 'Ada Brook', roles: ['chemist', 'technician'] });
    expect((await newcomer.get('/api/me')).body.email).toBe(email);

    const again = await t.agent().post(`/api/auth/invitations/${token}`).send({ name: 'Mallory', password: 'another long secret' });
    expect(again.status).toBe(410);
    expect(again.body.error.message).toMatch(/already been used/);
    expect((await request(t.server).get(`/api/auth/invitations/${token}`)).status).toBe(410);
    await signIn(t.agent(), email, 'a long enough secret');

    const audit = await t.db.db.select().from(auditLog).where(eq(auditLog.subject, `invitation:${invitation.id}`));
    expect(audit.map((a) => a.action)).toEqual(['team.invited']);
    expect(audit[0]?.actor).toBe(adminId);
    const acceptedEntries = await t.db.db.select().from(auditLog).where(eq(auditLog.action, 'auth.invitation_accepted'));
    expect(acceptedEntries.some((a) => a.subject === `user:${accepted.body.id}`)).toBe(true);
  });

  it('refuses an expired link with a clear message', async () => {
    const email = uniqueEmail('late');
    const { invitation, path } = await invite(email, ['reviewer']);
    await t.db.db.update(invitations).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(invitations.id, invitation.id));
    const token = path.split('/').pop() as string;
    const res = await t.agent().post(`/api/auth/invitations/${token}`).send({ name: 'Late Comer', password: 'a long enough secret' });
    expect(res.status).toBe(410);
    expect(res.body.error.message).toMatch(/expired on .*Ask an admin to send a new one/);
  });

  it('says a garbled link is not valid', async () => {
    for (const token of ['abc', 'x'.repeat(43)]) {
      const res = await request(t.server).get(`/api/auth/invitations/${token}`);
      expect(res.status).toBe(404);
      expect(res.body.error.message).toMatch(/not valid/);
    }
  });

  it('resending voids the old link; withdrawing voids the invitation', async () => {
    const email = uniqueEmail('twice');
    const first = await invite(email, ['safety']);
    const resent = await admin.post(`/api/team/invitations/${first.invitation.id}/resend`);
    expect(resent.status).toBe(200);
    expect(resent.body.mailed).toBe(true);
    expect(await mailCount(t.db.db, email)).toBe(2);
    const oldToken = first.path.split('/').pop() as string;
    expect((await request(t.server).get(`/api/auth/invitations/${oldToken}`)).status).toBe(404);
    const latest = await waitForMail(t.db.db, email, /invited you/);
    const newToken = linkPath(latest.text, '/welcome/').split('/').pop() as string;
    expect(newToken).not.toBe(oldToken);
    expect((await request(t.server).get(`/api/auth/invitations/${newToken}`)).status).toBe(200);

    const pending = await admin.get('/api/team/invitations');
    expect(pending.body.map((i: { email: string }) => i.email)).toContain(email);
    expect((await admin.delete(`/api/team/invitations/${first.invitation.id}`)).status).toBe(204);
    const gone = await request(t.server).get(`/api/auth/invitations/${newToken}`);
    expect(gone.status).toBe(410);
    expect(gone.body.error.message).toMatch(/withdrawn/);
    const after = await admin.get('/api/team/invitations');
    expect(after.body.map((i: { email: string }) => i.email)).not.toContain(email);
  });

  it('refuses to invite someone who already has an account, and bad input', async () => {
    const existing = await createUser(t.db.db, { roles: ['chemist'] });
    const dup = await admin.post('/api/team/invitations').send({ email: existing.email, roles: ['chemist'] });
    expect(dup.status).toBe(409);
    expect(dup.body.error.message).toMatch(/already has an account/);
    const cases: [unknown, string][] = [
      [{ email: 'nope', roles: ['chemist'] }, 'email'],
      [{ email: uniqueEmail('x'), roles: [] }, 'roles'],
      [{ email: uniqueEmail('x'), roles: ['wizard'] }, 'roles.0'],
      [{ email: uniqueEmail('x') }, 'roles'],
    ];
    for (const [body, field] of cases) {
      const res = await admin.post('/api/team/invitations').send(body as object);
      expect(res.status).toBe(400);
      expect(res.body.error.details[0].path).toBe(field);
    }
  });

  it('only admins invite', async () => {
    const chemist = await createUser(t.db.db, { roles: ['chemist', 'reviewer', 'safety', 'technician'] });
    const agent = t.agent();
    await signIn(agent, chemist.email);
    const res = await agent.post('/api/team/invitations').send({ email: uniqueEmail('sneaky'), roles: ['admin'] });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('forbidden');
  });
});
