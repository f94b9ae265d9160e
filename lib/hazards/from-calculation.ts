// The hazard situation of a calculation: the system's totals and pH, the base solution solved on
// the built problem, the reagents the calculator names, and for a dosing plan the vessel before
// and after each step (from the plan's result when there is one, else tallied from the steps).
import type { z } from 'zod';

import { solveBuilt } from '@/lib/library/solve-built';
import type { CalculatorKey } from '@/shared/calculations';
import type { ProblemJson, systemRequestSchema } from '@/shared/constants';
import type { Hazard, HazardThresholds } from '@/shared/safety';

import { evaluateHazards } from './rules';
import type { HazardSituation, HazardStep, SolvedSolution } from './types';

/** A calculation as run: the request, the built problem and, when it ran, its outcome (JSON-safe). */
export interface CalculationHazardInput {
  calculator: CalculatorKey;
  system: z.output<typeof systemRequestSchema>;
  /** The calculator's parameters as sent; read defensively. */
  params: unknown;
  problem: ProblemJson;
  outcome?: { result?: unknown } | null;
  /**
   * The base solution (the built problem at the system's pH), when the caller has solved it
   * already (a saved run's). Omitted: a speciation's own result, else solved here.
   */
  base?: SolvedSolution | null;
}

type Json = Record<string, unknown>;
const isRecord = (v: unknown): v is Json => typeof v === 'object' && v !== null && !Array.isArray(v);
const finite = (v: unknown): number | null => (typeof v === 'number' && Number.isFinite(v) ? v : null);
const text = (v: unknown): string | null => (typeof v === 'string' && v.trim() !== '' ? v.trim() : null);

/** Numbers only: JSON nulls (non-finite values) and anything else are left out. */
function numbers(v: unknown): Record<string, number> {
  if (!isRecord(v)) return {};
  return Object.fromEntries(Object.entries(v).filter((e): e is [string, number] => finite(e[1]) !== null));
}

/** The base solution on the built problem at the system's pH; null when it throws or does not converge. */
function baseSolution(problem: ProblemJson, pH: number | undefined): SolvedSolution | null {
  try {
    const r = solveBuilt(problem, pH);
    return r.status === 'converged' ? { free: r.free, species: r.species } : null;
  } catch {
    return null;
  }
}

/** The base solution in a solve result as JSON ({status, free, species}); null unless it converged. */
export function solutionOf(result: unknown): SolvedSolution | null {
  if (!isRecord(result) || result.status !== 'converged') return null;
  return { free: numbers(result.free), species: numbers(result.species) };
}

/** A speciation's result holds the base solution itself (the same problem at the same pH); undefined for other calculators or no result. */
function speciationBase(input: CalculationHazardInput): SolvedSolution | null | undefined {
  const result = input.outcome?.result;
  if (input.calculator !== 'speciation' || !isRecord(result) || result.result === undefined) return undefined;
  return solutionOf(result.result);
}

const rawSteps = (params: unknown): Json[] => (isRecord(params) && Array.isArray(params.steps) ? params.steps.map((s) => (isRecord(s) ? s : {})) : []);

/** Reagents the calculator names: the make-up salt, the solid dissolved, or the reagents dosed. */
function reagentsOf(calculator: CalculatorKey, params: unknown): string[] {
  const p = isRecord(params) ? params : {};
  let named: unknown[] = [];
  if (calculator === 'make_up') named = isRecord(p.salt) ? [p.salt.name, p.salt.formula] : [];
  else if (calculator === 'headroom') named = [p.solid];
  else if (calculator === 'fixer_loading') named = [p.solid ?? 'AgBr(s)'];
  else if (calculator === 'dosing_plan') named = rawSteps(params).filter((s) => s.kind === 'add').map((s) => s.reagent);
  return [...new Set(named.map(text).filter((s): s is string => s !== null))];
}

/** A step's own fields (not the vessel states); null for a kind the rules do not know. */
function stepFields(s: Json, i: number): Omit<HazardStep, 'before' | 'after'> | null {
  const index = i + 1;
  if (s.kind === 'add') {
    const reagent = text(s.reagent) ?? 'a reagent';
    const mol = finite(s.mol);
    return { index, kind: 'add', label: text(s.label) ?? `add ${mol ?? '?'} mol ${reagent}`, reagent, stoich: numbers(s.stoich), ...(mol !== null ? { mol } : {}) };
  }
  if (s.kind === 'set-ph') {
    const pH = finite(s.pH);
    return { index, kind: 'set-ph', label: text(s.label) ?? `set pH ${pH ?? '?'}`, ...(pH !== null ? { setPh: pH } : {}) };
  }
  if (s.kind === 'dilute') {
    const to = finite(s.toVolumeL);
    return { index, kind: 'dilute', label: text(s.label) ?? (to !== null ? `dilute to ${to} L` : `add ${finite(s.addWaterL) ?? '?'} L water`) };
  }
  return null;
}

/** One state of a dosing plan's JSON result (lib/calculators/dosing-plan.ts DosingState). */
function planState(v: unknown): HazardStep['after'] {
  const s = isRecord(v) ? v : {};
  const pH = isRecord(s.pH) ? finite(s.pH.pH) : null;
  const r = isRecord(s.result) ? s.result : null;
  const converged = (s.status ?? r?.status) === 'converged';
  return { totals: numbers(s.totals), pH, solution: r && converged ? { free: numbers(r.free), species: numbers(r.species) } : null };
}

/** Steps with the vessel states from the plan's result: states[i] is the vessel after step i, states[0] the start. */
function stepsFromPlan(raw: Json[], states: unknown[]): HazardStep[] {
  const out: HazardStep[] = [];
  raw.forEach((s, i) => {
    const fields = stepFields(s, i);
    if (!fields) return;
    const label = text((states[i + 1] as Json | undefined)?.label) ?? fields.label;
    const before = planState(states[i]);
    out.push({ ...fields, label, before: { totals: before.totals, pH: before.pH }, after: planState(states[i + 1]) });
  });
  return out;
}

/** Steps with the vessel tallied from the parameters alone (no solve): moles added, volumes, pH set points. */
function stepsFromParams(system: CalculationHazardInput['system'], params: unknown, raw: Json[]): HazardStep[] {
  const p = isRecord(params) ? params : {};
  let volume = finite(p.volumeL) !== null && (p.volumeL as number) > 0 ? (p.volumeL as number) : 1;
  const amounts: Record<string, number> = Object.fromEntries(Object.entries(numbers(system?.totals)).map(([k, v]) => [k, v * volume]));
  let pH = finite(system?.pH);
  const now = () => ({ totals: Object.fromEntries(Object.entries(amounts).map(([k, v]) => [k, v / volume])), pH });
  const out: HazardStep[] = [];
  raw.forEach((s, i) => {
    const fields = stepFields(s, i);
    if (!fields) return;
    const before = now();
    if (fields.kind === 'add') {
      const mol = fields.mol ?? 0;
      for (const [c, n] of Object.entries(fields.stoich ?? {})) {
        if (c === 'H+' && pH !== null) continue; // taken up by the pH set point
        amounts[c] = Math.max(0, (amounts[c] ?? 0) + mol * n);
      }
      const added = finite(s.volumeL);
      if (added !== null && added > 0) volume += added;
    } else if (fields.kind === 'set-ph') {
      if (fields.setPh !== undefined) pH = fields.setPh;
      delete amounts['H+'];
    } else {
      const to = finite(s.toVolumeL);
      const water = finite(s.addWaterL);
      if (to !== null && to >= volume) volume = to;
      else if (water !== null && water > 0) volume += water;
    }
    out.push({ ...fields, before, after: { ...now(), solution: null } });
  });
  return out;
}

function dosingSteps(input: CalculationHazardInput): HazardStep[] {
  const raw = rawSteps(input.params);
  const result = input.outcome?.result;
  const states = isRecord(result) && Array.isArray(result.states) ? result.states : null;
  return states !== null && states.length === raw.length + 1 ? stepsFromPlan(raw, states) : stepsFromParams(input.system, input.params, raw);
}

/** What the rules look at for one calculation. */
export function calculationSituation(input: CalculationHazardInput): HazardSituation {
  const pH = finite(input.system?.pH);
  return {
    totals: numbers(input.system?.totals),
    pH,
    solution: input.base !== undefined ? input.base : (speciationBase(input) ?? baseSolution(input.problem, pH ?? undefined)),
    reagents: reagentsOf(input.calculator, input.params),
    ...(input.calculator === 'dosing_plan' ? { steps: dosingSteps(input) } : {}),
  };
}

/** The hazards of one calculation under the shop's thresholds, in HAZARD_RULES order. */
export function calculationHazards(input: CalculationHazardInput, thresholds: HazardThresholds): Hazard[] {
  return evaluateHazards(calculationSituation(input), thresholds);
}
