// The precipitant total at which one solid first saturates on the full equilibrium: the solid is
// left out (the others may form), its saturation index is computed from the free concentrations
// and activity coefficients, scanned upward in log total and refined by Brent's method.
import { retarget, type SolveResult, type SolveStatus, type Tableau, type WarmStart } from '@/lib/engine';

import { brent } from './root-find';
import { solveWarmOrCold, worstStatus } from './status';

/** Where a solid first saturates as the precipitant total rises. */
export interface ThresholdFound {
  /** 'reached' within the range, 'already' at the starting total, 'not_reached' up to the maximum. */
  outcome: 'reached' | 'already' | 'not_reached';
  /** Precipitant total at the threshold, mol/L (the starting total when 'already'; null when not reached). */
  total: number | null;
  /** The bath at the threshold, without the solid (null when not reached). */
  result: SolveResult | null;
  status: SolveStatus;
}

/** Scan steps per decade of precipitant total. */
const STEPS_PER_DECADE = 4;
/** Lowest total scanned when the bath has none of the precipitant, mol/L. */
export const LOWEST_PRECIPITANT_MOL_PER_L = 1e-20;
/** Decades stepped down at a time, and the floor (log10 mol/L), when a solid saturates even at the lowest total. */
const DECADES_DOWN = 5;
const LOWEST_LOG_TOTAL = -290;

/** Saturation index (log10) of solid row `b` with ln Ksp `lnKsp` in a result. */
export function saturationFrom(tab: Tableau, b: readonly number[], lnKsp: number, r: SolveResult): number {
  let lnIap = 0;
  for (let j = 0; j < tab.nc; j++) {
    const count = b[j] as number;
    if (count === 0) continue;
    const name = tab.components[j] as string;
    const free = r.free[name] ?? 0;
    if (!(free > 0)) return -Infinity;
    lnIap += count * (Math.log(free) + Math.log(r.gamma[name] ?? 1));
  }
  return (lnIap - lnKsp) / Math.LN10;
}

/** First total of `precipitant` in [start, max] (mol/L) where the solid (row b, lnKsp) saturates in `without`. */
export function findThreshold(without: Tableau, precipitant: string, b: readonly number[], lnKsp: number, start: number, max: number): ThresholdFound {
  let warm: WarmStart | undefined;
  const statuses: SolveStatus[] = [];
  const at = (u: number) => {
    const sol = solveWarmOrCold(retarget(without, { totals: { [precipitant]: 10 ** u } }), warm);
    statuses.push(sol.result.status);
    return sol;
  };
  let u = Math.log10(Math.max(start, LOWEST_PRECIPITANT_MOL_PER_L));
  let first = at(u);
  let si = saturationFrom(without, b, lnKsp, first.result);
  // With none of the precipitant at the start, step down until the solid is undersaturated.
  while (start === 0 && si >= 0 && u > LOWEST_LOG_TOTAL) {
    u -= DECADES_DOWN;
    warm = first.state;
    first = at(u);
    si = saturationFrom(without, b, lnKsp, first.result);
  }
  if (si >= 0) return { outcome: 'already', total: start, result: first.result, status: worstStatus(...statuses) };
  const hi = Math.log10(max);
  while (u < hi) {
    const next = Math.min(hi, u + 1 / STEPS_PER_DECADE);
    warm = first.state;
    const sol = at(next);
    const siNext = saturationFrom(without, b, lnKsp, sol.result);
    if (siNext >= 0) {
      const f = (x: number) => saturationFrom(without, b, lnKsp, at(x).result);
      const root = brent(f, u, next, Number.isFinite(si) ? si : -1e3, siNext, { xTolerance: 1e-12, fTolerance: 1e-12, maxEvaluations: 100 });
      if (!root.converged) statuses.push('not_converged');
      const final = at(root.x);
      return { outcome: 'reached', total: 10 ** root.x, result: final.result, status: worstStatus(...statuses) };
    }
    u = next;
    si = siNext;
    first = sol;
  }
  return { outcome: 'not_reached', total: null, result: null, status: worstStatus(...statuses) };
}
