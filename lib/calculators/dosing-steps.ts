// The vessel a dosing plan works on and the steps it takes, with their checks. Amounts are moles in
// the vessel (dissolved plus solid: a closed system), volumes litres.
import { CalculatorInputError } from './errors';
import { checkPh, type ChemicalSystem, type PhSetting } from './system';
import { componentName, finiteNumber, nonNegative, positive } from './validate';

/** Add a reagent: `mol` of it, each mole bringing `stoich` moles of components; `volumeL` of liquid it brings (default 0). */
export interface AddStep {
  kind: 'add';
  label?: string;
  reagent: string;
  stoich: Record<string, number>;
  mol: number;
  volumeL?: number;
}

/** Hold the pH at a set point from this step on (a pH-stat): H+ becomes fixed. */
export interface SetPhStep extends PhSetting {
  kind: 'set-ph';
  label?: string;
}

/** Add water: `addWaterL` litres, or make up to `toVolumeL` litres (not below the current volume). */
export interface DiluteStep {
  kind: 'dilute';
  label?: string;
  addWaterL?: number;
  toVolumeL?: number;
}

/** One step of a dosing plan. */
export type DosingStep = AddStep | SetPhStep | DiluteStep;

/** The vessel before the first step. */
export interface Vessel {
  /** Volume of solution, L. */
  volumeL: number;
  /** Moles of each component in the vessel; components not listed (and not fixed) start at 0. */
  amounts: Record<string, number>;
  /** Free concentrations held fixed, mol/L. */
  fixed?: Record<string, number>;
  /** pH held from the start (fixes H+). */
  pH?: PhSetting;
}

/** Checks the vessel; returns its volume. */
export function checkVessel(system: ChemicalSystem, vessel: Vessel): number {
  if (typeof vessel !== 'object' || vessel === null) throw new CalculatorInputError('vessel', 'give the vessel: volumeL and amounts in mol');
  const volume = positive(vessel.volumeL, 'vessel.volumeL', 'the volume (L)');
  if (typeof vessel.amounts !== 'object' || vessel.amounts === null) throw new CalculatorInputError('vessel.amounts', 'give the moles of each component as an object');
  for (const [c, n] of Object.entries(vessel.amounts)) {
    componentName(system, c, `vessel.amounts.${c}`);
    nonNegative(n, `vessel.amounts.${c}`, 'an amount (mol)');
  }
  for (const [c, v] of Object.entries(vessel.fixed ?? {})) {
    componentName(system, c, `vessel.fixed.${c}`);
    positive(v, `vessel.fixed.${c}`, 'a fixed free concentration (mol/L)');
  }
  if (vessel.pH !== undefined) checkPh(vessel.pH?.pH, 'vessel.pH');
  return volume;
}

/** Checks one step against the system; throws CalculatorInputError naming `steps[i]...`. */
export function checkStep(system: ChemicalSystem, step: DosingStep, i: number, volumeL: number): void {
  const field = `steps[${i}]`;
  if (step?.kind === 'add') {
    if (typeof step.reagent !== 'string' || step.reagent.trim() === '') throw new CalculatorInputError(`${field}.reagent`, 'name the reagent, such as "NaCN"');
    if (typeof step.stoich !== 'object' || step.stoich === null || Object.keys(step.stoich).length === 0) {
      throw new CalculatorInputError(`${field}.stoich`, 'give the moles of each component in one mole of reagent, such as {"Na+": 1, "CN-": 1}');
    }
    for (const [c, n] of Object.entries(step.stoich)) {
      componentName(system, c, `${field}.stoich.${c}`);
      finiteNumber(n, `${field}.stoich.${c}`, 'a count');
    }
    nonNegative(step.mol, `${field}.mol`, 'the amount added (mol)');
    if (step.volumeL !== undefined) nonNegative(step.volumeL, `${field}.volumeL`, 'the volume the reagent brings (L)');
  } else if (step?.kind === 'set-ph') {
    checkPh(step.pH, `${field}.pH`);
  } else if (step?.kind === 'dilute') {
    if ((step.addWaterL === undefined) === (step.toVolumeL === undefined)) {
      throw new CalculatorInputError(field, 'give either addWaterL or toVolumeL for a dilution');
    }
    if (step.addWaterL !== undefined) nonNegative(step.addWaterL, `${field}.addWaterL`, 'the water added (L)');
    if (step.toVolumeL !== undefined && positive(step.toVolumeL, `${field}.toVolumeL`, 'the new volume (L)') < volumeL) {
      throw new CalculatorInputError(`${field}.toVolumeL`, `a dilution cannot reduce the volume: ${step.toVolumeL} L is below the ${volumeL} L already in the vessel`);
    }
  } else {
    throw new CalculatorInputError(`${field}.kind`, 'must be "add", "set-ph" or "dilute"');
  }
}
