// Working a calculation out in the browser: the bath solved as the server solves a saved run, and
// the default runner (runCalculation in one go). Pure of React.
import { jsonSafe, runCalculation } from '@/lib/calculators/run-calculation';
import { solveBuilt } from '@/lib/library/solve-built';
import { type ProblemJson, type SolveResultJson, type SystemRequest } from '@/shared/constants';

import { type CalculationRunner } from './types';

/** Runs the calculator in one go (most calculators take well under a second). */
export const runAtOnce: CalculationRunner = async ({ calculator, problem, pH, params }) =>
  runCalculation(calculator, problem, pH, params as never);

/** The bath as given, solved here the way the server solves a saved run; JSON-safe (no NaN or infinities). Throws CalculatorInputError. */
export function solveBathHere(problem: ProblemJson, pH: number | undefined): SolveResultJson {
  return jsonSafe(solveBuilt(problem, pH)) as SolveResultJson;
}

/** The part of a request that decides which species and solids the library builds (not the totals). */
export function selectionOf(request: Pick<SystemRequest, 'metals' | 'ligands' | 'counterIons' | 'includeDrafts' | 'pH'>): SystemRequest {
  return {
    metals: request.metals,
    ligands: request.ligands ?? [],
    counterIons: request.counterIons ?? [],
    includeDrafts: request.includeDrafts ?? false,
    ...(request.pH !== undefined ? { pH: request.pH } : {}),
  };
}

/** Waits for the next turn of the event loop, so the screen can draw between chunks of work. */
export function nextTurn(): Promise<void> {
  return new Promise((resolve) => setTimeout(resolve, 0));
}
