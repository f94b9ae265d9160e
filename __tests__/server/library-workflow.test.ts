// The constants library through its API: proposals, revisions, review rules, versions that are
// never overwritten, runs that keep the versions they used, and what the outcome mails say.
import { and, eq, sql } from 'drizzle-orm';
import type request from 'supertest';

import { auditLog, constants } from '@/db/schema';
import { startTestServer, type TestServer } from '../support/test-server';
import { createUser, signIn, waitForMail } from '../support/users';

let t: TestServer;
let chemist: request.Agent;
let otherChemist: request.Agent;
let reviewer: request.Agent;
let chemistReviewer: request.Agent;
let technician: request.Agent;
let chemistEmail: string;

beforeAll(async () => {
  t = await startTestServer();
  const people = await Promise.all([
    createUser(t.db.db, { roles: ['chemist'], name: 'Wren Achterberg' }),
    createUser(t.db.db, { roles: ['chemist'] }),
    createUser(t.db.db, { roles: ['reviewer'], name: 'Osei Brandt' }),
    createUser(t.db.db, { roles: ['chemist', 'reviewer'] }),
    createUser(t.db.db, { roles: ['technician'] }),
  ]);
  const agents = people.map(() => t.agent());
  await Promise.all(people.map((p, i) => signIn(agents[i] as request.Agent, p.email)));
  [chemist, otherChemist, reviewer, chemistReviewer, technician] = agents as [request.Agent, request.Agent, request.Agent, request.Agent, request.Agent];
  chemistEmail = (people[0] as { email: string }).email;
});

afterAll(async () => {
  await t.close();
});

type Summary = { id: number; lineageId: string; version: number; status: string; reaction: string; logValue: number; replacesId: number | null; defines: string };

async function approvedDefining(formula: string): Promise<Summary> {
  const res = await chemist.get('/api/constants').query({ status: 'approved' });
  expect(res.status).toBe(200);
  const hit = (res.body as Summary[]).find((c) => c.defines === formula);
  if (!hit) throw new Error(`the seeded library defines no ${formula}`);
  return hit;
}

const SOURCE = 'Test compilation, table 3 (values made up for this test)';

describe('the seeded library', () => {
  it('is there, approved, each value with a source', async () => {
    const res = await chemist.get('/api/constants');
    expect(res.status).toBe(200);
    const list = res.body as (Summary & { source: string })[];
    expect(list.length).toBeGreaterThan(40);
    expect(list.every((c) => c.status === 'approved' && c.source.length > 3)).toBe(true);
    expect(list.map((c) => c.reaction)).toContain('H+ + OH- = H2O');
  });

  it('filters by metal, ligand, kind and words', async () => {
    const silverAmmines = await chemist.get('/api/constants').query({ metal: 'Ag+', ligand: 'NH3' });
    expect((silverAmmines.body as Summary[]).map((c) => c.defines)).toContain('Ag(NH3)2+');
    expect((silverAmmines.body as Summary[]).every((c) => c.reaction.includes('NH3'))).toBe(true);
    const ksp = await chemist.get('/api/constants').query({ kind: 'solubility_product', q: 'AgCl' });
    expect((ksp.body as Summary[]).map((c) => c.defines)).toEqual(['AgCl(s)']);
    const bad = await chemist.get('/api/constants').query({ kind: 'pKa' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('kind');
  });
});

describe('proposing a new constant', () => {
  const reaction = 'Pb+2 + 2 SCN- = Pb(SCN)2';

  it('takes a draft from a chemist, and refuses other roles', async () => {
    const body = { kind: 'cumulative_formation', reaction, logValue: 1.2, source: SOURCE, note: 'Seen in a plant report.' };
    expect((await reviewer.post('/api/constants').send(body)).status).toBe(403);
    expect((await technician.post('/api/constants').send(body)).status).toBe(403);
    const res = await chemist.post('/api/constants').send(body);
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ status: 'draft', version: 1, replacesId: null, reaction, defines: 'Pb(SCN)2', metals: ['Pb+2'], ligands: ['SCN-'] });
    const again = await otherChemist.post('/api/constants').send(body);
    expect(again.status).toBe(409);
    expect(again.body.error.message).toMatch(/already in the library .*propose a revision/);
  });

  it('names the field for a reaction that does not balance or does not fit its kind', async () => {
    const unbalanced = await chemist.post('/api/constants').send({ kind: 'cumulative_formation', reaction: 'Ag+ + NH3 = Ag(NH3)2+', logValue: 7, source: SOURCE });
    expect(unbalanced.status).toBe(400);
    expect(unbalanced.body.error.details).toEqual([{ path: 'reaction', message: 'the reaction does not balance: 1 N on the left, 2 on the right' }]);
    const wrongKind = await chemist.post('/api/constants').send({ kind: 'solubility_product', reaction: 'Ag+ + Cl- = AgCl', logValue: 3, source: SOURCE });
    expect(wrongKind.status).toBe(400);
    expect(wrongKind.body.error.details[0].path).toBe('reaction');
    const noSource = await chemist.post('/api/constants').send({ kind: 'protonation', reaction: 'H+ + Qx- = HQx', logValue: 3 });
    expect(noSource.status).toBe(400);
    expect(noSource.body.error.details.map((d: { path: string }) => d.path)).toContain('source');
  });

  it('refuses a second constant for a species the library already defines', async () => {
    const res = await chemist.post('/api/constants').send({ kind: 'stepwise_formation', reaction: 'Ag(NH3)+ + NH3 = Ag(NH3)2+', logValue: 3.9, source: SOURCE });
    expect(res.status).toBe(409);
    expect(res.body.error.message).toMatch(/Ag\(NH3\)2\+ is already defined by the approved constant/);
  });
});

describe('review', () => {
  it('a reviewer cannot approve their own proposal; another reviewer can, and the proposer is told', async () => {
    const own = await chemistReviewer
      .post('/api/constants')
      .send({ kind: 'cumulative_formation', reaction: 'Ni+2 + I- = NiI+', logValue: 0.1, source: SOURCE });
    expect(own.status).toBe(201);
    const self = await chemistReviewer.post(`/api/constants/${own.body.id}/review`).send({ decision: 'approve', note: 'fine' });
    expect(self.status).toBe(403);
    expect(self.body.error.message).toMatch(/another reviewer/);
    const ok = await reviewer.post(`/api/constants/${own.body.id}/review`).send({ decision: 'approve', note: 'Matches the table.' });
    expect(ok.status).toBe(200);
    expect(ok.body).toMatchObject({ status: 'approved', reviewNote: 'Matches the table.', reviewedBy: { name: 'Osei Brandt' } });
    const twice = await reviewer.post(`/api/constants/${own.body.id}/review`).send({ decision: 'reject', note: 'changed my mind' });
    expect(twice.status).toBe(409);
  });

  it('needs a decision and a note', async () => {
    const res = await reviewer.post('/api/constants/1/review').send({ decision: 'maybe' });
    expect(res.status).toBe(400);
    expect(res.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(['decision', 'note']);
  });
});

describe('revisions, versions and runs', () => {
  const system = { metals: ['Ag+'], ligands: ['NH3', 'Cl-'], totals: { 'Ag+': 0.05, NH3: 1, 'Cl-': 0.05 }, pH: 11, activity: 'davies' };

  it('a revision is a new version; approving it retires the old one; an earlier run keeps the old version', async () => {
    const v1 = await approvedDefining('Ag(NH3)2+');

    const before = await chemist.post('/api/runs').send({ title: 'Before the revision', system });
    expect(before.status).toBe(201);
    const usedBefore = (before.body.constants as Summary[]).find((c) => c.id === v1.id);
    expect(usedBefore).toMatchObject({ version: v1.version, logValue: v1.logValue, status: 'approved' });

    const revised = v1.logValue + 0.2;
    const draft = await chemist.post(`/api/constants/${v1.id}/revisions`).send({ logValue: revised, source: SOURCE, note: 'Newer measurement.' });
    expect(draft.status).toBe(201);
    expect(draft.body).toMatchObject({ lineageId: v1.lineageId, version: v1.version + 1, replacesId: v1.id, status: 'draft', reaction: v1.reaction });

    const second = await otherChemist.post(`/api/constants/${v1.id}/revisions`).send({ logValue: 1, source: SOURCE, note: 'Another one.' });
    expect(second.status).toBe(409);
    expect(second.body.error.message).toMatch(/already waiting for review/);

    // Drafts feed a calculation only on request, and the answer says so.
    const plain = await chemist.post('/api/systems/build').send(system);
    expect(plain.body.constants.map((c: Summary) => c.id)).toContain(v1.id);
    const withDrafts = await chemist.post('/api/systems/build').send({ ...system, includeDrafts: true });
    expect(withDrafts.body.drafts.map((c: Summary) => c.id)).toEqual([draft.body.id]);

    const approved = await reviewer.post(`/api/constants/${draft.body.id}/review`).send({ decision: 'approve', note: 'Better data.' });
    expect(approved.status).toBe(200);
    const mail = await waitForMail(t.db.db, chemistEmail, /Approved: /);
    expect(mail.text).toContain('Osei Brandt has approved your proposed constant');
    expect(mail.text).toContain('Better data.');

    const detail = await chemist.get(`/api/constants/${v1.id}`);
    expect(detail.body.constant.status).toBe('retired');
    expect(detail.body.history.map((c: Summary) => [c.version, c.status])).toEqual([
      [v1.version + 1, 'approved'],
      [v1.version, 'retired'],
    ]);

    const after = await chemist.post('/api/systems/build').send(system);
    const diammine = (after.body.problem.species as { name: string; logK: number }[]).find((s) => s.name === 'Ag(NH3)2+');
    expect(after.body.constants.map((c: Summary) => c.id)).toContain(draft.body.id);
    expect(after.body.constants.map((c: Summary) => c.id)).not.toContain(v1.id);
    expect(diammine).toBeDefined();

    const old = await technician.get(`/api/runs/${before.body.id}`);
    expect(old.status).toBe(200);
    const kept = (old.body.constants as (Summary & { supersededBy: { id: number }; statusNow: string })[]).find((c) => c.lineageId === v1.lineageId);
    expect(kept).toMatchObject({ id: v1.id, logValue: v1.logValue, statusNow: 'retired', supersededBy: { id: draft.body.id, logValue: revised } });
    expect(old.body.result).toEqual(before.body.result);

    const audit = await t.db.db.select().from(auditLog).where(eq(auditLog.subject, `constant:${draft.body.id}`));
    expect(audit.map((a) => a.action).sort()).toEqual(['constant.approved', 'constant.revision_proposed']);
  });

  it('a rejected revision changes nothing in calculations, and the proposer hears why', async () => {
    const current = await approvedDefining('AgCl(s)');
    const draft = await otherChemist.post(`/api/constants/${current.id}/revisions`).send({ logValue: -5, source: SOURCE, note: 'Typo test.' });
    expect(draft.status).toBe(201);
    const rejected = await reviewer.post(`/api/constants/${draft.body.id}/review`).send({ decision: 'reject', note: 'Off by four orders of magnitude.' });
    expect(rejected.body.status).toBe('rejected');
    expect((await approvedDefining('AgCl(s)')).id).toBe(current.id);
  });

  it('stored versions cannot be overwritten or deleted, even in SQL', async () => {
    const row = await approvedDefining('AgBr(s)');
    await expect(t.db.db.update(constants).set({ logValue: 0 }).where(eq(constants.id, row.id))).rejects.toThrow();
    await expect(t.db.db.delete(constants).where(eq(constants.id, row.id))).rejects.toThrow();
    await expect(t.db.db.update(constants).set({ status: 'draft' }).where(and(eq(constants.id, row.id)))).rejects.toThrow();
    const [still] = await t.db.db.select().from(constants).where(eq(constants.id, row.id));
    expect(still?.logValue).toBe(row.logValue);
    await expect(t.db.db.execute(sql`truncate constants cascade`)).rejects.toThrow();
  });

  it('counts library_revision up in the same transaction as each library change, and the counter only goes up', async () => {
    const revision = async () => Number(((await t.db.db.execute(sql`select revision from library_revision where id = 1`)) as unknown as { revision: string }[])[0]?.revision);
    const before = await revision();
    const row = await approvedDefining('AgCl(s)');
    const draft = await otherChemist.post(`/api/constants/${row.id}/revisions`).send({ logValue: -9.8, source: SOURCE, note: 'Revision counter test.' });
    expect(draft.status).toBe(201);
    const afterDraft = await revision();
    expect(afterDraft).toBeGreaterThan(before);
    // A change rolled back leaves the number where it was.
    await expect(
      t.db.db.transaction(async (tx) => {
        await tx.update(constants).set({ status: 'rejected' }).where(eq(constants.id, draft.body.id));
        throw new Error('roll back');
      }),
    ).rejects.toThrow('roll back');
    expect(await revision()).toBe(afterDraft);
    expect((await reviewer.post(`/api/constants/${draft.body.id}/review`).send({ decision: 'reject', note: 'Counter test only.' })).status).toBe(200);
    expect(await revision()).toBeGreaterThan(afterDraft);
    // Drizzle wraps the database's error; the trigger's message is its cause.
    const refusal = (query: Promise<unknown>) => query.then(() => 'accepted', (e: { cause?: { message?: string } }) => e.cause?.message ?? String(e));
    expect(await refusal(t.db.db.execute(sql`update library_revision set revision = revision - 1`))).toBe('library_revision only counts up');
    expect(await refusal(t.db.db.execute(sql`delete from library_revision`))).toBe('library_revision only counts up');
    expect(await refusal(t.db.db.execute(sql`truncate library_revision`))).toBe('library_revision only counts up');
  });

  it('retiring needs a reviewer and an approved version', async () => {
    const row = await approvedDefining('NiI+');
    expect((await chemist.post(`/api/constants/${row.id}/retire`).send({ note: 'no' })).status).toBe(403);
    const res = await reviewer.post(`/api/constants/${row.id}/retire`).send({ note: 'Test value only.' });
    expect(res.body).toMatchObject({ status: 'retired', reviewNote: 'Matches the table.', retireNote: 'Test value only.', retiredBy: { name: 'Osei Brandt' } });
    expect((await reviewer.post(`/api/constants/${row.id}/retire`).send({ note: 'again' })).status).toBe(409);
  });
});

describe('runs', () => {
  it('answers 422 naming the field for a system the library cannot build', async () => {
    const res = await chemist.post('/api/runs').send({ system: { metals: ['Ag+'], ligands: ['NH3'], totals: { 'Zn+2': 0.1 } } });
    expect(res.status).toBe(422);
    expect(res.body.error.details).toEqual([{ path: 'totals.Zn+2', message: '"Zn+2" is not one of the chosen ions; choose it or remove its total' }]);
  });

  it('lists runs newest first for everyone signed in; a reviewer cannot save one', async () => {
    const saved = await technician.post('/api/runs').send({ title: 'Fixer check', system: { metals: ['Ag+'], ligands: ['S2O3-2', 'Br-'], counterIons: ['Na+'], totals: { 'Ag+': 0.02, 'S2O3-2': 0.5, 'Br-': 0.02, 'Na+': 1 }, pH: 6.5 } });
    expect(saved.status).toBe(201);
    expect(saved.body.result.status).toBe('converged');
    expect(saved.body.engineVersion).toMatch(/^\d+\.\d+\.\d+$/);
    const list = await reviewer.get('/api/runs');
    expect(list.body[0]).toMatchObject({ id: saved.body.id, title: 'Fixer check', usesDrafts: false });
    expect((await reviewer.post('/api/runs').send({ system: { metals: ['Ag+'] } })).status).toBe(403);
    expect((await reviewer.get('/api/runs/not-a-uuid')).status).toBe(404);
  });
});
