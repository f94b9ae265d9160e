// Headroom on a compiled tableau: add a generous excess of the solid to the totals, let the full
// equilibrium settle (other solids may form), and read how much of the excess dissolved. Shared by
// the headroom, fixer-loading and make-up calculators.
import { retarget, type SolveResult, type SolveStatus, type Tableau, type TableauSolution } from '@/lib/engine';

import { CalculatorInputError } from './errors';
import { mergeWarnings, solveWarmOrCold, worstStatus } from './status';

/** What happened when the solid was offered to the bath. */
export type HeadroomOutcome = 'headroom' | 'already_saturated' | 'not_reached';

/** Headroom of one solid in a solved bath. */
export interface HeadroomCore {
  outcome: HeadroomOutcome;
  status: SolveStatus;
  /** Solid that dissolves before it persists, mol per litre of bath. */
  molPerL: number;
  /** The bath at saturation with the solid (the bath itself when already saturated). */
  atSaturation: SolveResult;
  warnings: string[];
}

/** Largest excess tried, mol/L: beyond this the bath is reported as showing no limit. */
export const MAX_EXCESS_MOL_PER_L = 1e4;
const REFINEMENTS = 2;

/** Row of the solid in the tableau; throws when it consumes a component that has a total. */
function solidRow(tab: Tableau, solid: string): number[] {
  const s = tab.solidNames.indexOf(solid);
  const row = tab.b.slice(s * tab.nc, (s + 1) * tab.nc);
  row.forEach((b, j) => {
    if (b < 0 && !tab.fixed[j]) {
      const c = tab.components[j] as string;
      throw new CalculatorInputError('solid', `"${solid}" consumes "${c}" (count ${b}), which has a total; hold "${c}" fixed (for H+, give a pH) to work out its headroom`);
    }
  });
  return row;
}

function offer(tab: Tableau, row: number[], excess: number, warm: TableauSolution['state']): TableauSolution {
  const totals: Record<string, number> = {};
  row.forEach((b, j) => {
    if (b !== 0 && !tab.fixed[j]) totals[tab.components[j] as string] = (tab.total[j] as number) + excess * b;
  });
  return solveWarmOrCold(retarget(tab, { totals }), warm);
}

/** Moles per litre of component j dissolved or held in solids other than `solid`. */
function heldOutside(tab: Tableau, j: number, solid: string, r: SolveResult): number {
  let sum = r.free[tab.components[j] as string] ?? 0;
  for (let i = 0; i < tab.ns; i++) {
    const a = tab.a[i * tab.nc + j] as number;
    if (a !== 0) sum += a * (r.species[tab.speciesNames[i] as string] ?? 0);
  }
  for (let s = 0; s < tab.nsol; s++) {
    const b = tab.b[s * tab.nc + j] as number;
    const name = tab.solidNames[s] as string;
    if (b !== 0 && name !== solid) sum += b * (r.solids[name] ?? 0);
  }
  return sum;
}

/**
 * Solid dissolved between `now` and `sat` (offered `excess`), mol/L, read from the mass balance of
 * the solid's component with the smallest total per count: every balance is solved to the same
 * relative tolerance, so the smallest one resolves a small headroom best (excess minus what is
 * left would inherit the error of the largest, e.g. 0.1 M chloride against 2e-9 M AgCl).
 */
function dissolvedAmount(tab: Tableau, row: number[], solid: string, excess: number, now: SolveResult, sat: SolveResult): number {
  let best = -1;
  let scale = Infinity;
  row.forEach((b, j) => {
    const perCount = ((tab.total[j] as number) + excess * b) / b;
    if (b > 0 && !tab.fixed[j] && perCount < scale) [best, scale] = [j, perCount];
  });
  const left = sat.solids[solid] ?? 0;
  if (best < 0) return Math.max(0, excess - left);
  return Math.max(0, (heldOutside(tab, best, solid, sat) - heldOutside(tab, best, solid, now)) / (row[best] as number));
}

/** Headroom of `solid` (a solid of the tableau) in the bath solved as `base`. */
export function headroomOnTableau(tab: Tableau, solid: string, base: TableauSolution): HeadroomCore {
  const row = solidRow(tab, solid);
  const now = base.result;
  if (now.solids[solid] !== undefined || (now.saturation[solid] as number) >= -1e-9) {
    return { outcome: 'already_saturated', status: now.status, molPerL: 0, atSaturation: now, warnings: now.warnings };
  }
  let bathTotal = 0;
  tab.total.forEach((t) => (bathTotal += t));
  let excess = 2 * bathTotal + 0.1;
  let sol = offer(tab, row, excess, base.state);
  while (sol.result.solids[solid] === undefined && excess * 10 <= MAX_EXCESS_MOL_PER_L) {
    excess *= 10;
    sol = offer(tab, row, excess, sol.state);
  }
  const left = sol.result.solids[solid];
  const done = (outcome: HeadroomOutcome, molPerL: number): HeadroomCore => ({
    outcome,
    status: worstStatus(now.status, sol.result.status),
    molPerL,
    atSaturation: sol.result,
    warnings: mergeWarnings(now.warnings, sol.result.warnings),
  });
  if (left === undefined) return done('not_reached', excess);
  let dissolved = dissolvedAmount(tab, row, solid, excess, now, sol.result);
  // The equilibrium with the solid present does not depend on how much is left over: offer about
  // twice what dissolved to read the difference without cancellation against a large excess.
  for (let k = 0; k < REFINEMENTS && dissolved > 0; k++) {
    const again = offer(tab, row, 2 * dissolved, sol.state);
    if (again.result.solids[solid] === undefined || again.result.status !== 'converged') break;
    sol = again;
    dissolved = dissolvedAmount(tab, row, solid, 2 * dissolved, now, sol.result);
  }
  return done('headroom', dissolved);
}
