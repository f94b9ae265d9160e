import { fixerLoading, headroom, type BathState } from '@/lib/calculators';
import { DEMO_BATHS } from '@/lib/chemistry/demo-baths';

import { expectClose, expectNoNaN, inputError, referenceBath, refLog } from './support';

// Closed forms (derived for these tests): for MX(s) + 2L = ML2 + X with K = Ksp * beta2, and a
// bath holding only the ligand, s^2 / (L - 2s)^2 = K, so s = sqrt(K) / (1 + 2 sqrt(K)) * L. They
// ignore the free metal ion and every other species, so the systems below carry only ML2.
// Constants: AgCl(s) -9.74, AgBr(s) -12.3 (CRC, from memory); Ag(NH3)2+ 7.22, Ag(S2O3)2-3 13.46
// (Smith & Martell, from memory). Atomic weights: IUPAC CIAAW 2021 (Ag 107.8682, Cl 35.45, Br 79.904).
const AG = 107.8682;
const closedForm = (logKsp: number, logBeta2: number, ligandTotal: number) => {
  const r = Math.sqrt(10 ** (logKsp + logBeta2));
  return (r / (1 + 2 * r)) * ligandTotal;
};
const ammonia = referenceBath(['Ag+', 'Cl-', 'NH3'], 'ideal', ['Ag(NH3)2+', 'AgCl(s)']);
const thio = referenceBath(['Ag+', 'Br-', 'S2O3-2'], 'ideal', ['Ag(S2O3)2-3', 'AgBr(s)']);

describe('headroom against the single-complex closed form', () => {
  it.each<[string, typeof ammonia, string, string, string, number, number, number]>([
    ['AgCl in 0.5 M ammonia', ammonia, 'AgCl(s)', 'Ag(NH3)2+', 'NH3', 0.5, 1e-6, 107.8682 + 35.45],
    ['AgCl in 1 M ammonia', ammonia, 'AgCl(s)', 'Ag(NH3)2+', 'NH3', 1, 1e-6, 107.8682 + 35.45],
    ['AgCl in 3 M ammonia', ammonia, 'AgCl(s)', 'Ag(NH3)2+', 'NH3', 3, 1e-6, 107.8682 + 35.45],
    ['AgBr in 0.2 M thiosulfate', thio, 'AgBr(s)', 'Ag(S2O3)2-3', 'S2O3-2', 0.2, 1e-6, 107.8682 + 79.904],
    ['AgBr in 0.8 M thiosulfate', thio, 'AgBr(s)', 'Ag(S2O3)2-3', 'S2O3-2', 0.8, 1e-6, 107.8682 + 79.904],
  ])('%s', (_name, system, solid, complex, ligand, total, tolerance, molarMass) => {
    const [metal, halide] = system.components as [string, string];
    const state: BathState = { totals: { [metal]: 0, [halide]: 0, [ligand]: total } };
    const h = headroom({ system, state, solid });
    const s = closedForm(refLog(solid), refLog(complex), total);
    expect(h.outcome).toBe('headroom');
    expect(h.status).toBe('converged');
    expectClose(h.molPerL, s, tolerance);
    expectClose(h.gramsPerL as number, s * molarMass, tolerance);
    expect(h.metal?.component).toBe('Ag+');
    expectClose(h.metal?.gramsPerL as number, s * AG, tolerance);
    expect(h.atSaturation.saturation[solid]).toBeCloseTo(0, 9);
    expect(h.atSaturation.solids[solid]).toBeGreaterThan(0);
    expectClose(h.atSaturation.free[ligand] as number, total - 2 * s, tolerance);
    expect(h.message).toBe(`${h.molPerL.toPrecision(4)} mol/L more ${solid} dissolves before it persists.`);
    expectNoNaN(h);
  });
});

describe('headroom on the full equilibrium', () => {
  it('is sqrt(Ksp) for AgCl in pure water (solubility product, CRC, from memory)', () => {
    const h = headroom({ system: ammonia, state: { totals: { 'Ag+': 0, 'Cl-': 0, NH3: 0 } }, solid: 'AgCl(s)' });
    expectClose(h.molPerL, Math.sqrt(10 ** refLog('AgCl(s)')), 1e-9);
  });

  it('is Ksp / [Cl-] in a chloride rinse (common ion, free Ag+ only)', () => {
    const h = headroom({ system: ammonia, state: { totals: { 'Ag+': 0, 'Cl-': 0.1, NH3: 0 } }, solid: 'AgCl(s)' });
    // s (0.1 + s) = Ksp, s << 0.1.
    const ksp = 10 ** refLog('AgCl(s)');
    expectClose(h.molPerL, (-0.1 + Math.sqrt(0.01 + 4 * ksp)) / 2, 1e-6);
  });

  it('reports a bath already saturated with the solid', () => {
    const h = headroom({ system: ammonia, state: { totals: { 'Ag+': 0.1, 'Cl-': 0.1, NH3: 0.1 } }, solid: 'AgCl(s)' });
    expect(h.outcome).toBe('already_saturated');
    expect(h.molPerL).toBe(0);
    expect(h.message).toBe('The bath is already saturated with AgCl(s): headroom 0.');
    expect(h.atSaturation).toBe(h.now);
  });

  it('lets another solid form while the offered one dissolves (AgBr appears as AgCl is offered to ammonia with bromide)', () => {
    const system = referenceBath(['Ag+', 'Cl-', 'Br-', 'NH3'], 'ideal', ['Ag(NH3)2+', 'AgCl(s)', 'AgBr(s)']);
    const withBromide = headroom({ system, state: { totals: { 'Ag+': 0, 'Cl-': 0, 'Br-': 0.02, NH3: 1 } }, solid: 'AgCl(s)' });
    const without = headroom({ system: ammonia, state: { totals: { 'Ag+': 0, 'Cl-': 0, NH3: 1 } }, solid: 'AgCl(s)' });
    expect(withBromide.atSaturation.solids['AgBr(s)']).toBeGreaterThan(0);
    // AgBr takes silver out of solution, so more AgCl dissolves than in the bromide-free bath.
    expect(withBromide.molPerL).toBeGreaterThan(without.molPerL);
  });

  it('reports a solid that never persists (an invented, absurdly strong neutral complex)', () => {
    const system = { ...ammonia, species: [{ name: 'AgCl', logK: 20, stoich: { 'Ag+': 1, 'Cl-': 1 } }] };
    const h = headroom({ system, state: { totals: { 'Ag+': 0, 'Cl-': 0, NH3: 1 } }, solid: 'AgCl(s)' });
    expect(h.outcome).toBe('not_reached');
    expect(h.message).toBe(`AgCl(s) still dissolves completely at ${h.molPerL.toPrecision(3)} mol/L offered; no limit found up to 10000 mol/L.`);
  });

  it('passes on warnings and converts a measured pH (demo fixer, Davies)', () => {
    const p = DEMO_BATHS.find((b) => b.key === 'fixer-a')?.problem;
    const system = { components: p!.components, species: p!.species!, solids: p!.solids!, activity: p!.activity };
    const h = headroom({ system, state: { totals: p!.totals! }, pH: { pH: 6.5 }, solid: 'AgBr(s)' });
    expect(h.outcome).toBe('headroom');
    expect(h.freeH).toBeCloseTo(10 ** -6.5 / (h.now.gamma['H+'] as number), 15);
    expect(h.warnings.some((w) => w.startsWith('Measured pH 6.5 taken as an activity'))).toBe(true);
    expect(h.atSaturation.saturation['AgBr(s)']).toBeCloseTo(0, 9);
  });

  it('gives CuCN headroom per copper in the demo copper strike (Cu 63.546, IUPAC 2021)', () => {
    const p = DEMO_BATHS.find((b) => b.key === 'copper-strike')?.problem;
    const system = { components: p!.components, species: p!.species!, solids: p!.solids!, activity: p!.activity };
    const h = headroom({ system, state: { totals: p!.totals!, fixed: p!.fixed }, solid: 'CuCN(s)' });
    expect(h.metal?.component).toBe('Cu+');
    expectClose(h.metal?.gramsPerL as number, h.molPerL * 63.546, 1e-12);
    expectClose(h.gramsPerL as number, h.molPerL * (63.546 + 12.011 + 14.007), 1e-12);
  });
});

describe('fixerLoading', () => {
  it.each<[string, number, number]>([
    ['a fresh fixer', 0, 0.5],
    ['a fixer holding 0.05 M silver bromide', 0.05, 0.5],
    ['a fixer holding 0.1 M silver bromide', 0.1, 0.6],
  ])('%s against the closed form (capacity = s - a, loading = a / s)', (_name, held, thiosulfate) => {
    const r = fixerLoading({ system: thio, state: { totals: { 'Ag+': held, 'Br-': held, 'S2O3-2': thiosulfate } } });
    const s = closedForm(refLog('AgBr(s)'), refLog('Ag(S2O3)2-3'), thiosulfate);
    expect(r.outcome).toBe('headroom');
    expectClose(r.capacity.molPerL, s - held, 1e-6);
    expectClose(r.capacity.gramsPerL, (s - held) * AG, 1e-6);
    expectClose(r.capacity.solidGramsPerL as number, (s - held) * (AG + 79.904), 1e-6);
    expectClose(r.silverNow.gramsPerL, held * AG, 1e-12, 1e-300);
    expectClose(r.loadingPercent, (100 * held) / s, 1e-6, 1e-300);
  });

  it('is 100 % for a fixer saturated with silver bromide', () => {
    const r = fixerLoading({ system: thio, state: { totals: { 'Ag+': 0.3, 'Br-': 0.3, 'S2O3-2': 0.5 } } });
    expect(r.outcome).toBe('already_saturated');
    expect(r.loadingPercent).toBe(100);
    expect(r.message).toBe('The bath is already saturated with AgBr(s): headroom 0. Silver held 32.4 g/L; loading 100 % of capacity.');
  });
});

describe('headroom errors', () => {
  const state: BathState = { totals: { 'Ag+': 0, 'Cl-': 0, NH3: 1 } };
  const copper = referenceBath(['Cu+2', 'NH3', 'H+']);
  it.each<[string, () => unknown, string, string]>([
    ['an unknown solid', () => headroom({ system: ammonia, state, solid: 'AgI(s)' }), 'solid', 'solid: "AgI(s)" is not a solid of the system; use one of AgCl(s)'],
    ['a system without solids', () => headroom({ system: { ...ammonia, solids: [] }, state, solid: 'AgCl(s)' }), 'solid',
      'solid: "AgCl(s)" is not a solid of the system; the system has no solids; add one'],
    ['an unknown metal', () => headroom({ system: ammonia, state, solid: 'AgCl(s)', metal: 'Au+' }), 'metal',
      'metal: "Au+" is not a component of the system; use one of Ag+, Cl-, NH3'],
    ['a metal the solid does not hold', () => headroom({ system: ammonia, state, solid: 'AgCl(s)', metal: 'NH3' }), 'metal',
      'metal: "NH3" is not released by "AgCl(s)"; name a component the solid holds'],
    ['a solid that consumes a component with a total', () => headroom({ system: copper, state: { totals: { 'Cu+2': 0.1, NH3: 1, 'H+': 0.01 } }, solid: 'Cu(OH)2(s)' }), 'solid',
      'solid: "Cu(OH)2(s)" consumes "H+" (count -2), which has a total; hold "H+" fixed (for H+, give a pH) to work out its headroom'],
    ['fixer silver held fixed', () => fixerLoading({ system: thio, state: { totals: { 'Br-': 0, 'S2O3-2': 0.5 }, fixed: { 'Ag+': 1e-12 } } }), 'silver',
      'silver: "Ag+" needs a total (mol/L) in the bath state, not a fixed free concentration'],
    ['a fixer solid without silver', () => fixerLoading({ system: { ...thio, solids: [...thio.solids, { name: 'NaBr(s)', logKsp: 2, stoich: { 'Br-': 1 } }] }, state: { totals: { 'Ag+': 0, 'Br-': 0, 'S2O3-2': 0.5 } }, solid: 'NaBr(s)' }), 'solid',
      'solid: "NaBr(s)" holds no "Ag+"; pick the silver halide the fixer dissolves, such as AgBr(s)'],
  ])('%s', (_name, call, field, message) => {
    const e = inputError(call);
    expect(e.field).toBe(field);
    expect(e.message).toBe(message);
  });
});
