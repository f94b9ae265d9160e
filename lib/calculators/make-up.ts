// Make-up: how much of a salt (or stock solution) to add to a bath of given volume to reach a
// target free concentration or headroom. The added amount is found on the engine: bracketed by
// decades, then refined by Brent's method; a bounded number of solves, never a loop without end.
import { amountToMass, convertMass, convertVolume, type MassUnit } from '@/lib/units';
import { retarget, type SolveResult, type SolveStatus, type Tableau, type TableauSolution } from '@/lib/engine';

import { headroomOnTableau } from './headroom-core';
import { checkMakeUp, type MakeUpInput, type MakeUpPlan } from './make-up-input';
import { brent } from './root-find';
import { mergeWarnings, solveWarmOrCold, worstStatus } from './status';
import { solveBath } from './system';

export type { MakeUpInput, MakeUpTarget, Salt } from './make-up-input';

/** 'add': the amount found; 'already_met': the bath is at or past the target in the direction the salt drives it; 'unreachable': not within the most salt considered. */
export type MakeUpOutcome = 'add' | 'already_met' | 'unreachable';

/** How much to add, and the bath after it. */
export interface MakeUpResult {
  status: SolveStatus;
  outcome: MakeUpOutcome;
  message: string;
  warnings: string[];
  /** Salt to add, mol per litre of the bath as it is (0 unless outcome is 'add'). */
  addMolPerL: number;
  /** Salt to add for the whole volume, mol. */
  addMol: number;
  /** Mass to weigh out, in grams and in the chosen unit; null without a formula. */
  mass: { grams: number; value: number; unit: MassUnit } | null;
  /** For a stock solution: its concentration (mol/L), the volume to add (L and the bath's unit) and its mass (g). */
  stock: { molPerL: number; volumeL: number; volume: number; massG: number } | null;
  /** Bath volume after the addition, L (grows only by a stock solution's volume). */
  finalVolumeL: number;
  /** Target quantity before and after the addition (mol/L); `achieved` equals `before` unless outcome is 'add'. */
  before: number;
  achieved: number;
  /** When unreachable: the quantity with the most salt considered added (mol/L); else null. */
  atMost: number | null;
  /** The bath after the addition. */
  result: SolveResult;
  freeH: number | null;
}

/** Relative closeness to the target accepted by the search. */
const TARGET_TOLERANCE = 1e-9;
const FIRST_PROBE_MOL_PER_L = 1e-8;

interface Probe {
  c: number;
  q: number;
  sol: TableauSolution;
  status: SolveStatus;
}

function evaluator(input: MakeUpInput, plan: MakeUpPlan, tab: Tableau, base: TableauSolution): (c: number) => Probe {
  const counts = input.salt.stoich;
  const t = input.target;
  return (c) => {
    const dilution = plan.stockMolPerL === null ? 1 : 1 + c / plan.stockMolPerL;
    const totals: Record<string, number> = {};
    tab.components.forEach((name, j) => {
      if (!tab.fixed[j]) totals[name] = ((tab.total[j] as number) + (counts[name] ?? 0) * c) / dilution;
    });
    const moved = retarget(tab, { totals });
    const sol = solveWarmOrCold(moved, base.state);
    if (t.kind === 'free') return { c, q: sol.result.free[t.component] ?? 0, sol, status: sol.result.status };
    const h = headroomOnTableau(moved, t.solid, sol);
    return { c, q: h.molPerL, sol, status: h.status };
  };
}

interface Search {
  outcome: MakeUpOutcome;
  /** +1 when the salt raised the quantity, -1 when it lowered it, 0 when not probed or unchanged. */
  direction: number;
  start: Probe;
  end: Probe;
  statuses: SolveStatus[];
}

/** Bracket by decades of added mol/L up to `max`, then Brent; at most about 12 + 100 evaluations. */
function search(evaluate: (c: number) => Probe, target: number, max: number): Search {
  const statuses: SolveStatus[] = [];
  const at = (c: number) => {
    const p = evaluate(c);
    statuses.push(p.status);
    return p;
  };
  const start = at(0);
  const close = (p: Probe) => Math.abs(p.q - target) <= TARGET_TOLERANCE * target;
  if (close(start)) return { outcome: 'already_met', direction: 0, start, end: start, statuses };
  const side = Math.sign(start.q - target);
  let lo = start;
  for (let c = FIRST_PROBE_MOL_PER_L; lo.c < max; c *= 10) {
    const hi = at(Math.min(c, max));
    if (close(hi)) return { outcome: 'add', direction: -side, start, end: hi, statuses };
    if (Math.sign(hi.q - target) !== side) {
      const f = (x: number) => at(x).q - target;
      const root = brent(f, lo.c, hi.c, lo.q - target, hi.q - target, { xTolerance: 1e-15 * hi.c, fTolerance: TARGET_TOLERANCE * target, maxEvaluations: 100 });
      if (!root.converged) statuses.push('not_converged');
      return { outcome: 'add', direction: -side, start, end: at(root.x), statuses };
    }
    lo = hi;
  }
  // No crossing: the salt moved the quantity away from the target (already met), or too little.
  const moved = Math.abs(lo.q - start.q) > TARGET_TOLERANCE * target;
  const direction = moved ? Math.sign(lo.q - start.q) : 0;
  const away = moved && direction === side;
  return { outcome: away ? 'already_met' : 'unreachable', direction, start, end: away ? start : lo, statuses };
}

function describe(input: MakeUpInput, plan: MakeUpPlan, found: Search, addMol: number): string {
  const t = input.target;
  const what = t.kind === 'free' ? `free ${t.component}` : `headroom for ${t.solid}`;
  const f = (x: number) => x.toPrecision(4);
  if (found.outcome === 'add') {
    return `Add ${f(addMol)} mol of ${input.salt.name} to ${f(plan.litres)} L: ${what} goes from ${f(found.start.q)} to ${f(found.end.q)} mol/L (target ${t.molPerL}).`;
  }
  if (found.outcome === 'already_met' && found.direction === 0) return `No addition needed: ${what} is already ${f(found.start.q)} mol/L, at the target ${t.molPerL} mol/L.`;
  if (found.outcome === 'already_met') {
    const [side, verb] = found.direction > 0 ? ['at or above', 'raises'] : ['at or below', 'lowers'];
    return `No addition needed: ${what} is already ${f(found.start.q)} mol/L, ${side} the target ${t.molPerL} mol/L, and ${input.salt.name} only ${verb} it.`;
  }
  if (found.direction === 0) return `Unreachable: ${input.salt.name} does not change ${what} (${f(found.start.q)} mol/L).`;
  return `Unreachable: even ${plan.max} mol/L of ${input.salt.name} brings ${what} only to ${f(found.end.q)} mol/L (target ${t.molPerL}).`;
}

function amounts(input: MakeUpInput, plan: MakeUpPlan, addMolPerL: number): Pick<MakeUpResult, 'addMol' | 'mass' | 'stock' | 'finalVolumeL'> {
  const addMol = addMolPerL * plan.litres;
  const formula = input.salt.formula;
  const grams = formula === undefined ? null : amountToMass(addMolPerL, { value: plan.litres, unit: 'L' }, { formula }, 'g');
  const mass = grams === null ? null : { grams: grams.toNumber(), value: convertMass(grams, 'g', plan.massUnit).toNumber(), unit: plan.massUnit };
  if (plan.stockMolPerL === null || input.salt.stock === undefined) return { addMol, mass, stock: null, finalVolumeL: plan.litres };
  const volumeL = addMol / plan.stockMolPerL;
  const stock = {
    molPerL: plan.stockMolPerL,
    volumeL,
    volume: convertVolume(volumeL, 'L', input.volume.unit).toNumber(),
    massG: volumeL * input.salt.stock.densityKgPerL * 1000,
  };
  return { addMol, mass, stock, finalVolumeL: plan.litres + volumeL };
}

/** Salt (or stock solution) to add to a bath to reach a target free concentration or headroom: mol/L, mol, mass, stock volume. */
export function makeUp(input: MakeUpInput): MakeUpResult {
  const plan = checkMakeUp(input);
  const bath = solveBath(input.system, input.state, input.pH);
  const found = search(evaluator(input, plan, bath.tableau, { result: bath.result, state: bath.warm }), input.target.molPerL, plan.max);
  const addMolPerL = found.outcome === 'add' ? found.end.c : 0;
  const parts = amounts(input, plan, addMolPerL);
  const after = found.outcome === 'add' ? found.end : found.start;
  return {
    status: worstStatus(bath.result.status, ...found.statuses),
    outcome: found.outcome,
    message: describe(input, plan, found, parts.addMol),
    warnings: mergeWarnings(bath.result.warnings, after.sol.result.warnings),
    addMolPerL,
    ...parts,
    before: found.start.q,
    achieved: after.q,
    atMost: found.outcome === 'unreachable' ? found.end.q : null,
    result: after.sol.result,
    freeH: bath.freeH,
  };
}
