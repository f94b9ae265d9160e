// The hazard rules on hand-made situations: the HCN share from the pH, cyanide at low pH and the
// thresholds, acid added to cyanide, ammoniacal silver, acidified thiosulfate and ammonia vapour.
import { HCN_PKA, evaluateHazards, hcnRatioFromPh, isFlagged, type HazardSituation, type HazardStep } from '@/lib/hazards';
import { DEFAULT_THRESHOLDS, DEFER_TO_SDS, HAZARD_RULES, hazardSchema, type Hazard, type HazardRule, type HazardThresholds } from '@/shared/safety';

const T = DEFAULT_THRESHOLDS;
const rules = (hs: Hazard[]) => hs.map((h) => h.rule);
const find = (hs: Hazard[], rule: HazardRule) => hs.find((h) => h.rule === rule);
const evidence = (h: Hazard | undefined, label: string) => h?.evidence.find((e) => e.label === label);
const PKA_NOTE = 'pKa 9.21, 25 °C (CRC Handbook, from memory)';

/** Every hazard parses against the shared schema, ends with the SDS line, and the rules keep their order. */
function expectWellFormed(hs: Hazard[]): void {
  for (const h of hs) {
    expect(hazardSchema.parse(h)).toEqual(h);
    expect(h.text.endsWith(DEFER_TO_SDS)).toBe(true);
  }
  const order = rules(hs).map((r) => HAZARD_RULES.indexOf(r));
  expect(order).toEqual([...order].sort((a, b) => a - b));
}

// A silver cyanide bath, invented: 0.2 M Ag+, 1.0 M total cyanide.
const cyanideBath = (pH: number | null, extra: Partial<HazardSituation> = {}): HazardSituation => ({ totals: { 'Ag+': 0.2, 'CN-': 1.0, 'K+': 1.0 }, pH, ...extra });

describe('hcnRatioFromPh', () => {
  // HCN pKa 9.21 at 25 °C (CRC Handbook of Chemistry and Physics, from memory); ratio 1 / (1 + 10^(pH - pKa)).
  it.each<[string, number, number, number]>([
    ['pH = pKa: one half', 9.21, 0.5, 1e-15],
    // 10^0.79 = 6.1660 (log10 6.166 = 0.7900), 1 / 7.1660 = 0.13955.
    ['pH 10: 1 / (1 + 10^0.79)', 10, 0.13955, 1e-4],
    // 10^1.79 = 61.660, 1 / 62.660 = 0.015959.
    ['pH 11: 1 / (1 + 10^1.79)', 11, 0.015959, 1e-4],
    // 10^-1 = 0.1, 1 / 1.1 = 0.90909.
    ['pH 8.21: 1 / (1 + 10^-1)', 8.21, 0.90909, 1e-5],
  ])('%s', (_name, pH, expected, relative) => {
    expect(Math.abs(hcnRatioFromPh(pH) - expected)).toBeLessThanOrEqual(relative * expected);
  });

  it('uses pKa 9.21 and takes another pKa', () => {
    expect(HCN_PKA).toBe(9.21);
    expect(hcnRatioFromPh(9.0, 9.0)).toBe(0.5);
  });

  it('puts 2 % as HCN near pH 10.9, as the default threshold says (common practice)', () => {
    // 0.02 = 1 / (1 + 10^(pH - 9.21)) at pH = 9.21 + log10(49) = 10.900.
    expect(hcnRatioFromPh(9.21 + Math.log10(49))).toBeCloseTo(0.02, 12);
  });
});

describe('cyanide_present', () => {
  it('gives the caution whenever cyanide is present, with total, g/L as CN-, pH and the NaCN/KCN statements', () => {
    const hs = evaluateHazards(cyanideBath(12), T);
    expectWellFormed(hs);
    expect(rules(hs)).toEqual(['cyanide_present']);
    const h = find(hs, 'cyanide_present')!;
    expect(h).toMatchObject({ severity: 'caution', flag: false });
    expect(evidence(h, 'Total cyanide')?.value).toBe(1.0);
    // CN-: C 12.011 + N 14.007 = 26.018 g/mol (IUPAC 2021 conventional atomic weights).
    expect(evidence(h, 'Total cyanide as CN-')?.value).toBeCloseTo(26.018, 9);
    expect(evidence(h, 'pH')?.value).toBe(12);
    expect(h.ghs.map((s) => s.code)).toEqual(['H300', 'H310', 'H330', 'H410', 'EUH032']);
    expect(h.pictograms).toEqual(['GHS06', 'GHS09']);
    expect(h.text).toMatch(/fatal if swallowed, in contact with skin or if inhaled/);
    expect(h.text).toMatch(/Contact with acids liberates hydrogen cyanide/);
  });

  it('takes the statements of the cyanide reagents named (NaCN adds H290 and H372, GHS05 and GHS08)', () => {
    const h = find(evaluateHazards(cyanideBath(12, { reagents: ['sodium cyanide', 'silver nitrate'] }), T), 'cyanide_present')!;
    expect(h.reagents).toEqual(['NaCN']);
    expect(h.ghs.map((s) => s.code)).toEqual(['H290', 'H300', 'H310', 'H330', 'H372', 'H410', 'EUH032']);
    expect(h.pictograms).toEqual(['GHS05', 'GHS06', 'GHS08', 'GHS09']);
  });

  it('says to measure the pH when it is not given, and fires on a cyanide reagent alone', () => {
    const h = find(evaluateHazards({ totals: {}, pH: null, reagents: ['PGC'] }, T), 'cyanide_present')!;
    expect(evidence(h, 'pH')?.value).toBe('not given');
    expect(h.text).toMatch(/The pH is not given: measure it, and keep it at pH 11 or above/);
    expect(h.reagents).toEqual(['K[Au(CN)2]']);
  });

  it('counts cyanide held in a complex key by its groups, and not thiocyanate', () => {
    const h = find(evaluateHazards({ totals: { 'Ag(CN)2-': 0.1, 'CN-': 0.05 }, pH: 12 }, T), 'cyanide_present')!;
    expect(evidence(h, 'Total cyanide')?.value).toBeCloseTo(0.25, 12);
    expect(evaluateHazards({ totals: { 'SCN-': 1, 'Ag+': 0.1 }, pH: 5, reagents: ['KSCN'] }, T)).toEqual([]);
  });
});

describe('cyanide_low_ph', () => {
  it('flags a cyanide bath at pH 10 (below 11; 14 % as HCN, above 2 %)', () => {
    const hs = evaluateHazards(cyanideBath(10), T);
    expectWellFormed(hs);
    expect(rules(hs)).toEqual(['cyanide_present', 'cyanide_low_ph']);
    const h = find(hs, 'cyanide_low_ph')!;
    expect(h).toMatchObject({ severity: 'danger', flag: true });
    expect(isFlagged(hs)).toBe(true);
    const ratio = evidence(h, 'HCN share of free cyanide, HCN / (HCN + CN-)');
    expect(ratio?.value).toBeCloseTo(0.13955, 4);
    expect(ratio?.note).toBe(PKA_NOTE);
    expect(evidence(h, 'pH')?.value).toBe(10);
    expect(evidence(h, 'Lowest pH for cyanide')?.value).toBe(11);
    expect(evidence(h, 'Largest HCN share')?.value).toBe(0.02);
    expect(h.ghs.map((s) => s.code)).toEqual(['H224', 'H300', 'H310', 'H330', 'H410']);
    expect(h.pictograms).toEqual(['GHS02', 'GHS06', 'GHS09']);
  });

  it('does not fire at pH 11.5 (0.5 % as HCN)', () => {
    const hs = evaluateHazards(cyanideBath(11.5), T);
    expect(rules(hs)).toEqual(['cyanide_present']);
    expect(isFlagged(hs)).toBe(false);
  });

  it.each<[string, Partial<HazardThresholds>, number, boolean]>([
    ['pH threshold lowered to 10: pH 10.5 passes (4.9 % HCN, under a 5 % limit)', { cyanideMinPh: 10, hcnFractionMax: 0.05 }, 10.5, false],
    ['pH threshold 10 but HCN limit 2 %: pH 10.5 fires on the share', { cyanideMinPh: 10, hcnFractionMax: 0.02 }, 10.5, true],
    ['pH threshold 10, HCN limit 0.1 %: pH 11.5 fires on the share (0.51 %)', { cyanideMinPh: 10, hcnFractionMax: 0.001 }, 11.5, true],
    ['pH threshold raised to 12: pH 11.5 fires', { cyanideMinPh: 12 }, 11.5, true],
  ])('respects changed thresholds: %s', (_name, over, pH, fires) => {
    const hs = evaluateHazards(cyanideBath(pH), { ...T, ...over });
    expect(rules(hs).includes('cyanide_low_ph')).toBe(fires);
  });

  it('uses the engine speciation when the solution has HCN and free CN-', () => {
    const solution = { free: { 'CN-': 0.6, 'Ag+': 1e-20 }, species: { HCN: 0.15, 'CN-': 0.6, 'Ag(CN)2-': 0.2 } };
    const h = find(evaluateHazards(cyanideBath(12, { solution }), T), 'cyanide_low_ph')!;
    const ratio = evidence(h, 'HCN share of free cyanide, HCN / (HCN + CN-)');
    expect(ratio?.value).toBeCloseTo(0.2, 12);
    expect(ratio?.note).toBe('engine speciation');
    expect(evidence(h, 'HCN')?.value).toBe(0.15);
  });

  it('does not fire with neither a pH nor a speciation', () => {
    expect(rules(evaluateHazards(cyanideBath(null), T))).toEqual(['cyanide_present']);
  });
});

// A dosing plan on a cyanide bath at pH 12, tallied by hand: 100 L, 1 M cyanide.
const start = { totals: { 'Ag+': 0.2, 'CN-': 1.0 }, pH: 12 };
const plan = (steps: Omit<HazardStep, 'index' | 'before' | 'after'>[], pHs: (number | null)[] = steps.map(() => 12)): HazardSituation => {
  let before: HazardStep['before'] = start;
  const out: HazardStep[] = steps.map((s, i) => {
    const step: HazardStep = { ...s, index: i + 1, before, after: { totals: start.totals, pH: pHs[i] ?? null } };
    before = { totals: start.totals, pH: pHs[i] ?? null };
    return step;
  });
  return { ...start, steps: out };
};
const addNaOH = { kind: 'add' as const, label: 'add NaOH', reagent: 'NaOH', stoich: { 'H+': -1, 'Na+': 1 }, mol: 1 };

describe('acid_into_cyanide', () => {
  it('flags acid named as a reagent at its step, with the H+ it brings', () => {
    const hs = evaluateHazards(plan([addNaOH, { kind: 'add', label: 'add HCl', reagent: 'hydrochloric acid', stoich: { 'H+': 1 }, mol: 2 }]), T);
    expectWellFormed(hs);
    const acid = hs.filter((h) => h.rule === 'acid_into_cyanide');
    expect(acid).toHaveLength(1);
    expect(acid[0]).toMatchObject({ step: 2, severity: 'danger', flag: true, reagents: ['HCl', 'hydrogen cyanide (HCN)'] });
    expect(evidence(acid[0], 'H+ it brings')?.value).toBe(2);
    expect(evidence(acid[0], 'Cyanide in the vessel before')?.value).toBe(1.0);
    expect(acid[0]!.ghs.map((s) => s.code)).toEqual(['H224', 'H290', 'H300', 'H310', 'H314', 'H330', 'H335', 'H410']);
    // HCl's H335 (GHS07) gives way to GHS06.
    expect(acid[0]!.pictograms).toEqual(['GHS02', 'GHS05', 'GHS06', 'GHS09']);
    expect(acid[0]!.text).toMatch(/^Step 2 \(add HCl\) adds hydrochloric acid, an acid, to a vessel holding cyanide/);
  });

  it('flags a reagent known only by the H+ it brings', () => {
    const hs = evaluateHazards(plan([{ kind: 'add', label: 'brightener', reagent: 'additive X', stoich: { 'H+': 0.5 }, mol: 4 }]), T);
    const h = find(hs, 'acid_into_cyanide')!;
    expect(h.step).toBe(1);
    expect(evidence(h, 'H+ it brings')?.value).toBe(2);
  });

  it('flags a set-ph step that lowers the pH, with the HCN share after', () => {
    const hs = evaluateHazards(plan([addNaOH, { kind: 'set-ph', label: 'set pH 9', setPh: 9 }], [12, 9]), T);
    const acid = find(hs, 'acid_into_cyanide')!;
    expect(acid.step).toBe(2);
    expect(evidence(acid, 'pH before')?.value).toBe(12);
    expect(evidence(acid, 'pH after')?.value).toBe(9);
    // 1 / (1 + 10^(9 - 9.21)) = 1 / (1 + 0.6166) = 0.6186 (pKa 9.21, CRC, from memory).
    expect(evidence(acid, 'HCN share of free cyanide after')?.value).toBeCloseTo(0.6186, 4);
    // and the vessel after step 2 is itself below the safe pH
    expect(hs.filter((h) => h.rule === 'cyanide_low_ph').map((h) => h.step)).toEqual([2]);
  });

  it('flags a set-ph below the threshold when the pH before is not known; not one raising the pH', () => {
    const unknown: HazardSituation = { totals: start.totals, pH: null, steps: [{ index: 1, label: 'set pH 10.5', kind: 'set-ph', setPh: 10.5, before: { totals: start.totals, pH: null }, after: { totals: start.totals, pH: 10.5 } }] };
    expect(find(evaluateHazards(unknown, T), 'acid_into_cyanide')?.step).toBe(1);
    expect(find(evaluateHazards(plan([{ kind: 'set-ph', label: 'set pH 12.5', setPh: 12.5 }], [12.5]), T), 'acid_into_cyanide')).toBeUndefined();
  });

  it('does not flag NaOH, nor acid into a vessel without cyanide', () => {
    expect(find(evaluateHazards(plan([addNaOH]), T), 'acid_into_cyanide')).toBeUndefined();
    const noCyanide: HazardSituation = { totals: { 'Ag+': 0.1 }, pH: 7, steps: [{ index: 1, label: 'add HCl', kind: 'add', reagent: 'HCl', stoich: { 'H+': 1 }, mol: 1, before: { totals: { 'Ag+': 0.1 }, pH: 7 }, after: { totals: { 'Ag+': 0.1 }, pH: 7 } }] };
    expect(evaluateHazards(noCyanide, T)).toEqual([]);
  });

  it('gives one cyanide_low_ph for the base and one per step below the threshold, in order', () => {
    const hs = evaluateHazards({ ...plan([addNaOH, addNaOH, addNaOH], [10, 12, 10]), pH: 10 }, T);
    expect(hs.filter((h) => h.rule === 'cyanide_low_ph').map((h) => h.step)).toEqual([undefined, 1, 3]);
    expectWellFormed(hs);
  });
});

describe('ammoniacal_silver', () => {
  const silverAmmonia: HazardSituation = { totals: { 'Ag+': 0.1, NH3: 0.5 }, pH: 11 };

  it('fires without a solution, and goes to the desk as the thresholds say', () => {
    const h = find(evaluateHazards(silverAmmonia, T), 'ammoniacal_silver')!;
    expect(h).toMatchObject({ severity: 'danger', flag: true });
    expect(evidence(h, 'Silver')?.value).toBe(0.1);
    expect(evidence(h, 'Ammonia (NH3 + NH4+)')?.value).toBe(0.5);
    expect(h.text).toMatch(/Never store it: make only what the job needs and discard it the same day/);
    expect(h.text).toMatch(/fulminating silver/);
    expect(h.source).toBe("common practice; Bretherick's Handbook of Reactive Chemical Hazards, from memory");
    expect(find(evaluateHazards(silverAmmonia, { ...T, deskAmmoniacalSilver: false }), 'ammoniacal_silver')?.flag).toBe(false);
  });

  it('with a solution, fires only when 1 % or more of the silver is held as ammines', () => {
    const held = { free: { 'Ag+': 1e-6, NH3: 0.3 }, species: { 'Ag(NH3)2+': 0.099, 'Ag(NH3)+': 0.001, 'Ag+': 1e-6 } };
    const h = find(evaluateHazards({ ...silverAmmonia, solution: held }, T), 'ammoniacal_silver')!;
    expect(evidence(h, 'Share of silver as ammine complexes')?.value).toBeCloseTo(1.0, 12);
    // A cyanide bath with a little ammonia: silver sits as Ag(CN)2-, 0.5 % as ammine.
    const cyanide = { free: { 'CN-': 0.5, NH3: 0.05 }, species: { 'Ag(CN)2-': 0.0995, 'Ag(NH3)2+': 0.0005, 'CN-': 0.5 } };
    expect(find(evaluateHazards({ totals: { 'Ag+': 0.1, NH3: 0.05, 'CN-': 0.7 }, pH: 12, solution: cyanide }, T), 'ammoniacal_silver')).toBeUndefined();
  });

  it('counts ammonia given as NH4+, and silver named as a reagent', () => {
    expect(find(evaluateHazards({ totals: { 'Ag+': 0.1, 'NH4+': 0.2 }, pH: 9 }, T), 'ammoniacal_silver')).toBeDefined();
    const named = find(evaluateHazards({ totals: { NH3: 1 }, pH: 11, reagents: ['silver nitrate'] }, T), 'ammoniacal_silver')!;
    expect(named.reagents).toEqual(['AgNO3', 'aqueous ammonia']);
    expect(named.ghs.map((s) => s.code)).toEqual(['H272', 'H290', 'H314', 'H335', 'H400', 'H410']);
  });

  it('does not fire on silver alone or ammonia alone', () => {
    expect(find(evaluateHazards({ totals: { 'Ag+': 0.1 }, pH: 7 }, T), 'ammoniacal_silver')).toBeUndefined();
    expect(find(evaluateHazards({ totals: { NH3: 1 }, pH: 11 }, T), 'ammoniacal_silver')).toBeUndefined();
  });
});

describe('acidified_thiosulfate', () => {
  // Thiosulfate breaks down below about pH 4 (common practice).
  const fixer = (pH: number): HazardSituation => ({ totals: { 'S2O3-2': 0.8, 'Ag+': 0.02 }, pH });

  it('gives the SO2 caution at pH 3.5, not at pH 5', () => {
    const h = find(evaluateHazards(fixer(3.5), T), 'acidified_thiosulfate')!;
    expect(h).toMatchObject({ severity: 'caution', flag: false });
    expect(evidence(h, 'pH')?.value).toBe(3.5);
    expect(evidence(h, 'Lowest pH for thiosulfate')?.value).toBe(4);
    expect(evidence(h, 'Thiosulfate')?.value).toBe(0.8);
    expect(h.ghs.map((s) => s.code)).toEqual(['H280', 'H314', 'H331']);
    expect(h.text).toMatch(/sulfur \(the solution turns cloudy\) and sulfur dioxide/);
    expect(h.text).toMatch(/Ventilate/);
    expect(find(evaluateHazards(fixer(5), T), 'acidified_thiosulfate')).toBeUndefined();
  });

  it('goes to the desk when the thresholds say so, and follows the pH threshold', () => {
    expect(find(evaluateHazards(fixer(3.5), { ...T, deskAcidifiedThiosulfate: true }), 'acidified_thiosulfate')?.flag).toBe(true);
    expect(find(evaluateHazards(fixer(5), { ...T, thiosulfateMinPh: 6 }), 'acidified_thiosulfate')).toBeDefined();
  });

  it('fires on a dosing step whose after-pH is low', () => {
    const s: HazardSituation = { ...fixer(6), steps: [{ index: 1, label: 'acid stop', kind: 'add', reagent: 'acetic acid', stoich: { 'H+': 1 }, mol: 1, before: fixer(6), after: fixer(3) }] };
    expect(find(evaluateHazards(s, T), 'acidified_thiosulfate')?.step).toBe(1);
  });
});

describe('ammonia_vapour', () => {
  it('gives the caution from 0.05 mol/L total ammonia, with the exposure limits (NIOSH Pocket Guide, from memory)', () => {
    const h = find(evaluateHazards({ totals: { NH3: 0.04, 'NH4+': 0.02 }, pH: 10, solution: { free: { NH3: 0.035 }, species: {} } }, T), 'ammonia_vapour')!;
    expect(h).toMatchObject({ severity: 'caution', flag: false });
    expect(evidence(h, 'Total ammonia (NH3 + NH4+)')?.value).toBeCloseTo(0.06, 12);
    expect(evidence(h, 'Free NH3')?.value).toBe(0.035);
    const limits = h.evidence.filter((e) => e.note === 'NIOSH Pocket Guide to Chemical Hazards, from memory').map((e) => [e.label, e.value, e.unit]);
    expect(limits).toEqual([
      ['Ammonia exposure limit: OSHA PEL, 8-h TWA', 50, 'ppm'],
      ['Ammonia exposure limit: NIOSH REL, TWA', 25, 'ppm'],
      ['Ammonia exposure limit: NIOSH REL, STEL', 35, 'ppm'],
      ['Ammonia exposure limit: ACGIH TLV, TWA', 25, 'ppm'],
      ['Ammonia exposure limit: ACGIH TLV, STEL', 35, 'ppm'],
      ['Ammonia exposure limit: IDLH', 300, 'ppm'],
    ]);
    expect(h.ghs.map((s) => s.code)).toEqual(['H314', 'H335', 'H400']);
    expect(h.pictograms).toEqual(['GHS05', 'GHS07', 'GHS09']);
    expect(h.text).not.toMatch(/little is volatile/);
  });

  it('says little is volatile below pH 8, and stays quiet under the threshold', () => {
    const h = find(evaluateHazards({ totals: { 'NH4+': 1 }, pH: 6 }, T), 'ammonia_vapour')!;
    expect(h.text).toMatch(/little is volatile while the pH stays low/);
    expect(find(evaluateHazards({ totals: { NH3: 0.049 }, pH: 11 }, T), 'ammonia_vapour')).toBeUndefined();
    expect(find(evaluateHazards({ totals: { NH3: 0.049 }, pH: 11 }, { ...T, ammoniaVapourMolPerL: 0.01 }), 'ammonia_vapour')).toBeDefined();
  });
});

describe('every rule together', () => {
  it('fires all six in HAZARD_RULES order, each text ending with the SDS line', () => {
    const s: HazardSituation = {
      totals: { 'Ag+': 0.1, 'CN-': 0.5, NH3: 1, 'S2O3-2': 0.5 },
      pH: 3,
      reagents: ['KCN'],
      steps: [{ index: 1, label: 'add HCl', kind: 'add', reagent: 'HCl', stoich: { 'H+': 1 }, mol: 1, before: { totals: { 'CN-': 0.5 }, pH: 3 }, after: { totals: { 'CN-': 0.5 }, pH: 3 } }],
    };
    const hs = evaluateHazards(s, T);
    expect(rules(hs)).toEqual(['cyanide_present', 'cyanide_low_ph', 'cyanide_low_ph', 'acid_into_cyanide', 'ammoniacal_silver', 'acidified_thiosulfate', 'ammonia_vapour']);
    expectWellFormed(hs);
    expect(hs.every((h) => h.text.endsWith(DEFER_TO_SDS))).toBe(true);
  });

  it('is empty for plain water', () => {
    expect(evaluateHazards({ totals: {}, pH: 7 }, T)).toEqual([]);
  });
});
