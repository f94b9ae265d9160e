// Faults: PostgreSQL stopped (immediate mode, as a crash) under a steady stream of requests and
// started again, and uploads that fail half-way. The file runs its own throwaway cluster, so the
// shared test server keeps serving the other files that run beside it.
import fs from 'node:fs';
import http from 'node:http';

import { eq } from 'drizzle-orm';
import request from 'supertest';

import { ensureDatabase } from '@/db/ensure-database';
import { runMigrations } from '@/db/migrate';
import { analyses, attachments } from '@/db/schema';
import { startTestServer, type TestServer } from '../support/test-server';
import { startThrowawayPg, type ThrowawayPg } from '../support/throwaway-pg';
import { createUser, signIn, TEST_PASSWORD } from '../support/users';

jest.setTimeout(60_000);

/** The longest any one request may take, database up or down, in milliseconds. */
const REQUEST_DEADLINE_MS = 5_000;
/** How long the API may take to answer again once PostgreSQL accepts connections, in milliseconds. */
const RECOVERY_LIMIT_MS = 15_000;

let pg: ThrowawayPg | undefined;
let t: TestServer;
let chemist: request.Agent;
let chemistEmail: string;
// The app runs in this process: anything it throws outside a request lands here.
const strayErrors: unknown[] = [];
const onStray = (err: unknown) => strayErrors.push(err);

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

beforeAll(async () => {
  process.on('unhandledRejection', onStray);
  process.on('uncaughtException', onStray);
  pg = await startThrowawayPg();
  // As the server project's global setup does, then startTestServer loads the starting library.
  const url = pg.url('ligandry_faults');
  await ensureDatabase(url);
  await runMigrations(url);
  t = await startTestServer({ dbUrl: url });
  const person = await createUser(t.db.db, { roles: ['chemist'], name: 'Faults chemist' });
  chemistEmail = person.email;
  chemist = t.agent();
  await signIn(chemist, person.email);
});

afterAll(async () => {
  process.off('unhandledRejection', onStray);
  process.off('uncaughtException', onStray);
  try {
    if (t) await t.close();
  } finally {
    await pg?.destroy();
  }
});

/** What one request came to: a status, or `timeout` / `error` when no answer arrived. */
type Outcome = { kind: string; status: number | 'timeout' | 'error'; code?: string; message?: string; id?: string; started: number; ended: number };

/** Sends one request with the deadline and records what came back (never throws). */
async function outcome(kind: string, req: request.Test): Promise<Outcome> {
  const started = Date.now();
  try {
    const res = await req.timeout({ deadline: REQUEST_DEADLINE_MS });
    const body = res.body as { id?: string; error?: { code?: string; message?: string } };
    return { kind, status: res.status, code: body?.error?.code, message: body?.error?.message, id: body?.id, started, ended: Date.now() };
  } catch (err) {
    const timedOut = (err as { timeout?: number }).timeout !== undefined;
    return { kind, status: timedOut ? 'timeout' : 'error', message: String(err), started, ended: Date.now() };
  }
}

const isDbUnavailable = (o: Outcome) => o.status === 503 && o.code === 'db_unavailable' && /database/i.test(o.message ?? '');

async function createBath(name: string): Promise<string> {
  const res = await chemist.post('/api/baths').send({ name, process: 'thiosulfate_fixer', volume: 60 });
  if (res.status !== 201) throw new Error(`bath not created: ${JSON.stringify(res.body)}`);
  return res.body.id as string;
}

/** Polls until the API answers a health check and a signed-in read again; returns when it did. */
async function waitForRecovery(): Promise<number> {
  const until = Date.now() + RECOVERY_LIMIT_MS;
  for (;;) {
    const health = await outcome('health', request(t.server).get('/api/health'));
    const read = health.status === 200 ? await outcome('read', chemist.get('/api/baths')) : health;
    if (read.status === 200) return Date.now();
    if (Date.now() > until) throw new Error(`the API did not recover within ${RECOVERY_LIMIT_MS} ms: ${JSON.stringify(read)}`);
    await sleep(100);
  }
}

// An invented cyanide silver bath for the calculator requests (as in calculations.test.ts).
const silver = { metals: ['Ag+'], ligands: ['CN-'], counterIons: ['K+'], totals: { 'Ag+': 0.3, 'CN-': 1.0, 'K+': 1.0 }, pH: 12, activity: 'ideal' };

describe('PostgreSQL stopped under traffic', () => {
  it('PostgreSQL stops during traffic and starts again', async () => {
    const bathId = await createBath('Faults fixer, tank 1');
    const outcomes: Outcome[] = [];
    let running = true;
    let n = 0;
    // Distinct sampling times a minute apart, a month back, so none is in the future.
    const firstSample = Date.now() - 30 * 24 * 3600 * 1000;
    const senders: Record<string, () => request.Test> = {
      'add analysis': () => {
        n += 1;
        return chemist.post(`/api/baths/${bathId}/analyses`).send({ sampledAt: new Date(firstSample + n * 60_000).toISOString(), analyst: 'Fault drill', pH: 7, bromide: { value: 3 } });
      },
      'list baths': () => chemist.get('/api/baths'),
      calculate: () => chemist.post('/api/calculations').send({ calculator: 'speciation', system: silver }),
      'save run': () => chemist.post('/api/runs').send({ title: 'Fault drill', calculator: 'speciation', system: silver }),
    };
    const streams = Object.entries(senders).map(async ([kind, send]) => {
      while (running) {
        outcomes.push(await outcome(kind, send()));
        await sleep(20);
      }
    });

    let down = 0;
    let startAsked = 0;
    let up = 0;
    let recovered = 0;
    let healthDown: request.Response;
    try {
      await sleep(1_000);
      await pg?.stop('immediate');
      down = Date.now();
      await sleep(500);
      healthDown = await request(t.server).get('/api/health').timeout({ deadline: REQUEST_DEADLINE_MS });
      await sleep(1_500);
      startAsked = Date.now();
      await pg?.start();
      up = Date.now();
      recovered = await waitForRecovery();
      await sleep(1_000);
    } finally {
      running = false;
      await Promise.all(streams);
    }
    const healthUp = await request(t.server).get('/api/health').timeout({ deadline: REQUEST_DEADLINE_MS });

    // Every answer is a success or a JSON 503 db_unavailable: no 500, no hang, no dropped connection.
    const odd = outcomes.filter((o) => !(o.status === 200 || o.status === 201 || isDbUnavailable(o)));
    expect(odd).toEqual([]);
    // Requests made wholly while the server was down are all 503, for every kind of request.
    const duringOutage = outcomes.filter((o) => o.started >= down && o.ended <= startAsked);
    for (const kind of Object.keys(senders)) expect(duringOutage.filter((o) => o.kind === kind).length).toBeGreaterThan(0);
    expect(duringOutage.filter((o) => !isDbUnavailable(o))).toEqual([]);
    // And every request made after the recovery succeeds again, with no server restart.
    expect(outcomes.filter((o) => o.started >= recovered && o.status !== 200 && o.status !== 201)).toEqual([]);
    for (const kind of Object.keys(senders)) expect(outcomes.some((o) => o.kind === kind && o.started >= up && (o.status === 200 || o.status === 201))).toBe(true);

    expect(healthDown.status).toBe(503);
    expect(healthDown.body).toMatchObject({ status: 'degraded', db: 'down' });
    expect(healthUp.status).toBe(200);
    expect(healthUp.body).toMatchObject({ status: 'ok', db: 'up' });

    // No acknowledged write is lost.
    const acknowledged = outcomes.filter((o) => o.kind === 'add analysis' && o.status === 201).map((o) => o.id);
    expect(acknowledged.length).toBeGreaterThan(0);
    const log = await chemist.get(`/api/baths/${bathId}/analyses`);
    expect(log.status).toBe(200);
    const stored = new Set((log.body as { id: string }[]).map((a) => a.id));
    expect(acknowledged.filter((id) => !stored.has(id as string))).toEqual([]);

    expect(t.server.listening).toBe(true);
    expect(strayErrors).toEqual([]);
  });
});

// A multipart body sent by hand, so it can be sent in two halves or cut off.
function multipartBody(fields: Record<string, string>, file: { name: string; type: string; data: Buffer }) {
  const boundary = `----ligandry-faults-${Date.now().toString(36)}`;
  const parts = Object.entries(fields).map(([k, v]) => `--${boundary}\r\nContent-Disposition: form-data; name="${k}"\r\n\r\n${v}\r\n`);
  const head = Buffer.from(`${parts.join('')}--${boundary}\r\nContent-Disposition: form-data; name="file"; filename="${file.name}"\r\nContent-Type: ${file.type}\r\n\r\n`, 'latin1');
  const tail = Buffer.from(`\r\n--${boundary}--\r\n`, 'latin1');
  return { contentType: `multipart/form-data; boundary=${boundary}`, body: Buffer.concat([head, file.data, tail]) };
}

/** A POST whose body goes out in pieces: `send` more, `finish` with the rest, or `abort` the socket. */
function slowPost(path: string, cookie: string, contentType: string, body: Buffer) {
  const req = http.request({
    host: '127.0.0.1',
    port: (t.server.address() as { port: number }).port,
    method: 'POST',
    path,
    headers: { 'Content-Type': contentType, 'Content-Length': String(body.length), Cookie: cookie, Origin: t.origin },
  });
  const answer = new Promise<{ status: number; body: { error?: { code?: string } } }>((resolve, reject) => {
    req.on('response', (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode ?? 0, body: JSON.parse(Buffer.concat(chunks).toString('utf8') || '{}') }));
    });
    req.on('error', reject);
    req.setTimeout(REQUEST_DEADLINE_MS, () => req.destroy(new Error('no answer in time')));
  });
  answer.catch(() => undefined);
  let sent = 0;
  return {
    answer,
    send: (bytes: number) => {
      req.write(body.subarray(sent, sent + bytes));
      sent += bytes;
    },
    finish: () => req.end(body.subarray(sent)),
    abort: () => req.destroy(),
  };
}

/** A session cookie for the chemist, for requests sent without supertest. */
async function sessionCookie(): Promise<string> {
  const res = await request(t.server).post('/api/auth/sign-in').set('Origin', t.origin).send({ email: chemistEmail, password: TEST_PASSWORD });
  const cookies = res.headers['set-cookie'] as unknown as string[];
  return cookies.map((c) => c.split(';')[0]).join('; ');
}

describe('uploads that fail half-way', () => {
  const pdf = Buffer.concat([Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\n', 'latin1'), Buffer.alloc(200_000, 0x20), Buffer.from('\ntrailer << /Root 1 0 R >>\n%%EOF\n', 'latin1')]);
  const csv = ['sampled_at,analyst,ph,bromide,notes', '2026-10-01,T. Okafor,6.9,3.0,weekly', '2026-10-08,T. Okafor,7.0,3.1,'].join('\n');

  it('an upload that fails half-way leaves nothing behind', async () => {
    const bathId = await createBath('Faults fixer, tank 2');
    const cookie = await sessionCookie();
    // The temporary file of an attachment shows up in the folder and goes again: watch for it.
    const seen: string[] = [];
    const watcher = fs.watch(t.uploadsDir, (_event, name) => {
      if (name) seen.push(String(name));
    });
    try {
      // Both uploads pass the sign-in check with the database up; it stops before their bodies end.
      const attachment = multipartBody({ title: 'Assay, cut off' }, { name: 'assay.pdf', type: 'application/pdf', data: pdf });
      const upload = slowPost(`/api/baths/${bathId}/attachments`, cookie, attachment.contentType, attachment.body);
      upload.send(Math.floor(attachment.body.length / 2));
      const table = multipartBody({ mode: 'all' }, { name: 'results.csv', type: 'text/csv', data: Buffer.from(csv, 'utf8') });
      const importing = slowPost(`/api/baths/${bathId}/analyses/import`, cookie, table.contentType, table.body);
      importing.send(40);
      await sleep(750);
      await pg?.stop('immediate');
      upload.finish();
      importing.finish();
      expect(await upload.answer).toMatchObject({ status: 503, body: { error: { code: 'db_unavailable' } } });
      expect(await importing.answer).toMatchObject({ status: 503, body: { error: { code: 'db_unavailable' } } });
      // The attachment got as far as its temporary file, which is gone again.
      expect(seen.some((name) => name.endsWith('.part'))).toBe(true);

      // Whole uploads sent while the database is down are refused the same way.
      const whole = await outcome('attach', chemist.post(`/api/baths/${bathId}/attachments`).attach('file', pdf, { filename: 'assay.pdf', contentType: 'application/pdf' }));
      const wholeCsv = await outcome('import', chemist.post(`/api/baths/${bathId}/analyses/import`).attach('file', Buffer.from(csv, 'utf8'), { filename: 'results.csv', contentType: 'text/csv' }));
      expect([whole, wholeCsv].filter((o) => !isDbUnavailable(o))).toEqual([]);
      expect(fs.readdirSync(t.uploadsDir)).toEqual([]);

      await pg?.start();
      await waitForRecovery();
      expect(await t.db.db.select().from(attachments).where(eq(attachments.bathId, bathId))).toEqual([]);
      expect(await t.db.db.select().from(analyses).where(eq(analyses.bathId, bathId))).toEqual([]);
      expect((await chemist.get(`/api/baths/${bathId}/attachments`)).body).toEqual([]);

      // A client that hangs up half-way through a large body leaves no file either.
      const large = multipartBody({ title: 'Scan, abandoned' }, { name: 'scan.pdf', type: 'application/pdf', data: Buffer.concat([pdf, Buffer.alloc(6_000_000, 0x20)]) });
      const abandoned = slowPost(`/api/baths/${bathId}/attachments`, cookie, large.contentType, large.body);
      abandoned.send(2_000_000);
      await sleep(300);
      abandoned.abort();
      await expect(abandoned.answer).rejects.toThrow();
      await sleep(300);
      expect(fs.readdirSync(t.uploadsDir)).toEqual([]);
      expect(await t.db.db.select().from(attachments).where(eq(attachments.bathId, bathId))).toEqual([]);

      // And the same upload, sent whole, still works: one row, one file, no temporary file.
      const res = await chemist.post(`/api/baths/${bathId}/attachments`).attach('file', pdf, { filename: 'assay.pdf', contentType: 'application/pdf' });
      expect(res.status).toBe(201);
      expect(fs.readdirSync(t.uploadsDir)).toEqual([`${res.body.id}.pdf`]);
      expect(strayErrors).toEqual([]);
    } finally {
      watcher.close();
    }
  });
});
