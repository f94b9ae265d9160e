import { eq } from 'drizzle-orm';
import request from 'supertest';

import { auditLog, passwordResets } from '@/db/schema';
import { startTestServer, type TestServer } from '@/__tests__/support/test-server';
import { createUser, linkPath, mailCount, signIn, uniqueEmail, waitForMail } from '@/__tests__/support/users';

describe('password reset by e-mail', () => {
  let t: TestServer;
  beforeAll(async () => {
    t = await startTestServer();
  });
  afterAll(async () => {
    await t.close();
  });

  async function requestLink(email: string) {
    const res = await t.agent().post('/api/auth/password-resets').send({ email });
    expect(res.status).toBe(202);
    return res.body.message as string;
  }

  it('mails a one-hour, one-time link that sets a new password, signs in and ends the old sessions', async () => {
    const person = await createUser(t.db.db, { roles: ['chemist'], name: 'Nell Ashdown' });
    const old = t.agent();
    await signIn(old, person.email);
    await requestLink(person.email);
    const mail = await waitForMail(t.db.db, person.email, /new Ligandry password/);
    expect(mail.text).toMatch(/Hello Nell Ashdown/);
    const token = linkPath(mail.text, '/new-password/').split('/').pop() as string;

    const info = await request(t.server).get(`/api/auth/password-resets/${token}`);
    expect(info.status).toBe(200);
    expect(info.body.email).toBe(person.email);
    const minutes = (new Date(info.body.expiresAt).getTime() - Date.now()) / 60_000;
    expect(minutes).toBeGreaterThan(55);
    expect(minutes).toBeLessThanOrEqual(60);

    const browser = t.agent();
    const short = await browser.post(`/api/auth/password-resets/${token}`).send({ password: 'tiny' });
    expect(short.status).toBe(400);
    expect(short.body.error.details).toEqual([{ path: 'password', message: 'must be at least 10 characters' }]);
    const done = await browser.post(`/api/auth/password-resets/${token}`).send({ password: 'brand new secret 7' });
    expect(done.status).toBe(200);
    expect(done.body.email).toBe(person.email);
    expect((await browser.get('/api/me')).status).toBe(200);
    expect((await old.get('/api/me')).status).toBe(401);

    const reused = await t.agent().post(`/api/auth/password-resets/${token}`).send({ password: 'attacker secret 99' });
    expect(reused.status).toBe(410);
    expect(reused.body.error.message).toMatch(/already been used/);
    await signIn(t.agent(), person.email, 'brand new secret 7');
    const audit = await t.db.db.select().from(auditLog).where(eq(auditLog.subject, `user:${person.id}`));
    expect(audit.map((a) => a.action)).toEqual(expect.arrayContaining(['auth.password_reset_requested', 'auth.password_reset']));
  });

  it('answers the same for an unknown address and sends nothing', async () => {
    const known = await createUser(t.db.db, { roles: ['reviewer'] });
    const nobody = uniqueEmail('nobody');
    const a = await requestLink(known.email);
    const b = await requestLink(nobody);
    expect(b).toBe(a);
    await waitForMail(t.db.db, known.email, /new Ligandry password/);
    await new Promise((r) => setTimeout(r, 300));
    expect(await mailCount(t.db.db, nobody)).toBe(0);
  });

  it('a newer link voids the older one; an expired link says so', async () => {
    const person = await createUser(t.db.db, { roles: ['safety'] });
    await requestLink(person.email);
    const first = await waitForMail(t.db.db, person.email, /new Ligandry password/);
    await requestLink(person.email);
    let second = first;
    for (let i = 0; i < 100 && second.id === first.id; i++) {
      await new Promise((r) => setTimeout(r, 50));
      second = await waitForMail(t.db.db, person.email, /new Ligandry password/);
    }
    expect(second.id).not.toBe(first.id);
    const firstToken = linkPath(first.text, '/new-password/').split('/').pop() as string;
    const secondToken = linkPath(second.text, '/new-password/').split('/').pop() as string;
    expect((await request(t.server).get(`/api/auth/password-resets/${firstToken}`)).status).toBe(410);
    await t.db.db.update(passwordResets).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(passwordResets.userId, person.id));
    const expired = await t.agent().post(`/api/auth/password-resets/${secondToken}`).send({ password: 'too late secret 1' });
    expect(expired.status).toBe(410);
    expect(expired.body.error.message).toMatch(/expired at .*Ask for a new link/);
  });

  it('sends at most three links an hour to one address', async () => {
    const person = await createUser(t.db.db, { roles: ['technician'] });
    for (let i = 0; i < 5; i++) await requestLink(person.email);
    await new Promise((r) => setTimeout(r, 800));
    expect(await mailCount(t.db.db, person.email)).toBe(3);
  });

  it('refuses a malformed address naming the field', async () => {
    const res = await t.agent().post('/api/auth/password-resets').send({ email: 'at-nowhere' });
    expect(res.status).toBe(400);
    expect(res.body.error.details[0].path).toBe('email');
  });
});
