// The engine against closed forms worked by hand, each with its source. Constants are the
// reference values named beside each case (from memory of the handbooks); the scenarios are our own.
import { compileProblem, retarget, solve, solveTableau, vantHoff, type Problem } from '@/lib/engine';

const close = (actual: number, expected: number, relative: number) =>
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(relative * Math.abs(expected));

describe('solubility with one complex (single-complex closed form)', () => {
  // AgCl(s) log Ksp -9.74 (CRC, from memory); Ag(NH3)2+ log beta2 7.22 (Smith & Martell, from
  // memory). With only Ag(NH3)2+ and free Ag+ neglected (up to 1e-5 of s here): K = Ksp beta2,
  // s / ([NH3]T - 2s) = sqrt(K), so s = sqrt(K) [NH3]T / (1 + 2 sqrt(K)).
  it.each([0.1, 1.0, 4.0])('AgCl in %s mol/L ammonia', (nh3) => {
    const k = 10 ** (-9.74 + 7.22);
    const expected = (Math.sqrt(k) * nh3) / (1 + 2 * Math.sqrt(k));
    const r = solve({
      components: ['Ag+', 'Cl-', 'NH3'],
      totals: { 'Ag+': 2 * nh3, 'Cl-': 2 * nh3, NH3: nh3 },
      species: [{ name: 'Ag(NH3)2+', logK: 7.22, stoich: { 'Ag+': 1, NH3: 2 } }],
      solids: [{ name: 'AgCl(s)', logKsp: -9.74, stoich: { 'Ag+': 1, 'Cl-': 1 } }],
    });
    close(2 * nh3 - (r.solids['AgCl(s)'] as number), expected, 2e-5);
    expect(r.saturation['AgCl(s)']).toBeCloseTo(0, 9);
  });

  // AgBr(s) log Ksp -12.3 (CRC, from memory); Ag(S2O3)2-3 log beta2 13.46 (Smith & Martell, from memory).
  it('AgBr in 0.5 mol/L thiosulfate', () => {
    const k = 10 ** (-12.3 + 13.46);
    const expected = (Math.sqrt(k) * 0.5) / (1 + 2 * Math.sqrt(k));
    const r = solve({
      components: ['Ag+', 'Br-', 'S2O3-2'],
      totals: { 'Ag+': 1, 'Br-': 1, 'S2O3-2': 0.5 },
      species: [{ name: 'Ag(S2O3)2-3', logK: 13.46, stoich: { 'Ag+': 1, 'S2O3-2': 2 } }],
      solids: [{ name: 'AgBr(s)', logKsp: -12.3, stoich: { 'Ag+': 1, 'Br-': 1 } }],
    });
    close(1 - (r.solids['AgBr(s)'] as number), expected, 1e-6);
  });
});

describe('acid-base', () => {
  // HCN pKa 9.21 (Smith & Martell, from memory): fraction as HCN = 1 / (1 + 10^(pH - 9.21)).
  it.each([9.2, 10, 11])('fraction of cyanide as HCN at pH %s', (pH) => {
    const r = solve({
      components: ['CN-', 'H+'],
      totals: { 'CN-': 0.05 },
      fixed: { 'H+': 10 ** -pH },
      species: [{ name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'CN-': 1 } }],
    });
    close((r.species.HCN as number) / 0.05, 1 / (1 + 10 ** (pH - 9.21)), 1e-10);
  });

  // 0.1 M NaCN in water, proton balance with total H = 0: [OH-] = [HCN] + [H+]; hand solution
  // [OH-]^2 ~ Kb C with Kb = 10^(-14+9.21), so pH = 14 + log10(sqrt(Kb 0.1)) = 11.105 to three figures.
  it('pH of 0.1 mol/L sodium cyanide from the proton balance', () => {
    const r = solve({
      components: ['Na+', 'CN-', 'H+'],
      totals: { 'Na+': 0.1, 'CN-': 0.1, 'H+': 0 },
      species: [
        { name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'CN-': 1 } },
        { name: 'OH-', logK: -14, stoich: { 'H+': -1 } },
      ],
    });
    expect(-Math.log10(r.free['H+'] as number)).toBeCloseTo(11.1, 1);
  });
});

describe('complexes and constants', () => {
  // Cu(II)-ammine stepwise log K 4.04, 3.43, 2.80, 1.48 (Smith & Martell, from memory) entered as
  // cumulative betas; at a free ammonia of 1 mol/L the fraction as Cu(NH3)4+2 is
  // beta4 / (1 + beta1 + beta2 + beta3 + beta4).
  it('copper(II) ammine distribution at fixed free ammonia', () => {
    const steps = [4.04, 3.43, 2.8, 1.48];
    const betas = steps.map((_, i) => steps.slice(0, i + 1).reduce((a, b) => a + b, 0));
    expect(betas[3]).toBeCloseTo(11.75, 10);
    const r = solve({
      components: ['Cu+2', 'NH3'],
      totals: { 'Cu+2': 1e-3 },
      fixed: { NH3: 1 },
      species: betas.map((logK, i) => ({ name: `Cu(NH3)${i + 1}+2`, logK, stoich: { 'Cu+2': 1, NH3: i + 1 } })),
    });
    const sum = 1 + betas.reduce((a, b) => a + 10 ** b, 0);
    close((r.species['Cu(NH3)4+2'] as number) / 1e-3, 10 ** 11.75 / sum, 1e-10);
  });

  // Au(CN)2- log beta2 38.3 (NIST SRD 46, from memory): extreme constant, extreme totals.
  it.each([
    [1e-12, 10],
    [1e-3, 0.01],
    [10, 25],
  ])('gold cyanide with Au %s and CN %s mol/L converges and balances', (au, cn) => {
    const r = solve({
      components: ['Au+', 'CN-'],
      totals: { 'Au+': au, 'CN-': cn },
      species: [{ name: 'Au(CN)2-', logK: 38.3, stoich: { 'Au+': 1, 'CN-': 2 } }],
    });
    expect(r.status).toBe('converged');
    close(r.species['Au(CN)2-'] as number, au, 1e-10);
    // Free gold from the constant: [Au+] = [Au(CN)2-] / (beta2 [CN-]^2).
    close(r.free['Au+'] as number, (r.species['Au(CN)2-'] as number) / (10 ** 38.3 * (r.free['CN-'] as number) ** 2), 1e-9);
  });
});

describe('activity and temperature', () => {
  // Davies (1962): log10 gamma = -0.509 z^2 (sqrt(I)/(1 + sqrt(I)) - 0.3 I). At I = 0.1 mol/L
  // (0.1 M of a 1:1 salt): log gamma(+-1) = -0.509 (0.24025 - 0.03) = -0.10702 (hand calculation).
  it('Davies coefficients at I = 0.1 mol/L', () => {
    const r = solve({ components: ['Na+', 'Cl-', 'SO4-2'], totals: { 'Na+': 0.1, 'Cl-': 0.1, 'SO4-2': 1e-9 }, activity: 'davies' });
    close(r.ionicStrength, 0.1, 1e-6);
    close(Math.log10(r.gamma['Na+'] as number), -0.10702, 1e-3);
    close(Math.log10(r.gamma['SO4-2'] as number), 4 * -0.10702, 1e-3);
  });

  it('warns above I = 0.5 mol/L under Davies', () => {
    const r = solve({ components: ['Na+', 'Cl-'], totals: { 'Na+': 2, 'Cl-': 2 }, activity: 'davies' });
    expect(r.warnings.join(' ')).toMatch(/above 0.5 mol\/L/);
  });

  // van 't Hoff with the HCN protonation enthalpy -43.6 kJ/mol (Smith & Martell, from memory):
  // log K(50 C) = 9.21 + 43600 / (8.314462618 ln 10) (1/323.15 - 1/298.15) = 8.619 (hand calculation).
  it('van t Hoff correction and the warning when no enthalpy is given', () => {
    expect(vantHoff(9.21, -43.6, 25, 50)).toBeCloseTo(8.619, 3);
    const problem: Problem = {
      components: ['CN-', 'H+'],
      totals: { 'CN-': 0.01 },
      fixed: { 'H+': 10 ** -8.619 },
      temperatureC: 50,
      species: [{ name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'CN-': 1 }, deltaH: -43.6 }],
    };
    const r = solve(problem);
    close(r.species.HCN as number, 0.005, 1e-3);
    const plain = solve({ ...problem, species: [{ name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'CN-': 1 } }] });
    expect(plain.warnings.join(' ')).toMatch(/another temperature and have no enthalpy/);
  });
});

describe('solids that come and go', () => {
  // AgCl(s) with ammonia added step by step: present while Ag(NH3)2+ cannot hold the silver,
  // gone once the ammonia suffices (threshold from the closed form above: s = 0.01 M at
  // [NH3]T = 0.01 (1 + 2 sqrt K) / sqrt K).
  it('AgCl(s) dissolves as ammonia rises, warm-started along the sweep', () => {
    const k = Math.sqrt(10 ** (-9.74 + 7.22));
    const threshold = (0.01 * (1 + 2 * k)) / k;
    const tab = compileProblem({
      components: ['Ag+', 'Cl-', 'NH3'],
      totals: { 'Ag+': 0.01, 'Cl-': 0.01, NH3: 0.01 },
      species: [{ name: 'Ag(NH3)2+', logK: 7.22, stoich: { 'Ag+': 1, NH3: 2 } }],
      solids: [{ name: 'AgCl(s)', logKsp: -9.74, stoich: { 'Ag+': 1, 'Cl-': 1 } }],
    });
    let state;
    for (const factor of [0.5, 0.9, 0.99, 1.01, 1.1, 2]) {
      const solution = solveTableau(retarget(tab, { totals: { NH3: factor * threshold } }), {}, state);
      state = solution.state;
      expect(solution.result.status).toBe('converged');
      expect((solution.result.solids['AgCl(s)'] ?? 0) > 0).toBe(factor < 1);
    }
  });

  // Three silver halides (CRC, from memory): with silver short of the halides, AgI and AgBr form
  // and AgCl stays below saturation; with silver in excess of all three, all three are present.
  it.each([
    [0.015, ['AgBr(s)', 'AgI(s)']],
    [0.025, ['AgBr(s)', 'AgCl(s)', 'AgI(s)']],
  ])('silver %s mol/L into 0.01 mol/L each of chloride, bromide and iodide', (ag, present) => {
    const r = solve({
      components: ['Ag+', 'Cl-', 'Br-', 'I-'],
      totals: { 'Ag+': ag, 'Cl-': 0.01, 'Br-': 0.01, 'I-': 0.01 },
      solids: [
        { name: 'AgCl(s)', logKsp: -9.74, stoich: { 'Ag+': 1, 'Cl-': 1 } },
        { name: 'AgBr(s)', logKsp: -12.3, stoich: { 'Ag+': 1, 'Br-': 1 } },
        { name: 'AgI(s)', logKsp: -16.08, stoich: { 'Ag+': 1, 'I-': 1 } },
      ],
    });
    expect(Object.keys(r.solids).sort()).toEqual(present);
  });

  // Cu(OH)2(s) + 2 H+ = Cu+2 + 2 H2O, log K 8.64 (Baes & Mesmer, from memory): at fixed pH the
  // free copper over the solid is 10^(8.64 - 2 pH).
  it.each([6, 7, 8])('copper hydroxide written with negative H+ at pH %s', (pH) => {
    const r = solve({
      components: ['Cu+2', 'H+'],
      totals: { 'Cu+2': 0.01 },
      fixed: { 'H+': 10 ** -pH },
      solids: [{ name: 'Cu(OH)2(s)', logKsp: 8.64, stoich: { 'Cu+2': 1, 'H+': -2 } }],
    });
    close(r.free['Cu+2'] as number, 10 ** (8.64 - 2 * pH), 1e-9);
    expect(r.saturation['Cu(OH)2(s)']).toBeCloseTo(0, 8);
  });
});
