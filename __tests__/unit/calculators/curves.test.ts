import { curve, curvesToCsv, seriesColumn, sweepValues, toProblem, type BathState, type Curve, type CurveInput, type Sweep } from '@/lib/calculators';
import { solve } from '@/lib/engine';
import { DEMO_BATHS } from '@/lib/chemistry/demo-baths';

import { expectClose, expectNoNaN, inputError, referenceBath } from './support';

// The demo shop's cyanide silver strike (invented composition, reference constants from memory),
// under Davies with H+ fixed.
const strike = DEMO_BATHS.find((b) => b.key === 'silver-strike')!.problem;
const system = { components: strike.components, species: strike.species!, solids: strike.solids!, activity: strike.activity };
const state: BathState = { totals: strike.totals!, fixed: strike.fixed };
const series: CurveInput['series'] = [
  { kind: 'free', component: 'CN-' },
  { kind: 'species', name: 'Ag(CN)2-' },
  { kind: 'species', name: 'HCN' },
  { kind: 'solid', name: 'AgCN(s)' },
  { kind: 'saturation', name: 'AgCN(s)' },
];

/** Cold solve of the bath with the swept input at x. */
function coldAt(sweep: Sweep, x: number) {
  const v = sweep.variable;
  if (v.kind === 'total') return solve(toProblem(system, { ...state, totals: { ...state.totals, [v.component]: x } }));
  if (v.kind === 'fixed') return solve(toProblem(system, { ...state, fixed: { ...state.fixed, [v.component]: x } }));
  return solve(toProblem(system, { ...state, fixed: { ...state.fixed, 'H+': 10 ** -x } }));
}

describe('curve', () => {
  it.each<[string, Sweep]>([
    ['silver total through AgCN saturation (linear, from 0)', { variable: { kind: 'total', component: 'Ag+' }, from: 0, to: 0.6, points: 61 }],
    ['cyanide total over four decades (log)', { variable: { kind: 'total', component: 'CN-' }, from: 1e-3, to: 10, points: 41, spacing: 'log' }],
    ['pH 13 down to 2', { variable: { kind: 'pH' }, from: 13, to: 2, points: 45 }],
    ['fixed free H+ (log)', { variable: { kind: 'fixed', component: 'H+' }, from: 1e-13, to: 1e-3, points: 21, spacing: 'log' }],
  ])('warm-started points equal cold solves within 1e-9 relative: %s', (_name, sweep) => {
    const c = curve({ system, state, sweep, series });
    expect(c.points).toHaveLength(sweep.points);
    expectNoNaN(c);
    for (const p of c.points) {
      const cold = coldAt(sweep, p.x);
      expect(p.status).toBe(cold.status);
      const [free, complex, hcn, solid, si] = p.values as [number, number, number, number, number];
      expectClose(free, cold.free['CN-'] as number, 1e-9, 1e-300);
      expectClose(complex, cold.species['Ag(CN)2-'] as number, 1e-9, 1e-300);
      expectClose(hcn, cold.species.HCN as number, 1e-9, 1e-300);
      expectClose(solid, cold.solids['AgCN(s)'] ?? 0, 1e-9, 1e-15);
      if (Number.isFinite(cold.saturation['AgCN(s)'])) expectClose(si, cold.saturation['AgCN(s)'] as number, 0, 1e-9);
      else expect(si).toBe(-Infinity);
    }
  });

  it('records fractions of a total that add to 1 with the share in solids', () => {
    const c = curve({ system, state, sweep: { variable: { kind: 'total', component: 'Ag+' }, from: 0.01, to: 0.6, points: 30 }, series: [{ kind: 'fractions', component: 'Ag+' }] });
    expect(c.series.map((s) => s.key)).toEqual(['fraction:Ag+:Ag+', 'fraction:Ag+:Ag(CN)2-', 'fraction:Ag+:Ag(CN)3-2', 'fraction:Ag+:(solids)']);
    for (const p of c.points) expectClose(p.values.reduce((a, v) => a + v, 0), 1, 1e-9);
    expect(seriesColumn(c, 'fraction:Ag+:(solids)').at(-1)).toBeGreaterThan(0);
  });

  it('records solubility as the dissolved total (AgCl in ammonia, ideal: flat once the solid is present)', () => {
    const ammonia = referenceBath(['Ag+', 'Cl-', 'NH3'], 'ideal', ['Ag(NH3)2+', 'AgCl(s)']);
    const c = curve({
      system: ammonia,
      state: { totals: { 'Ag+': 0, 'Cl-': 0, NH3: 1 } },
      sweep: { variable: { kind: 'total', component: 'Ag+' }, from: 0, to: 0.5, points: 11 },
      series: [{ kind: 'solubility', component: 'Ag+' }],
    });
    // With no chloride there is no solid: everything stays dissolved.
    c.points.forEach((p) => expectClose(p.values[0] as number, p.x, 1e-9, 1e-300));
  });

  it('spaces points linearly or by decades with exact endpoints', () => {
    expect(sweepValues({ variable: { kind: 'pH' }, from: 2, to: 4, points: 5 })).toEqual([2, 2.5, 3, 3.5, 4]);
    const log = sweepValues({ variable: { kind: 'total', component: 'CN-' }, from: 1e-4, to: 1, points: 5, spacing: 'log' });
    [1e-4, 1e-3, 1e-2, 1e-1, 1].forEach((v, i) => expectClose(log[i] as number, v, 1e-12));
    expect(log[0]).toBe(1e-4);
    expect(log[4]).toBe(1);
  });

  it('notes that its pH axis is a concentration under Davies', () => {
    const c = curve({ system, state, sweep: { variable: { kind: 'pH' }, from: 12, to: 11, points: 3 }, series });
    expect(c.warnings[0]).toBe('The pH axis is -log10 of the free [H+] (a concentration), not a measured pH (an activity).');
    expect(c.axis).toEqual({ key: 'pH', label: 'pH', unit: '-log10 [H+] free' });
  });
});

describe('curvesToCsv', () => {
  const c = curve({ system, state, sweep: { variable: { kind: 'total', component: 'Ag+' }, from: 0, to: 0.5, points: 6 }, series });
  const lines = curvesToCsv(c).trimEnd().split('\n');

  it('writes a header with units and one row per point', () => {
    expect(lines[0]).toBe('total Ag+ (mol/L),status,free CN- (mol/L),Ag(CN)2- (mol/L),HCN (mol/L),AgCN(s) present (mol/L),SI AgCN(s) (log10 IAP/Ksp)');
    expect(lines).toHaveLength(7);
  });

  it('writes numbers to 6 significant figures that read back, and an empty cell for -Infinity', () => {
    const first = lines[1]!.split(',');
    expect(first[0]).toBe('0');
    expect(first[1]).toBe('converged');
    expect(first[6]).toBe('');
    lines.slice(1).forEach((line, i) => {
      const cells = line.split(',');
      c.points[i]!.values.forEach((v, k) => {
        if (Number.isFinite(v)) expectClose(Number(cells[k + 2]), v, 5e-6, 1e-300);
      });
    });
    expect(curvesToCsv(c)).not.toMatch(/NaN|Infinity/);
  });

  it('quotes a label holding a comma or a quote (RFC 4180)', () => {
    const made: Curve = { axis: { key: 'x', label: 'x, "raw"', unit: 'mol/L' }, series: [], points: [{ x: 1.23456789, status: 'converged', values: [], warnings: [] }], status: 'converged', warnings: [] };
    expect(curvesToCsv(made)).toBe('"x, ""raw"" (mol/L)",status\n1.23457,converged\n');
  });
});

describe('curve errors', () => {
  const ok: Sweep = { variable: { kind: 'total', component: 'CN-' }, from: 0.1, to: 1, points: 5 };
  const run = (sweep: Partial<Sweep> | null, s: CurveInput['series'] = series, st: BathState = state) =>
    curve({ system, state: st, sweep: (sweep === null ? null : { ...ok, ...sweep }) as Sweep, series: s });
  it.each<[string, () => unknown, string, string]>([
    ['no sweep', () => run(null), 'sweep', 'sweep: give the variable, from, to and points'],
    ['a start that is not a number', () => run({ from: Number.NaN }), 'sweep.from', 'sweep.from: the start must be a finite number, got NaN'],
    ['an end that is not a number', () => run({ to: undefined }), 'sweep.to', 'sweep.to: the end must be a finite number, got undefined'],
    ['one point', () => run({ points: 1 }), 'sweep.points', 'sweep.points: must be a whole number from 2 to 2000, got 1'],
    ['too many points', () => run({ points: 2001 }), 'sweep.points', 'sweep.points: must be a whole number from 2 to 2000, got 2001'],
    ['a fractional count', () => run({ points: 2.5 }), 'sweep.points', 'sweep.points: must be a whole number from 2 to 2000, got 2.5'],
    ['an unknown spacing', () => run({ spacing: 'cubic' as 'log' }), 'sweep.spacing', 'sweep.spacing: must be "linear" or "log", got "cubic"'],
    ['pH on a log scale', () => run({ variable: { kind: 'pH' }, from: 2, to: 12, spacing: 'log' }), 'sweep.spacing', 'sweep.spacing: pH is already a logarithm; sweep it with linear spacing'],
    ['a pH out of range', () => run({ variable: { kind: 'pH' }, from: 2, to: 20 }), 'sweep.to', 'sweep.to: the pH must lie between -2 and 16, got 20'],
    ['a negative total', () => run({ from: -0.1 }), 'sweep.from', 'sweep.from: a total cannot be negative, got -0.1 to 1'],
    ['a log sweep from 0', () => run({ from: 0, spacing: 'log' }), 'sweep.from', 'sweep.from: log spacing needs from and to above 0 mol/L, got 0 to 1'],
    ['a fixed sweep through 0 (high end first)', () => run({ variable: { kind: 'fixed', component: 'H+' }, from: 1e-3, to: 0 }), 'sweep.to',
      'sweep.to: a fixed free concentration needs from and to above 0 mol/L, got 0.001 to 0'],
    ['an unknown variable', () => run({ variable: { kind: 'volume' } as unknown as Sweep['variable'] }), 'sweep.variable.kind', 'sweep.variable.kind: must be "total", "fixed" or "pH"'],
    ['an unknown component', () => run({ variable: { kind: 'total', component: 'Cu+' } }), 'sweep.variable.component',
      'sweep.variable.component: "Cu+" is not a component of the system; use one of Ag+, CN-, K+, H+'],
    ['a total sweep of a fixed component', () => run({ variable: { kind: 'total', component: 'H+' } }), 'sweep.variable.component',
      'sweep.variable.component: "H+" has a fixed free concentration in the bath state; sweep it as "fixed" or change the state'],
    ['a fixed sweep of a component with a total', () => run({ variable: { kind: 'fixed', component: 'CN-' } }), 'sweep.variable.component',
      'sweep.variable.component: "CN-" has a total in the bath state; sweep it as "total" or change the state'],
    ['a pH sweep of H+ with a total', () => run({ variable: { kind: 'pH' }, from: 10, to: 12 }, series, { totals: { ...state.totals, 'H+': 0 } }), 'pH',
      'pH: "H+" has a total in the bath state; give either a pH or a total for it, not both'],
    ['no series', () => run({}, []), 'series', 'series: ask for at least one series, such as { kind: "free", component: "CN-" }'],
    ['an unknown series kind', () => run({}, [{ kind: 'colour' } as unknown as CurveInput['series'][number]]), 'series[0].kind',
      'series[0].kind: must be one of free, species, fractions, solubility, solid, saturation'],
    ['free of an unknown component', () => run({}, [{ kind: 'free', component: 'Cl-' }]), 'series[0].component',
      'series[0].component: "Cl-" is not a component of the system; use one of Ag+, CN-, K+, H+'],
    ['an unknown species', () => run({}, [{ kind: 'species', name: 'AgCl2-' }]), 'series[0].name', 'series[0].name: "AgCl2-" is not a component or species of the system'],
    ['fractions of a fixed component', () => run({}, [{ kind: 'fractions', component: 'H+' }]), 'series[0].component',
      'series[0].component: "H+" is held at a fixed free concentration; fractions need a component with a total'],
    ['fractions in a species without the component', () => run({}, [{ kind: 'fractions', component: 'Ag+', species: ['HCN'] }]), 'series[0].species',
      'series[0].species: "HCN" does not contain "Ag+"'],
    ['solubility of an unknown component', () => run({}, [{ kind: 'solubility', component: 'Au+' }]), 'series[0].component',
      'series[0].component: "Au+" is not a component of the system; use one of Ag+, CN-, K+, H+'],
    ['an unknown solid', () => run({}, [{ kind: 'solid', name: 'AgCl(s)' }]), 'series[0].name', 'series[0].name: "AgCl(s)" is not a solid of the system; use one of AgCN(s), Ag2O(s)'],
    ['saturation of an unknown solid', () => run({}, [{ kind: 'saturation', name: 'CuCN(s)' }]), 'series[0].name', 'series[0].name: "CuCN(s)" is not a solid of the system; use one of AgCN(s), Ag2O(s)'],
    ['a column that is not there', () => seriesColumn(run({}), 'free:Ag+'), 'key',
      'key: no series "free:Ag+" in this curve; it has free:CN-, species:Ag(CN)2-, species:HCN, solid:AgCN(s), saturation:AgCN(s)'],
  ])('%s', (_name, call, field, message) => {
    const e = inputError(call);
    expect(e.field).toBe(field);
    expect(e.message).toBe(message);
  });
});
