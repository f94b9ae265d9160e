// Precipitation order: one precipitant (Cl-, S2-, OH- as a total, or Ag+ into a halide mix) added
// gradually to several ions; for each solid it can form, the precipitant total and free
// concentration at which that solid first saturates on the full equilibrium, the order, and what
// is left dissolved of each ion at each threshold. Beside it, the single-equilibrium estimate.
import type { SolveResult, SolveStatus, Tableau } from '@/lib/engine';

import { CalculatorInputError } from './errors';
import { mergeWarnings, worstStatus } from './status';
import { compileBath, solveBath, withFixedH, type BathState, type ChemicalSystem, type PhSetting } from './system';
import { dissolvedTotal, share } from './tally';
import { findThreshold } from './threshold';
import { positive, totalComponent } from './validate';

/** Ions (cations, or anions when a metal is the titrant) and the precipitant dosed into them. */
export interface PrecipitationOrderInput {
  system: ChemicalSystem;
  /** Totals of the ions; the precipitant's total here is the starting point (often 0). */
  state: BathState;
  pH?: PhSetting;
  /** Component whose total is increased. */
  precipitant: string;
  /** Components whose fate is reported, each with a total. */
  cations: string[];
  /** Highest precipitant total searched, mol/L (default 10). */
  maxPrecipitantMolPerL?: number;
}

/** What is left dissolved of one ion: mol/L and fraction of its total. */
export interface LeftDissolved {
  component: string;
  molPerL: number;
  fraction: number;
}

/** Free precipitant = (Ksp / [ion total]^nu)^(1/mu), ignoring complexes, other solids and consumption. */
export interface SingleEquilibriumEstimate {
  label: 'single-equilibrium estimate';
  cation: string;
  precipitantFreeMolPerL: number;
}

/** One solid's threshold. */
export interface SolidThreshold {
  solid: string;
  outcome: 'reached' | 'already' | 'not_reached';
  /** Precipitant total at which the solid first saturates, mol/L; null when not reached. */
  precipitantTotalMolPerL: number | null;
  /** Free precipitant there, mol/L. */
  precipitantFreeMolPerL: number | null;
  estimate: SingleEquilibriumEstimate | null;
  /** Each ion left dissolved at this threshold. */
  left: LeftDissolved[];
  /** The bath at the threshold (null when not reached). */
  result: SolveResult | null;
}

/** Thresholds in the order the solids appear; those not reached last. */
export interface PrecipitationOrderResult {
  status: SolveStatus;
  message: string;
  warnings: string[];
  precipitant: string;
  thresholds: SolidThreshold[];
  freeH: number | null;
}

function estimate(tab: Tableau, b: number[], lnKsp: number, precipitant: string, cations: string[]): SingleEquilibriumEstimate | null {
  const p = tab.components.indexOf(precipitant);
  const cation = cations.find((c) => (b[tab.components.indexOf(c)] ?? 0) > 0);
  if (cation === undefined) return null;
  const m = tab.components.indexOf(cation);
  let lnK = lnKsp;
  for (let j = 0; j < tab.nc; j++) {
    if (j === p || j === m || b[j] === 0) continue;
    if (!tab.fixed[j]) return null;
    lnK -= (b[j] as number) * (tab.fixedLn[j] as number);
  }
  const total = tab.total[m] as number;
  if (!(total > 0)) return null;
  const free = Math.exp((lnK - (b[m] as number) * Math.log(total)) / (b[p] as number));
  return Number.isFinite(free) ? { label: 'single-equilibrium estimate', cation, precipitantFreeMolPerL: free } : null;
}

function checkInput(input: PrecipitationOrderInput): { precipitant: string; cations: string[]; max: number } {
  const precipitant = totalComponent(input.system, input.state, input.precipitant, 'precipitant');
  if (!Array.isArray(input.cations) || input.cations.length === 0) {
    throw new CalculatorInputError('cations', 'list the ions being precipitated, each a component with a total');
  }
  const cations = input.cations.map((c, i) => {
    const name = totalComponent(input.system, input.state, c, `cations[${i}]`);
    if (name === precipitant) throw new CalculatorInputError(`cations[${i}]`, `"${name}" is the precipitant; list the ions it precipitates`);
    return name;
  });
  const max = input.maxPrecipitantMolPerL === undefined ? 10 : positive(input.maxPrecipitantMolPerL, 'maxPrecipitantMolPerL', 'the highest precipitant total');
  const start = input.state.totals[precipitant] as number;
  if (max <= start) throw new CalculatorInputError('maxPrecipitantMolPerL', `must be above the precipitant's starting total ${start} mol/L, got ${max}`);
  return { precipitant, cations, max };
}

function describe(t: SolidThreshold, max: number): string {
  if (t.outcome === 'already') return `${t.solid} already saturated at the start`;
  if (t.outcome === 'not_reached') return `${t.solid} not reached up to ${max} mol/L`;
  return `${t.solid} at ${(t.precipitantTotalMolPerL as number).toPrecision(3)} mol/L total (${(t.precipitantFreeMolPerL as number).toPrecision(3)} mol/L free)`;
}

/** Thresholds, order and what is left of each ion as a precipitant total rises (mol/L throughout). */
export function precipitationOrder(input: PrecipitationOrderInput): PrecipitationOrderResult {
  const { precipitant, cations, max } = checkInput(input);
  const bath = solveBath(input.system, input.state, input.pH);
  const state = bath.freeH === null ? input.state : withFixedH(input.system, input.state, input.pH?.hComponent ?? 'H+', bath.freeH);
  const full = bath.tableau;
  const nc = full.nc;
  const p = full.components.indexOf(precipitant);
  const solids = full.solidNames.filter((_, s) => (full.b[s * nc + p] as number) > 0);
  if (solids.length === 0) throw new CalculatorInputError('precipitant', `no solid of the system contains "${precipitant}"; add the solids it forms`);
  const statuses: SolveStatus[] = [bath.result.status];
  const thresholds = solids.map((solid): SolidThreshold => {
    const s = full.solidNames.indexOf(solid);
    const b = full.b.slice(s * nc, (s + 1) * nc);
    const without = compileBath({ ...input.system, solids: input.system.solids.filter((x) => x.name !== solid) }, state);
    const found = findThreshold(without, precipitant, b, full.lnKsp[s] as number, state.totals[precipitant] as number, max);
    statuses.push(found.status);
    const r = found.result;
    return {
      solid,
      outcome: found.outcome,
      precipitantTotalMolPerL: found.total,
      precipitantFreeMolPerL: r === null ? null : (r.free[precipitant] ?? 0),
      estimate: estimate(full, b, full.lnKsp[s] as number, precipitant, cations),
      left: r === null ? [] : cations.map((c) => ({ component: c, molPerL: dissolvedTotal(input.system, r, c), fraction: share(dissolvedTotal(input.system, r, c), state.totals[c] as number) })),
      result: r,
    };
  });
  const rank = (t: SolidThreshold) => t.precipitantTotalMolPerL ?? Infinity;
  thresholds.sort((x, y) => rank(x) - rank(y) || x.solid.localeCompare(y.solid));
  return {
    status: worstStatus(...statuses),
    message: `As ${precipitant} is added: ${thresholds.map((t) => describe(t, max)).join('; ')}.`,
    warnings: mergeWarnings(bath.result.warnings, ...thresholds.map((t) => t.result?.warnings ?? [])),
    precipitant,
    thresholds,
    freeH: bath.freeH,
  };
}
