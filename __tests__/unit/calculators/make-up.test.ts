import { makeUp, solveAtPh, toProblem, type BathState, type MakeUpInput } from '@/lib/calculators';
import { solve } from '@/lib/engine';
import { DEMO_BATHS } from '@/lib/chemistry/demo-baths';

import { expectClose, expectNoNaN, inputError, referenceBath, refLog } from './support';

// Molar masses from IUPAC CIAAW 2021 standard atomic weights: KCN 65.1163, Na2S2O3·5H2O
// 248.17153856, NH3 17.031 g/mol. Unit definitions: 1 US gal = 3.785411784 L, 1 lb = 453.59237 g.
const strike = DEMO_BATHS.find((b) => b.key === 'silver-strike')!.problem;
const cyanideSystem = { components: strike.components, species: strike.species!, solids: strike.solids!, activity: strike.activity };
const strikeState: BathState = { totals: strike.totals! };
const kcn = { name: 'potassium cyanide', formula: 'KCN', stoich: { 'K+': 1, 'CN-': 1 } };

/** Re-solves the bath with `c` mol/L of the salt added (diluted by a stock's volume), H+ held as the calculator held it. */
function resolve(input: MakeUpInput, c: number, freeH: number | null, stockMolPerL: number | null) {
  const dilution = stockMolPerL === null ? 1 : 1 + c / stockMolPerL;
  const totals: Record<string, number> = {};
  for (const [k, v] of Object.entries(input.state.totals)) totals[k] = (v + (input.salt.stoich[k] ?? 0) * c) / dilution;
  return solve(toProblem(input.system, { totals, fixed: freeH === null ? input.state.fixed : { ...input.state.fixed, 'H+': freeH } }));
}

describe('makeUp hits its target when re-solved', () => {
  it.each<[string, MakeUpInput, number]>([
    ['free cyanide 0.8 M in the demo strike with KCN (Davies, pH 12)',
      { system: cyanideSystem, state: strikeState, pH: { pH: 12 }, volume: { value: 200, unit: 'L' }, salt: kcn, target: { kind: 'free', component: 'CN-', molPerL: 0.8 } }, 1e-6],
    ['free cyanide down to 0.5 M by adding silver cyanide (a salt that lowers it)',
      { system: cyanideSystem, state: strikeState, pH: { pH: 12 }, volume: { value: 50, unit: 'gal' }, salt: { name: 'silver cyanide', formula: 'AgCN', stoich: { 'Ag+': 1, 'CN-': 1 } }, target: { kind: 'free', component: 'CN-', molPerL: 0.5 }, massUnit: 'lb' }, 1e-6],
    ['free ammonia 0.2 M from 25 % w/w aqueous ammonia at 0.91 kg/L (stock dilutes the bath)',
      { system: referenceBath(['Ag+', 'NH3'], 'ideal', ['Ag(NH3)2+']), state: { totals: { 'Ag+': 0.01, NH3: 0.05 } }, volume: { value: 10, unit: 'L' },
        salt: { name: 'aqueous ammonia 25 %', formula: 'NH3', stoich: { NH3: 1 }, stock: { massFraction: 0.25, densityKgPerL: 0.91 } }, target: { kind: 'free', component: 'NH3', molPerL: 0.2 } }, 1e-6],
  ])('%s', (_name, input, tolerance) => {
    const r = makeUp(input);
    expect(r.outcome).toBe('add');
    expect(r.status).toBe('converged');
    expectNoNaN(r);
    const target = input.target as { component: string; molPerL: number };
    expectClose(r.achieved, target.molPerL, tolerance);
    const again = resolve(input, r.addMolPerL, r.freeH, r.stock?.molPerL ?? null);
    expectClose(again.free[target.component] as number, target.molPerL, tolerance);
  });

  it('gives moles and mass for the volume (KCN 65.1163 g/mol; 200 L)', () => {
    const r = makeUp({ system: cyanideSystem, state: strikeState, pH: { pH: 12 }, volume: { value: 200, unit: 'L' }, salt: kcn, target: { kind: 'free', component: 'CN-', molPerL: 0.8 }, massUnit: 'kg' });
    expectClose(r.addMol, r.addMolPerL * 200, 1e-12);
    expectClose(r.mass!.grams, r.addMol * 65.1163, 1e-12);
    expect(r.mass!.unit).toBe('kg');
    expectClose(r.mass!.value, r.mass!.grams / 1000, 1e-12);
    expect(r.stock).toBeNull();
    expect(r.finalVolumeL).toBe(200);
    expect(r.message).toBe(`Add ${r.addMol.toPrecision(4)} mol of potassium cyanide to 200.0 L: free CN- goes from ${r.before.toPrecision(4)} to ${r.achieved.toPrecision(4)} mol/L (target 0.8).`);
  });

  it('gives the stock volume and mass for aqueous ammonia (13.358 mol/L = 0.25 x 910 g/L / 17.031 g/mol)', () => {
    const r = makeUp({
      system: referenceBath(['Ag+', 'NH3'], 'ideal', ['Ag(NH3)2+']), state: { totals: { 'Ag+': 0.01, NH3: 0.05 } }, volume: { value: 2, unit: 'gal' },
      salt: { name: 'aqueous ammonia 25 %', formula: 'NH3', stoich: { NH3: 1 }, stock: { massFraction: 0.25, densityKgPerL: 0.91 } }, target: { kind: 'free', component: 'NH3', molPerL: 0.2 },
    });
    const litres = 2 * 3.785411784;
    const stockMolPerL = (0.25 * 910) / 17.031;
    expectClose(r.stock!.molPerL, stockMolPerL, 1e-12);
    expectClose(r.stock!.volumeL, (r.addMolPerL * litres) / stockMolPerL, 1e-12);
    expectClose(r.stock!.volume, r.stock!.volumeL / 3.785411784, 1e-12);
    expectClose(r.stock!.massG, r.stock!.volumeL * 910, 1e-12);
    expectClose(r.finalVolumeL, litres + r.stock!.volumeL, 1e-12);
  });

  it('reaches a headroom target: AgBr headroom 0.1 M in a thiosulfate fixer, against the closed form', () => {
    // Only Ag(S2O3)2-3 (log beta2 13.46, Smith & Martell) and AgBr(s) (log Ksp -12.3, CRC; from memory):
    // saturated silver s = r / (1 + 2r) x L with r = sqrt(Ksp beta2), so the thiosulfate total
    // needed for s = held + 0.1 is L = s (1 + 2r) / r.
    const system = referenceBath(['Ag+', 'Br-', 'S2O3-2'], 'ideal', ['Ag(S2O3)2-3', 'AgBr(s)']);
    const r = Math.sqrt(10 ** (refLog('AgBr(s)') + refLog('Ag(S2O3)2-3')));
    const needed = ((0.05 + 0.1) * (1 + 2 * r)) / r;
    const m = makeUp({
      system, state: { totals: { 'Ag+': 0.05, 'Br-': 0.05, 'S2O3-2': 0.3 } }, volume: { value: 40, unit: 'L' },
      salt: { name: 'sodium thiosulfate pentahydrate', formula: 'Na2S2O3·5H2O', stoich: { 'S2O3-2': 1 } }, target: { kind: 'headroom', solid: 'AgBr(s)', molPerL: 0.1 },
    });
    expect(m.outcome).toBe('add');
    expectClose(m.addMolPerL, needed - 0.3, 1e-6);
    expectClose(m.achieved, 0.1, 1e-6);
    expectClose(m.mass!.grams, m.addMolPerL * 40 * 248.17153856, 1e-12);
  });
});

describe('makeUp when no amount does it', () => {
  const base = { system: cyanideSystem, state: strikeState, pH: { pH: 12 }, volume: { value: 100, unit: 'L' as const }, salt: kcn };

  it('says the target is past on the side a salt drives it (Davies: K+ lowers free cyanide a little, target above)', () => {
    const r = makeUp({ ...base, salt: { name: 'potassium nitrate', formula: 'KNO3', stoich: { 'K+': 1 } }, target: { kind: 'free', component: 'CN-', molPerL: 0.9 } });
    expect(r.outcome).toBe('already_met');
    expect(r.message).toBe(`No addition needed: free CN- is already ${r.before.toPrecision(4)} mol/L, at or below the target 0.9 mol/L, and potassium nitrate only lowers it.`);
  });

  it('says the target is already met (free cyanide above 0.3 M; KCN only raises it)', () => {
    const before = solveAtPh(cyanideSystem, strikeState, 12).result.free['CN-'] as number;
    const r = makeUp({ ...base, target: { kind: 'free', component: 'CN-', molPerL: 0.3 } });
    expect(r).toMatchObject({ outcome: 'already_met', addMolPerL: 0, addMol: 0 });
    expect(r.message).toBe(`No addition needed: free CN- is already ${before.toPrecision(4)} mol/L, at or above the target 0.3 mol/L, and potassium cyanide only raises it.`);
  });

  it('says a bath exactly at the target needs nothing', () => {
    const before = solveAtPh(cyanideSystem, strikeState, 12).result.free['CN-'] as number;
    const r = makeUp({ ...base, target: { kind: 'free', component: 'CN-', molPerL: before } });
    expect(r.outcome).toBe('already_met');
    expect(r.message).toBe(`No addition needed: free CN- is already ${before.toPrecision(4)} mol/L, at the target ${before} mol/L.`);
  });

  it('says the target is unreachable within the most salt considered', () => {
    const r = makeUp({ ...base, target: { kind: 'free', component: 'CN-', molPerL: 5 }, maxAddMolPerL: 1 });
    expect(r.outcome).toBe('unreachable');
    expect(r.addMolPerL).toBe(0);
    expect(r.achieved).toBe(r.before);
    expect(r.atMost).toBeGreaterThan(r.before);
    expect(r.message).toBe(`Unreachable: even 1 mol/L of potassium cyanide brings free CN- only to ${r.atMost!.toPrecision(4)} mol/L (target 5).`);
  });

  it('says a salt that does not touch the target cannot reach it (ideal: a spectator ion changes nothing)', () => {
    const ideal = { ...cyanideSystem, activity: 'ideal' as const };
    const r = makeUp({ ...base, system: ideal, salt: { name: 'potassium nitrate', formula: 'KNO3', stoich: { 'K+': 1 } }, target: { kind: 'free', component: 'CN-', molPerL: 0.9 } });
    expect(r.outcome).toBe('unreachable');
    expect(r.message).toBe(`Unreachable: potassium nitrate does not change free CN- (${r.before.toPrecision(4)} mol/L).`);
  });

  it('gives no mass without a formula', () => {
    const r = makeUp({ ...base, salt: { name: 'cyanide', stoich: { 'CN-': 1 } }, target: { kind: 'free', component: 'CN-', molPerL: 0.75 } });
    expect(r.outcome).toBe('add');
    expect(r.mass).toBeNull();
  });
});

describe('make-up errors', () => {
  const ok: MakeUpInput = { system: cyanideSystem, state: strikeState, pH: { pH: 12 }, volume: { value: 100, unit: 'L' }, salt: kcn, target: { kind: 'free', component: 'CN-', molPerL: 0.8 } };
  const run = (over: Partial<MakeUpInput>) => makeUp({ ...ok, ...over });
  const stock = (s: Partial<NonNullable<MakeUpInput['salt']['stock']>>) => run({ salt: { ...kcn, stock: { massFraction: 0.25, densityKgPerL: 0.91, ...s } } });
  it.each<[string, () => unknown, string, string]>([
    ['an unknown volume unit', () => run({ volume: { value: 1, unit: 'bucket' as 'L' } }), 'volume.unit', 'volume.unit: use one of L, mL, gal, got "bucket"'],
    ['a volume of 0', () => run({ volume: { value: 0, unit: 'L' } }), 'volume.value', 'volume.value: the bath volume must be above 0, got 0'],
    ['an unknown mass unit', () => run({ massUnit: 'stone' as 'g' }), 'massUnit', 'massUnit: use one of g, kg, mg, oz, troy oz, lb, got "stone"'],
    ['a negative limit', () => run({ maxAddMolPerL: -1 }), 'maxAddMolPerL', 'maxAddMolPerL: the most salt considered (mol/L) must be above 0, got -1'],
    ['an unknown target', () => run({ target: { kind: 'ph' } as unknown as MakeUpInput['target'] }), 'target.kind', 'target.kind: must be "free" or "headroom"'],
    ['a target on a fixed component', () => run({ target: { kind: 'free', component: 'H+', molPerL: 1e-12 } }), 'target.component',
      'target.component: "H+" needs a total (mol/L) in the bath state, not a fixed free concentration'],
    ['a headroom for an unknown solid', () => run({ target: { kind: 'headroom', solid: 'AgCl(s)', molPerL: 0.1 } }), 'target.solid',
      'target.solid: "AgCl(s)" is not a solid of the system; use one of AgCN(s), Ag2O(s)'],
    ['a target of 0', () => run({ target: { kind: 'free', component: 'CN-', molPerL: 0 } }), 'target.molPerL', 'target.molPerL: the target (mol/L) must be above 0, got 0'],
    ['a salt without a name', () => run({ salt: { ...kcn, name: '' } }), 'salt.name', 'salt.name: name the salt, such as "sodium cyanide"'],
    ['a salt with an unknown component', () => run({ salt: { ...kcn, stoich: { 'Na+': 1, 'CN-': 1 } } }), 'salt.stoich.Na+',
      'salt.stoich.Na+: "Na+" is not a component of the system; use one of Ag+, CN-, K+, H+'],
    ['a count that is not a number', () => run({ salt: { ...kcn, stoich: { 'CN-': Number.NaN } } }), 'salt.stoich.CN-', 'salt.stoich.CN-: a count must be a finite number, got NaN'],
    ['a salt that takes out', () => run({ salt: { ...kcn, stoich: { 'K+': 1, 'CN-': -1 } } }), 'salt.stoich.CN-',
      'salt.stoich.CN-: a salt cannot take "CN-" out of the bath (count -1); use a count of 0 or more'],
    ['a salt bringing nothing with a total', () => run({ salt: { ...kcn, stoich: { 'H+': 1 } } }), 'salt.stoich',
      'salt.stoich: the salt must bring at least one component that has a total in the bath, such as {"Na+": 1, "CN-": 1}'],
    ['a formula that does not parse', () => run({ salt: { ...kcn, formula: 'Kcn' } }), 'salt.formula',
      'salt.formula: Unknown element "Kc" at position 1 in "Kcn": check the spelling and capitals (Co is cobalt, CO is carbon and oxygen).'],
    ['a stock without a formula', () => run({ salt: { name: 'stock', stoich: { 'CN-': 1 }, stock: { massFraction: 0.3, densityKgPerL: 1.1 } } }), 'salt.formula',
      'salt.formula: a stock solution needs the formula of its substance, such as NH3'],
    ['a mass fraction given in percent', () => stock({ massFraction: 25 }), 'salt.stock.massFraction', 'salt.stock.massFraction: is a fraction from 0 to 1 (25 % is 0.25), got 25'],
    ['a mass fraction of 0', () => stock({ massFraction: 0 }), 'salt.stock.massFraction', 'salt.stock.massFraction: the mass fraction must be above 0, got 0'],
    ['a density of 0', () => stock({ densityKgPerL: 0 }), 'salt.stock.densityKgPerL', 'salt.stock.densityKgPerL: the density (kg/L) must be above 0, got 0'],
  ])('%s', (_name, call, field, message) => {
    const e = inputError(call);
    expect(e.field).toBe(field);
    expect(e.message).toBe(message);
  });
});
