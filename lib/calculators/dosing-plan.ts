// Dosing plan: a vessel taken through a sequence of additions, pH set points and dilutions, with
// the equilibrium after each step and which solids appeared or dissolved. Closed system: solids
// stay in the vessel, so the totals include them.
import type { SolveResult, SolveStatus } from '@/lib/engine';

import { checkStep, checkVessel, type AddStep, type DosingStep, type Vessel } from './dosing-steps';
import { CalculatorInputError } from './errors';
import { mergeWarnings, worstStatus } from './status';
import { solveBath, type ChemicalSystem, type PhSetting } from './system';

/** A vessel and the steps to take. */
export interface DosingPlanInput {
  system: ChemicalSystem;
  vessel: Vessel;
  steps: DosingStep[];
}

/** The vessel after one step (index 0: before any step). */
export interface DosingState {
  index: number;
  kind: 'start' | DosingStep['kind'];
  label: string;
  /** Volume of solution, L. */
  volumeL: number;
  /** Moles in the vessel of each component with a total (dissolved plus solid). */
  amounts: Record<string, number>;
  /** amounts / volume, mol/L. */
  totals: Record<string, number>;
  /** Free concentrations held, mol/L (H+ as converted from the pH set point). */
  fixed: Record<string, number>;
  pH: PhSetting | null;
  result: SolveResult;
  /** Solids present now that were not after the step before. */
  appeared: string[];
  /** Solids present after the step before that are gone now. */
  dissolved: string[];
  /** Moles of each reagent added so far. */
  reagentsAdded: Record<string, number>;
  /** Moles of each component added so far by reagents (fixed ones included: the set point takes them up). */
  componentsAdded: Record<string, number>;
  status: SolveStatus;
  warnings: string[];
}

/** Every state of the plan. */
export interface DosingPlanResult {
  status: SolveStatus;
  warnings: string[];
  states: DosingState[];
}

interface Vat {
  volumeL: number;
  amounts: Record<string, number>;
  fixed: Record<string, number>;
  pH: PhSetting | null;
  reagentsAdded: Record<string, number>;
  componentsAdded: Record<string, number>;
}

function startVat(system: ChemicalSystem, vessel: Vessel): Vat {
  const volumeL = checkVessel(system, vessel);
  const fixed = { ...(vessel.fixed ?? {}) };
  const h = vessel.pH ? (vessel.pH.hComponent ?? 'H+') : null;
  const amounts: Record<string, number> = {};
  for (const c of system.components) {
    if (fixed[c] !== undefined || c === h) {
      if (vessel.amounts[c] !== undefined) throw new CalculatorInputError(`vessel.amounts.${c}`, `"${c}" is held fixed (or set by the pH); give it an amount or a fixed value, not both`);
    } else amounts[c] = vessel.amounts[c] ?? 0;
  }
  return { volumeL, amounts, fixed, pH: vessel.pH ?? null, reagentsAdded: {}, componentsAdded: {} };
}

function add(vat: Vat, step: AddStep, i: number): string[] {
  const notes: string[] = [];
  vat.reagentsAdded[step.reagent] = (vat.reagentsAdded[step.reagent] ?? 0) + step.mol;
  for (const [c, n] of Object.entries(step.stoich)) {
    const moles = step.mol * n;
    vat.componentsAdded[c] = (vat.componentsAdded[c] ?? 0) + moles;
    if (vat.amounts[c] === undefined) {
      if (moles !== 0) notes.push(`${c} from ${step.reagent} (${moles.toPrecision(3)} mol) is taken up by the ${c} held fixed.`);
      continue;
    }
    const next = (vat.amounts[c] as number) + moles;
    if (next < -1e-12 * Math.max(1, Math.abs(moles))) {
      throw new CalculatorInputError(`steps[${i}].stoich.${c}`, `adding ${step.mol} mol ${step.reagent} would leave ${next.toPrecision(3)} mol of "${c}"; set a pH instead, or add less`);
    }
    vat.amounts[c] = Math.max(0, next);
  }
  vat.volumeL += step.volumeL ?? 0;
  return notes;
}

function setPh(vat: Vat, step: PhSetting): string[] {
  const h = step.hComponent ?? 'H+';
  const notes = vat.amounts[h] !== undefined ? [`The ${h} amount is replaced by the pH set point from here on.`] : [];
  delete vat.amounts[h];
  delete vat.fixed[h];
  vat.pH = { pH: step.pH, measured: step.measured, hComponent: h };
  return notes;
}

function apply(system: ChemicalSystem, vat: Vat, step: DosingStep, i: number): string[] {
  checkStep(system, step, i, vat.volumeL);
  if (step.kind === 'add') return add(vat, step, i);
  if (step.kind === 'set-ph') return setPh(vat, step);
  vat.volumeL = step.toVolumeL ?? vat.volumeL + (step.addWaterL as number);
  return [];
}

function defaultLabel(step: DosingStep): string {
  if (step.kind === 'add') return `add ${step.mol} mol ${step.reagent}`;
  if (step.kind === 'set-ph') return `set pH ${step.pH}`;
  return step.toVolumeL !== undefined ? `dilute to ${step.toVolumeL} L` : `add ${step.addWaterL} L water`;
}

function snapshot(system: ChemicalSystem, vat: Vat, index: number, step: DosingStep | null, before: SolveResult | null, notes: string[]): DosingState {
  const totals: Record<string, number> = {};
  for (const [c, n] of Object.entries(vat.amounts)) totals[c] = n / vat.volumeL;
  const bath = solveBath(system, { totals, fixed: vat.fixed }, vat.pH ?? undefined);
  const fixed = vat.pH ? { ...vat.fixed, [vat.pH.hComponent ?? 'H+']: bath.freeH as number } : { ...vat.fixed };
  const was = Object.keys(before?.solids ?? {});
  const now = Object.keys(bath.result.solids);
  return {
    index,
    kind: step?.kind ?? 'start',
    label: step?.label ?? (step ? defaultLabel(step) : 'start'),
    volumeL: vat.volumeL,
    amounts: { ...vat.amounts },
    totals,
    fixed,
    pH: vat.pH ? { ...vat.pH } : null,
    result: bath.result,
    appeared: now.filter((s) => !was.includes(s)),
    dissolved: before ? was.filter((s) => !now.includes(s)) : [],
    reagentsAdded: { ...vat.reagentsAdded },
    componentsAdded: { ...vat.componentsAdded },
    status: bath.result.status,
    warnings: mergeWarnings(notes, bath.result.warnings),
  };
}

/** Runs a dosing plan: the vessel's state (mol, L, mol/L, equilibrium, solids in and out) after each step. */
export function dosingPlan(input: DosingPlanInput): DosingPlanResult {
  const vat = startVat(input.system, input.vessel);
  if (!Array.isArray(input.steps)) throw new CalculatorInputError('steps', 'give a list of steps (it may be empty)');
  const states = [snapshot(input.system, vat, 0, null, null, [])];
  input.steps.forEach((step, i) => {
    const notes = apply(input.system, vat, step, i);
    states.push(snapshot(input.system, vat, i + 1, step, (states[states.length - 1] as DosingState).result, notes));
  });
  return { status: worstStatus(...states.map((s) => s.status)), warnings: mergeWarnings(...states.map((s) => s.warnings)), states };
}
