// Property tests over thousands of random realistic systems (fast-check): every solve converges,
// balances mass to 1e-10 relative, honours every formation constant, leaves present solids at
// saturation index 0 within 1e-8 and absent solids at or below 0, and prints no NaN.
import fc from 'fast-check';

import { solve } from '@/lib/engine';

import { allNumbers, lawOfMassActionMisfit, massBalanceMisfit } from './invariants';
import { randomProblem } from './random-systems';

const RUNS = Number(process.env.LIGANDRY_PROPERTY_RUNS ?? 3000);
const SEED = Number(process.env.LIGANDRY_PROPERTY_SEED ?? 20261201);

describe('engine properties on random systems', () => {
  it(`holds the invariants over ${RUNS} random systems`, () => {
    fc.assert(
      fc.property(randomProblem, (problem) => {
        const result = solve(problem);
        if (result.status !== 'converged') throw new Error(`not converged: ${result.message}\n${JSON.stringify(problem)}`);
        expect(allNumbers(result).some(Number.isNaN)).toBe(false);
        expect(massBalanceMisfit(problem, result)).toBeLessThan(1e-10);
        expect(lawOfMassActionMisfit(problem, result)).toBeLessThan(1e-9);
        for (const [solid, si] of Object.entries(result.saturation)) {
          if (result.solids[solid] !== undefined) expect(Math.abs(si)).toBeLessThan(1e-8);
          else expect(si).toBeLessThanOrEqual(1e-9);
        }
        for (const amount of Object.values(result.solids)) expect(amount).toBeGreaterThan(0);
        for (const c of Object.values(result.species)) expect(c).toBeGreaterThanOrEqual(0);
      }),
      { numRuns: RUNS, seed: SEED, endOnFailure: true },
    );
  });
});
