// The hazards of a calculation: the base solution solved on the built problem (engine
// speciation for the HCN share), the reagents the calculator names, and a dosing plan's steps from
// its result or, without one, from its parameters.
import { runCalculation } from '@/lib/calculators/run-calculation';
import { calculationHazards, calculationSituation, hcnRatioFromPh, solutionOf, type CalculationHazardInput } from '@/lib/hazards';
import { solveBuilt } from '@/lib/library/solve-built';
import type { dosingPlanParamsSchema } from '@/shared/calculations';
import { systemRequestSchema, type ProblemJson } from '@/shared/constants';
import { DEFAULT_THRESHOLDS, DEFER_TO_SDS, hazardSchema, type Hazard } from '@/shared/safety';
import type { z } from 'zod';

const T = DEFAULT_THRESHOLDS;

// An invented silver strike: 0.05 M Ag+, 0.3 M NaCN, Davies activities. Constants: HCN log K 9.21
// (protonation of CN-), Ag(CN)2- log beta2 20.48 (Smith & Martell, from memory), OH- log K -14.00
// (ion product of water at 25 °C, common textbook value).
const problem: ProblemJson = {
  components: ['Ag+', 'CN-', 'H+', 'Na+'],
  totals: { 'Ag+': 0.05, 'CN-': 0.3, 'Na+': 0.3 },
  fixed: {},
  species: [
    { name: 'OH-', logK: -14, stoich: { 'H+': -1 } },
    { name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'CN-': 1 } },
    { name: 'Ag(CN)2-', logK: 20.48, stoich: { 'Ag+': 1, 'CN-': 2 } },
  ],
  solids: [],
  activity: 'davies',
  temperatureC: 25,
};
const system = (pH?: number) =>
  systemRequestSchema.parse({ metals: ['Ag+'], ligands: ['CN-'], counterIons: ['Na+'], totals: problem.totals, ...(pH !== undefined ? { pH } : {}) });
const input = (over: Partial<CalculationHazardInput>): CalculationHazardInput => ({ calculator: 'speciation', system: system(10), params: {}, problem, ...over });
const find = (hs: Hazard[], rule: Hazard['rule']) => hs.filter((h) => h.rule === rule);
const value = (h: Hazard | undefined, label: string) => h?.evidence.find((e) => e.label === label);
const RATIO = 'HCN share of free cyanide, HCN / (HCN + CN-)';

describe('calculationHazards: engine speciation', () => {
  it('uses a base solution the caller passes instead of solving again: a speciation result gives the same hazards', () => {
    const run = runCalculation('speciation', problem, 10, {});
    const base = solutionOf((run.result as { result: unknown }).result);
    expect(base).not.toBeNull();
    expect(calculationHazards(input({ outcome: { result: run.result }, base }), T)).toEqual(calculationHazards(input({}), T));
    // A speciation's outcome alone is enough: its result is that base solution.
    expect(calculationSituation(input({ outcome: { result: run.result } })).solution).toEqual(base);
    // Passed, it is used as given: a problem that cannot be solved still gets the engine's share.
    const broken = { ...problem, species: [{ name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'XX-': 1 } }] };
    expect(calculationSituation(input({ problem: broken, base })).solution).toEqual(base);
    // null says there is no solution (it did not converge): the pKa fallback, as when solving fails.
    expect(calculationSituation(input({ base: null })).solution).toBeNull();
    expect(solutionOf({ status: 'not_converged', free: {}, species: {} })).toBeNull();
    expect(solutionOf({ status: 'converged', free: { 'CN-': 0.2, 'Ag+': null }, species: 'x' })).toEqual({ free: { 'CN-': 0.2 }, species: {} });
  });

  it('takes the HCN share from the solved problem, not from the pKa, at pH 10', () => {
    const r = solveBuilt(problem, 10);
    expect(r.status).toBe('converged');
    const engine = (r.species.HCN as number) / ((r.species.HCN as number) + (r.free['CN-'] as number));
    const hs = calculationHazards(input({}), T);
    const [low] = find(hs, 'cyanide_low_ph');
    expect(low?.flag).toBe(true);
    expect(value(low, RATIO)).toMatchObject({ note: 'engine speciation' });
    expect(value(low, RATIO)?.value).toBeCloseTo(engine, 14);
    expect(value(low, 'HCN')?.value).toBe(r.species.HCN);
    // Under Davies the measured pH is an activity, so the engine's share is not the pKa one (0.13955).
    expect(Math.abs(engine - hcnRatioFromPh(10))).toBeGreaterThan(1e-3);
    for (const h of hs) expect(hazardSchema.parse(h)).toEqual(h);
  });

  it('does not fire at pH 11.5, and falls back to the pKa when the problem cannot be solved', () => {
    expect(find(calculationHazards(input({ system: system(11.5) }), T), 'cyanide_low_ph')).toEqual([]);
    const broken = { ...problem, species: [{ name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'XX-': 1 } }] };
    const situation = calculationSituation(input({ problem: broken }));
    expect(situation.solution).toBeNull();
    const [low] = find(calculationHazards(input({ problem: broken }), T), 'cyanide_low_ph');
    expect(value(low, RATIO)?.note).toBe('pKa 9.21, 25 °C (CRC Handbook, from memory)');
  });
});

describe('calculationSituation: reagents', () => {
  it.each<[string, Partial<CalculationHazardInput>, string[]]>([
    ['make-up: the salt name and formula', { calculator: 'make_up', params: { salt: { name: 'sodium cyanide', formula: 'NaCN', stoich: { 'Na+': 1, 'CN-': 1 } } } }, ['sodium cyanide', 'NaCN']],
    ['headroom: the solid', { calculator: 'headroom', params: { solid: 'AgCN(s)' } }, ['AgCN(s)']],
    ['fixer loading: the solid, AgBr(s) by default', { calculator: 'fixer_loading', params: {} }, ['AgBr(s)']],
    ['speciation: none', { calculator: 'speciation', params: {} }, []],
    ['garbage parameters: none', { calculator: 'make_up', params: 'nonsense' }, []],
  ])('%s', (_name, over, reagents) => {
    expect(calculationSituation(input(over)).reagents).toEqual(reagents);
  });

  it('lists the make-up salt as the cyanide reagent with its statements', () => {
    const hs = calculationHazards(input({ calculator: 'make_up', system: system(12), params: { salt: { name: 'sodium cyanide', formula: 'NaCN' } } }), T);
    expect(find(hs, 'cyanide_present')[0]?.reagents).toEqual(['NaCN']);
  });
});

type PlanParams = z.output<typeof dosingPlanParamsSchema>;
const planParams: PlanParams = {
  volumeL: 100,
  steps: [
    { kind: 'add', reagent: 'NaOH', stoich: { 'H+': -1, 'Na+': 1 }, mol: 1 },
    { kind: 'add', label: 'brightener', reagent: 'additive X', stoich: { 'H+': 1 }, mol: 2 },
    { kind: 'add', reagent: 'HCl', stoich: { 'H+': 1 }, mol: 1 },
    { kind: 'set-ph', pH: 9 },
    { kind: 'dilute', addWaterL: 10 },
  ],
};

describe('calculationHazards: dosing plan', () => {
  const run = runCalculation('dosing_plan', problem, 12, planParams);
  const withResult = calculationHazards(input({ calculator: 'dosing_plan', system: system(12), params: planParams, outcome: { result: run.result } }), T);
  const withoutResult = calculationHazards(input({ calculator: 'dosing_plan', system: system(12), params: planParams }), T);

  it.each<[string, Hazard[]]>([
    ['from the plan result', withResult],
    ['from the parameters alone', withoutResult],
  ])('%s: acid at steps 2 (by H+), 3 (by name) and 4 (pH lowered), not at NaOH', (_name, hs) => {
    expect(run.status).toBe('converged');
    expect(find(hs, 'acid_into_cyanide').map((h) => h.step)).toEqual([2, 3, 4]);
    expect(find(hs, 'cyanide_low_ph').map((h) => h.step)).toEqual([4, 5]);
    for (const h of hs) {
      expect(hazardSchema.parse(h)).toEqual(h);
      expect(h.text.endsWith(DEFER_TO_SDS)).toBe(true);
    }
  });

  it('reads the steps from the plan result: labels, totals, pH and engine speciation after each step', () => {
    const { steps } = calculationSituation(input({ calculator: 'dosing_plan', system: system(12), params: planParams, outcome: { result: run.result } }));
    expect(steps?.map((s) => [s.index, s.kind, s.label])).toEqual([
      [1, 'add', 'add 1 mol NaOH'],
      [2, 'add', 'brightener'],
      [3, 'add', 'add 1 mol HCl'],
      [4, 'set-ph', 'set pH 9'],
      [5, 'dilute', 'add 10 L water'],
    ]);
    expect(steps?.[3]?.before.pH).toBe(12);
    expect(steps?.[3]?.after.pH).toBe(9);
    expect(steps?.[4]?.after.totals['CN-']).toBeCloseTo(0.3 * (100 / 110), 12);
    expect(steps?.[3]?.after.solution?.species.HCN).toBeGreaterThan(0);
    const [atStep4] = find(withResult, 'cyanide_low_ph');
    expect(value(atStep4, RATIO)?.note).toBe('engine speciation');
    expect(value(find(withoutResult, 'cyanide_low_ph')[0], RATIO)?.note).toBe('pKa 9.21, 25 °C (CRC Handbook, from memory)');
  });

  it('tallies the vessel from the parameters: volumes and pH set points', () => {
    const { steps } = calculationSituation(input({ calculator: 'dosing_plan', system: system(12), params: planParams }));
    expect(steps?.map((s) => [s.before.pH, s.after.pH])).toEqual([[12, 12], [12, 12], [12, 12], [12, 9], [9, 9]]);
    expect(steps?.[0]?.after.totals['Na+']).toBeCloseTo(0.31, 12);
    expect(steps?.[4]?.after.totals['CN-']).toBeCloseTo(0.3 / 1.1, 12);
  });

  it('survives a result that does not match the steps, and garbage steps', () => {
    expect(() => calculationHazards(input({ calculator: 'dosing_plan', params: planParams, outcome: { result: { states: [null, 3] } } }), T)).not.toThrow();
    const garbage = calculationSituation(input({ calculator: 'dosing_plan', params: { volumeL: -1, steps: [null, { kind: 'boil' }, { kind: 'add', stoich: 'x', mol: NaN }] } }));
    expect(garbage.steps?.map((s) => [s.index, s.kind])).toEqual([[3, 'add']]);
  });
});
