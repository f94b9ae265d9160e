// The public entry points: solve a problem in the general form, or a compiled tableau with a
// warm start (curves and calculators), and turn the solver's state into a result a chemist can
// audit.

import { DEFAULTS, type SolveOptions } from './defaults';
import type { TraceLine } from './newton';
import { type PhaseOutcome, saturationIndex, settleOuterIonicStrength, settlePhases, type WarmStart } from './phases';
import { compileProblem, type Tableau } from './tableau';
import type { Problem, SolveResult } from './types';

// Copied out of DEFAULTS: read on every solve.
const DAVIES_LIMIT_I = DEFAULTS.daviesLimitI;
const NEAR_SATURATION = DEFAULTS.nearSaturation;
// The fixed parts of the ionic-strength warning, built once (number-to-text costs on every solve).
const DAVIES_WARNING_HEAD = 'Ionic strength ';
const DAVIES_WARNING_TAIL = ` mol/L is above ${DAVIES_LIMIT_I} mol/L, beyond the usual range of the Davies equation; treat activities as estimates.`;

/** A result together with the state to start the next, nearby solve from. */
export interface TableauSolution {
  result: SolveResult & { trace?: TraceLine[] };
  state: WarmStart;
}

function finiteOr(value: number, fallback: number): number {
  return Number.isFinite(value) ? value : fallback;
}

/** Largest |z| whose gamma is kept per solve (charges of real ions are well inside it). */
const MAX_CACHED_CHARGE = 8;
// gamma by |z| for the solve being built (NaN: not yet worked out); reused, results are synchronous.
const gammaByCharge = new Float64Array(MAX_CACHED_CHARGE + 1);

/** gamma = exp(phi z^2); one exponential per whole charge size, worked out on first use. */
function gammaOf(phi: number, z: number): number {
  const size = z < 0 ? -z : z;
  if (size > MAX_CACHED_CHARGE || !Number.isInteger(size)) return finiteOr(Math.exp(phi * z * z), 1);
  let g = gammaByCharge[size] as number;
  if (Number.isNaN(g)) {
    g = finiteOr(Math.exp(phi * size * size), 1);
    gammaByCharge[size] = g;
  }
  return g;
}

/**
 * The result a chemist reads, built in one pass over the assemblage. Records are filled in the
 * order of the public result (components, then species), so their keys print in that order.
 */
function buildResult(tab: Tableau, settled: PhaseOutcome): SolveResult & { trace?: TraceLine[] } {
  const { asm, possible } = settled;
  const phi = asm.phiValue;
  gammaByCharge.fill(NaN);
  const free: Record<string, number> = {};
  const species: Record<string, number> = {};
  const gamma: Record<string, number> = {};
  const { nc, ns, nsol, components, fixed, fixedValue, componentCharge, speciesNames, speciesCharge, solidNames } = tab;
  const { componentRow } = asm;
  for (let j = 0; j < nc; j++) {
    const name = components[j] as string;
    const k = componentRow[j] as number;
    const value = finiteOr(k >= 0 ? (asm.x[k] as number) : fixed[j] ? (fixedValue[j] as number) : 0, 0);
    free[name] = value;
    species[name] = value;
    gamma[name] = gammaOf(phi, componentCharge[j] as number);
  }
  for (let i = 0; i < ns; i++) {
    const name = speciesNames[i] as string;
    const r = asm.speciesRow[i] as number;
    species[name] = r >= 0 ? finiteOr(asm.c[r] as number, 0) : 0;
    gamma[name] = gammaOf(phi, speciesCharge[i] as number);
  }
  const solids: Record<string, number> = {};
  for (let r = 0; r < asm.p; r++) {
    const amount = asm.n[r] as number;
    if (amount > 0 && Number.isFinite(amount)) solids[solidNames[asm.present[r] as number] as string] = amount;
  }
  const ionicStrength = finiteOr(asm.ionicStrength, 0);
  const warnings = tab.warnings.slice();
  if (tab.activity === 'davies' && ionicStrength > DAVIES_LIMIT_I) warnings.push(DAVIES_WARNING_HEAD + ionicStrength.toPrecision(3) + DAVIES_WARNING_TAIL);
  const saturation: Record<string, number> = {};
  for (let s = 0; s < nsol; s++) {
    const name = solidNames[s] as string;
    let si = possible[s] ? saturationIndex(asm, s) : -Infinity;
    if (Number.isNaN(si)) si = -Infinity;
    saturation[name] = si;
    // Close to saturation but absent (a present solid has index 0, so the test also skips those
    // with a positive amount; one present with amount 0 is absent from solids and is tested).
    if (si < 0 && si > -NEAR_SATURATION && solids[name] === undefined) {
      warnings.push(`${name} is close to saturation (saturation index ${si.toFixed(2)}): a small change may precipitate it.`);
    }
  }
  const status = settled.converged ? 'converged' : 'not_converged';
  const residual = finiteOr(asm.massResidual(), Number.MAX_VALUE);
  const iterations = settled.iterations;
  const { activity, temperatureC } = tab;
  // Two literals rather than a spread: the message key only when there is one, in its place.
  const result: SolveResult & { trace?: TraceLine[] } = settled.message
    ? { status, message: settled.message, free, species, solids, saturation, gamma, ionicStrength, residual, activity, temperatureC, iterations, warnings }
    : { status, free, species, solids, saturation, gamma, ionicStrength, residual, activity, temperatureC, iterations, warnings };
  if (settled.trace) result.trace = settled.trace;
  return result;
}

/** Solves a compiled tableau, optionally from the state of a nearby solve. Never throws on non-convergence. */
export function solveTableau(tab: Tableau, options: SolveOptions = {}, warm?: WarmStart): TableauSolution {
  const opts = {
    tolerance: options.tolerance ?? DEFAULTS.tolerance,
    maxIterations: options.maxIterations ?? DEFAULTS.maxIterations,
    trace: options.trace === true,
  };
  let settled = settlePhases(tab, opts, warm);
  if (!settled.converged && tab.activity === 'davies' && tab.fixedIonicStrength === null) {
    const outer = settleOuterIonicStrength(tab, opts, settled.state.ionicStrength);
    if (outer) settled = { ...outer, iterations: outer.iterations + settled.iterations, trace: settled.trace };
  }
  return { result: buildResult(tab, settled), state: settled.state };
}

/** Solves one problem in the general form; throws EngineInputError for invalid input only. */
export function solve(problem: Problem | unknown, options: SolveOptions = {}): SolveResult {
  return solveTableau(compileProblem(problem), options).result;
}
