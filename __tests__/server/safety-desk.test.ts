// The safety desk through the API: hazards on calculations and saved runs, flagged work reaching
// the desk, sign-off with conditions and send-back (never on one's own work), release blocked
// until sign-off, mail and audit at every step, flagged baths, and versioned thresholds. Suites
// share one database, so every check finds its own rows by id.
import { and, eq, sql } from 'drizzle-orm';
import type request from 'supertest';

import { auditLog, hazardThresholds, safetyReviewEvents, safetyReviews } from '@/db/schema';
import { DEFAULT_THRESHOLDS } from '@/shared/safety';

import { startTestServer, type TestServer } from '../support/test-server';
import { createUser, mailCount, signIn, waitForMail } from '../support/users';

let t: TestServer;
let chemist: request.Agent;
let otherChemist: request.Agent;
let safety: request.Agent;
let chemistSafety: request.Agent;
let admin: request.Agent;
const people: Record<string, { id: string; email: string }> = {};

beforeAll(async () => {
  t = await startTestServer();
  const made = await Promise.all([
    createUser(t.db.db, { roles: ['chemist'], name: 'Desk chemist' }),
    createUser(t.db.db, { roles: ['chemist'], name: 'Other chemist' }),
    createUser(t.db.db, { roles: ['safety'], name: 'Desk officer' }),
    createUser(t.db.db, { roles: ['chemist', 'safety'], name: 'Chemist and officer' }),
    createUser(t.db.db, { roles: ['admin'], name: 'Desk admin' }),
  ]);
  const agents = made.map(() => t.agent());
  await Promise.all(made.map((p, i) => signIn(agents[i] as request.Agent, p.email)));
  [chemist, otherChemist, safety, chemistSafety, admin] = agents as [request.Agent, request.Agent, request.Agent, request.Agent, request.Agent];
  ['chemist', 'otherChemist', 'safety', 'chemistSafety', 'admin'].forEach((k, i) => {
    people[k] = made[i] as { id: string; email: string };
  });
});

afterAll(async () => {
  await t.close();
});

// An invented cyanide silver strike: 0.05 M Ag, 0.5 M total cyanide, K+ to match.
const strike = (pH: number) => ({ metals: ['Ag+'], ligands: ['CN-'], counterIons: ['K+'], totals: { 'Ag+': 0.05, 'CN-': 0.5, 'K+': 0.5 }, pH, activity: 'davies' });

type HazardJson = { rule: string; severity: string; flag: boolean; evidence: { label: string; value: unknown }[]; text: string; ghs: { code: string }[] };

async function saveRun(agent: request.Agent, title: string, pH: number) {
  const res = await agent.post('/api/runs').send({ title, calculator: 'speciation', system: strike(pH), params: {} });
  expect(res.status).toBe(201);
  return res.body as { id: string; safety: { flagged: boolean; hazards: HazardJson[]; review: { id: string; status: string } | null; released: unknown } };
}

async function auditActions(subject: string): Promise<string[]> {
  const rows = await t.db.db.select().from(auditLog).where(eq(auditLog.subject, subject));
  return rows.map((r) => r.action).sort();
}

describe('hazards on calculations', () => {
  it('POST /calculations names cyanide always and flags pH 10 with its evidence', async () => {
    const high = await chemist.post('/api/calculations').send({ calculator: 'speciation', system: strike(12), params: {} });
    expect(high.status).toBe(200);
    const highRules = (high.body.hazards as HazardJson[]).map((h) => h.rule);
    expect(highRules).toContain('cyanide_present');
    expect(highRules).not.toContain('cyanide_low_ph');
    const present = (high.body.hazards as HazardJson[]).find((h) => h.rule === 'cyanide_present') as HazardJson;
    // GHS statements of cyanide salts (typical supplier SDS, from memory).
    expect(present.ghs.map((g) => g.code)).toEqual(expect.arrayContaining(['H300', 'H310', 'H330', 'EUH032', 'H410']));
    expect(present.text).toMatch(/SDS/);

    const low = await chemist.post('/api/calculations').send({ calculator: 'speciation', system: strike(10), params: {} });
    const flagged = (low.body.hazards as HazardJson[]).find((h) => h.rule === 'cyanide_low_ph') as HazardJson;
    expect(flagged).toMatchObject({ severity: 'danger', flag: true });
    // The pH that triggered it is in the evidence.
    expect(flagged.evidence.some((e) => e.value === 10)).toBe(true);
  });
});

describe('a flagged run on the desk', () => {
  it('reaches the desk, is mailed and audited, and cannot be released before sign-off', async () => {
    const before = await mailCount(t.db.db, people.safety!.email);
    const run = await saveRun(chemist, 'Strike at pH 10', 10);
    expect(run.safety.flagged).toBe(true);
    expect(run.safety.review).toMatchObject({ status: 'pending' });
    const reviewId = run.safety.review!.id;
    await waitForMail(t.db.db, people.safety!.email, /^For review: Strike at pH 10/);
    expect(await mailCount(t.db.db, people.safety!.email)).toBe(before + 1);
    expect(await auditActions(`review:${reviewId}`)).toEqual(['safety.submitted']);

    // The desk sees it with its evidence; another chemist does not; the author sees their own.
    const queue = await safety.get('/api/safety/reviews');
    expect(queue.status).toBe(200);
    expect((queue.body as { id: string }[]).some((r) => r.id === reviewId)).toBe(true);
    expect(((await otherChemist.get('/api/safety/reviews?status=all')).body as { id: string }[]).some((r) => r.id === reviewId)).toBe(false);
    expect(((await chemist.get('/api/safety/reviews?status=all')).body as { id: string }[]).some((r) => r.id === reviewId)).toBe(true);
    expect((await otherChemist.get(`/api/safety/reviews/${reviewId}`)).status).toBe(403);
    const detail = await safety.get(`/api/safety/reviews/${reviewId}`);
    expect(detail.body).toMatchObject({ status: 'pending', flags: ['cyanide_low_ph'], subject: { kind: 'run', id: run.id, title: 'Strike at pH 10' } });
    expect((detail.body.hazards as HazardJson[]).map((h) => h.rule)).toContain('cyanide_low_ph');

    // Release is refused while the review is open, for the author and for an admin.
    const refused = await chemist.post(`/api/runs/${run.id}/release`).send({});
    expect(refused.status).toBe(409);
    expect(refused.body.error.code).toBe('sign_off_required');
    expect(refused.body.error.message).toMatch(/safety desk/);
    expect((await admin.post(`/api/runs/${run.id}/release`).send({})).status).toBe(409);
    expect((await otherChemist.post(`/api/runs/${run.id}/release`).send({})).status).toBe(403);

    // Only the safety role decides; a chemist cannot.
    expect((await otherChemist.post(`/api/safety/reviews/${reviewId}/sign-off`).send({ conditions: 'x' })).status).toBe(403);

    // Sent back with a note: the author is mailed; release is still refused.
    const back = await safety.post(`/api/safety/reviews/${reviewId}/send-back`).send({ note: 'Raise the pH to 11.5 with KOH first.' });
    expect(back.status).toBe(200);
    expect(back.body).toMatchObject({ status: 'sent_back', note: 'Raise the pH to 11.5 with KOH first.', decidedBy: { id: people.safety!.id } });
    const backMail = await waitForMail(t.db.db, people.chemist!.email, /^Sent back: Strike at pH 10/);
    expect(backMail.text).toMatch(/Raise the pH to 11\.5/);
    expect((await chemist.post(`/api/runs/${run.id}/release`).send({})).status).toBe(409);
    expect((await safety.post(`/api/safety/reviews/${reviewId}/sign-off`).send({})).status).toBe(409);

    // Only its submitter resubmits, and only with a note.
    expect((await otherChemist.post(`/api/safety/reviews/${reviewId}/resubmit`).send({ note: 'done' })).status).toBe(403);
    const noNote = await chemist.post(`/api/safety/reviews/${reviewId}/resubmit`).send({});
    expect(noNote.status).toBe(400);
    expect(noNote.body.error.details[0].path).toBe('note');
    const again = await chemist.post(`/api/safety/reviews/${reviewId}/resubmit`).send({ note: 'The bath is dumped and remade at pH 12; this run is the record of the event.' });
    expect(again.body).toMatchObject({ status: 'pending', decidedBy: null });
    await waitForMail(t.db.db, people.safety!.email, /^Resubmitted: Strike at pH 10/);

    // Signed off with a condition: the author is mailed it, sees it on the run, and can release.
    const signed = await safety.post(`/api/safety/reviews/${reviewId}/sign-off`).send({ conditions: 'Work only with the extraction on and an HCN monitor in the room.' });
    expect(signed.status).toBe(200);
    expect(signed.body).toMatchObject({ status: 'signed_off', conditions: 'Work only with the extraction on and an HCN monitor in the room.' });
    expect((signed.body.events as { action: string }[]).map((e) => e.action)).toEqual(['submitted', 'sent_back', 'resubmitted', 'signed_off']);
    const signedMail = await waitForMail(t.db.db, people.chemist!.email, /^Signed off: Strike at pH 10/);
    expect(signedMail.text).toMatch(/HCN monitor/);
    const seen = await chemist.get(`/api/runs/${run.id}`);
    expect(seen.body.safety.review).toMatchObject({ status: 'signed_off', conditions: expect.stringMatching(/HCN monitor/), decidedBy: { name: 'Desk officer' } });
    const listed = (await chemist.get('/api/runs').expect(200)).body as { id: string; review: unknown; released: boolean; hazards: { rule: string }[] }[];
    expect(listed.find((r) => r.id === run.id)).toMatchObject({ review: { id: reviewId, status: 'signed_off' }, released: false });

    const released = await chemist.post(`/api/runs/${run.id}/release`).send({ note: 'Record kept with the incident report.' });
    expect(released.status).toBe(200);
    expect(released.body.released).toMatchObject({ by: { id: people.chemist!.id }, note: 'Record kept with the incident report.' });
    expect((await chemist.post(`/api/runs/${run.id}/release`).send({})).status).toBe(409);
    expect(await auditActions(`review:${reviewId}`)).toEqual(['safety.resubmitted', 'safety.sent_back', 'safety.signed_off', 'safety.submitted']);
    expect(await auditActions(`run:${run.id}`)).toEqual(['run.released', 'run.saved']);
  });

  it('a safety officer cannot review their own work', async () => {
    const run = await saveRun(chemistSafety, 'Own strike check', 9.5);
    const id = run.safety.review!.id;
    const own = await chemistSafety.post(`/api/safety/reviews/${id}/sign-off`).send({ conditions: 'fine' });
    expect(own.status).toBe(403);
    expect(own.body.error.message).toMatch(/own work/);
    expect((await chemistSafety.post(`/api/safety/reviews/${id}/send-back`).send({ note: 'Not at this pH.' })).status).toBe(403);
    // The officer who submitted it is not mailed about their own work.
    expect((await safety.post(`/api/safety/reviews/${id}/sign-off`).send({ conditions: '' })).body.status).toBe('signed_off');
  });

  it('a run that fires no flag-level rule has no review and is released at once', async () => {
    const run = await saveRun(chemist, 'Strike at pH 12.2', 12.2);
    expect(run.safety.flagged).toBe(false);
    expect(run.safety.review).toBeNull();
    expect(run.safety.hazards.map((h) => h.rule)).toContain('cyanide_present');
    expect((await chemist.post(`/api/runs/${run.id}/release`).send({})).status).toBe(200);
  });

  it('a flagged run deleted while it waits leaves the waiting list and is marked deleted elsewhere', async () => {
    const run = await saveRun(chemist, 'Strike check, deleted later', 10.1);
    const id = run.safety.review!.id;
    expect(((await safety.get('/api/safety/reviews')).body as { id: string }[]).some((r) => r.id === id)).toBe(true);
    expect((await chemist.delete(`/api/runs/${run.id}`)).status).toBe(204);
    expect(((await safety.get('/api/safety/reviews')).body as { id: string }[]).some((r) => r.id === id)).toBe(false);
    const all = (await safety.get('/api/safety/reviews?status=all')).body as { id: string; subject: { title: string } }[];
    expect(all.find((r) => r.id === id)?.subject.title).toBe('Strike check, deleted later (deleted)');
  });

  it('unknown and malformed review ids are 404s; bad decisions name the field', async () => {
    expect((await safety.get('/api/safety/reviews/not-a-uuid')).status).toBe(404);
    expect((await safety.post('/api/safety/reviews/00000000-0000-4000-8000-000000000000/sign-off').send({})).status).toBe(404);
    const run = await saveRun(chemist, 'Strike at pH 10.4', 10.4);
    const bad = await safety.post(`/api/safety/reviews/${run.safety.review!.id}/send-back`).send({ note: 42 });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('note');
    expect((await safety.get('/api/safety/reviews?status=maybe')).status).toBe(400);
  });

  it('the history tables refuse change in SQL', async () => {
    const run = await saveRun(chemist, 'Strike for the SQL check', 10);
    const id = run.safety.review!.id;
    // Drizzle wraps the database's refusal; the trigger's own words are in its cause.
    const refused = (message: RegExp) => expect.objectContaining({ cause: expect.objectContaining({ message: expect.stringMatching(message) }) });
    await expect(t.db.db.update(safetyReviewEvents).set({ note: 'rewritten' }).where(eq(safetyReviewEvents.reviewId, id))).rejects.toEqual(refused(/never changed or deleted/));
    await expect(t.db.db.delete(safetyReviews).where(eq(safetyReviews.id, id))).rejects.toEqual(refused(/never changed or deleted/));
    await expect(t.db.db.update(safetyReviews).set({ flags: [] }).where(eq(safetyReviews.id, id))).rejects.toEqual(refused(/keeps what it was opened on/));
    await expect(t.db.db.update(hazardThresholds).set({ note: 'x' }).where(eq(hazardThresholds.version, 1))).rejects.toEqual(refused(/never changed or deleted/));
    await expect(t.db.db.execute(sql`truncate run_releases`)).rejects.toEqual(refused(/never changed or deleted/));
  });
});

describe('baths on the desk', () => {
  const bath = {
    name: 'Desk test strike, tank 3',
    process: 'silver_strike',
    volume: 120,
    volumeUnit: 'L',
    metalUnit: 'g/L',
    ligandUnit: 'g/L',
    targets: { metal: { min: null, max: null }, freeLigand: { min: null, max: null }, pH: { min: 11.5, max: 12.5 } },
  };

  it('an analysis at pH 10 opens one review; the list and detail show the hazards', async () => {
    const made = await chemist.post('/api/baths').send(bath);
    expect(made.status).toBe(201);
    expect(made.body.safety.review).toBeNull();
    const path = `/api/baths/${made.body.id}/analyses`;
    const first = await chemist.post(path).send({ sampledAt: '2026-11-20', analyst: 'D. Test', metal: { value: 3 }, freeLigand: { value: 60 }, pH: 10 });
    expect(first.status).toBe(201);
    const rows = await t.db.db.select().from(safetyReviews).where(and(eq(safetyReviews.bathId, made.body.id), eq(safetyReviews.status, 'pending')));
    expect(rows).toHaveLength(1);
    expect(rows[0]!.flags).toEqual(['cyanide_low_ph']);
    await waitForMail(t.db.db, people.safety!.email, /^For review: Desk test strike, tank 3/);
    // A second low result while the review is open adds no second review.
    await chemist.post(path).send({ sampledAt: '2026-11-21', analyst: 'D. Test', metal: { value: 3 }, freeLigand: { value: 60 }, pH: 10.2 }).expect(201);
    const all = await t.db.db.select().from(safetyReviews).where(eq(safetyReviews.bathId, made.body.id));
    expect(all).toHaveLength(1);

    const detail = await otherChemist.get(`/api/baths/${made.body.id}`);
    expect(detail.body.safety).toMatchObject({ flagged: true, review: { status: 'pending' } });
    const list = (await otherChemist.get('/api/baths').expect(200)).body as { id: string; hazards: { rule: string }[]; review: { status: string } | null }[];
    const row = list.find((b) => b.id === made.body.id);
    expect(row?.hazards.map((h) => h.rule)).toEqual(['cyanide_present', 'cyanide_low_ph']);
    expect(row?.review).toMatchObject({ status: 'pending' });

    // Signed off, the same flag does not reopen it; the bath's analyses stand either way.
    await safety.post(`/api/safety/reviews/${rows[0]!.id}/sign-off`).send({ conditions: 'Raise to pH 11.5 by the end of the shift.' }).expect(200);
    await chemist.post(path).send({ sampledAt: '2026-11-22', analyst: 'D. Test', pH: 10.6 }).expect(201);
    expect(await t.db.db.select().from(safetyReviews).where(eq(safetyReviews.bathId, made.body.id))).toHaveLength(1);
  });
});

describe('thresholds', () => {
  it('start at the defaults, change only by the safety role as new versions, and are audited', async () => {
    const current = await chemist.get('/api/safety/thresholds');
    expect(current.status).toBe(200);
    expect(current.body.version).toBeGreaterThanOrEqual(1);
    const [v1] = await t.db.db.select().from(hazardThresholds).where(eq(hazardThresholds.version, 1));
    // Migration 0010 holds the same defaults as shared/safety.ts.
    expect(v1!.values).toEqual(DEFAULT_THRESHOLDS);

    const bad = await safety.post('/api/safety/thresholds').send({ values: { ...DEFAULT_THRESHOLDS, cyanideMinPh: 3 }, note: 'try' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toBe('values.cyanideMinPh');
    expect((await chemist.post('/api/safety/thresholds').send({ values: DEFAULT_THRESHOLDS, note: 'not mine' })).status).toBe(403);

    // A harmless change (the vapour caution from 0.06 M), then back: two new versions, both kept.
    const changed = await safety.post('/api/safety/thresholds').send({ values: { ...current.body.values, ammoniaVapourMolPerL: 0.06 }, note: 'Vapour caution from 1 g/L NH3.' });
    expect(changed.status).toBe(201);
    expect(changed.body).toMatchObject({ version: current.body.version + 1, values: { ammoniaVapourMolPerL: 0.06 }, createdBy: { id: people.safety!.id } });
    const back = await safety.post('/api/safety/thresholds').send({ values: current.body.values, note: 'Back to the shop default.' });
    expect(back.body.version).toBe(changed.body.version + 1);
    const history = (await otherChemist.get('/api/safety/thresholds/history')).body as { version: number }[];
    expect(history.map((h) => h.version).slice(0, 3)).toEqual([back.body.version, changed.body.version, current.body.version]);
    const audit = await t.db.db.select().from(auditLog).where(eq(auditLog.subject, `thresholds:${changed.body.version}`));
    expect(audit[0]).toMatchObject({ action: 'safety.thresholds_changed', payload: expect.objectContaining({ changes: { ammoniaVapourMolPerL: { from: current.body.values.ammoniaVapourMolPerL, to: 0.06 } } }) });
    const count = await t.db.db.execute(sql`select count(*)::int as n from hazard_thresholds`);
    expect((count as unknown as { n: number }[])[0]?.n ?? (count as unknown as { rows: { n: number }[] }).rows[0]?.n).toBeGreaterThanOrEqual(3);
  });
});
