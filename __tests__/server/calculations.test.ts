// The calculators through the API on the seeded library: POST /api/solve in the general form,
// POST /api/calculations for each calculator, and saved runs with filters and soft delete.
import type request from 'supertest';

import { startTestServer, type TestServer } from '../support/test-server';
import { createUser, signIn } from '../support/users';

let t: TestServer;
let chemist: request.Agent;
let otherChemist: request.Agent;
let technician: request.Agent;
let admin: request.Agent;
let chemistId: string;

beforeAll(async () => {
  t = await startTestServer();
  const people = await Promise.all([
    createUser(t.db.db, { roles: ['chemist'], name: 'Calc chemist' }),
    createUser(t.db.db, { roles: ['chemist'] }),
    createUser(t.db.db, { roles: ['technician'] }),
    createUser(t.db.db, { roles: ['admin'] }),
  ]);
  const agents = people.map(() => t.agent());
  await Promise.all(people.map((p, i) => signIn(agents[i] as request.Agent, p.email)));
  [chemist, otherChemist, technician, admin] = agents as [request.Agent, request.Agent, request.Agent, request.Agent];
  chemistId = (people[0] as { id: string }).id;
});

afterAll(async () => {
  await t.close();
});

// An invented cyanide silver bath: 0.3 M Ag, 1.0 M total cyanide, K+ to match, pH 12.
const silver = { metals: ['Ag+'], ligands: ['CN-'], counterIons: ['K+'], totals: { 'Ag+': 0.3, 'CN-': 1.0, 'K+': 1.0 }, pH: 12, activity: 'ideal' };
// An invented fixer: 0.5 M thiosulfate, 0.02 M silver and bromide, Na+ to match, pH 6.5; ideal activity.
const fixer = { metals: ['Ag+'], ligands: ['S2O3-2', 'Br-'], counterIons: ['Na+'], totals: { 'Ag+': 0.02, 'S2O3-2': 0.5, 'Br-': 0.02, 'Na+': 1.0 }, pH: 6.5, activity: 'ideal' };

describe('POST /api/solve', () => {
  it('solves a problem in the general form, names the field of a bad one, and needs sign-in', async () => {
    // AgCl in pure water: s = sqrt(Ksp) = 10^-4.87 mol/L for log Ksp -9.74 (closed form).
    const problem = {
      components: ['Ag+', 'Cl-'],
      totals: { 'Ag+': 0.01, 'Cl-': 0.01 },
      fixed: {},
      species: [],
      solids: [{ name: 'AgCl(s)', logKsp: -9.74, stoich: { 'Ag+': 1, 'Cl-': 1 } }],
      activity: 'ideal',
    };
    const res = await technician.post('/api/solve').send(problem);
    expect(res.status).toBe(200);
    expect(res.body.free['Ag+']).toBeCloseTo(10 ** -4.87, 8);
    const bad = await technician.post('/api/solve').send({ ...problem, solids: [{ name: 'AgCl(s)', logKsp: -9.74, stoich: { 'Ag+': 1, 'Q-': 1 } }] });
    expect(bad.status).toBe(400);
    expect(bad.body.error.details[0].path).toMatch(/^solids\[0\]\.stoich/);
    const batch = await technician.post('/api/solve').send([problem, problem]);
    expect(batch.body).toHaveLength(2);
    expect((await t.agent().post('/api/solve').send(problem)).status).toBe(401);
  });
});

describe('POST /api/calculations', () => {
  it('headroom: how much more AgCN a cyanide silver bath dissolves, with a verdict', async () => {
    const res = await technician.post('/api/calculations').send({ calculator: 'headroom', system: silver, params: { solid: 'AgCN(s)' } });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ calculator: 'headroom', status: 'converged' });
    expect(res.body.verdict).toMatch(/AgCN/);
    // Each AgCN dissolved brings one Ag and one CN. With everything as Ag(CN)2- the limit is
    // CN total = 2 x Ag total: 1.0 + x = 2 (0.3 + x), x = 0.4 M (hand-worked stoichiometric limit);
    // the equilibrium answer sits just below it (a little free cyanide and Ag(CN)3-2 remain).
    expect(res.body.result.molPerL).toBeGreaterThan(0.38);
    expect(res.body.result.molPerL).toBeLessThanOrEqual(0.4);
  });

  it('fixer loading, speciation, curves and precipitation order answer on the seeded library', async () => {
    const loading = await technician.post('/api/calculations').send({ calculator: 'fixer_loading', system: fixer, params: {} });
    expect(loading.status).toBe(200);
    expect(loading.body.result.loadingPercent).toBeGreaterThan(0);
    expect(loading.body.result.loadingPercent).toBeLessThan(100);
    const spec = await technician.post('/api/calculations').send({ calculator: 'speciation', system: silver });
    expect(spec.body.verdict).toMatch(/^Ag\+ is held mostly as Ag\(CN\)/);
    const curve = await technician.post('/api/calculations').send({
      calculator: 'curves',
      system: silver,
      params: { variable: { kind: 'total', component: 'Ag+' }, from: 0.01, to: 0.5, points: 20, series: [{ kind: 'free', component: 'CN-' }] },
    });
    expect(curve.status).toBe(200);
    expect(curve.body.result.points).toHaveLength(20);
    const order = await technician.post('/api/calculations').send({
      calculator: 'precipitation_order',
      system: { metals: ['Ag+', 'Pb+2'], ligands: ['I-'], totals: { 'Ag+': 0.001, 'Pb+2': 0.01, 'I-': 0 }, activity: 'ideal' },
      params: { precipitant: 'I-', cations: ['Ag+', 'Pb+2'] },
    });
    expect(order.status).toBe(200);
    // AgI (log Ksp -16.08) comes down long before PbI2 (log Ksp about -8): silver first.
    expect(order.body.result.thresholds[0].solid).toBe('AgI(s)');
  });

  it('names the parameter or system field to fix', async () => {
    const noSolid = await technician.post('/api/calculations').send({ calculator: 'headroom', system: silver, params: {} });
    expect(noSolid.status).toBe(400);
    expect(noSolid.body.error.details[0].path).toBe('params.solid');
    const wrongSolid = await technician.post('/api/calculations').send({ calculator: 'headroom', system: silver, params: { solid: 'PbI2(s)' } });
    expect(wrongSolid.status).toBe(422);
    expect(wrongSolid.body.error.details[0].path).toMatch(/^params\.solid/);
    const curve = await technician.post('/api/calculations').send({ calculator: 'curves', system: silver, params: { variable: { kind: 'pH' }, from: 9, to: 9, series: [] } });
    expect(curve.body.error.details.map((d: { path: string }) => d.path).sort()).toEqual(['params.series', 'params.to']);
    expect((await technician.post('/api/calculations').send({ calculator: 'chrome', system: silver })).status).toBe(400);
  });
});

describe('runs of every calculator', () => {
  it('saves a headroom run on a bath, filters the list, and lets only the author or an admin delete it', async () => {
    const bath = (await chemist.post('/api/baths').send({ name: 'Calc test silver', process: 'cyanide_silver_plate', volume: 500 })).body as { id: string };
    const saved = await chemist.post('/api/runs').send({ title: 'Headroom check', calculator: 'headroom', system: silver, params: { solid: 'AgCN(s)' }, bathId: bath.id });
    expect(saved.status).toBe(201);
    expect(saved.body).toMatchObject({ calculator: 'headroom', bath: { id: bath.id, name: 'Calc test silver' }, status: 'converged' });
    expect(saved.body.verdict).toMatch(/AgCN/);
    expect(saved.body.output.molPerL).toBeGreaterThan(0);
    await technician.post('/api/runs').send({ title: 'Fixer', calculator: 'fixer_loading', system: fixer, params: {} });

    const byBath = await technician.get('/api/runs').query({ bath: bath.id });
    expect(byBath.body.map((r: { id: string }) => r.id)).toEqual([saved.body.id]);
    const byCalc = await technician.get('/api/runs').query({ calculator: 'fixer_loading' });
    expect(byCalc.body.every((r: { calculator: string }) => r.calculator === 'fixer_loading')).toBe(true);
    const byAuthor = await technician.get('/api/runs').query({ author: chemistId });
    expect(byAuthor.body.every((r: { author: { id: string } }) => r.author.id === chemistId)).toBe(true);
    const today = new Date().toISOString().slice(0, 10);
    expect((await technician.get('/api/runs').query({ from: today, to: today })).body.length).toBeGreaterThanOrEqual(2);
    expect((await technician.get('/api/runs').query({ to: '2000-01-01' })).body).toEqual([]);
    expect((await technician.get('/api/runs').query({ from: 'yesterday' })).status).toBe(400);

    const nobody = await chemist.post('/api/runs').send({ calculator: 'headroom', system: silver, params: { solid: 'AgCN(s)' }, bathId: '00000000-0000-4000-8000-000000000000' });
    expect(nobody.status).toBe(422);
    expect(nobody.body.error.details[0].path).toBe('bathId');

    expect((await otherChemist.delete(`/api/runs/${saved.body.id}`)).status).toBe(403);
    expect((await chemist.delete(`/api/runs/${saved.body.id}`)).status).toBe(204);
    expect((await chemist.get(`/api/runs/${saved.body.id}`)).status).toBe(404);
    const another = await otherChemist.post('/api/runs').send({ calculator: 'speciation', system: silver });
    expect((await admin.delete(`/api/runs/${another.body.id}`)).status).toBe(204);
  });
});
