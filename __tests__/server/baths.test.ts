// Baths through the API: records and their checks, archiving, the analysis log in shop units,
// CSV upload with its per-row report, and attachments (type, size, download, nothing left behind).
import fs from 'node:fs';

import { eq } from 'drizzle-orm';
import type request from 'supertest';

import { auditLog, baths } from '@/db/schema';
import { startTestServer, type TestServer } from '../support/test-server';
import { createUser, signIn } from '../support/users';

let t: TestServer;
let chemist: request.Agent;
let technician: request.Agent;
let reviewer: request.Agent;
let admin: request.Agent;

beforeAll(async () => {
  t = await startTestServer();
  const people = await Promise.all(
    (['chemist', 'technician', 'reviewer', 'admin'] as const).map((role) => createUser(t.db.db, { roles: [role], name: `Baths ${role}` })),
  );
  const agents = people.map(() => t.agent());
  await Promise.all(people.map((p, i) => signIn(agents[i] as request.Agent, p.email)));
  [chemist, technician, reviewer, admin] = agents as [request.Agent, request.Agent, request.Agent, request.Agent];
});

afterAll(async () => {
  await t.close();
});

const silverBath = {
  name: 'Test silver, tank 9',
  process: 'cyanide_silver_plate',
  volume: 300,
  volumeUnit: 'gal',
  temperatureC: 24,
  makeUp: [
    { salt: 'KCN', amount: 120, unit: 'g/L' },
    { salt: 'potassium silver cyanide', amount: 55, unit: 'g/L' },
  ],
  metalUnit: 'troy oz/gal',
  targets: { metal: { min: 3.5, max: 4.5 }, freeLigand: { min: 90, max: 130 }, pH: { min: 11.5, max: 12.5 } },
  site: 'Test site',
};

async function createBath(body: Record<string, unknown> = silverBath) {
  const res = await chemist.post('/api/baths').send(body);
  if (res.status !== 201) throw new Error(`bath not created: ${JSON.stringify(res.body)}`);
  return res.body as { id: string; volumeL: number; makeUp: { salt: string }[]; ligandAs: string; metal: string };
}

describe('bath records', () => {
  it('creates a bath with process defaults, names salts by formula and keeps litres beside gallons', async () => {
    const bath = await createBath();
    // 300 US gal x 3.785411784 L/gal (exact by definition) = 1135.6235352 L.
    expect(bath.volumeL).toBeCloseTo(1135.6235352, 6);
    expect(bath).toMatchObject({ metal: 'Ag+', ligand: 'CN-', ligandAs: 'KCN', metalUnit: 'troy oz/gal', ligandUnit: 'g/L', carbonateAs: 'K2CO3', extras: ['carbonate'], status: 'active' });
    expect(bath.makeUp.map((l) => l.salt)).toEqual(['KCN', 'K[Ag(CN)2]']);
  });

  it('lets chemists and technicians create baths, and no one else', async () => {
    const fixer = { name: 'Test fixer', process: 'thiosulfate_fixer', volume: 80 };
    expect((await technician.post('/api/baths').send(fixer)).status).toBe(201);
    expect((await reviewer.post('/api/baths').send(fixer)).status).toBe(403);
    expect((await admin.post('/api/baths').send(fixer)).status).toBe(403);
  });

  it('names the field to fix', async () => {
    const paths = async (body: Record<string, unknown>) => {
      const res = await chemist.post('/api/baths').send(body);
      expect(res.status).toBe(400);
      return (res.body.error.details as { path: string }[]).map((d) => d.path);
    };
    expect(await paths({ ...silverBath, process: 'chrome' })).toEqual(['process']);
    expect(await paths({ ...silverBath, volume: -1 })).toEqual(['volume']);
    expect(await paths({ ...silverBath, targets: { metal: { min: 5, max: 4 } } })).toEqual(['targets.metal.max']);
    expect(await paths({ ...silverBath, makeUp: [{ salt: 'unobtainium salt', amount: 1, unit: 'g/L' }] })).toEqual(['makeUp.0.salt']);
    expect(await paths({ ...silverBath, ligandAs: 'NH3' })).toEqual(['ligandAs']);
    expect(await paths({ ...silverBath, name: '' })).toEqual(['name']);
  });

  it('edits, records what changed, and only admins archive and restore', async () => {
    const bath = await createBath({ ...silverBath, name: 'Test silver, tank 10' });
    const edited = await technician.patch(`/api/baths/${bath.id}`).send({ targets: { ...silverBath.targets, pH: { min: 11.8, max: 12.6 } } });
    expect(edited.status).toBe(200);
    expect(edited.body.targets.pH).toEqual({ min: 11.8, max: 12.6 });
    const [entry] = await t.db.db.select().from(auditLog).where(eq(auditLog.action, 'bath.updated'));
    expect(entry?.payload).toMatchObject({ changes: { targets: { from: { pH: { min: 11.5 } }, to: { pH: { min: 11.8 } } } } });
    // A PATCH of one field leaves the others as they were.
    const renamed = await chemist.patch(`/api/baths/${bath.id}`).send({ name: 'Test silver, tank 10b' });
    expect(renamed.body).toMatchObject({ name: 'Test silver, tank 10b', volumeUnit: 'gal', site: 'Test site', temperatureC: 24, targets: { pH: { min: 11.8, max: 12.6 } } });
    expect(renamed.body.makeUp).toHaveLength(2);

    expect((await chemist.post(`/api/baths/${bath.id}/archive`)).status).toBe(403);
    const archived = await admin.post(`/api/baths/${bath.id}/archive`);
    expect(archived.body).toMatchObject({ status: 'archived' });
    expect((await chemist.get('/api/baths')).body.map((b: { id: string }) => b.id)).not.toContain(bath.id);
    expect((await chemist.get('/api/baths').query({ status: 'all' })).body.map((b: { id: string }) => b.id)).toContain(bath.id);
    expect((await chemist.patch(`/api/baths/${bath.id}`).send({ name: 'x' })).status).toBe(409);
    expect((await admin.post(`/api/baths/${bath.id}/restore`)).body).toMatchObject({ status: 'active', archivedAt: null });
    await expect(t.db.db.delete(baths).where(eq(baths.id, bath.id))).rejects.toThrow();
  });

  it('searches and filters the list', async () => {
    await createBath({ ...silverBath, name: 'Searchable gold', process: 'gold_strike', metalUnit: 'g/L' });
    const byWord = await reviewer.get('/api/baths').query({ q: 'searchable' });
    expect(byWord.body.map((b: { name: string }) => b.name)).toEqual(['Searchable gold']);
    const byProcess = await reviewer.get('/api/baths').query({ process: 'gold_strike' });
    expect(byProcess.body.every((b: { process: string }) => b.process === 'gold_strike')).toBe(true);
    expect((await reviewer.get('/api/baths').query({ process: 'chrome' })).status).toBe(400);
    expect((await reviewer.get('/api/baths/not-a-bath')).status).toBe(404);
  });
});

describe('the analysis log', () => {
  it('stores results in mol/L from shop units and flags what is out of range', async () => {
    const bath = await createBath({ ...silverBath, name: 'Test silver, tank 11' });
    const res = await technician.post(`/api/baths/${bath.id}/analyses`).send({
      sampledAt: '2026-11-20',
      analyst: 'R. Obi',
      metal: { value: 4.0 },
      freeLigand: { value: 80, unit: 'g/L' },
      pH: 12.1,
      carbonate: { value: 45 },
    });
    expect(res.status).toBe(201);
    // 4.0 troy oz/gal: 4 x 31.1034768 g / 3.785411784 L = 32.8665 g/L; / 107.8682 g/mol (Ag, IUPAC) = 0.304693 mol/L.
    expect(res.body.values.metal).toBeCloseTo(0.304693, 5);
    // 80 g/L KCN / 65.1163 g/mol (K 39.0983 + C 12.011 + N 14.007) = 1.228571 mol/L of cyanide.
    expect(res.body.values.freeLigand).toBeCloseTo(1.228571, 5);
    expect(res.body.entered.metal).toEqual({ value: 4, unit: 'troy oz/gal' });
    expect(res.body.sampledAt).toBe('2026-11-20T12:00:00.000Z');
    expect(res.body.outOfRange).toEqual([{ quantity: 'freeLigand', value: expect.closeTo(80, 9), side: 'below' }]);

    const list = await reviewer.get('/api/baths').query({ q: 'tank 11' });
    expect(list.body[0]).toMatchObject({ analysisCount: 1, lastAnalysisAt: '2026-11-20T12:00:00.000Z', outOfRange: [{ quantity: 'freeLigand', side: 'below' }] });
    expect(list.body[0].lastAnalysisAgeDays).toBeGreaterThanOrEqual(0);
  });

  it('refuses what the bath does not log, a future date, free above total, and other roles', async () => {
    const fixer = (await technician.post('/api/baths').send({ name: 'Test fixer 2', process: 'thiosulfate_fixer', volume: 50 })).body as { id: string };
    const path = `/api/baths/${fixer.id}/analyses`;
    const carbonate = await technician.post(path).send({ sampledAt: '2026-11-20', analyst: 'A', carbonate: { value: 3 } });
    expect(carbonate.status).toBe(400);
    expect(carbonate.body.error.details[0].path).toBe('carbonate');
    const future = await technician.post(path).send({ sampledAt: '2099-01-01', analyst: 'A', pH: 5 });
    expect(future.body.error.details[0]).toEqual({ path: 'sampledAt', message: 'is in the future' });
    const upside = await technician.post(path).send({ sampledAt: '2026-11-20', analyst: 'A', freeLigand: { value: 200 }, totalLigand: { value: 100 } });
    expect(upside.body.error.details[0].path).toBe('freeLigand');
    const badDate = await technician.post(path).send({ sampledAt: '20/11/2026', analyst: 'A', pH: 5 });
    expect(badDate.body.error.details[0]).toEqual({ path: 'sampledAt', message: 'give the date of sampling as YYYY-MM-DD, or a date and time such as 2026-11-20T09:30:00Z' });
    const nothing = await technician.post(path).send({ sampledAt: '2026-11-20', analyst: 'A' });
    expect(nothing.status).toBe(400);
    expect((await reviewer.post(path).send({ sampledAt: '2026-11-20', analyst: 'A', pH: 5 })).status).toBe(403);
    expect((await reviewer.get(path)).status).toBe(200);
  });
});

describe('analysis CSV upload', () => {
  function upload(agent: request.Agent, bathId: string, csv: string, mode?: string, name = 'results.csv') {
    const req = agent.post(`/api/baths/${bathId}/analyses/import`);
    if (mode) req.field('mode', mode);
    return req.attach('file', Buffer.from(csv, 'utf8'), { filename: name, contentType: 'text/csv' });
  }

  const file = [
    'sampled_at,analyst,metal,metal_unit,free_ligand,ph,bromide,notes',
    '2026-10-01,T. Okafor,4.1,g/L,150,6.4,3.0,weekly',
    '2026-10-08,T. Okafor,5.2,g/L,145,high,3.1,',
    '2026-10-15,T. Okafor,6.0,gallons,140,6.5,3.3,',
    '2026-10-22,T. Okafor,6.6,g/L,138,6.6,3.4,"note, with comma"',
  ].join('\n');

  it('writes nothing with one bad row, reports row and column; imports the valid rows when asked; no duplicates', async () => {
    const fixer = (await technician.post('/api/baths').send({ name: 'Test fixer 3', process: 'thiosulfate_fixer', volume: 60 })).body as { id: string };
    const all = await upload(technician, fixer.id, file);
    expect(all.status).toBe(422);
    expect(all.body.error.details.problems).toEqual([
      { row: 3, column: 'ph', message: '"high" is not a number' },
      { row: 4, column: 'metal_unit', message: '"gallons" is not a unit here; use mol/L, mmol/L, g/L, mg/L, troy oz/gal, oz/gal' },
    ]);
    expect((await technician.get(`/api/baths/${fixer.id}/analyses`)).body).toEqual([]);

    const valid = await upload(technician, fixer.id, file, 'valid');
    expect(valid.status).toBe(200);
    expect(valid.body).toMatchObject({ rows: 4, created: 2, rejected: 2, written: true });
    const log = (await technician.get(`/api/baths/${fixer.id}/analyses`)).body as { notes: string; source: string; values: { metal: number } }[];
    expect(log.map((a) => a.notes)).toEqual(['weekly', 'note, with comma']);
    expect(log.every((a) => a.source === 'csv')).toBe(true);
    // 4.1 g/L Ag / 107.8682 g/mol = 0.0380093 mol/L.
    expect(log[0]?.values.metal).toBeCloseTo(0.0380093, 6);

    const again = await upload(technician, fixer.id, file, 'valid');
    expect(again.body.created).toBe(0);
    expect(again.body.problems.filter((p: { message: string }) => /already in the log/.test(p.message))).toHaveLength(2);
  });

  it('reports a missing column and refuses a file that is not CSV', async () => {
    const fixer = (await technician.post('/api/baths').send({ name: 'Test fixer 4', process: 'thiosulfate_fixer', volume: 60 })).body as { id: string };
    const missing = await upload(technician, fixer.id, 'date,metal\n2026-10-01,3\n');
    expect(missing.status).toBe(422);
    expect(missing.body.error.details.problems[0]).toEqual({ row: 1, column: null, message: 'the header row lacks the columns sampled_at, analyst' });
    expect((await upload(technician, fixer.id, '%PDF-1.4', undefined, 'scan.pdf')).status).toBe(415);
    expect((await upload(reviewer, fixer.id, file)).status).toBe(403);
  });
});

describe('attachments', () => {
  const pdf = Buffer.from('%PDF-1.4\n1 0 obj << /Type /Catalog >> endobj\ntrailer << /Root 1 0 R >>\n%%EOF\n', 'latin1');

  it('takes a PDF, lists it, and gives it back to any team member', async () => {
    const bath = await createBath({ ...silverBath, name: 'Test silver, tank 12' });
    const res = await technician.post(`/api/baths/${bath.id}/attachments`).field('title', 'Assay, November').attach('file', pdf, { filename: 'assay-nov.pdf', contentType: 'application/pdf' });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ title: 'Assay, November', fileName: 'assay-nov.pdf', contentType: 'application/pdf', sizeBytes: pdf.length });
    const list = await reviewer.get(`/api/baths/${bath.id}/attachments`);
    expect(list.body.map((a: { id: string }) => a.id)).toEqual([res.body.id]);
    const file = await reviewer.get(`/api/baths/${bath.id}/attachments/${res.body.id}`).buffer(true).parse((r, cb) => {
      const chunks: Buffer[] = [];
      r.on('data', (d: Buffer) => chunks.push(d));
      r.on('end', () => cb(null, Buffer.concat(chunks)));
    });
    expect(file.status).toBe(200);
    expect(file.headers['content-type']).toBe('application/pdf');
    expect(file.headers['content-disposition']).toMatch(/^attachment; filename="assay-nov.pdf"/);
    expect(Buffer.compare(file.body as Buffer, pdf)).toBe(0);
    expect((await t.agent().get(`/api/baths/${bath.id}/attachments/${res.body.id}`)).status).toBe(401);
  });

  it('refuses a file that only claims to be a PDF, one too large, and other roles, leaving nothing behind', async () => {
    const bath = await createBath({ ...silverBath, name: 'Test silver, tank 13' });
    const before = fs.readdirSync(t.uploadsDir).length;
    const fake = await technician.post(`/api/baths/${bath.id}/attachments`).attach('file', Buffer.from('<script>alert(1)</script>'), { filename: 'report.pdf', contentType: 'application/pdf' });
    expect(fake.status).toBe(415);
    expect(fake.body.error.message).toMatch(/is not a PDF, PNG or JPEG file/);
    const big = Buffer.concat([pdf, Buffer.alloc(10_000_001)]);
    const tooBig = await technician.post(`/api/baths/${bath.id}/attachments`).attach('file', big, { filename: 'big.pdf', contentType: 'application/pdf' });
    expect(tooBig.status).toBe(413);
    expect((await reviewer.post(`/api/baths/${bath.id}/attachments`).attach('file', pdf, { filename: 'a.pdf' })).status).toBe(403);
    const nowhere = await technician.post('/api/baths/00000000-0000-4000-8000-000000000000/attachments').attach('file', pdf, { filename: 'a.pdf' });
    expect(nowhere.status).toBe(404);
    expect(fs.readdirSync(t.uploadsDir).length).toBe(before);
  });
});
