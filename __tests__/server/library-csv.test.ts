// CSV out and back in: the export of the approved library imports as "unchanged"; a changed
// value becomes a revision draft; bad rows are reported by row and column, and with the default
// mode nothing is written unless every row is valid.
import { eq } from 'drizzle-orm';
import type request from 'supertest';

import { constants } from '@/db/schema';
import { parseCsv, toCsv } from '@/server/library/csv';
import { CSV_COLUMNS } from '@/shared/constants';
import { startTestServer, type TestServer } from '../support/test-server';
import { createUser, signIn } from '../support/users';

let t: TestServer;
let chemist: request.Agent;
let technician: request.Agent;

beforeAll(async () => {
  t = await startTestServer();
  const [c, tech] = await Promise.all([createUser(t.db.db, { roles: ['chemist'] }), createUser(t.db.db, { roles: ['technician'] })]);
  chemist = t.agent();
  technician = t.agent();
  await signIn(chemist, (c as { email: string }).email);
  await signIn(technician, (tech as { email: string }).email);
});

afterAll(async () => {
  await t.close();
});

async function exportCsv(agent: request.Agent, query: Record<string, string> = {}): Promise<string> {
  const res = await agent.get('/api/constants/export.csv').query(query).buffer(true).parse((r, cb) => {
    let text = '';
    r.on('data', (d: Buffer) => (text += d.toString()));
    r.on('end', () => cb(null, text));
  });
  expect(res.status).toBe(200);
  expect(res.headers['content-type']).toMatch(/^text\/csv/);
  expect(res.headers['content-disposition']).toMatch(/attachment; filename="ligandry-constants-/);
  return res.body as string;
}

function upload(agent: request.Agent, csv: string, mode?: string, name = 'constants.csv') {
  const req = agent.post('/api/constants/import');
  if (mode) req.field('mode', mode);
  return req.attach('file', Buffer.from(csv, 'utf8'), { filename: name, contentType: 'text/csv' });
}

describe('CSV helpers', () => {
  it('quote what needs quoting and read it back', () => {
    const text = toCsv(['a', 'b', 'c'], [{ a: 'plain', b: 'with, comma', c: 'say "hi"\nnext line' }, { a: '=SUM(A1)', b: null, c: -1.5 }]);
    expect(text).toBe('a,b,c\r\nplain,"with, comma","say ""hi""\nnext line"\r\n\'=SUM(A1),,-1.5\r\n');
    const parsed = parseCsv(text);
    expect(parsed.header).toEqual(['a', 'b', 'c']);
    expect(parsed.records.map((r) => r.cells)).toEqual([
      ['plain', 'with, comma', 'say "hi"\nnext line'],
      ["'=SUM(A1)", '', '-1.5'],
    ]);
  });
});

describe('GET /api/constants/export.csv', () => {
  it('gives the approved library with the contract columns and readable equations, to any role', async () => {
    const csv = await exportCsv(technician);
    const parsed = parseCsv(csv);
    expect(parsed.header).toEqual([...CSV_COLUMNS]);
    for (const col of ['kind', 'reaction', 'log_value', 'temperature_c', 'ionic_strength', 'source', 'status', 'version']) expect(parsed.header).toContain(col);
    const col = (name: string) => parsed.header.indexOf(name);
    const rows = parsed.records.map((r) => r.cells);
    expect(rows.length).toBeGreaterThan(40);
    expect(rows.every((r) => r[col('status')] === 'approved')).toBe(true);
    expect(rows.map((r) => r[col('reaction')])).toContain('Ag+ + 2 NH3 = Ag(NH3)2+');
    expect(rows.every((r) => Number.isFinite(Number(r[col('log_value')])))).toBe(true);
  });

  it('exports the filtered view', async () => {
    const parsed = parseCsv(await exportCsv(chemist, { kind: 'solubility_product', metal: 'Ag+' }));
    const kinds = new Set(parsed.records.map((r) => r.cells[0]));
    expect([...kinds]).toEqual(['solubility_product']);
    expect(parsed.records.map((r) => r.cells[1])).toContain('AgCl(s) = Ag+ + Cl-');
  });
});

describe('POST /api/constants/import', () => {
  it('round trip: importing the export changes nothing', async () => {
    const csv = await exportCsv(chemist);
    const res = await upload(chemist, csv);
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ mode: 'all', created: 0, rejected: 0, written: false, problems: [] });
    expect(res.body.unchanged).toBe(res.body.rows);
  });

  it('with one bad row and mode "all", writes nothing and reports the row and column', async () => {
    const csv = await exportCsv(chemist, { q: 'AgBr' });
    const parsed = parseCsv(csv);
    const header = parsed.header;
    const agbr = parsed.records.map((r) => r.cells).find((r) => r[1] === 'AgBr(s) = Ag+ + Br-') as string[];
    const changed = [...agbr];
    changed[header.indexOf('log_value')] = '-12.4';
    changed[header.indexOf('source')] = 'Test compilation, 2026 (made up for this test)';
    const bad = ['ksp', 'AgZz(s) = Ag+ + Zz-', 'minus twelve', '', '25', '0', '', '', 'Nowhere', '', '', '', '', ''];
    const file = toCsv(header, [changed, bad].map((cells) => Object.fromEntries(header.map((h, i) => [h, cells[i]]))));
    const before = (await t.db.db.select().from(constants)).length;

    const all = await upload(chemist, file);
    expect(all.status).toBe(422);
    expect(all.body.error.message).toMatch(/^Nothing was imported: 1 row has a problem \(first: row 3, log_value: "minus twelve" is not a number\)/);
    expect(all.body.error.details).toMatchObject({ rows: 2, created: 0, rejected: 1, written: false });
    expect(all.body.error.details.problems).toEqual([{ row: 3, column: 'log_value', message: '"minus twelve" is not a number' }]);
    expect((await t.db.db.select().from(constants)).length).toBe(before);

    const valid = await upload(chemist, file, 'valid');
    expect(valid.status).toBe(200);
    expect(valid.body).toMatchObject({ mode: 'valid', rows: 2, created: 1, rejected: 1, written: true });
    const [draft] = await t.db.db.select().from(constants).where(eq(constants.id, valid.body.draftIds[0]));
    expect(draft).toMatchObject({ status: 'draft', logValue: -12.4, reaction: 'AgBr(s) = Ag+ + Br-' });
    expect(draft?.replacesId).not.toBeNull();
  });

  it('reports a missing column, an unknown species and a reaction repeated in the file', async () => {
    const missing = await upload(chemist, 'kind,reaction,source\nksp,AgCl(s) = Ag+ + Cl-,x\n');
    expect(missing.status).toBe(422);
    expect(missing.body.error.details.problems).toEqual([{ row: 1, column: null, message: 'the header row lacks the column log_value' }]);

    const file = ['kind,reaction,log_value,source', 'beta,Hg+2 + 2 CN- = Hg(CN)2,32.8,Somewhere (from memory)', 'protonation,H+ + Qq-2 = HQq-,3,Somewhere', 'beta,Pb+2 + 3 Br- = PbBr3-,1.9,Somewhere', 'beta,Pb+2 + 3 Br- = PbBr3-,2.0,Somewhere'].join('\n');
    const res = await upload(chemist, file);
    expect(res.status).toBe(422);
    const problems = res.body.error.details.problems as { row: number; column: string; message: string }[];
    expect(problems.map((p) => [p.row, p.column])).toEqual([
      [2, 'reaction'],
      [3, 'reaction'],
      [5, 'reaction'],
    ]);
    expect(problems[0]?.message).toMatch(/Hg\+2 is not in the species catalogue/);
    expect(problems[2]?.message).toBe('the same reaction is already on row 4');
  });

  it('refuses what is not a CSV file, a missing file, and other roles', async () => {
    const pdf = await upload(chemist, '%PDF-1.4 \u0000 binary', undefined, 'report.pdf');
    expect(pdf.status).toBe(415);
    expect(pdf.body.error.message).toMatch(/is not a CSV file/);
    const none = await chemist.post('/api/constants/import').field('mode', 'all');
    expect(none.status).toBe(400);
    expect(none.body.error.details[0].path).toBe('file');
    const mode = await upload(chemist, 'kind\n', 'some');
    expect(mode.status).toBe(400);
    expect((await upload(technician, 'kind\n')).status).toBe(403);
  });

  it('refuses a file over the size limit with 413', async () => {
    const big = `kind,reaction,log_value,source\n${'x'.repeat(1_100_000)}`;
    const res = await upload(chemist, big);
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('payload_too_large');
  });
});
