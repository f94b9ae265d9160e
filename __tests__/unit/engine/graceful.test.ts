// Far outside the Davies equation's range (several mol/L of divalent salts, complexes of charge
// -4 and -5) a solve may not converge; it must still come back as a result with a status and a
// message, never a throw, never NaN. Also: an impossible tolerance ends in a status, not a hang.
import fc from 'fast-check';

import { solve } from '@/lib/engine';

import { allNumbers } from './invariants';
import { randomProblem } from './random-systems';

const extreme = randomProblem.map((p) => ({
  ...p,
  activity: 'davies' as const,
  totals: Object.fromEntries(Object.entries(p.totals ?? {}).map(([k, v]) => [k, Math.min(10, v * 30)])),
}));

describe('graceful failure', () => {
  it('returns a status, a message when not converged, and no NaN, on extreme Davies systems', () => {
    fc.assert(
      fc.property(extreme, (problem) => {
        const result = solve(problem);
        expect(['converged', 'not_converged']).toContain(result.status);
        if (result.status === 'not_converged') expect(result.message).toMatch(/\w+/);
        expect(allNumbers(result).some(Number.isNaN)).toBe(false);
      }),
      { numRuns: 150, seed: 5, endOnFailure: true },
    );
  });

  it('reports non-convergence when the tolerance cannot be met', () => {
    const result = solve(
      {
        components: ['Au+', 'CN-', 'H+'],
        totals: { 'Au+': 1e-3, 'CN-': 0.01 },
        fixed: { 'H+': 1e-11 },
        species: [
          { name: 'Au(CN)2-', logK: 38.3, stoich: { 'Au+': 1, 'CN-': 2 } },
          { name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'CN-': 1 } },
        ],
      },
      { tolerance: 1e-300, maxIterations: 5 },
    );
    expect(result.status).toBe('not_converged');
    expect(result.message).toMatch(/did not converge/);
    expect(allNumbers(result).some(Number.isNaN)).toBe(false);
  });
});
