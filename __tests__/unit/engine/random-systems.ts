// Random but realistic systems for property tests: one or two metals, one or two ligands, an
// anion that forms salts, fixed pH, complexes with cumulative constants up to log beta ~ 40,
// ligand protonation, hydrolysis, salts and hydroxide solids (written with negative H+), totals
// from 1e-12 to 10 mol/L (0.1 mol/L under Davies), ideal or Davies activity.
import fc from 'fast-check';

import type { Problem, SolidInput, SpeciesInput } from '@/lib/engine';

const METALS = [
  { name: 'Ma+', z: 1 },
  { name: 'Mb+2', z: 2 },
  { name: 'Mc+', z: 1 },
];
const LIGANDS = [
  { name: 'La-', z: -1 },
  { name: 'Lb-2', z: -2 },
  { name: 'Ln', z: 0 },
];

const logTotal = fc.double({ min: -12, max: 1, noNaN: true });
const stepK = fc.double({ min: -1, max: 11, noNaN: true });

export const randomProblem: fc.Arbitrary<Problem> = fc
  .record({
    metalCount: fc.integer({ min: 1, max: 2 }),
    ligandCount: fc.integer({ min: 1, max: 2 }),
    metalTotals: fc.array(logTotal, { minLength: 2, maxLength: 2 }),
    ligandTotals: fc.array(logTotal, { minLength: 2, maxLength: 2 }),
    anionTotal: logTotal,
    pH: fc.double({ min: 1, max: 13.5, noNaN: true }),
    steps: fc.array(fc.array(fc.array(stepK, { minLength: 1, maxLength: 4 }), { minLength: 2, maxLength: 2 }), { minLength: 2, maxLength: 2 }),
    protonation: fc.array(fc.double({ min: 0, max: 11, noNaN: true }), { minLength: 2, maxLength: 2 }),
    hydrolysis: fc.array(fc.double({ min: -13, max: -6, noNaN: true }), { minLength: 2, maxLength: 2 }),
    saltKsp: fc.array(fc.double({ min: -22, max: -2, noNaN: true }), { minLength: 2, maxLength: 2 }),
    ligandSaltKsp: fc.array(fc.option(fc.double({ min: -25, max: -4, noNaN: true }), { nil: undefined }), { minLength: 2, maxLength: 2 }),
    hydroxideK: fc.array(fc.option(fc.double({ min: 4, max: 16, noNaN: true }), { nil: undefined }), { minLength: 2, maxLength: 2 }),
    davies: fc.boolean(),
  })
  .map((r) => {
    const metals = METALS.slice(0, r.metalCount);
    const ligands = LIGANDS.slice(0, r.ligandCount);
    const components = [...metals.map((m) => m.name), ...ligands.map((l) => l.name), 'X-', 'Na+', 'H+'];
    // Under Davies, totals stop at 0.1 mol/L (ionic strengths up to about 1 mol/L, already twice
    // the equation's usual range): molar salts of divalent ions and complexes of charge -4 put I
    // far past anything the equation means (gamma of 10^16 at I = 30). Those are exercised
    // separately, for graceful failure only.
    const top = r.davies ? -1 : 1;
    const total = (log: number) => 10 ** Math.min(log, top);
    const totals: Record<string, number> = { 'X-': total(r.anionTotal), 'Na+': 0 };
    metals.forEach((m, i) => (totals[m.name] = total(r.metalTotals[i] as number)));
    ligands.forEach((l, i) => (totals[l.name] = total(r.ligandTotals[i] as number)));
    // Sodium balances the anionic ligands, as their salts would bring it.
    totals['Na+'] = ligands.reduce((sum, l) => sum + -l.z * (totals[l.name] as number), totals['X-'] as number);
    const species: SpeciesInput[] = [{ name: 'OH-', logK: -14, stoich: { 'H+': -1 } }];
    const solids: SolidInput[] = [];
    metals.forEach((m, i) => {
      ligands.forEach((l, k) => {
        let logBeta = 0;
        (r.steps[i]?.[k] ?? []).forEach((step, n) => {
          logBeta += step;
          const z = m.z + (n + 1) * l.z;
          species.push({ name: `${m.name.replace(/[+-]\d*$/, '')}(${l.name.replace(/[+-]\d*$/, '')})${n + 1}${z === 0 ? '' : z > 0 ? `+${z}` : `${z}`}`, logK: logBeta, stoich: { [m.name]: 1, [l.name]: n + 1 }, charge: z });
        });
      });
      species.push({ name: `${m.name}OH`, logK: r.hydrolysis[i] as number, stoich: { [m.name]: 1, 'H+': -1 }, charge: m.z - 1 });
      solids.push({ name: `${m.name}X${m.z}(s)`, logKsp: r.saltKsp[i] as number, stoich: { [m.name]: 1, 'X-': m.z } });
      const ligandSalt = r.ligandSaltKsp[i];
      const l0 = ligands[0] as { name: string; z: number };
      if (ligandSalt !== undefined && l0.z !== 0) {
        const [a, b] = m.z === -l0.z ? [1, 1] : [-l0.z, m.z];
        solids.push({ name: `${m.name}${a}L${b}(s)`, logKsp: ligandSalt * Math.max(a, b), stoich: { [m.name]: a, [l0.name]: b } });
      }
      const hydroxide = r.hydroxideK[i];
      if (hydroxide !== undefined) solids.push({ name: `${m.name}(OH)${m.z}(s)`, logKsp: hydroxide * (m.z === 1 ? 0.5 : 1), stoich: { [m.name]: 1, 'H+': -m.z } });
    });
    ligands.forEach((l, i) => {
      if (l.z < 0) species.push({ name: `H${l.name}`, logK: r.protonation[i] as number, stoich: { [l.name]: 1, 'H+': 1 }, charge: l.z + 1 });
      else species.push({ name: `${l.name}H+`, logK: r.protonation[i] as number, stoich: { [l.name]: 1, 'H+': 1 }, charge: 1 });
    });
    return { components, totals, fixed: { 'H+': 10 ** -r.pH }, species, solids, activity: r.davies ? 'davies' : 'ideal' } satisfies Problem;
  });
