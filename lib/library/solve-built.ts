// Solves a system built from the library the same way in the browser and on the server: the pH
// the request gave is a measured one (an activity), converted to free [H+] under Davies.
import { solveAtPh, solveBath } from '@/lib/calculators/system';
import type { SolveResult } from '@/lib/engine';
import type { ProblemJson } from '@/shared/constants';

/** Solves a built problem; `pH` is the request's measured pH (omit when the problem has no H+). */
export function solveBuilt(problem: ProblemJson, pH?: number): SolveResult {
  const system = {
    components: problem.components,
    species: problem.species,
    solids: problem.solids,
    activity: problem.activity,
    ...(problem.temperatureC !== undefined ? { temperatureC: problem.temperatureC } : {}),
  };
  if (pH === undefined) return solveBath(system, { totals: problem.totals, fixed: problem.fixed }).result;
  const fixed = { ...problem.fixed };
  delete fixed['H+'];
  return solveAtPh(system, { totals: problem.totals, fixed }, pH, { measured: true }).result;
}
