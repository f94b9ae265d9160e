// Passing the engine's status and warnings on through calculators that make several solves, and
// the one retry they share.
import { solveTableau, type SolveStatus, type Tableau, type TableauSolution, type WarmStart } from '@/lib/engine';

/** "not_converged" if any solve did not converge, else "converged". */
export function worstStatus(...statuses: SolveStatus[]): SolveStatus {
  return statuses.every((s) => s === 'converged') ? 'converged' : 'not_converged';
}

/** The warnings of several results, each once, in first-seen order. */
export function mergeWarnings(...lists: readonly (readonly string[])[]): string[] {
  return [...new Set(lists.flat())];
}

/**
 * Solves from a warm start and, if that does not converge, once more from cold; returns the
 * converged solution, or the one with the smaller mass-balance residual.
 * NOTE: a warm start near a change of the solids present can lead Newton astray where a cold start does not.
 */
export function solveWarmOrCold(tab: Tableau, warm: WarmStart | undefined): TableauSolution {
  const first = solveTableau(tab, {}, warm);
  if (first.result.status === 'converged' || warm === undefined) return first;
  const cold = solveTableau(tab);
  return cold.result.status === 'converged' || cold.result.residual < first.result.residual ? cold : first;
}
