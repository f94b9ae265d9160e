// Garbage in, no NaN out: random totals (NaN, infinities, negative, huge), pH, speciation and
// dosing steps never make the rules throw, and every hazard parses, keeps its numbers finite or
// null, follows HAZARD_RULES order and ends with the SDS line.
import fc from 'fast-check';

import { calculationHazards, evaluateHazards, type HazardSituation } from '@/lib/hazards';
import { CALCULATOR_KEYS } from '@/shared/calculations';
import { systemRequestSchema, type ProblemJson } from '@/shared/constants';
import { DEFAULT_THRESHOLDS, DEFER_TO_SDS, HAZARD_RULES, hazardSchema, type Hazard, type HazardThresholds } from '@/shared/safety';

const RUNS = Number(process.env.LIGANDRY_PROPERTY_RUNS ?? 1000);
const SEED = Number(process.env.LIGANDRY_PROPERTY_SEED ?? 20261201);

const number = fc.oneof(fc.double(), fc.double({ min: -1, max: 20, noNaN: true }), fc.constantFrom(NaN, Infinity, -Infinity, -0, 1e308, -1e-300, 0));
const keys = fc.constantFrom('CN-', 'Ag+', 'NH3', 'NH4+', 'S2O3-2', 'Ag(CN)2-', 'HCN', 'SCN-', 'HCN', 'Ag(NH3)2+', 'Na+', '__proto__');
const amounts = fc.dictionary(keys, number, { maxKeys: 8 });
const pH = fc.oneof(fc.constant(null), number);
const solution = fc.option(fc.record({ free: amounts, species: amounts }), { nil: undefined });
const state = fc.record({ totals: amounts, pH, solution });
const step = fc.record({
  index: fc.oneof(fc.integer({ min: -5, max: 40 }), number),
  label: fc.string(),
  kind: fc.constantFrom('add', 'set-ph', 'dilute'),
  reagent: fc.option(fc.constantFrom('HCl', 'NaOH', 'sodium cyanide', 'hypo', 'aqueous ammonia', 'AgNO3', 'acid', ''), { nil: undefined }),
  stoich: fc.option(amounts, { nil: undefined }),
  mol: fc.option(number, { nil: undefined }),
  setPh: fc.option(number, { nil: undefined }),
  before: state,
  after: state,
});
const situation = fc.record({
  totals: amounts,
  pH,
  solution,
  reagents: fc.option(fc.array(fc.constantFrom('KCN', 'PGC', 'hypo', 'silver nitrate', 'NH3', 'HCl', 'KSCN', 'water')), { nil: undefined }),
  steps: fc.option(fc.array(step, { maxLength: 4 }), { nil: undefined }),
});
const thresholds: fc.Arbitrary<HazardThresholds> = fc.record({
  cyanideMinPh: fc.double({ min: 7, max: 14, noNaN: true }),
  hcnFractionMax: fc.double({ min: 1e-6, max: 0.5, noNaN: true }),
  thiosulfateMinPh: fc.double({ min: 1, max: 7, noNaN: true }),
  ammoniaVapourMolPerL: fc.double({ min: 1e-6, max: 20, noNaN: true }),
  deskAmmoniacalSilver: fc.boolean(),
  deskAcidifiedThiosulfate: fc.boolean(),
});

/** Every number anywhere in the value. */
function numbersIn(value: unknown): number[] {
  if (typeof value === 'number') return [value];
  if (Array.isArray(value)) return value.flatMap(numbersIn);
  if (typeof value === 'object' && value !== null) return Object.values(value).flatMap(numbersIn);
  return [];
}

function expectSound(hs: Hazard[]): void {
  for (const h of hs) {
    expect(hazardSchema.parse(h)).toEqual(h);
    expect(h.text.endsWith(DEFER_TO_SDS)).toBe(true);
  }
  expect(numbersIn(hs).every(Number.isFinite)).toBe(true);
  const order = hs.map((h) => HAZARD_RULES.indexOf(h.rule));
  expect(order).toEqual([...order].sort((a, b) => a - b));
  expect(hs.filter((h) => !['acid_into_cyanide', 'cyanide_low_ph'].includes(h.rule)).length).toBe(new Set(hs.map((h) => h.rule).filter((r) => !['acid_into_cyanide', 'cyanide_low_ph'].includes(r))).size);
}

describe('evaluateHazards on garbage', () => {
  it(`never throws and never prints NaN or infinity over ${RUNS} random situations`, () => {
    fc.assert(
      fc.property(situation, thresholds, (s, t) => {
        expectSound(evaluateHazards(s as unknown as HazardSituation, t));
      }),
      { numRuns: RUNS, seed: SEED, endOnFailure: true },
    );
  });

  it.each<[string, unknown, unknown]>([
    ['nothing', undefined, undefined],
    ['null situation', null, null],
    ['totals as a string', { totals: 'lots', pH: 'ten' }, {}],
    ['NaN everywhere', { totals: { 'CN-': NaN, 'Ag+': NaN }, pH: NaN, solution: { free: { 'CN-': NaN }, species: { HCN: NaN } } }, { cyanideMinPh: NaN }],
    ['steps not a list', { totals: { 'CN-': 1 }, pH: 10, steps: 'step' }, {}],
  ])('%s', (_name, s, t) => {
    expectSound(evaluateHazards(s as HazardSituation, t as HazardThresholds));
  });

  it('treats negative and non-finite totals as absent', () => {
    expect(evaluateHazards({ totals: { 'CN-': -1, 'Ag+': NaN, NH3: Infinity }, pH: 3 }, { cyanideMinPh: 11, hcnFractionMax: 0.02, thiosulfateMinPh: 4, ammoniaVapourMolPerL: 0.05, deskAmmoniacalSilver: true, deskAcidifiedThiosulfate: false })).toEqual([]);
  });
});

describe('calculationHazards on garbage parameters and outcomes', () => {
  // A tiny cyanide problem (HCN log K 9.21, Smith & Martell, from memory); what varies is what the request and the result hold.
  const problem: ProblemJson = { components: ['CN-', 'H+'], totals: { 'CN-': 0.1 }, fixed: {}, species: [{ name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'CN-': 1 } }], solids: [], activity: 'ideal' };
  const system = systemRequestSchema.parse({ metals: ['Ag+'], totals: { 'CN-': 0.1 }, pH: 10 });

  it('never throws and never prints NaN or infinity', () => {
    fc.assert(
      fc.property(fc.constantFrom(...CALCULATOR_KEYS), fc.anything(), fc.anything(), (calculator, params, result) => {
        expectSound(calculationHazards({ calculator, system, params, problem, outcome: { result } }, DEFAULT_THRESHOLDS));
      }),
      { numRuns: 300, seed: SEED, endOnFailure: true },
    );
  });
});
