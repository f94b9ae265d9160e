// Solves a system built from the library the same way in the browser and on the server: the pH
// the request gave is a measured one (an activity), converted to free [H+] under Davies.
import { calculatorInputs } from '@/lib/calculators/run-calculation';
import { solveBath } from '@/lib/calculators/system';
import type { SolveResult } from '@/lib/engine';
import type { ProblemJson } from '@/shared/constants';

/** Solves a built problem; `pH` is the request's measured pH (omit when the problem has no H+). */
export function solveBuilt(problem: ProblemJson, pH?: number): SolveResult {
  const { system, state, ph } = calculatorInputs(problem, pH);
  return solveBath(system, state, ph).result;
}
