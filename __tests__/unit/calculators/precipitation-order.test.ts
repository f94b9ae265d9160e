import { precipitationOrder, solveBath, toProblem, type BathState, type ChemicalSystem } from '@/lib/calculators';
import { solve } from '@/lib/engine';

import { expectClose, expectNoNaN, inputError, referenceBath, refLog } from './support';

// An invented waste stream holding silver(I) and copper(I), dosed with cyanide, with no complexes
// and ideal activities so that the closed forms hold exactly: a 1:1 solid MX starts when
// [X] = Ksp / [M]total, and what is left of the first metal when the second starts is
// Ksp1 / [X]2 = (Ksp1 / Ksp2) x [M2]total. AgCN(s) -15.74, CuCN(s) -19.5 (CRC, from memory).
const waste = referenceBath(['Ag+', 'Cu+', 'CN-'], 'ideal', ['AgCN(s)', 'CuCN(s)']);
const kAg = 10 ** refLog('AgCN(s)');
const kCu = 10 ** refLog('CuCN(s)');

describe('precipitationOrder against Ksp / [M] (no complexes, ideal)', () => {
  it.each<[string, number, number, number]>([
    ['equal totals: the share left is the Ksp ratio', 2e-3, 2e-3, 1e-9],
    ['more silver than copper', 5e-3, 1e-4, 1e-9],
    // Copper left at the second threshold is 6e-7 of its total, so the free cyanide there is about
    // 1.7e6 times as sensitive to the copper mass balance, which the engine solves to 1e-12.
    ['more copper than silver', 1e-5, 3e-3, 1e-6],
  ])('%s', (_name, ag, cu, tolerance) => {
    const r = precipitationOrder({ system: waste, state: { totals: { 'Ag+': ag, 'Cu+': cu, 'CN-': 0 } }, precipitant: 'CN-', cations: ['Ag+', 'Cu+'] });
    expect(r.status).toBe('converged');
    expectNoNaN(r);
    const [first, second] = r.thresholds as [NonNullable<(typeof r.thresholds)[0]>, NonNullable<(typeof r.thresholds)[1]>];
    expect([first.solid, second.solid]).toEqual(['CuCN(s)', 'AgCN(s)']);
    expectClose(first.precipitantFreeMolPerL as number, kCu / cu, tolerance);
    expectClose(first.precipitantTotalMolPerL as number, kCu / cu, tolerance);
    expectClose(second.precipitantFreeMolPerL as number, kAg / ag, tolerance);
    // Cyanide in CuCN(s) plus the free cyanide.
    expectClose(second.precipitantTotalMolPerL as number, kAg / ag + cu - kCu / (kAg / ag), tolerance);
    const copperLeft = second.left.find((l) => l.component === 'Cu+')!;
    expectClose(copperLeft.fraction, ((kCu / kAg) * ag) / cu, 1e-7);
    expectClose(copperLeft.molPerL, (kCu / kAg) * ag, 1e-7);
    expectClose(second.left.find((l) => l.component === 'Ag+')!.fraction, 1, 1e-9);
    expect(first.estimate).toEqual({ label: 'single-equilibrium estimate', cation: 'Cu+', precipitantFreeMolPerL: expect.any(Number) });
    expectClose(first.estimate!.precipitantFreeMolPerL, kCu / cu, 1e-12);
    expectClose(second.estimate!.precipitantFreeMolPerL, kAg / ag, 1e-12);
  });

  it('handles a 2:1 solid: free chromate = Ksp / [Ag]^2 (Ag2CrO4 log Ksp -11.92, CRC, from memory)', () => {
    const system: ChemicalSystem = { components: ['Ag+', 'CrO4-2'], species: [], solids: [{ name: 'Ag2CrO4(s)', logKsp: -11.92, stoich: { 'Ag+': 2, 'CrO4-2': 1 } }] };
    const r = precipitationOrder({ system, state: { totals: { 'Ag+': 0.01, 'CrO4-2': 0 } }, precipitant: 'CrO4-2', cations: ['Ag+'] });
    expectClose(r.thresholds[0]!.precipitantTotalMolPerL as number, 10 ** -11.92 / 1e-4, 1e-9);
    expectClose(r.thresholds[0]!.estimate!.precipitantFreeMolPerL, 10 ** -11.92 / 1e-4, 1e-12);
  });
});

describe('precipitationOrder on the full equilibrium', () => {
  // Silver dosed into an invented chloride/bromide/iodide mix, with the silver-halide complexes
  // of the reference set (Smith & Martell, CRC; from memory).
  const halides = referenceBath(['Ag+', 'Cl-', 'Br-', 'I-'], 'ideal');
  const state: BathState = { totals: { 'Ag+': 0, 'Cl-': 0.02, 'Br-': 0.005, 'I-': 0.001 } };
  const r = precipitationOrder({ system: halides, state, precipitant: 'Ag+', cations: ['Cl-', 'Br-', 'I-'] });

  it('orders the silver halides iodide, bromide, chloride', () => {
    expect(r.thresholds.map((t) => t.solid)).toEqual(['AgI(s)', 'AgBr(s)', 'AgCl(s)']);
    expect(r.message).toMatch(/^As Ag\+ is added: AgI\(s\) at .* mol\/L total \(.* mol\/L free\); AgBr\(s\) at .*; AgCl\(s\) at .*\.$/);
  });

  it.each([0, 1, 2])('puts each threshold where the full solve first shows the solid (threshold %d)', (k) => {
    const t = r.thresholds[k]!;
    const at = (f: number) => solve(toProblem(halides, { totals: { ...state.totals, 'Ag+': (t.precipitantTotalMolPerL as number) * f } }));
    expect(at(1 - 1e-6).solids[t.solid]).toBeUndefined();
    expect(at(1 + 1e-6).solids[t.solid]).toBeGreaterThan(0);
  });

  it('says a solid is already saturated at the starting total', () => {
    // 0.002 M silver: AgI takes 0.001, and the rest saturates AgBr as well.
    const started = precipitationOrder({ system: halides, state: { totals: { ...state.totals, 'Ag+': 0.002 } }, precipitant: 'Ag+', cations: ['I-'] });
    expect(started.thresholds.map((t) => [t.solid, t.outcome])).toEqual([['AgBr(s)', 'already'], ['AgI(s)', 'already'], ['AgCl(s)', 'reached']]);
    expect(started.thresholds[0]!.precipitantTotalMolPerL).toBe(0.002);
    expect(started.message).toMatch(/^As Ag\+ is added: AgBr\(s\) already saturated at the start; AgI\(s\) already saturated at the start; AgCl/);
  });

  it('says a solid is not reached below the highest total searched', () => {
    // AgI takes about 0.001 M silver, AgBr starts just after; AgCl needs about 0.006 M.
    const capped = precipitationOrder({ system: halides, state, precipitant: 'Ag+', cations: ['Cl-'], maxPrecipitantMolPerL: 0.003 });
    expect(capped.thresholds.map((t) => [t.solid, t.outcome])).toEqual([['AgI(s)', 'reached'], ['AgBr(s)', 'reached'], ['AgCl(s)', 'not_reached']]);
    expect(capped.thresholds[2]).toMatchObject({ precipitantTotalMolPerL: null, precipitantFreeMolPerL: null, left: [], result: null });
    expect(capped.message).toMatch(/; AgCl\(s\) not reached up to 0\.003 mol\/L\.$/);
  });

  it('converts a measured pH once and holds that free [H+] (copper dosed into ammonia until Cu(OH)2 forms, invented)', () => {
    const copper = referenceBath(['Cu+2', 'NH3', 'H+'], 'davies');
    const bath = { totals: { 'Cu+2': 0.01, NH3: 0 } };
    const o = precipitationOrder({ system: copper, state: bath, pH: { pH: 9 }, precipitant: 'Cu+2', cations: ['NH3'] });
    expect(o.freeH).toBeCloseTo(solveBath(copper, bath, { pH: 9 }).freeH as number, 20);
    expect(o.warnings.some((w) => w.startsWith('Measured pH 9 taken as an activity'))).toBe(true);
  });
});

describe('precipitation-order errors', () => {
  const state: BathState = { totals: { 'Ag+': 1e-3, 'Cu+': 1e-3, 'CN-': 0 } };
  const run = (over: Partial<Parameters<typeof precipitationOrder>[0]>) => precipitationOrder({ system: waste, state, precipitant: 'CN-', cations: ['Ag+', 'Cu+'], ...over });
  it.each<[string, () => unknown, string, string]>([
    ['a precipitant without a total', () => run({ state: { totals: { 'Ag+': 1e-3, 'Cu+': 1e-3 }, fixed: { 'CN-': 1e-9 } } }), 'precipitant',
      'precipitant: "CN-" needs a total (mol/L) in the bath state, not a fixed free concentration'],
    ['no ions', () => run({ cations: [] }), 'cations', 'cations: list the ions being precipitated, each a component with a total'],
    ['an unknown ion', () => run({ cations: ['Ag+', 'Zn+2'] }), 'cations[1]', 'cations[1]: "Zn+2" is not a component of the system; use one of Ag+, Cu+, CN-'],
    ['the precipitant as an ion', () => run({ cations: ['CN-'] }), 'cations[0]', 'cations[0]: "CN-" is the precipitant; list the ions it precipitates'],
    ['a highest total of 0', () => run({ maxPrecipitantMolPerL: 0 }), 'maxPrecipitantMolPerL', 'maxPrecipitantMolPerL: the highest precipitant total must be above 0, got 0'],
    ['a highest total below the start', () => run({ state: { totals: { ...state.totals, 'CN-': 0.5 } }, maxPrecipitantMolPerL: 0.1 }), 'maxPrecipitantMolPerL',
      "maxPrecipitantMolPerL: must be above the precipitant's starting total 0.5 mol/L, got 0.1"],
    ['a precipitant that forms no solid', () => run({ precipitant: 'Ag+', cations: ['Cu+'], state: { totals: { 'Ag+': 0, 'Cu+': 1e-3, 'CN-': 1e-3 } }, system: { ...waste, solids: [waste.solids[1]!] } }), 'precipitant',
      'precipitant: no solid of the system contains "Ag+"; add the solids it forms'],
  ])('%s', (_name, call, field, message) => {
    const e = inputError(call);
    expect(e.field).toBe(field);
    expect(e.message).toBe(message);
  });
});
