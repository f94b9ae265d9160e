import { compileBath, solveAtPh, solveBath, toProblem, type BathState, type ChemicalSystem } from '@/lib/calculators';

import { expectClose, expectInvariants, inputError, referenceBath } from './support';

// An invented rinse: 0.1 M NaCl with 0.01 M cyanide; HCN (log K 9.21) and OH- (log Kw -14) from
// the reference set (Smith & Martell; common textbook value; from memory).
const rinse = (activity: 'ideal' | 'davies'): ChemicalSystem => referenceBath(['Na+', 'Cl-', 'CN-', 'H+'], activity);
const state: BathState = { totals: { 'Na+': 0.1, 'Cl-': 0.1, 'CN-': 0.01 } };

describe('toProblem', () => {
  it('puts the system and the state in the general problem form', () => {
    const system = { ...rinse('davies'), temperatureC: 30, ionicStrength: 0.5 };
    expect(toProblem(system, { totals: { 'CN-': 1 }, fixed: { 'H+': 1e-10 } })).toEqual({
      components: system.components,
      totals: { 'CN-': 1 },
      fixed: { 'H+': 1e-10 },
      species: system.species,
      solids: system.solids,
      activity: 'davies',
      temperatureC: 30,
      ionicStrength: 0.5,
    });
  });

  it('defaults to ideal activity and no fixed components', () => {
    const p = toProblem({ components: ['Ag+'], species: [], solids: [] }, { totals: { 'Ag+': 0.1 } });
    expect(p.activity).toBe('ideal');
    expect(p.fixed).toEqual({});
  });
});

describe('solveAtPh', () => {
  it.each([8, 9.21, 10.5])('ideal at pH %d: free [H+] is 10^-pH, no conversion', (pH) => {
    const sol = solveAtPh(rinse('ideal'), state, pH);
    expect(sol.freeH).toBe(10 ** -pH);
    expectClose(sol.result.free['H+'] as number, 10 ** -pH, 1e-14);
    expect(sol.result.warnings.some((w) => w.startsWith('Measured pH'))).toBe(false);
    expectInvariants(rinse('ideal'), state, sol.result);
  });

  it.each([7, 9.5, 12])('Davies at pH %d: free [H+] = 10^-pH / gamma(H+) at the final ionic strength', (pH) => {
    const sol = solveAtPh(rinse('davies'), state, pH);
    const gamma = sol.result.gamma['H+'] as number;
    expectClose(sol.freeH as number, 10 ** -pH / gamma, 1e-9);
    // Davies (1962) with A = 0.509 at 25 C: log gamma = -A z^2 (sqrt I / (1 + sqrt I) - 0.3 I).
    const rootI = Math.sqrt(sol.result.ionicStrength);
    expectClose(gamma, 10 ** (-0.509 * (rootI / (1 + rootI) - 0.3 * sol.result.ionicStrength)), 1e-9);
    expect(sol.result.warnings).toContain(
      `Measured pH ${pH} taken as an activity: free [H+] = 10^-pH / γ = ${(sol.freeH as number).toPrecision(4)} mol/L (γ(H+) = ${gamma.toPrecision(4)}, Davies).`,
    );
    expectInvariants(rinse('davies'), state, sol.result);
  });

  it('takes the pH as a concentration when measured is false', () => {
    const sol = solveAtPh(rinse('davies'), state, 9.5, { measured: false });
    expect(sol.freeH).toBe(10 ** -9.5);
    expect(sol.result.warnings.some((w) => w.startsWith('Measured pH'))).toBe(false);
  });

  it('uses a fixed ionic strength for gamma (one correction settles it)', () => {
    const sol = solveAtPh({ ...rinse('davies'), ionicStrength: 0.3 }, state, 10);
    const rootI = Math.sqrt(0.3);
    expectClose(sol.freeH as number, 10 ** -10 / 10 ** (-0.509 * (rootI / (1 + rootI) - 0.09)), 1e-9);
  });

  it('overrides a fixed H+ already in the state', () => {
    const sol = solveAtPh(rinse('ideal'), { ...state, fixed: { 'H+': 1e-3 } }, 11);
    expectClose(sol.result.free['H+'] as number, 1e-11, 1e-14);
  });
});

describe('solveBath', () => {
  it('solves as given without a pH', () => {
    const sol = solveBath(rinse('ideal'), { ...state, fixed: { 'H+': 1e-9 } });
    expect(sol.freeH).toBeNull();
    expect(sol.result.status).toBe('converged');
  });
});

describe('system errors', () => {
  const sys = rinse('ideal');
  it.each<[string, () => unknown, string, string]>([
    ['a pH that is not a number', () => solveAtPh(sys, state, Number.NaN), 'pH', 'pH: the pH must be a finite number, got NaN'],
    ['a pH out of range', () => solveAtPh(sys, state, 17), 'pH', 'pH: the pH must lie between -2 and 16, got 17'],
    ['an unknown H component', () => solveAtPh(sys, state, 7, { hComponent: 'H3O+' }), 'hComponent',
      'hComponent: "H3O+" is not a component of the system; use one of Na+, Cl-, CN-, H+'],
    ['a pH for a component with a total', () => solveAtPh(sys, { totals: { ...state.totals, 'H+': 0.01 } }, 7), 'pH',
      'pH: "H+" has a total in the bath state; give either a pH or a total for it, not both'],
    ['no system', () => compileBath(null as unknown as ChemicalSystem, state), 'system', 'system: give the chemical system: components, species and solids'],
    ['no totals', () => compileBath(sys, {} as BathState), 'state.totals', 'state.totals: give the bath totals as an object of component name to mol/L'],
    ['a negative total (from the engine)', () => compileBath(sys, { totals: { ...state.totals, 'CN-': -1 }, fixed: { 'H+': 1e-7 } }), 'state.totals.CN-',
      'state.totals.CN-: a total cannot be negative (got -1 mol/L)'],
    ['a component with neither total nor fixed value (from the engine)', () => compileBath(sys, state), 'state.totals.H+',
      'state.totals.H+: component "H+" needs a total (mol/L) or a fixed free concentration'],
    ['a bad constant (from the engine)', () => compileBath({ ...sys, species: [{ name: 'HCN', logK: Number.NaN, stoich: { 'H+': 1, 'CN-': 1 } }] }, { ...state, fixed: { 'H+': 1e-7 } }),
      'system.species[0].logK', 'system.species[0].logK: log K must be a finite number, got NaN'],
  ])('%s', (_name, call, field, message) => {
    const e = inputError(call);
    expect(e.field).toBe(field);
    expect(e.message).toBe(message);
  });
});
