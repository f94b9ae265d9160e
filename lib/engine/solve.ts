// The public entry points: solve a problem in the general form, or a compiled tableau with a
// warm start (curves and calculators), and turn the solver's state into a result a chemist can
// audit.

import { DEFAULTS, type SolveOptions } from './defaults';
import type { Assemblage, TraceLine } from './newton';
import { saturationIndex, settleOuterIonicStrength, settlePhases, type WarmStart } from './phases';
import { compileProblem, type Tableau } from './tableau';
import type { Problem, SolveResult } from './types';

// Copied out of DEFAULTS: read on every solve.
const DAVIES_LIMIT_I = DEFAULTS.daviesLimitI;
const NEAR_SATURATION = DEFAULTS.nearSaturation;

/** A result together with the state to start the next, nearby solve from. */
export interface TableauSolution {
  result: SolveResult & { trace?: TraceLine[] };
  state: WarmStart;
}

function finiteOr(value: number, fallback: number): number {
  return Number.isFinite(value) ? value : fallback;
}

function buildResult(tab: Tableau, asm: Assemblage, possible: number[]): Omit<SolveResult, 'status' | 'iterations' | 'warnings'> {
  const free: Record<string, number> = {};
  const species: Record<string, number> = {};
  const gamma: Record<string, number> = {};
  // gamma depends only on z^2: one exponential per whole charge size up to 8.
  const byZ2: number[] = [];
  const gammaOf = (z: number): number => {
    const z2 = z * z;
    if (z2 > 64 || !Number.isInteger(z2)) return finiteOr(Math.exp(asm.phiValue * z2), 1);
    let g = byZ2[z2];
    if (g === undefined) {
      g = finiteOr(Math.exp(asm.phiValue * z2), 1);
      byZ2[z2] = g;
    }
    return g;
  };
  for (let j = 0; j < tab.nc; j++) {
    const name = tab.components[j] as string;
    const k = asm.componentRow[j] as number;
    const value = finiteOr(k >= 0 ? (asm.x[k] as number) : tab.fixed[j] ? (tab.fixedValue[j] as number) : 0, 0);
    free[name] = value;
    species[name] = value;
    gamma[name] = gammaOf(tab.componentCharge[j] as number);
  }
  for (let i = 0; i < tab.ns; i++) {
    const name = tab.speciesNames[i] as string;
    const r = asm.speciesRow[i] as number;
    species[name] = r >= 0 ? finiteOr(asm.c[r] as number, 0) : 0;
    gamma[name] = gammaOf(tab.speciesCharge[i] as number);
  }
  const solids: Record<string, number> = {};
  for (let r = 0; r < asm.p; r++) {
    const amount = asm.n[r] as number;
    if (amount > 0 && Number.isFinite(amount)) solids[tab.solidNames[asm.present[r] as number] as string] = amount;
  }
  const saturation: Record<string, number> = {};
  for (let s = 0; s < tab.nsol; s++) {
    const si = possible[s] ? saturationIndex(asm, s) : -Infinity;
    saturation[tab.solidNames[s] as string] = Number.isNaN(si) ? -Infinity : si;
  }
  return {
    free,
    species,
    solids,
    saturation,
    gamma,
    ionicStrength: finiteOr(asm.ionicStrength, 0),
    residual: finiteOr(asm.massResidual(), Number.MAX_VALUE),
    activity: tab.activity,
    temperatureC: tab.temperatureC,
  };
}

function resultWarnings(tab: Tableau, body: ReturnType<typeof buildResult>): string[] {
  const warnings = [...tab.warnings];
  if (tab.activity === 'davies' && body.ionicStrength > DAVIES_LIMIT_I) {
    warnings.push(
      `Ionic strength ${body.ionicStrength.toPrecision(3)} mol/L is above ${DAVIES_LIMIT_I} mol/L, beyond the usual range of the Davies equation; treat activities as estimates.`,
    );
  }
  for (const name of tab.solidNames) {
    const si = body.saturation[name] as number;
    if (body.solids[name] === undefined && si < 0 && si > -NEAR_SATURATION) {
      warnings.push(`${name} is close to saturation (saturation index ${si.toFixed(2)}): a small change may precipitate it.`);
    }
  }
  return warnings;
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
  const body = buildResult(tab, settled.asm, settled.possible);
  const result: SolveResult & { trace?: TraceLine[] } = {
    status: settled.converged ? 'converged' : 'not_converged',
    ...(settled.message ? { message: settled.message } : {}),
    ...body,
    iterations: settled.iterations,
    warnings: resultWarnings(tab, body),
  };
  if (settled.trace) result.trace = settled.trace;
  return { result, state: settled.state };
}

/** Solves one problem in the general form; throws EngineInputError for invalid input only. */
export function solve(problem: Problem | unknown, options: SolveOptions = {}): SolveResult {
  return solveTableau(compileProblem(problem), options).result;
}
