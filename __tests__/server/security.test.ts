// Security checks as tests. This file holds the ones no other suite makes; the others live here:
//   sign-in: no session fixation, a new session per sign-in        auth-sessions.test.ts
//   sign-out ends the session (GET /api/me with the old cookie)     auth-sessions.test.ts
//   "sign out everywhere" and a password change end other sessions  auth-sessions.test.ts
//   deactivation ends a person's sessions at once                   team-admin.test.ts
//   cookie httpOnly, SameSite=Lax, Secure over HTTPS                auth-sessions.test.ts
//   sign-in rate limits per account and per address                 auth-sessions.test.ts
//   a sign-in posted from another origin                            auth-sessions.test.ts
//   a write to an unknown path from another origin                  app-shell.test.ts
//   security headers (CSP, nosniff, frame-ancestors), no stacks,
//   the JSON body limit                                             app-shell.test.ts
//   who may call each route; 401 for nobody on every guarded one    role-matrix.test.ts
//   mailed links: once only, expiry, a newer one voids the older    password-reset.test.ts, invitations.test.ts
//   an attachment that only claims to be a PDF, one over 10 MB,
//   a PDF sent as analysis CSV                                      baths.test.ts
//   a constants import that is not CSV, or over 1 MB                library-csv.test.ts
//   audit log and history tables refuse change, even in SQL         audit-log.test.ts, safety-desk.test.ts, library-workflow.test.ts
//   malformed input of every kind on every write route              fuzz-writes.test.ts
// Here: a cookie reused on write routes after sign-out and after "sign out everywhere"; every
// write route refusing other origins; upload type and size on all three upload routes with
// nothing stored; and SQL injection through every text field and search, coming back as data.
//
// Runs on a database of its own: it adds thresholds versions and retires a constant, which
// suites running beside it read.
import fs from 'node:fs';

import { and, count, eq, sql } from 'drizzle-orm';
import request from 'supertest';

import { analyses, attachments, baths, constants, hazardThresholds, runs } from '@/db/schema';
import { listRoutes } from '@/server/auth/access';
import { ROLES } from '@/shared/auth';
import { DEFAULT_THRESHOLDS } from '@/shared/safety';

import { startTestServer, type TestServer } from '../support/test-server';
import { createUser, TEST_PASSWORD } from '../support/users';

let t: TestServer;
/** Session cookies ("ligandry_session=..."), by who holds them. */
const cookies: Record<'chemist' | 'officer' | 'everyone', string> = { chemist: '', officer: '', everyone: '' };
let chemistId = '';

function sessionCookieOf(res: request.Response): string {
  const raw = (res.headers['set-cookie'] as unknown as string[] | undefined) ?? [];
  const found = raw.find((c) => c.startsWith('ligandry_session='));
  if (!found) throw new Error(`no session cookie: ${res.status} ${JSON.stringify(res.body)}`);
  return found.split(';')[0] as string;
}

async function signInCookie(email: string): Promise<string> {
  return sessionCookieOf(await request(t.server).post('/api/auth/sign-in').set('Origin', t.origin).send({ email, password: TEST_PASSWORD }));
}

type Method = 'get' | 'post' | 'patch' | 'put' | 'delete';

/** A same-origin request with a cookie (the way the web app sends them). */
function as(cookie: string, method: Method, url: string) {
  return request(t.server)[method](url).set('Origin', t.origin).set('Cookie', cookie);
}

async function bathCount(where = sql`true`): Promise<number> {
  const [row] = await t.db.db.select({ n: count() }).from(baths).where(where);
  return row?.n ?? 0;
}

const strike = (pH: number) => ({ metals: ['Ag+'], ligands: ['CN-'], counterIons: ['K+'], totals: { 'Ag+': 0.05, 'CN-': 0.5, 'K+': 0.5 }, pH, activity: 'davies' });
const bathBody = (name: string) => ({ name, process: 'thiosulfate_fixer', volume: 40, site: 'Security site' });

beforeAll(async () => {
  t = await startTestServer({ ownDatabase: true });
  const [chemist, officer, everyone] = await Promise.all([
    createUser(t.db.db, { roles: ['chemist', 'technician'], name: 'Sec chemist' }),
    createUser(t.db.db, { roles: ['safety', 'reviewer'], name: 'Sec officer' }),
    createUser(t.db.db, { roles: [...ROLES], name: 'Sec everyone' }),
  ]);
  chemistId = chemist.id;
  cookies.chemist = await signInCookie(chemist.email);
  cookies.officer = await signInCookie(officer.email);
  cookies.everyone = await signInCookie(everyone.email);
}, 60_000);

afterAll(async () => {
  await t?.close();
});

describe('a session cookie that should be dead stays dead on write routes', () => {
  async function writesRefused(cookie: string, label: string): Promise<void> {
    const name = `Bath by a dead cookie (${label})`;
    const attempts = [
      await request(t.server).post('/api/baths').set('Origin', t.origin).set('Cookie', cookie).send(bathBody(name)),
      await request(t.server).patch('/api/me').set('Origin', t.origin).set('Cookie', cookie).send({ name: 'Taken over' }),
      await request(t.server).post('/api/runs').set('Origin', t.origin).set('Cookie', cookie).send({ title: name, system: strike(12) }),
      await request(t.server).post('/api/me/password').set('Origin', t.origin).set('Cookie', cookie).send({ currentPassword: TEST_PASSWORD, newPassword: 'attacker password 1' }),
    ];
    expect(attempts.map((r) => [r.status, r.body.error?.code])).toEqual(attempts.map(() => [401, 'unauthenticated']));
    // The dead cookie is cleared in the answer, and nothing was written.
    expect((attempts[0]?.headers['set-cookie'] as unknown as string[] | undefined)?.some((c) => /^ligandry_session=;/.test(c))).toBe(true);
    expect(await bathCount(eq(baths.name, name))).toBe(0);
    expect(await t.db.db.select({ n: count() }).from(runs).where(eq(runs.title, name))).toEqual([{ n: 0 }]);
  }

  it('after sign-out, the old cookie cannot write', async () => {
    const person = await createUser(t.db.db, { roles: ['chemist'], name: 'Signs out' });
    const cookie = await signInCookie(person.email);
    expect((await as(cookie, 'post', '/api/baths').send(bathBody('Written while signed in'))).status).toBe(201);
    expect((await as(cookie, 'post', '/api/auth/sign-out')).status).toBe(204);
    await writesRefused(cookie, 'signed out');
    // The password was not changed by the refused call: the person signs in as before.
    await signInCookie(person.email);
  });

  it('after "sign out everywhere", a cookie copied from another device cannot write', async () => {
    const person = await createUser(t.db.db, { roles: ['chemist'], name: 'Loses a laptop' });
    const desk = await signInCookie(person.email);
    const stolen = await signInCookie(person.email);
    expect((await as(stolen, 'get', '/api/me')).status).toBe(200);
    expect((await as(desk, 'post', '/api/me/sign-out-everywhere')).status).toBe(204);
    await writesRefused(stolen, 'stolen');
    await writesRefused(desk, 'signed out everywhere');
  });

  it('a made-up or garbled cookie is refused like no cookie', async () => {
    for (const cookie of ['ligandry_session=not-a-session', "ligandry_session='; DROP TABLE sessions; --", `ligandry_session=${'a'.repeat(4000)}`]) {
      await writesRefused(cookie, cookie.slice(17, 30));
    }
    // The sessions table is still there: the real sessions still work.
    expect((await as(cookies.chemist, 'get', '/api/me')).status).toBe(200);
  });
});

describe('other origins cannot write, on any write route', () => {
  /** A URL for a route: the ids of real rows where that matters, a well-formed unknown id otherwise. */
  function urlOf(path: string, ids: { bath: string; run: string }): string {
    const id = path.startsWith('/api/baths/') ? ids.bath : path.startsWith('/api/runs/') ? ids.run : '00000000-0000-4000-8000-00000000beef';
    return path.replace(':id', id).replace(':token', 'AAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAAA');
  }

  it('refuses every POST, PATCH, PUT and DELETE from another site with 403 bad_origin, and changes nothing', async () => {
    const bath = (await as(cookies.everyone, 'post', '/api/baths').send(bathBody('Origin target'))).body as { id: string };
    const run = (await as(cookies.everyone, 'post', '/api/runs').send({ title: 'Origin target run', system: strike(12) })).body as { id: string };
    const [thresholdsBefore] = await t.db.db.select({ n: count() }).from(hazardThresholds);
    const bathsBefore = await bathCount();
    const port = new URL(t.origin).port;
    // What a page on another site makes a browser send: its Origin (or "null" from a sandboxed
    // frame or a file), or no Origin but Sec-Fetch-Site: cross-site.
    const senders: [string, Record<string, string>][] = [
      ['another site', { Origin: 'https://evil.example' }],
      ['a sandboxed frame', { Origin: 'null' }],
      ['another port here', { Origin: `http://127.0.0.1:${Number(port) + 1}` }],
      ['another name for this host', { Origin: `http://localhost:${port}` }],
      ['a cross-site fetch without Origin', { 'Sec-Fetch-Site': 'cross-site', Referer: 'https://evil.example/page' }],
    ];
    const routes = listRoutes(t.app).filter((r) => r.path.startsWith('/api') && ['POST', 'PATCH', 'PUT', 'DELETE'].includes(r.method));
    expect(routes.length).toBeGreaterThan(30);
    const wrong: string[] = [];
    for (const route of routes) {
      for (const [who, headers] of senders) {
        const res = await request(t.server)
          [route.method.toLowerCase() as Method](urlOf(route.path, { bath: bath.id, run: run.id }))
          .set('Cookie', cookies.everyone)
          .set(headers)
          .send(route.path === '/api/baths' ? bathBody('Cross-site bath') : { note: 'cross-site', name: 'Cross-site name', values: DEFAULT_THRESHOLDS });
        if (res.status !== 403 || res.body.error?.code !== 'bad_origin') wrong.push(`${route.method} ${route.path} from ${who}: ${res.status} ${res.body.error?.code}`);
      }
    }
    expect(wrong).toEqual([]);
    // Nothing happened: no bath, the bath not archived, the run kept, the thresholds and the
    // name as they were, and the session (which the sign-outs would have ended) still good.
    expect(await bathCount()).toBe(bathsBefore);
    expect((await as(cookies.everyone, 'get', `/api/baths/${bath.id}`)).body.status).toBe('active');
    expect((await as(cookies.everyone, 'get', `/api/runs/${run.id}`)).status).toBe(200);
    expect(await t.db.db.select({ n: count() }).from(hazardThresholds)).toEqual([thresholdsBefore]);
    const me = await as(cookies.everyone, 'get', '/api/me');
    expect([me.status, me.body.name]).toEqual([200, 'Sec everyone']);
  });

  it('does not read Referer: without Origin or Sec-Fetch-Site (a script, not a page) a write passes the origin check', async () => {
    // Browsers send Origin on every cross-origin POST, PATCH, PUT and DELETE, and Sec-Fetch-Site;
    // a request with neither comes from a script or the command line, which may write when signed in.
    const res = await request(t.server).post('/api/baths').set('Cookie', cookies.chemist).set('Referer', 'https://evil.example/form').send(bathBody('Scripted bath'));
    expect(res.status).toBe(201);
    const same = await request(t.server).post('/api/baths').set('Cookie', cookies.chemist).set('Sec-Fetch-Site', 'same-origin').send(bathBody('Same-origin fetch'));
    expect(same.status).toBe(201);
  });
});

describe('uploads: the type is read from the bytes, the size is capped, and a refused file leaves nothing', () => {
  const PNG = Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a, 0, 0, 0, 13]), Buffer.from('IHDR'), Buffer.alloc(17)]);
  const JPEG = Buffer.concat([Buffer.from([0xff, 0xd8, 0xff, 0xe0, 0, 16]), Buffer.from('JFIF'), Buffer.alloc(10)]);
  const EXE = Buffer.concat([Buffer.from('MZ\u0090\u0000\u0003\u0000\u0000\u0000', 'latin1'), Buffer.alloc(56), Buffer.from('This program cannot be run in DOS mode.')]);
  const PDF = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n', 'latin1');
  const csvOf = (header: string, size: number) => Buffer.from(`${header}\n${`x,${'y'.repeat(60)}\n`.repeat(Math.ceil(size / 63))}`);

  type Case = [name: string, fileName: string, file: Buffer, contentType: string, status: number];
  let bathId = '';
  beforeAll(async () => {
    bathId = ((await as(cookies.chemist, 'post', '/api/baths').send(bathBody('Upload target'))).body as { id: string }).id;
  });

  /** Rows and files an upload could have left: constants, the bath's analyses and attachments, the uploads folder. */
  async function stored() {
    const [c] = await t.db.db.select({ n: count() }).from(constants);
    const [a] = await t.db.db.select({ n: count() }).from(analyses).where(eq(analyses.bathId, bathId));
    const [f] = await t.db.db.select({ n: count() }).from(attachments).where(eq(attachments.bathId, bathId));
    return { constants: c?.n, analyses: a?.n, attachments: f?.n, files: fs.readdirSync(t.uploadsDir).sort() };
  }

  const routes: [route: string, cases: Case[]][] = [
    [
      'attachments',
      [
        ['a PNG renamed .pdf', 'lab-report.pdf', PNG, 'application/pdf', 415],
        ['a JPEG renamed .png', 'panel.png', JPEG, 'image/png', 415],
        ['a PDF renamed .jpg', 'photo.jpg', PDF, 'image/jpeg', 415],
        ['a Windows program', 'setup.exe', EXE, 'application/x-msdownload', 415],
        ['a Windows program renamed .pdf', 'report.pdf', EXE, 'application/pdf', 415],
        ['a PDF over 10 MB', 'big.pdf', Buffer.concat([PDF, Buffer.alloc(10_000_001)]), 'application/pdf', 413],
      ],
    ],
    [
      'analyses/import',
      [
        ['a PNG renamed .csv', 'results.csv', PNG, 'text/csv', 415],
        ['a Windows program', 'results.exe', EXE, 'application/x-msdownload', 415],
        ['a Windows program renamed .csv', 'results.csv', EXE, 'text/csv', 415],
        ['a PDF', 'results.pdf', PDF, 'application/pdf', 415],
        ['a CSV over 1 MB', 'results.csv', csvOf('sampled_at,analyst', 1_000_100), 'text/csv', 413],
      ],
    ],
    [
      'constants/import',
      [
        ['a PNG renamed .csv', 'constants.csv', PNG, 'text/csv', 415],
        ['a Windows program', 'constants.exe', EXE, 'application/x-msdownload', 415],
        ['a Windows program renamed .csv', 'constants.csv', EXE, 'text/csv', 415],
        ['a PDF', 'constants.pdf', PDF, 'application/pdf', 415],
        ['a CSV over 1 MB', 'constants.csv', csvOf('kind,reaction,log_value,source', 1_000_100), 'text/csv', 413],
      ],
    ],
  ];
  const urlOf = (route: string) => (route === 'constants/import' ? '/api/constants/import' : `/api/baths/${bathId}/${route}`);

  it('keeps a real PDF sent under a name of another kind, named as the PDF it is', async () => {
    const res = await as(cookies.chemist, 'post', `/api/baths/${bathId}/attachments`).attach('file', PDF, { filename: 'setup.exe', contentType: 'application/x-msdownload' });
    expect([res.status, res.body.fileName, res.body.contentType]).toEqual([201, 'setup.exe.pdf', 'application/pdf']);
  });

  describe.each(routes)('%s', (route, cases) => {
    it.each(cases)('refuses %s (%s) and stores nothing', async (_name, fileName, file, contentType, status) => {
      const before = await stored();
      const res = await as(cookies.chemist, 'post', urlOf(route)).field('mode', 'valid').attach('file', file, { filename: fileName, contentType });
      expect(res.status).toBe(status);
      expect(res.body.error.code).toBe(status === 413 ? 'payload_too_large' : 'validation_failed');
      if (status !== 413) expect(res.body.error.details[0].path).toBe('file');
      expect(await stored()).toEqual(before);
    });

    it('refuses a large upload from nobody (401) or a role without the right (403) before reading it', async () => {
      const big = Buffer.concat([route === 'attachments' ? PDF : Buffer.from('kind\n'), Buffer.alloc(11_000_000)]);
      const before = await stored();
      const nobody = await request(t.server).post(urlOf(route)).set('Origin', t.origin).attach('file', big, { filename: 'big.pdf' });
      expect(nobody.status).toBe(401);
      const wrongRole = await as(cookies.officer, 'post', urlOf(route)).attach('file', big, { filename: 'big.pdf' });
      expect(wrongRole.status).toBe(403);
      expect(await stored()).toEqual(before);
    });
  });
});

describe('SQL injection through text fields and searches comes back as plain data', () => {
  // Each value is valid text: it must be stored and read back exactly as sent. "$$" is shorter
  // than fields that need three characters; there it is refused naming the field.
  const VALUES = [
    "'; DROP TABLE baths; --",
    "' OR '1'='1",
    '\\x00',
    '$$',
    '$1; SELECT pg_sleep(5)',
    '"; DROP TABLE users; --',
    "Robert'); DELETE FROM constants; --",
    "%' OR name LIKE '%",
  ];
  const tooShort = (v: string, min: number) => v.trim().length < min;
  let tablesBefore: string[] = [];

  async function tableNames(): Promise<string[]> {
    const rows = (await t.db.db.execute(sql`select table_name from information_schema.tables where table_schema = 'public' order by table_name`)) as unknown as { table_name: string }[];
    return rows.map((r) => r.table_name);
  }

  /** Stored exactly (2xx and `read` gives the value back), or refused naming `field` when too short. */
  function storedOrRefused(res: request.Response, value: string, min: number, field: string, read: () => unknown): void {
    if (tooShort(value, min)) {
      expect([res.status, res.body.error?.details?.[0]?.path]).toEqual([400, field]);
      return;
    }
    expect([res.status < 300, res.body.error]).toEqual([true, undefined]);
    expect(read()).toBe(value);
  }

  beforeAll(async () => {
    tablesBefore = await tableNames();
    expect(tablesBefore).toEqual(expect.arrayContaining(['baths', 'users', 'constants', 'runs', 'sessions', 'analyses']));
  });

  it.each(VALUES)('bath name, site and notes, and analysis analyst and notes: %s', async (value) => {
    const made = await as(cookies.chemist, 'post', '/api/baths').send({ ...bathBody(value), site: value, notes: value });
    expect(made.status).toBe(201);
    expect([made.body.name, made.body.site, made.body.notes]).toEqual([value, value, value]);
    const read = await as(cookies.officer, 'get', `/api/baths/${made.body.id}`);
    expect([read.body.name, read.body.site, read.body.notes]).toEqual([value, value, value]);
    const patched = await as(cookies.chemist, 'patch', `/api/baths/${made.body.id}`).send({ name: `${value} (2)`, notes: `${value} (2)` });
    expect([patched.body.name, patched.body.notes]).toEqual([`${value} (2)`, `${value} (2)`]);
    const analysis = await as(cookies.chemist, 'post', `/api/baths/${made.body.id}/analyses`).send({ sampledAt: '2026-11-20', analyst: value, notes: value, pH: 7 });
    expect(analysis.status).toBe(201);
    const log = (await as(cookies.officer, 'get', `/api/baths/${made.body.id}/analyses`)).body as { analyst: string; notes: string }[];
    expect(log.map((a) => [a.analyst, a.notes])).toEqual([[value, value]]);
  });

  it.each(VALUES)('run title, and the safety desk: send-back, resubmit, sign-off and release notes: %s', async (value) => {
    const run = await as(cookies.chemist, 'post', '/api/runs').send({ title: value, system: strike(10) });
    expect(run.status).toBe(201);
    expect((await as(cookies.officer, 'get', `/api/runs/${run.body.id}`)).body.title).toBe(value);
    const reviewId = run.body.safety.review.id as string;
    const review = () => as(cookies.officer, 'get', `/api/safety/reviews/${reviewId}`);
    const back = await as(cookies.officer, 'post', `/api/safety/reviews/${reviewId}/send-back`).send({ note: value });
    if (tooShort(value, 3)) {
      expect([back.status, back.body.error.details[0].path]).toEqual([400, 'note']);
      return;
    }
    expect((await review()).body.note).toBe(value);
    await as(cookies.chemist, 'post', `/api/safety/reviews/${reviewId}/resubmit`).send({ note: value }).expect(200);
    await as(cookies.officer, 'post', `/api/safety/reviews/${reviewId}/sign-off`).send({ conditions: value }).expect(200);
    const decided = (await review()).body as { conditions: string; events: { action: string; note: string | null }[] };
    expect(decided.conditions).toBe(value);
    expect(decided.events.map((e) => [e.action, e.note])).toEqual([
      ['submitted', null],
      ['sent_back', value],
      ['resubmitted', value],
      ['signed_off', value],
    ]);
    await as(cookies.chemist, 'post', `/api/runs/${run.body.id}/release`).send({ note: value }).expect(200);
    expect((await as(cookies.officer, 'get', `/api/runs/${run.body.id}`)).body.safety.released.note).toBe(value);
  });

  it('constant source, medium and note; review, revision and retirement notes; a reaction that is not one', async () => {
    const first = await as(cookies.chemist, 'post', '/api/constants').send({ kind: 'cumulative_formation', reaction: 'Cd+2 + I- = CdI+', logValue: 2, source: VALUES[0], medium: VALUES[1], note: VALUES[2] });
    expect(first.status).toBe(201);
    expect([first.body.source, first.body.medium, first.body.note]).toEqual([VALUES[0], VALUES[1], VALUES[2]]);
    const approved = await as(cookies.officer, 'post', `/api/constants/${first.body.id}/review`).send({ decision: 'approve', note: VALUES[4] });
    expect(approved.body.reviewNote).toBe(VALUES[4]);
    for (const value of VALUES) {
      const revision = await as(cookies.chemist, 'post', `/api/constants/${first.body.id}/revisions`).send({ logValue: 2.1, source: value, medium: value, note: value });
      storedOrRefused(revision, value, 3, 'source', () => revision.body.source);
      if (revision.status !== 201) continue;
      expect([revision.body.medium, revision.body.note]).toEqual([value, value]);
      const detail = await as(cookies.officer, 'get', `/api/constants/${revision.body.id}`);
      expect([detail.body.constant.source, detail.body.constant.note]).toEqual([value, value]);
      const rejected = await as(cookies.officer, 'post', `/api/constants/${revision.body.id}/review`).send({ decision: 'reject', note: value });
      expect(rejected.body.reviewNote).toBe(value);
    }
    const all = VALUES.join(' ');
    const retired = await as(cookies.officer, 'post', `/api/constants/${first.body.id}/retire`).send({ note: all });
    expect([retired.status, retired.body.retireNote]).toEqual([200, all]);
    for (const value of VALUES) {
      const bad = await as(cookies.chemist, 'post', '/api/constants').send({ kind: 'cumulative_formation', reaction: value, logValue: 1, source: 'Security compilation' });
      expect([bad.status, bad.body.error.details[0].path]).toEqual([400, 'reaction']);
    }
  });

  it('CSV imports carry the values into constants and analyses unchanged', async () => {
    const bath = (await as(cookies.chemist, 'post', '/api/baths').send(bathBody('CSV injection target'))).body as { id: string };
    const cell = (v: string) => `"${v.replace(/"/g, '""')}"`;
    const analysesCsv = ['sampled_at,analyst,ph,notes', ...VALUES.map((v, i) => `2026-10-${String(i + 1).padStart(2, '0')},${cell(v)},7,${cell(v)}`)].join('\n');
    const imported = await as(cookies.chemist, 'post', `/api/baths/${bath.id}/analyses/import`).attach('file', Buffer.from(analysesCsv), { filename: 'results.csv', contentType: 'text/csv' });
    expect([imported.status, imported.body.created]).toEqual([200, VALUES.length]);
    const log = (await as(cookies.officer, 'get', `/api/baths/${bath.id}/analyses`)).body as { analyst: string; notes: string }[];
    expect(log.map((a) => [a.analyst, a.notes])).toEqual(VALUES.map((v) => [v, v]));
    const value = VALUES[6] as string;
    const constantsCsv = `kind,reaction,log_value,source,medium,note\ncumulative_formation,Pb+2 + Br- = PbBr+,1.1,${cell(value)},${cell(value)},${cell(value)}\n`;
    const drafts = await as(cookies.chemist, 'post', '/api/constants/import').attach('file', Buffer.from(constantsCsv), { filename: 'constants.csv', contentType: 'text/csv' });
    expect([drafts.status, drafts.body.created]).toEqual([200, 1]);
    const draft = await as(cookies.officer, 'get', `/api/constants/${drafts.body.draftIds[0]}`);
    expect([draft.body.constant.source, draft.body.constant.medium, draft.body.constant.note]).toEqual([value, value, value]);
  });

  it.each(VALUES)('thresholds note, a person\'s name, sign-in and invitation fields: %s', async (value) => {
    const thresholds = await as(cookies.officer, 'post', '/api/safety/thresholds').send({ values: DEFAULT_THRESHOLDS, note: value });
    storedOrRefused(thresholds, value, 3, 'note', () => thresholds.body.note);
    const person = await createUser(t.db.db, { roles: ['technician'], name: 'Renamed soon' });
    const cookie = await signInCookie(person.email);
    const renamed = await as(cookie, 'patch', '/api/me').send({ name: value });
    expect([renamed.status, renamed.body.name]).toEqual([200, value]);
    expect((await as(cookie, 'get', '/api/me')).body.name).toBe(value);
    // Not an e-mail address: refused naming the field; a valid address with this password: wrong, no session.
    const signIn = await request(t.server).post('/api/auth/sign-in').set('Origin', t.origin).send({ email: value, password: value });
    expect([signIn.status, signIn.body.error.details[0].path]).toEqual([400, 'email']);
    const wrong = await request(t.server).post('/api/auth/sign-in').set('Origin', t.origin).send({ email: person.email, password: value });
    expect([wrong.status, wrong.headers['set-cookie']]).toEqual([401, undefined]);
    const invite = await as(cookies.everyone, 'post', '/api/team/invitations').send({ email: value, roles: ['chemist'] });
    expect([invite.status, invite.body.error.details[0].path]).toEqual([400, 'email']);
  });

  it('NUL is refused naming the field (PostgreSQL cannot store it), wherever it is sent', async () => {
    const bath = (await as(cookies.chemist, 'post', '/api/baths').send(bathBody('NUL target'))).body as { id: string };
    const cases: [Method, string, string, Record<string, unknown>, string][] = [
      ['post', '/api/baths', 'chemist', { ...bathBody('a\u0000b') }, 'name'],
      ['patch', `/api/baths/${bath.id}`, 'chemist', { notes: 'x\u0000' }, 'notes'],
      ['post', `/api/baths/${bath.id}/analyses`, 'chemist', { sampledAt: '2026-11-20', analyst: '\u0000', pH: 7 }, 'analyst'],
      ['post', '/api/runs', 'chemist', { title: 'run \u0000', system: strike(12) }, 'title'],
      ['post', '/api/runs', 'chemist', { system: strike(12), params: { 'key\u0000': 1 } }, 'params.key\\u0000'],
      ['post', '/api/safety/thresholds', 'officer', { values: DEFAULT_THRESHOLDS, note: 'why \u0000' }, 'note'],
      ['patch', '/api/me', 'chemist', { name: '\u0000' }, 'name'],
    ];
    for (const [method, url, who, body, field] of cases) {
      const res = await as(cookies[who as 'chemist' | 'officer'], method, url).send(body);
      expect([url, res.status, res.body.error?.code, res.body.error?.details?.[0]?.path]).toEqual([url, 400, 'validation_failed', field]);
    }
    const attached = await as(cookies.chemist, 'post', `/api/baths/${bath.id}/attachments`)
      .field('title', 'scan \u0000')
      .attach('file', Buffer.from('%PDF-1.4\n%%EOF\n'), { filename: 'scan.pdf', contentType: 'application/pdf' });
    expect([attached.status, attached.body.error?.details?.[0]?.path]).toEqual([400, 'title']);
  });

  it('searches take the text literally: ?q= finds only what contains it', async () => {
    await as(cookies.chemist, 'post', '/api/baths').send(bathBody('Plain bath for search'));
    for (const q of VALUES) {
      const found = await as(cookies.officer, 'get', '/api/baths').query({ q, status: 'all' });
      expect(found.status).toBe(200);
      const list = found.body as { name: string; site: string; notes: string }[];
      // The bath named with this value is found; every bath found contains the text; the plain one is not among them.
      expect(list.some((b) => b.name === q || b.name === `${q} (2)`)).toBe(true);
      expect(list.every((b) => [b.name, b.site, b.notes].some((s) => s.toLowerCase().includes(q.toLowerCase())))).toBe(true);
      const library = await as(cookies.officer, 'get', '/api/constants').query({ q, status: 'all' });
      expect(library.status).toBe(200);
      for (const c of library.body as { source: string; medium: string; note: string; reaction: string }[]) {
        expect([c.source, c.medium, c.note, c.reaction].join(' ').toLowerCase()).toContain(q.toLowerCase());
      }
      const exported = await as(cookies.officer, 'get', '/api/constants/export.csv').query({ q, status: 'all' });
      expect(exported.status).toBe(200);
      const species = await as(cookies.officer, 'get', '/api/species').query({ q });
      expect([species.status, species.body]).toEqual([200, []]);
    }
    expect(((await as(cookies.officer, 'get', '/api/species')).body as unknown[]).length).toBeGreaterThan(20);
    const runsByBath = await as(cookies.officer, 'get', '/api/runs').query({ bath: VALUES[1] });
    expect([runsByBath.status, runsByBath.body.error.details[0].path]).toEqual([400, 'bath']);
  });

  it('left every table in place, with its rows', async () => {
    expect(await tableNames()).toEqual(tablesBefore);
    expect(await bathCount()).toBeGreaterThan(VALUES.length);
    const [mine] = await t.db.db.select({ n: count() }).from(runs).where(and(eq(runs.authorId, chemistId)));
    expect(mine?.n).toBeGreaterThanOrEqual(VALUES.length);
    expect((await as(cookies.chemist, 'get', '/api/me')).status).toBe(200);
  });
});
