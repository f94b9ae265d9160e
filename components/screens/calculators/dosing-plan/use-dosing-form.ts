// The dosing plan's own inputs: the vessel volume and the steps as typed, and the params they make
// (amounts in mol, volumes in litres), with messages beside the step that cannot be read.
import { useRef, useState } from 'react';

import { parseAmount } from '@/components/screens/calculate/use-system-form';
import { type ParamsBase, type ParamsCheck } from '@/components/screens/calculators/frame/types';
import { convertVolume } from '@/lib/units';

import { gramsPerMole, inSystem, parseStoich, readReagent, reagentFormula, stoichText, type InSystem } from './reagent-stoich';
import { type TankUnit } from './use-bath-volume';

/** Units an addition is weighed or counted in. */
export const AMOUNT_UNITS = ['g', 'kg', 'mol'] as const;
export type AmountUnit = (typeof AMOUNT_UNITS)[number];

/** Most steps a plan takes (the schema's limit). */
export const MAX_STEPS = 30;

/** One step as typed. */
export type StepDraft =
  | { id: string; kind: 'add'; reagent: string; amount: string; unit: AmountUnit; stoich: string | null; liquid: string }
  | { id: string; kind: 'set-ph'; pH: string }
  | { id: string; kind: 'dilute'; mode: 'add' | 'to'; volume: string };

/** What a reagent brings in this system: read from its formula, or as the person wrote it. */
export type ReagentStoich = { stoich: Record<string, number> | null; derived: InSystem | null; message: string | null; formula: string | null };

/** The components a step may use: those of the last build, else the ions chosen (and H+ when a pH is given). */
export function componentsOf({ built, form }: ParamsBase): string[] {
  return built?.problem.components ?? [...form.chosen, ...(form.pH.trim() !== '' ? ['H+'] : [])];
}

/** What one mole of an add step's reagent brings, and why not when it cannot be read. */
export function reagentStoich(step: Extract<StepDraft, { kind: 'add' }>, components: readonly string[]): ReagentStoich {
  const reading = readReagent(step.reagent);
  const formula = reading.formula;
  if (step.stoich !== null) {
    const typed = parseStoich(step.stoich);
    if (!typed.ok) return { stoich: null, derived: null, message: typed.message, formula };
    const unknown = Object.keys(typed.stoich).filter((c) => !components.includes(c));
    if (unknown.length > 0) return { stoich: null, derived: null, message: `${unknown.join(', ')} ${unknown.length === 1 ? 'is' : 'are'} not in the solution; use ${components.join(', ')}`, formula };
    return { stoich: typed.stoich, derived: null, message: null, formula };
  }
  if (!reading.ok) return { stoich: null, derived: null, message: step.reagent.trim() === '' ? 'Name the reagent or give its formula, such as NaCN' : reading.reason, formula };
  const derived = inSystem(reading.ions, components);
  if (Object.keys(derived.stoich).length === 0) return { stoich: null, derived, message: `Nothing ${step.reagent.trim()} brings is in the solution: choose its ions above, or write what one mole brings`, formula };
  return { stoich: derived.stoich, derived, message: null, formula };
}

function litres(value: number, unit: TankUnit): number {
  return unit === 'L' ? value : convertVolume(value, unit, 'L').toNumber();
}

type Made = { step: Record<string, unknown> } | { error: string };

function addStep(d: Extract<StepDraft, { kind: 'add' }>, unit: TankUnit, components: readonly string[]): Made {
  const what = reagentStoich(d, components);
  if (!what.stoich) return { error: what.message ?? 'Write what one mole brings' };
  const amount = parseAmount(d.amount);
  if (amount === undefined || !(amount > 0)) return { error: 'Enter the amount added, above 0' };
  let mol = amount;
  if (d.unit !== 'mol') {
    const m = gramsPerMole(what.formula ?? reagentFormula(d.reagent));
    if (m === null) return { error: `Give the amount in mol: ${d.reagent.trim()} has no formula to weigh it by` };
    mol = (amount * (d.unit === 'kg' ? 1000 : 1)) / m;
  }
  const liquid = parseAmount(d.liquid);
  if (liquid !== undefined && !(liquid >= 0)) return { error: `The liquid it brings must be a number of ${unit} (or leave it empty)` };
  return {
    step: {
      kind: 'add',
      label: `add ${d.amount.trim()} ${d.unit} ${d.reagent.trim()}`.slice(0, 100),
      reagent: d.reagent.trim().slice(0, 60),
      stoich: what.stoich,
      mol,
      ...(liquid ? { volumeL: litres(liquid, unit) } : {}),
    },
  };
}

function makeStep(d: StepDraft, unit: TankUnit, components: readonly string[]): Made {
  if (d.kind === 'add') return addStep(d, unit, components);
  if (d.kind === 'set-ph') {
    const pH = parseAmount(d.pH);
    if (pH === undefined || Number.isNaN(pH) || pH < -2 || pH > 16) return { error: 'Enter the pH to hold, from -2 to 16' };
    return { step: { kind: 'set-ph', label: `set pH ${d.pH.trim()}`, pH } };
  }
  const v = parseAmount(d.volume);
  if (v === undefined || !(v > 0)) return { error: d.mode === 'add' ? `Enter the water added, in ${unit}` : `Enter the volume to make up to, in ${unit}` };
  return d.mode === 'add'
    ? { step: { kind: 'dilute', label: `add ${d.volume.trim()} ${unit} water`, addWaterL: litres(v, unit) } }
    : { step: { kind: 'dilute', label: `make up to ${d.volume.trim()} ${unit}`, toVolumeL: litres(v, unit) } };
}

/** The params of the plan, or the messages beside the fields ("volumeL", "steps", "steps.2"). */
export function dosingParams(volume: string, unit: TankUnit, drafts: readonly StepDraft[], components: readonly string[]): ParamsCheck {
  const errors: Record<string, string> = {};
  const v = parseAmount(volume);
  if (v === undefined) errors.volumeL = `Enter the volume in the vessel, in ${unit}`;
  else if (!(v > 0)) errors.volumeL = `Must be a number of ${unit} above 0`;
  if (drafts.length === 0) errors.steps = 'Add at least one step';
  const steps: Record<string, unknown>[] = [];
  drafts.forEach((d, i) => {
    const made = makeStep(d, unit, components);
    if ('error' in made) errors[`steps.${i}`] = made.error;
    else steps.push(made.step);
  });
  if (Object.keys(errors).length > 0 || v === undefined) return { ok: false, errors };
  return { ok: true, params: { volumeL: litres(v, unit), steps } };
}

/** The steps of the plan and the actions on them. */
export function useDosingSteps() {
  const [steps, setSteps] = useState<StepDraft[]>([]);
  const next = useRef(1);
  const id = () => `step-${next.current++}`;
  return {
    steps,
    add: (kind: StepDraft['kind']) =>
      setSteps((now) => {
        if (now.length >= MAX_STEPS) return now;
        const step: StepDraft =
          kind === 'add'
            ? { id: id(), kind, reagent: '', amount: '', unit: 'g', stoich: null, liquid: '' }
            : kind === 'set-ph'
              ? { id: id(), kind, pH: '' }
              : { id: id(), kind, mode: 'add', volume: '' };
        return [...now, step];
      }),
    remove: (stepId: string) => setSteps((now) => now.filter((s) => s.id !== stepId)),
    move: (stepId: string, by: -1 | 1) =>
      setSteps((now) => {
        const i = now.findIndex((s) => s.id === stepId);
        const j = i + by;
        if (i < 0 || j < 0 || j >= now.length) return now;
        const copy = [...now];
        [copy[i], copy[j]] = [copy[j] as StepDraft, copy[i] as StepDraft];
        return copy;
      }),
    update: (stepId: string, patch: Partial<StepDraft>) => setSteps((now) => now.map((s) => (s.id === stepId ? ({ ...s, ...patch } as StepDraft) : s))),
    /** Starts writing what one mole brings from what the formula gave. */
    editStoich: (stepId: string, from: Record<string, number> | null) => setSteps((now) => now.map((s) => (s.id === stepId && s.kind === 'add' ? { ...s, stoich: from ? stoichText(from) : '' } : s))),
  };
}

/** The steps' state and actions. */
export type DosingSteps = ReturnType<typeof useDosingSteps>;
