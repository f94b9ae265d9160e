// Bad input on every write route. The routes come from listRoutes(app), so a new POST, PATCH, PUT
// or DELETE under /api is fuzzed without being added here (from an empty object until it has a
// template below). One person holding every role sends, to real ids of rows made here and to
// malformed ids:
//   1. each field of a valid body with each of the worst values of its kind (NUL, lone
//      surrogates, injection text, numbers beyond doubles and integer columns), and each object
//      with prototype keys, NUL keys and 8000 levels of nesting; each malformed id with a valid body;
//   2. fast-check mutations of the valid body: wrong types, missing and extra fields, prototype
//      keys, huge and deep values, NaN-like and numeric strings, odd unicode, arrays, null;
//   3. raw bodies that are not JSON, or JSON under another content type or encoding;
//   4. on the upload routes, CSV files and attachments with hostile content, names and fields,
//      and broken or garbage multipart bodies.
// Every answer must keep the promises of answerProblem (__tests__/support/fuzz.ts): never a 5xx,
// the one error shape, and a validation_failed that names the field whenever the body names any
// of the route's fields (an empty path only for a body that is wrong as a whole).
//
// A valid body gets through now and then, so this file runs on a database of its own: its writes
// (new thresholds versions, retired constants) must not reach suites running beside it.
// LIGANDRY_PROPERTY_SEED picks other bodies; LIGANDRY_FUZZ_RUNS scales their number (1 = default);
// LIGANDRY_FUZZ_REPORT=1 prints the answers per route.
import fc from 'fast-check';
import request from 'supertest';

import { type RouteEntry, listRoutes } from '@/server/auth/access';
import { createLucia } from '@/server/auth/lucia';
import { ROLES } from '@/shared/auth';
import { DEFAULT_THRESHOLDS } from '@/shared/safety';

import { answerProblem, attachmentPartsArb, bodyArb, brief, csvPartsArb, type FuzzBody, type Json, multipartArb, multipartBody, namesKnownField, type Part, RAW_BODIES, worstBodies } from '../support/fuzz';
import { startTestServer, type TestServer } from '../support/test-server';
import { createUser, linkPath, TEST_PASSWORD, uniqueEmail, waitForMail } from '../support/users';

const SEED = Number(process.env.LIGANDRY_PROPERTY_SEED ?? 20261201);
const SCALE = Number(process.env.LIGANDRY_FUZZ_RUNS ?? 1);
const WRITE_METHODS = new Set(['POST', 'PATCH', 'PUT', 'DELETE']);
/** Routes fuzzed at once (each sends one request at a time). */
const CONCURRENCY = 4;

/** Random bodies per route; fewer where a valid-looking body costs a password hash (about 50 ms) or a mail. */
const RUNS_DEFAULT = 60;
const RUNS: Record<string, number> = {
  'POST /api/auth/sign-in': 40,
  'POST /api/auth/sign-out': 20,
  'POST /api/me/sign-out-everywhere': 20,
  'POST /api/me/password': 40,
  'POST /api/auth/password-resets/:token': 30,
  'POST /api/auth/invitations/:token': 30,
  'POST /api/team/invitations': 40,
  'POST /api/team/invitations/:id/resend': 30,
};
/** The worst-values pass takes at most this many bodies per route (an even spread of them). */
const WORST_MAX = 120;
const MULTIPART_RUNS = 120;

const strike = (pH: number) => ({ metals: ['Ag+'], ligands: ['CN-'], counterIons: ['K+'], totals: { 'Ag+': 0.05, 'CN-': 0.5, 'K+': 0.5 }, pH, activity: 'davies' });

const BATH = {
  name: 'Fuzz silver, tank 1',
  process: 'cyanide_silver_plate',
  volume: 300,
  volumeUnit: 'gal',
  temperatureC: 24,
  makeUp: [{ salt: 'KCN', amount: 120, unit: 'g/L' }],
  metalUnit: 'troy oz/gal',
  targets: { metal: { min: 3.5, max: 4.5 }, freeLigand: { min: 90, max: 130 }, pH: { min: 11.5, max: 12.5 } },
  site: 'Fuzz site',
  notes: 'made by the fuzz suite',
};
const SOURCE = 'Fuzz compilation, table 1 (values made up for this test)';

/** A valid body per route; a route missing here is fuzzed from an empty object. */
function templates(problem: Json): Record<string, Json> {
  return {
    'POST /api/auth/sign-in': { email: 'fuzz.nobody@example.test', password: 'not the password' },
    'POST /api/auth/sign-out': {},
    'POST /api/auth/password-resets': { email: 'fuzz.nobody@example.test' },
    'POST /api/auth/password-resets/:token': { password: 'a brand new secret 1' },
    'POST /api/auth/invitations/:token': { name: 'Fuzz Newcomer', password: 'a brand new secret 1' },
    'PATCH /api/me': { name: 'Fuzz All Roles' },
    'POST /api/me/password': { currentPassword: 'not the password', newPassword: 'another new secret 2' },
    'POST /api/me/sign-out-everywhere': {},
    'PATCH /api/team/people/:id': { roles: ['technician'], active: true },
    'POST /api/team/invitations': { email: 'fuzz.invitee@example.test', roles: ['technician'] },
    'POST /api/team/invitations/:id/resend': {},
    'DELETE /api/team/invitations/:id': {},
    'POST /api/constants': { kind: 'cumulative_formation', reaction: 'Cd+2 + Br- = CdBr+', logValue: 1.5, uncertainty: 0.1, temperatureC: 25, ionicStrength: 0, medium: 'NaClO4', source: SOURCE, note: 'fuzz' },
    'POST /api/constants/:id/revisions': { logValue: 2.1, source: SOURCE, note: 'a fuzz revision' },
    'POST /api/constants/:id/review': { decision: 'reject', note: 'fuzz review' },
    'POST /api/constants/:id/retire': { note: 'fuzz retirement' },
    'POST /api/constants/import': { mode: 'all' },
    'POST /api/systems/build': strike(12),
    'POST /api/runs': { title: 'Fuzz run', calculator: 'speciation', system: strike(12), params: {} },
    'DELETE /api/runs/:id': {},
    'POST /api/solve': problem,
    'POST /api/calculations': { calculator: 'speciation', system: strike(12), params: {} },
    'POST /api/baths': BATH,
    'PATCH /api/baths/:id': { name: 'Fuzz silver, tank 1b', notes: 'renamed' },
    'POST /api/baths/:id/archive': {},
    'POST /api/baths/:id/restore': {},
    'POST /api/baths/:id/analyses': { sampledAt: '2026-11-20', analyst: 'F. Uzz', metal: { value: 4 }, freeLigand: { value: 100, unit: 'g/L' }, pH: 12.1, notes: 'weekly' },
    'POST /api/baths/:id/analyses/import': { mode: 'all' },
    'POST /api/baths/:id/attachments': { title: 'Fuzz report' },
    'POST /api/safety/thresholds': { values: DEFAULT_THRESHOLDS, note: 'fuzz thresholds' },
    'POST /api/safety/reviews/:id/sign-off': { conditions: 'fume hood on' },
    'POST /api/safety/reviews/:id/send-back': { note: 'raise the pH first' },
    'POST /api/safety/reviews/:id/resubmit': { note: 'raised the pH' },
    'POST /api/runs/:id/release': { note: 'released by the fuzz suite' },
  };
}


// Ids that name nothing, or are not ids at all (already URL-encoded where they need it).
const MALFORMED_IDS = [
  '0',
  '-1',
  '1.5',
  '1e3',
  '2147483648',
  '99999999999',
  '9007199254740993',
  'NaN',
  'Infinity',
  'null',
  'undefined',
  '%00',
  '%',
  '%zz',
  '..',
  '__proto__',
  'constructor',
  encodeURIComponent("'; DROP TABLE baths; --"),
  encodeURIComponent("' OR '1'='1"),
  'x'.repeat(5000),
  '%F0%9F%A7%AA',
  '00000000-0000-0000-0000-000000000000',
  '00000000-0000-4000-8000-00000000000G',
  '%20',
];

const malformedIdArb: fc.Arbitrary<string> = fc.oneof(
  { weight: 3, arbitrary: fc.constantFrom(...MALFORMED_IDS) },
  { weight: 1, arbitrary: fc.uuid() },
  { weight: 1, arbitrary: fc.stringMatching(/^[A-Za-z0-9_-]{43}$/) },
  { weight: 2, arbitrary: fc.string({ minLength: 1, maxLength: 40 }).map(encodeURIComponent) },
  { weight: 1, arbitrary: fc.string({ unit: 'binary', minLength: 1, maxLength: 10 }).map(encodeURIComponent) },
  { weight: 1, arbitrary: fc.integer().map(String) },
);

let t: TestServer;
let mainCookie = '';
let newLeaverSession: () => Promise<string> = async () => '';
let problem: Json = {};
/** Real values for route parameters, by route key and parameter name. */
const real: Record<string, Record<string, string[]>> = {};
/** Answers per route: status -> count. */
const answers = new Map<string, Map<number, number>>();

function sessionCookieOf(res: request.Response): string {
  const raw = (res.headers['set-cookie'] as unknown as string[] | undefined) ?? [];
  const found = raw.find((c) => c.startsWith('ligandry_session='));
  if (!found) throw new Error(`no session cookie: ${res.status} ${JSON.stringify(res.body)}`);
  return found.split(';')[0] as string;
}

async function cookieOf(email: string): Promise<string> {
  return sessionCookieOf(await request(t.server).post('/api/auth/sign-in').set('Origin', t.origin).send({ email, password: TEST_PASSWORD }));
}

/** A setup call that must succeed. */
async function must(cookie: string, method: 'post' | 'get', url: string, body?: unknown): Promise<Record<string, unknown>> {
  const req = request(t.server)[method](url).set('Origin', t.origin).set('Cookie', cookie);
  const res = body === undefined ? await req : await req.send(body as object);
  if (res.status >= 300) throw new Error(`${method.toUpperCase()} ${url} answered ${res.status}: ${JSON.stringify(res.body)}`);
  return res.body as Record<string, unknown>;
}

/** Mailed one-time tokens: an invitation and a password link of people made here. */
async function mailedTokens(resettable: string): Promise<{ invitation: string; reset: string }> {
  const invitee = uniqueEmail('fuzz-invitee');
  await must(mainCookie, 'post', '/api/team/invitations', { email: invitee, roles: ['technician'] });
  const invitation = linkPath((await waitForMail(t.db.db, invitee, /invited you/)).text, '/welcome/').split('/').pop() as string;
  await request(t.server).post('/api/auth/password-resets').set('Origin', t.origin).send({ email: resettable }).expect(202);
  const reset = linkPath((await waitForMail(t.db.db, resettable, /new Ligandry password/)).text, '/new-password/').split('/').pop() as string;
  return { invitation, reset };
}

/** Rows to aim at, made here: baths, runs, reviews in both states, constants, an invitation, mailed tokens. */
async function makeRows(helperCookie: string, people: { target: string; resettable: string }): Promise<void> {
  const bath = (await must(mainCookie, 'post', '/api/baths', BATH)).id as string;
  const archivable = (await must(mainCookie, 'post', '/api/baths', { ...BATH, name: 'Fuzz silver, tank 2' })).id as string;
  const run = (await must(mainCookie, 'post', '/api/runs', { title: 'Fuzz run', system: strike(12) })).id as string;
  const doomed = (await must(mainCookie, 'post', '/api/runs', { title: 'Fuzz run to delete', system: strike(12) })).id as string;
  // Flagged runs (cyanide at pH 10) open reviews: one the helper submitted, for this person to
  // decide; one this person submitted, sent back by the helper, for this person to resubmit.
  const theirs = (await must(helperCookie, 'post', '/api/runs', { title: 'Fuzz flagged', system: strike(10) })) as { safety: { review: { id: string } } };
  const mine = (await must(mainCookie, 'post', '/api/runs', { title: 'Fuzz flagged, mine', system: strike(10) })) as { id: string; safety: { review: { id: string } } };
  await must(helperCookie, 'post', `/api/safety/reviews/${mine.safety.review.id}/send-back`, { note: 'Raise the pH first.' });
  // Constants: a draft by the helper (this person may review it), an approved one of this
  // person's (to revise and retire), and one of the starting library.
  const draft = (await must(helperCookie, 'post', '/api/constants', { kind: 'cumulative_formation', reaction: 'Ni+2 + Br- = NiBr+', logValue: 0.5, source: SOURCE })).id as number;
  const own = (await must(mainCookie, 'post', '/api/constants', { kind: 'cumulative_formation', reaction: 'Zn+2 + I- = ZnI+', logValue: -1.5, source: SOURCE })).id as number;
  await must(helperCookie, 'post', `/api/constants/${own}/review`, { decision: 'approve', note: 'fine' });
  const seeded = ((await must(mainCookie, 'get', '/api/constants')) as unknown as { id: number }[])[0]?.id as number;
  const invitation = (await must(mainCookie, 'post', '/api/team/invitations', { email: uniqueEmail('fuzz-pending'), roles: ['chemist'] })).id as string;
  const tokens = await mailedTokens(people.resettable);
  const baths = { id: [bath] };
  Object.assign(real, {
    'PATCH /api/team/people/:id': { id: [people.target] },
    'POST /api/team/invitations/:id/resend': { id: [invitation] },
    'DELETE /api/team/invitations/:id': { id: [invitation] },
    'POST /api/auth/password-resets/:token': { token: [tokens.reset] },
    'POST /api/auth/invitations/:token': { token: [tokens.invitation] },
    'POST /api/constants/:id/revisions': { id: [String(own), String(seeded)] },
    'POST /api/constants/:id/review': { id: [String(draft)] },
    'POST /api/constants/:id/retire': { id: [String(own), String(seeded)] },
    'DELETE /api/runs/:id': { id: [doomed] },
    'POST /api/runs/:id/release': { id: [run, mine.id] },
    'PATCH /api/baths/:id': baths,
    'POST /api/baths/:id/archive': { id: [archivable] },
    'POST /api/baths/:id/restore': { id: [archivable] },
    'POST /api/baths/:id/analyses': baths,
    'POST /api/baths/:id/analyses/import': baths,
    'POST /api/baths/:id/attachments': baths,
    'POST /api/safety/reviews/:id/sign-off': { id: [theirs.safety.review.id] },
    'POST /api/safety/reviews/:id/send-back': { id: [theirs.safety.review.id] },
    'POST /api/safety/reviews/:id/resubmit': { id: [mine.safety.review.id] },
  });
}

beforeAll(async () => {
  // A high limit per address: the sign-in fuzz fails many times from 127.0.0.1 on purpose.
  t = await startTestServer({ ownDatabase: true, signInLimits: { perAccount: 5, perIp: 1_000_000, windowMinutes: 15 } });
  const db = t.db.db;
  const [me, helper, leaver, target, resettable] = await Promise.all([
    createUser(db, { roles: [...ROLES], name: 'Fuzz all roles' }),
    createUser(db, { roles: ['chemist', 'reviewer', 'safety'], name: 'Fuzz helper' }),
    createUser(db, { roles: ['chemist'], name: 'Fuzz leaver' }),
    createUser(db, { roles: ['technician'], name: 'Fuzz target' }),
    createUser(db, { roles: ['technician'], name: 'Fuzz resettable' }),
  ]);
  // The sign-outs end the session they are sent with: each gets a fresh one (made as sign-in
  // makes them, without the password hash).
  const lucia = createLucia(db, { secure: false });
  newLeaverSession = async () => `ligandry_session=${(await lucia.createSession(leaver.id, {})).id}`;
  mainCookie = await cookieOf(me.email);
  await makeRows(await cookieOf(helper.email), { target: target.id, resettable: resettable.email });
  problem = (await must(mainCookie, 'post', '/api/systems/build', strike(12))).problem as Json;
}, 60_000);

afterAll(async () => {
  await t?.close();
});

function writeRoutes(): RouteEntry[] {
  return listRoutes(t.app).filter((r) => r.path.startsWith('/api') && WRITE_METHODS.has(r.method));
}

const keyOf = (r: RouteEntry) => `${r.method} ${r.path}`;

function paramNames(route: RouteEntry): string[] {
  return [...route.path.matchAll(/:(\w+)/g)].map((m) => m[1] as string);
}

function fill(route: RouteEntry, values: string[]): string {
  let i = 0;
  return route.path.replace(/:(\w+)/g, () => values[i++] as string);
}

/** The URL with real ids (malformed ones where the route has none made here). */
function realUrlArb(route: RouteEntry): fc.Arbitrary<string> {
  const names = paramNames(route);
  if (names.length === 0) return fc.constant(route.path);
  return fc.tuple(...names.map((n) => {
    const values = real[keyOf(route)]?.[n] ?? [];
    return values.length > 0 ? fc.constantFrom(...values) : malformedIdArb;
  })).map((vals) => fill(route, vals));
}

/** The URL with malformed ids. */
function malformedUrlArb(route: RouteEntry): fc.Arbitrary<string> {
  const names = paramNames(route);
  if (names.length === 0) return fc.constant(route.path);
  return fc.tuple(...names.map(() => malformedIdArb)).map((vals) => fill(route, vals));
}

/** The first real URL of a route. */
function realUrl(route: RouteEntry): string {
  return route.path.replace(/:(\w+)/g, (_m, n: string) => real[keyOf(route)]?.[n]?.[0] ?? '00000000-0000-4000-8000-00000000beef');
}

/**
 * Who sends: the open auth routes as nobody (a mailed link or sign-in page; a success there
 * starts a session, which must not replace this person's); the two sign-outs with a session of
 * their own each time; every other route as the person with every role.
 */
async function cookieFor(route: RouteEntry): Promise<string | null> {
  if (route.path === '/api/auth/sign-out' || route.path === '/api/me/sign-out-everywhere') return newLeaverSession();
  if (route.path.startsWith('/api/auth/')) return null;
  return mainCookie;
}

function tally(route: RouteEntry, status: number): void {
  const key = keyOf(route);
  const m = answers.get(key) ?? new Map<number, number>();
  m.set(status, (m.get(status) ?? 0) + 1);
  answers.set(key, m);
}

type Payload = { contentType?: string; encoding?: string; body: string | Buffer };
type Case = { url: string; payload: Payload; namesKnownField: boolean };

async function send(route: RouteEntry, url: string, payload: Payload) {
  const m = route.method.toLowerCase() as 'post' | 'patch' | 'put' | 'delete';
  let req = request(t.server)[m](url).set('Origin', t.origin);
  const cookie = await cookieFor(route);
  if (cookie) req = req.set('Cookie', cookie);
  if (payload.contentType) req = req.set('Content-Type', payload.contentType);
  if (payload.encoding) req = req.set('Content-Encoding', payload.encoding);
  const res = await req.send(payload.body);
  tally(route, res.status);
  return res;
}

/** Sends one case; returns what is wrong with the answer, or null. */
async function check(route: RouteEntry, c: Case, label = ''): Promise<string | null> {
  const res = await send(route, c.url, c.payload);
  const problem = answerProblem({ status: res.status, body: res.body, text: res.text }, { route: keyOf(route), url: c.url, what: label, namesKnownField: c.namesKnownField });
  return problem ? `${route.method} ${c.url.slice(0, 100)} ${label || brief(c.payload.body)} -> ${problem}` : null;
}

const json = (url: string, body: FuzzBody): Case => ({ url, payload: { contentType: 'application/json', body: body.text }, namesKnownField: body.namesKnownField });

/** Runs a property of cases against one route; the failure text (fast-check's shrunk case) or null. */
async function fuzzRoute(route: RouteEntry, arb: fc.Arbitrary<Case>, numRuns: number): Promise<string | null> {
  try {
    await fc.assert(
      fc.asyncProperty(arb, async (c) => {
        const problem = await check(route, c);
        if (problem) throw new Error(problem);
      }),
      { numRuns: Math.max(1, Math.round(numRuns * SCALE)), seed: SEED },
    );
    return null;
  } catch (err) {
    const msg = err instanceof Error ? err.message : String(err);
    const cause = err instanceof Error && err.cause instanceof Error ? err.cause.message : msg;
    const seed = /\{ seed: [^}]*\}/.exec(msg)?.[0] ?? '';
    return `${keyOf(route)}: ${seed} ${cause.slice(0, 900)}`;
  }
}

/** Runs `work` for each route, CONCURRENCY routes at a time; the failures of all of them. */
async function eachRoute(routes: RouteEntry[], work: (route: RouteEntry) => Promise<string[]>): Promise<string[]> {
  const failures: string[] = [];
  const queue = [...routes];
  await Promise.all(
    Array.from({ length: CONCURRENCY }, async () => {
      for (let route = queue.shift(); route; route = queue.shift()) failures.push(...(await work(route)));
    }),
  );
  return failures.sort();
}

/** An even spread of at most `max` items. */
function spread<T>(items: T[], max: number): T[] {
  if (items.length <= max) return items;
  return Array.from({ length: max }, (_, i) => items[Math.floor((i * items.length) / max)] as T);
}

const CSV_COLUMNS_OF: Record<string, Record<string, string>> = {
  'POST /api/constants/import': { kind: 'beta', reaction: 'Cd+2 + 2 Br- = CdBr2', log_value: '2.9', uncertainty: '0.1', temperature_c: '25', ionic_strength: '0', medium: 'NaClO4', enthalpy_kj_mol: '', source: SOURCE, note: 'fuzz' },
  'POST /api/baths/:id/analyses/import': { sampled_at: '2026-11-20', analyst: 'F. Uzz', metal: '4.1', metal_unit: 'g/L', free_ligand: '110', free_ligand_unit: 'g/L', total_ligand: '', ph: '12.1', carbonate: '40', carbonate_unit: 'g/L', notes: 'weekly' },
};

/** Well-formed uploads with hostile content for an upload route, or garbage multipart. */
function uploadArb(route: RouteEntry): fc.Arbitrary<Case> {
  const columns = CSV_COLUMNS_OF[keyOf(route)];
  const parts: fc.Arbitrary<Part[]> = columns ? csvPartsArb(columns) : attachmentPartsArb;
  const wellFormed = fc.record({ url: realUrlArb(route), parts }).map(({ url, parts: p }) => ({ url, multipart: multipartBody(p) }));
  const garbage = fc.record({ url: fc.oneof(realUrlArb(route), malformedUrlArb(route)), multipart: multipartArb });
  return fc.oneof({ weight: 3, arbitrary: wellFormed }, { weight: 2, arbitrary: garbage }).map(({ url, multipart }) => ({ url, payload: multipart, namesKnownField: true }));
}

const UPLOAD_ROUTES = Object.keys(CSV_COLUMNS_OF).concat('POST /api/baths/:id/attachments');

describe('bad input on every write route', () => {
  const prototypeKeys = () => [Object.getOwnPropertyNames(Object.prototype).sort(), Object.getOwnPropertyNames(Array.prototype).sort()];
  let before: string[][] = [];
  beforeAll(() => {
    before = prototypeKeys();
  });

  it('lists the write routes, each with a template where one is known', () => {
    const keys = writeRoutes().map(keyOf);
    expect(keys.length).toBeGreaterThan(30);
    // A template (or an upload's columns) for a route that no longer exists is a stale line here.
    expect([...Object.keys(templates({})), ...UPLOAD_ROUTES].filter((k) => !keys.includes(k))).toEqual([]);
  });

  it('answers the worst value in each field, and each malformed id, with a 4xx naming the field', async () => {
    const all = templates(problem);
    const failures = await eachRoute(writeRoutes(), async (route) => {
      const template = all[keyOf(route)] ?? {};
      const out: string[] = [];
      for (const body of spread(worstBodies(template), WORST_MAX)) {
        const failure = await check(route, json(realUrl(route), body));
        if (failure) out.push(failure);
      }
      if (paramNames(route).length > 0) {
        const valid = { text: JSON.stringify(template), namesKnownField: namesKnownField(template, template) };
        for (const id of MALFORMED_IDS) {
          const failure = await check(route, json(fill(route, paramNames(route).map(() => id)), valid));
          if (failure) out.push(failure);
        }
      }
      return out;
    });
    expect(failures).toEqual([]);
  }, 120_000);

  it('answers malformed JSON bodies with a 4xx naming the field, never a 5xx', async () => {
    const all = templates(problem);
    const failures = await eachRoute(writeRoutes(), async (route) => {
      const body = bodyArb(all[keyOf(route)] ?? {});
      // Mostly one thing wrong at a time: a bad body to a real row, or a good one to a bad id.
      const arb = fc.oneof(
        { weight: 4, arbitrary: fc.tuple(realUrlArb(route), body) },
        { weight: 1, arbitrary: fc.tuple(malformedUrlArb(route), body) },
      );
      const failure = await fuzzRoute(route, arb.map(([url, b]) => json(url, b)), RUNS[keyOf(route)] ?? RUNS_DEFAULT);
      return failure ? [failure] : [];
    });
    expect(failures).toEqual([]);
  }, 180_000);

  it('answers bodies that are not JSON, or not sent as JSON, with a 4xx (invalid JSON: 400 invalid_json)', async () => {
    const failures = await eachRoute(writeRoutes(), async (route) => {
      const out: string[] = [];
      for (const raw of RAW_BODIES) {
        const url = realUrl(route);
        const res = await send(route, url, raw);
        const problem = answerProblem({ status: res.status, body: res.body, text: res.text }, { route: keyOf(route), url, what: raw.name, namesKnownField: false });
        if (problem) out.push(`${keyOf(route)} with ${raw.name}: ${problem}`);
        else if (raw.expectInvalidJson && (res.status !== 400 || res.body.error?.code !== 'invalid_json')) {
          out.push(`${keyOf(route)} with ${raw.name}: ${res.status} ${res.body.error?.code}, not 400 invalid_json`);
        }
      }
      return out;
    });
    expect(failures).toEqual([]);
  }, 120_000);

  it('answers hostile uploads and broken multipart bodies with a 4xx naming the field', async () => {
    const routes = writeRoutes().filter((r) => UPLOAD_ROUTES.includes(keyOf(r)));
    expect(routes.map(keyOf).sort()).toEqual([...UPLOAD_ROUTES].sort());
    const failures = await eachRoute(routes, async (route) => {
      const failure = await fuzzRoute(route, uploadArb(route), MULTIPART_RUNS);
      return failure ? [failure] : [];
    });
    expect(failures).toEqual([]);
  }, 120_000);

  it('reached every handler as the person with every role, and polluted no prototype', async () => {
    const me = await must(mainCookie, 'get', '/api/me');
    expect([...(me.roles as string[])].sort()).toEqual([...ROLES].sort());
    // Each route answered something besides 401, 403 and 404 at least once: the bodies got past
    // the access check and the ids, to the handler's own checks.
    const unreached = writeRoutes()
      .map(keyOf)
      .filter((k) => ![...(answers.get(k)?.keys() ?? [])].some((s) => ![401, 403, 404].includes(s)));
    expect(unreached).toEqual([]);
    expect(prototypeKeys()).toEqual(before);
    expect(({} as Record<string, unknown>).admin).toBeUndefined();
    if (process.env.LIGANDRY_FUZZ_REPORT === '1') {
      const total = [...answers.values()].reduce((n, m) => n + [...m.values()].reduce((a, b) => a + b, 0), 0);
      const lines = [...answers].sort().map(([k, m]) => `${k.padEnd(48)} ${[...m].sort((a, b) => a[0] - b[0]).map(([s, n]) => `${s}x${n}`).join(' ')}`);
      // eslint-disable-next-line no-console
      console.log(`${total} requests\n${lines.join('\n')}`);
    }
  });
});
