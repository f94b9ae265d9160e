import { eq } from 'drizzle-orm';
import request from 'supertest';

import { auditLog, sessions, users } from '@/db/schema';
import { startTestServer, type TestServer } from '@/__tests__/support/test-server';
import { createUser, signIn, TEST_PASSWORD, uniqueEmail } from '@/__tests__/support/users';

function sessionCookie(res: request.Response): string | undefined {
  const raw = res.headers['set-cookie'] as unknown as string[] | undefined;
  return raw?.find((c) => c.startsWith('ligandry_session='));
}

describe('sign-in, sessions and sign-out', () => {
  let t: TestServer;
  beforeAll(async () => {
    // A high IP limit: this file makes many failed attempts from 127.0.0.1 on purpose.
    t = await startTestServer({ signInLimits: { perAccount: 5, perIp: 1000, windowMinutes: 15 } });
  });
  afterAll(async () => {
    await t.close();
  });

  it('signs in with {email, password}, sets an httpOnly SameSite=Lax cookie (not Secure over http) and returns the user', async () => {
    const person = await createUser(t.db.db, { roles: ['chemist', 'safety'] });
    const agent = t.agent();
    const res = await agent.post('/api/auth/sign-in').send({ email: person.email.toUpperCase(), password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ id: person.id, email: person.email, name: person.name, roles: ['chemist', 'safety'] });
    const cookie = sessionCookie(res);
    expect(cookie).toMatch(/HttpOnly/);
    expect(cookie).toMatch(/SameSite=Lax/);
    expect(cookie).not.toMatch(/Secure/);
    const me = await agent.get('/api/me');
    expect(me.status).toBe(200);
    expect(me.body).toEqual(res.body);
    const [row] = await t.db.db.select().from(users).where(eq(users.id, person.id));
    expect(row?.lastSignInAt).toBeInstanceOf(Date);
  });

  it('marks the cookie Secure when the request came over HTTPS through a proxy on loopback', async () => {
    const person = await createUser(t.db.db, { roles: ['chemist'] });
    const res = await t.agent().post('/api/auth/sign-in').set('X-Forwarded-Proto', 'https').send({ email: person.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(sessionCookie(res)).toMatch(/; Secure/);
  });

  it('GET /api/me is 401 without a session', async () => {
    const res = await request(t.server).get('/api/me');
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe('unauthenticated');
  });

  it('gives the same answer for an unknown e-mail, a wrong password and a deactivated account, and audits each', async () => {
    const person = await createUser(t.db.db, { roles: ['technician'] });
    const gone = await createUser(t.db.db, { roles: ['technician'], active: false });
    const unknown = await t.agent().post('/api/auth/sign-in').send({ email: uniqueEmail('nobody'), password: TEST_PASSWORD });
    const wrong = await t.agent().post('/api/auth/sign-in').send({ email: person.email, password: 'not the password' });
    const inactive = await t.agent().post('/api/auth/sign-in').send({ email: gone.email, password: TEST_PASSWORD });
    for (const res of [unknown, wrong, inactive]) {
      expect(res.status).toBe(401);
      expect(res.body).toEqual({ error: { code: 'unauthenticated', message: 'E-mail or password is wrong.' } });
      expect(sessionCookie(res)).toBeUndefined();
    }
    const failed = await t.db.db.select().from(auditLog).where(eq(auditLog.action, 'auth.sign_in_failed'));
    const reasons = failed.map((r) => r.payload.reason);
    expect(reasons).toEqual(expect.arrayContaining(['unknown_email', 'wrong_password', 'deactivated']));
  });

  it.each([
    [{ email: 'not-an-email', password: 'x' }, 'email', /not an e-mail address/],
    [{ email: 'a@b.co' }, 'password', /enter your password/],
    [{ password: 'whatever' }, 'email', /enter an e-mail address/],
  ])('refuses malformed input %j naming the field', async (body, field, message) => {
    const res = await t.agent().post('/api/auth/sign-in').send(body);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('validation_failed');
    expect(res.body.error.details).toEqual(expect.arrayContaining([{ path: field, message: expect.stringMatching(message) }]));
  });

  it('limits failed sign-ins per account and says when to try again', async () => {
    const person = await createUser(t.db.db, { roles: ['chemist'] });
    for (let i = 0; i < 5; i++) {
      const res = await t.agent().post('/api/auth/sign-in').send({ email: person.email, password: `wrong ${i}` });
      expect(res.status).toBe(401);
    }
    // Even the right password is refused while the account is blocked.
    const blocked = await t.agent().post('/api/auth/sign-in').send({ email: person.email, password: TEST_PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error.code).toBe('rate_limited');
    expect(blocked.body.error.message).toMatch(/Try again in 1[45] minutes\./);
    expect(Number(blocked.headers['retry-after'])).toBeGreaterThan(800);
    // Another account from the same address is not blocked.
    const other = await createUser(t.db.db, { roles: ['chemist'] });
    await signIn(t.agent(), other.email);
  });

  it('signing out ends the session: the old cookie no longer works', async () => {
    const person = await createUser(t.db.db, { roles: ['reviewer'] });
    const agent = t.agent();
    const res = await agent.post('/api/auth/sign-in').send({ email: person.email, password: TEST_PASSWORD });
    const cookie = (sessionCookie(res) as string).split(';')[0] as string;
    const out = await agent.post('/api/auth/sign-out');
    expect(out.status).toBe(204);
    expect(sessionCookie(out)).toMatch(/ligandry_session=;/);
    const reuse = await request(t.server).get('/api/me').set('Cookie', cookie);
    expect(reuse.status).toBe(401);
  });

  it('an expired session is refused and cleared; one in its second half is extended to 30 days with a fresh cookie', async () => {
    const person = await createUser(t.db.db, { roles: ['chemist'] });
    const agent = t.agent();
    expect((await agent.post('/api/auth/sign-in').send({ email: person.email, password: TEST_PASSWORD })).status).toBe(200);
    const day = 86_400_000;
    // 10 days left of 30: lucia extends it on the next use.
    await t.db.db.update(sessions).set({ expiresAt: new Date(Date.now() + 10 * day) }).where(eq(sessions.userId, person.id));
    const extended = await agent.get('/api/me');
    expect(extended.status).toBe(200);
    expect(sessionCookie(extended)).toMatch(/Max-Age=2592000/);
    const [row] = await t.db.db.select().from(sessions).where(eq(sessions.userId, person.id));
    expect((row?.expiresAt.getTime() ?? 0) - Date.now()).toBeGreaterThan(29 * day);
    // Past its end: refused, and the cookie is blanked.
    await t.db.db.update(sessions).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(sessions.userId, person.id));
    const expired = await agent.get('/api/me');
    expect(expired.status).toBe(401);
    expect(sessionCookie(expired)).toMatch(/^ligandry_session=;/);
  });

  it('a session id planted before sign-in is not the one after it (no fixation)', async () => {
    const person = await createUser(t.db.db, { roles: ['chemist'] });
    const first = t.agent();
    const a = await first.post('/api/auth/sign-in').send({ email: person.email, password: TEST_PASSWORD });
    const planted = (sessionCookie(a) as string).split(';')[0] as string;
    // A victim's browser carrying the planted cookie signs in: it gets a new session, the old one ends.
    const b = await request(t.server).post('/api/auth/sign-in').set('Origin', t.origin).set('Cookie', planted).send({ email: person.email, password: TEST_PASSWORD });
    const fresh = (sessionCookie(b) as string).split(';')[0] as string;
    expect(fresh).not.toBe(planted);
    expect((await request(t.server).get('/api/me').set('Cookie', planted)).status).toBe(401);
    expect((await request(t.server).get('/api/me').set('Cookie', fresh)).status).toBe(200);
  });

  it('refuses a sign-in posted from another origin', async () => {
    const person = await createUser(t.db.db, { roles: ['chemist'] });
    const res = await request(t.server).post('/api/auth/sign-in').set('Origin', 'https://evil.example').send({ email: person.email, password: TEST_PASSWORD });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('bad_origin');
  });

  it('changing the password ends every other session and keeps this one signed in', async () => {
    const person = await createUser(t.db.db, { roles: ['chemist'], password: 'first password 1' });
    const phone = t.agent();
    const desk = t.agent();
    await signIn(phone, person.email, 'first password 1');
    await signIn(desk, person.email, 'first password 1');
    const wrong = await desk.post('/api/me/password').send({ currentPassword: 'nope nope nope', newPassword: 'second password 2' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.details).toEqual([{ path: 'currentPassword', message: 'is not your current password' }]);
    const short = await desk.post('/api/me/password').send({ currentPassword: 'first password 1', newPassword: 'short' });
    expect(short.status).toBe(400);
    expect(short.body.error.details[0]).toEqual({ path: 'newPassword', message: 'must be at least 10 characters' });
    const ok = await desk.post('/api/me/password').send({ currentPassword: 'first password 1', newPassword: 'second password 2' });
    expect(ok.status).toBe(200);
    expect((await desk.get('/api/me')).status).toBe(200);
    expect((await phone.get('/api/me')).status).toBe(401);
    await signIn(t.agent(), person.email, 'second password 2');
    const old = await t.agent().post('/api/auth/sign-in').send({ email: person.email, password: 'first password 1' });
    expect(old.status).toBe(401);
  });

  it('signs out everywhere', async () => {
    const person = await createUser(t.db.db, { roles: ['safety'] });
    const a = t.agent();
    const b = t.agent();
    await signIn(a, person.email);
    await signIn(b, person.email);
    expect((await a.post('/api/me/sign-out-everywhere')).status).toBe(204);
    expect((await a.get('/api/me')).status).toBe(401);
    expect((await b.get('/api/me')).status).toBe(401);
    const left = await t.db.db.select().from(sessions).where(eq(sessions.userId, person.id));
    expect(left).toHaveLength(0);
  });

  it('updates the name and refuses an empty one', async () => {
    const person = await createUser(t.db.db, { roles: ['technician'] });
    const agent = t.agent();
    await signIn(agent, person.email);
    const bad = await agent.patch('/api/me').send({ name: '   ' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('name');
    const ok = await agent.patch('/api/me').send({ name: '  Rosa Vane ' });
    expect(ok.status).toBe(200);
    expect(ok.body.name).toBe('Rosa Vane');
  });
});

describe('sign-in limit per IP address', () => {
  let t: TestServer;
  beforeAll(async () => {
    t = await startTestServer({ signInLimits: { perAccount: 100, perIp: 3, windowMinutes: 10 } });
  });
  afterAll(async () => {
    await t.close();
  });

  it('blocks an address after too many failures across accounts', async () => {
    for (let i = 0; i < 3; i++) {
      const res = await t.agent().post('/api/auth/sign-in').send({ email: uniqueEmail(`spray${i}`), password: 'guess guess' });
      expect(res.status).toBe(401);
    }
    const res = await t.agent().post('/api/auth/sign-in').send({ email: uniqueEmail('spray'), password: 'guess guess' });
    expect(res.status).toBe(429);
    expect(res.body.error.message).toMatch(/^Too many sign-in attempts\. Try again in (9|10) minutes\.$/);
  });
});
