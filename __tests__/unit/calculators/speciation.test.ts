import { cyanideAsHcn, protonatedShare, solveAtPh, speciation, speciationOf, type BathState } from '@/lib/calculators';

import { expectClose, expectInvariants, inputError, referenceBath } from './support';

// HCN pKa 9.21 and NH4+ pKa 9.25 (Smith & Martell, from memory); for one protonation step the
// protonated share is 1 / (1 + 10^(pH - pKa)) (Henderson-Hasselbalch).
const cyanide = referenceBath(['CN-', 'H+'], 'ideal', ['HCN']);
const share = (pH: number, pKa: number) => 1 / (1 + 10 ** (pH - pKa));

describe('cyanideAsHcn', () => {
  it.each<[string, number, number]>([
    ['pH 9.2, just below the pKa', 9.2, 1e-9],
    ['pH 10', 10, 1e-9],
    ['pH 11', 11, 1e-9],
  ])('%s: HCN share is 1 / (1 + 10^(pH - 9.21))', (_name, pH, tolerance) => {
    const { result } = solveAtPh(cyanide, { totals: { 'CN-': 0.05 } }, pH);
    const hcn = cyanideAsHcn(cyanide, result);
    expectClose(hcn.ratio, share(pH, 9.21), tolerance);
    expectClose(hcn.fractionOfTotal, share(pH, 9.21), tolerance);
    expectClose(hcn.protonatedMolPerL, 0.05 * share(pH, 9.21), tolerance);
    expectClose(hcn.totalMolPerL, 0.05, 1e-12);
  });

  it('counts cyanide held by silver in the total, not in the ratio (silver strike composition, ideal)', () => {
    const system = referenceBath(['Ag+', 'CN-', 'H+'], 'ideal');
    const { result } = solveAtPh(system, { totals: { 'Ag+': 0.015, 'CN-': 0.75 } }, 10);
    const hcn = cyanideAsHcn(system, result);
    expect(hcn.fractionOfTotal).toBeLessThan(hcn.ratio);
    expectClose(hcn.ratio, share(10, 9.21), 1e-9);
    expectClose(hcn.totalMolPerL, 0.75, 1e-9);
  });

  it('takes other names for cyanide and HCN', () => {
    const system = { components: ['cn-', 'H+'], species: [{ name: 'hcn', logK: 9.21, stoich: { 'H+': 1, 'cn-': 1 } }], solids: [] };
    const { result } = solveAtPh(system, { totals: { 'cn-': 0.01 } }, 9.21);
    expectClose(cyanideAsHcn(system, result, { cyanide: 'cn-', hcn: 'hcn' }).ratio, 0.5, 1e-9);
  });
});

describe('protonatedShare', () => {
  it('is one half for ammonia at pH = pKa 9.25', () => {
    const system = referenceBath(['NH3', 'H+'], 'ideal', ['NH4+']);
    const { result } = solveAtPh(system, { totals: { NH3: 1 } }, 9.25);
    const s = protonatedShare(system, result, 'NH3', ['NH4+']);
    expectClose(s.ratio, 0.5, 1e-9);
    expectClose(s.freeMolPerL, 0.5, 1e-9);
  });
});

describe('speciation', () => {
  const system = referenceBath(['Ag+', 'Cl-', 'NH3', 'H+'], 'ideal');
  const state: BathState = { totals: { 'Ag+': 0.1, 'Cl-': 0.12, NH3: 0.3 } };

  it('accounts for every component with a total: free + complexes + solids = 1, largest share first', () => {
    const s = speciation({ system, state, pH: { pH: 10 } });
    expect(s.status).toBe('converged');
    expectInvariants(system, state, s.result);
    expect(s.components.map((c) => c.component)).toEqual(['Ag+', 'Cl-', 'NH3']);
    for (const c of s.components) {
      const sum = c.species.reduce((a, h) => a + h.fraction, 0) + c.solids.reduce((a, h) => a + h.fraction, 0);
      expectClose(sum, 1, 1e-9);
      expectClose(c.dissolvedFraction + c.solidFraction, 1, 1e-9);
      for (let i = 1; i < c.species.length; i++) expect(c.species[i - 1]!.fraction).toBeGreaterThanOrEqual(c.species[i]!.fraction);
      expectClose(c.freeFraction, c.free / c.total, 1e-12);
    }
  });

  it('shows the silver held as AgCl(s) when the ammonia cannot hold it all', () => {
    const s = speciation({ system, state, pH: { pH: 10 } });
    const silver = s.components.find((c) => c.component === 'Ag+')!;
    expect(silver.solids.map((h) => h.name)).toEqual(['AgCl(s)']);
    expectClose(silver.solidFraction, (s.result.solids['AgCl(s)'] as number) / 0.1, 1e-12);
    expect(silver.species[0]?.name).toBe('Ag(NH3)2+');
  });

  it('gives fractions of 0, not NaN, for a component whose total is 0', () => {
    const { result } = solveAtPh(system, { totals: { 'Ag+': 0, 'Cl-': 0.1, NH3: 0.1 } }, 9);
    const silver = speciationOf(system, { totals: { 'Ag+': 0, 'Cl-': 0.1, NH3: 0.1 } }, result)[0]!;
    expect(silver.species.every((h) => h.fraction === 0)).toBe(true);
    expect(silver.freeFraction).toBe(0);
  });
});

describe('speciation errors', () => {
  const { result } = solveAtPh(cyanide, { totals: { 'CN-': 0.05 } }, 10);
  it.each<[string, () => unknown, string, string]>([
    ['an unknown ligand', () => protonatedShare(cyanide, result, 'SCN-', ['HSCN']), 'ligand', 'ligand: "SCN-" is not a component of the system; use one of CN-, H+'],
    ['no protonated species', () => protonatedShare(cyanide, result, 'CN-', []), 'protonatedSpecies', 'protonatedSpecies: name at least one protonated species of "CN-", such as HCN for CN-'],
    ['a species without the ligand', () => cyanideAsHcn(cyanide, result, { hcn: 'HSCN' }), 'protonatedSpecies', 'protonatedSpecies: "HSCN" is not a species of the system that contains "CN-"'],
  ])('%s', (_name, call, field, message) => {
    const e = inputError(call);
    expect(e.field).toBe(field);
    expect(e.message).toBe(message);
  });
});
