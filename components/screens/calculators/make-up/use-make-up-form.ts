// The make-up calculator's own inputs: the salt (or stock solution), what it brings, the target
// and its unit, and the params they make, with messages beside the field that cannot be read.
import { useState } from 'react';

import { parseAmount } from '@/components/screens/calculate/use-system-form';
import { gramsPerMole, inSystem, parseStoich, readReagent, type InSystem } from '@/components/screens/calculators/dosing-plan/reagent-stoich';
import { type TankVolume } from '@/components/screens/calculators/dosing-plan/use-bath-volume';
import { defaultSolid } from '@/components/screens/calculators/frame/solid-choices';
import { type ParamsBase, type ParamsCheck } from '@/components/screens/calculators/frame/types';

import { SALTS, type SaltChoice } from './make-up-words';

/** A free-ligand target in mol/L of the ligand, or in g/L of the salt (as shops state free cyanide). */
export type TargetUnit = 'mol/L' | 'g/L';

/** The make-up fields as typed. */
export type MakeUpDraft = {
  salt: string;
  /** The formula of another salt (salt === 'other'). */
  other: string;
  /** What one mole brings, as written; null: read from the formula. */
  stoich: string | null;
  percent: string;
  density: string;
  kind: 'free' | 'headroom';
  component: string | null;
  solid: string | null;
  value: string;
  unit: TargetUnit;
};

/** The fields with the defaults the system suggests filled in, and what the salt brings. */
export type MakeUpResolved = {
  choice: SaltChoice | null;
  formula: string;
  brings: Record<string, number> | null;
  derived: InSystem | null;
  saltMessage: string | null;
  ligands: string[];
  component: string | null;
  solids: string[];
  solid: string | null;
};

const FIRST: MakeUpDraft = { salt: 'NaCN', other: '', stoich: null, percent: '28', density: '0.90', kind: 'free', component: null, solid: null, value: '', unit: 'mol/L' };

function components({ built, form }: ParamsBase): string[] {
  return built?.problem.components ?? [...form.chosen, ...(form.pH.trim() !== '' ? ['H+'] : [])];
}

/** Resolves the salt and the target against the system at hand. */
export function resolveMakeUp(d: MakeUpDraft, base: ParamsBase): MakeUpResolved {
  const choice = SALTS.find((s) => s.key === d.salt) ?? null;
  const formula = (choice?.formula ?? d.other).trim();
  const have = components(base);
  let brings: Record<string, number> | null = null;
  let derived: InSystem | null = null;
  let saltMessage: string | null = null;
  if (d.stoich !== null) {
    const typed = parseStoich(d.stoich);
    if (typed.ok) brings = typed.stoich;
    else saltMessage = typed.message;
  } else if (formula === '') saltMessage = 'Give the formula of the salt, such as CuCN';
  else {
    const read = readReagent(formula);
    if (!read.ok) saltMessage = read.reason;
    else {
      derived = inSystem(read.ions, have);
      brings = Object.keys(derived.stoich).length > 0 ? derived.stoich : null;
      if (!brings) saltMessage = `Nothing ${formula} brings is in the solution: choose its ions above`;
    }
  }
  const ligands = base.form.groups.ligands;
  const component = d.component !== null && ligands.includes(d.component) ? d.component : (ligands.find((l) => (brings?.[l] ?? 0) > 0) ?? ligands[0] ?? null);
  const solids = base.built?.availableSolids ?? [];
  const solid = d.solid !== null && solids.includes(d.solid) ? d.solid : defaultSolid(base.built, base.form.groups.metals, component ? [component] : ligands);
  return { choice, formula, brings, derived, saltMessage, ligands, component, solids, solid };
}

function stockOf(d: MakeUpDraft, choice: SaltChoice | null): { massFraction: number; densityKgPerL: number } | string | null {
  if (!choice?.stock) return null;
  const pct = parseAmount(d.percent);
  const rho = parseAmount(d.density);
  if (pct === undefined || !(pct > 0) || pct > 100) return 'The strength must be a percentage by mass, above 0 and up to 100';
  if (rho === undefined || !(rho > 0)) return 'The density must be a number of kg/L above 0';
  return { massFraction: pct / 100, densityKgPerL: rho };
}

function targetOf(d: MakeUpDraft, r: MakeUpResolved): Record<string, unknown> | string {
  const value = parseAmount(d.value);
  if (value === undefined || !(value > 0)) return `Enter the target, a number of ${d.kind === 'free' ? d.unit : 'mol/L'} above 0`;
  if (d.kind === 'headroom') return r.solid ? { kind: 'headroom', solid: r.solid, molPerL: value } : 'Choose the solid (the ions above must be able to form one)';
  if (!r.component) return 'Choose the ligand the target is for (among the ligands above)';
  if (d.unit === 'mol/L') return { kind: 'free', component: r.component, molPerL: value };
  const count = r.brings?.[r.component] ?? 0;
  const m = gramsPerMole(r.formula);
  if (!(count > 0) || m === null) return `The salt brings no ${r.component} to count as g/L: give the target in mol/L`;
  return { kind: 'free', component: r.component, molPerL: (value / m) * count };
}

/** The params of the make-up, or the messages beside its fields ("volume", "salt", "target"). */
export function makeUpParams(d: MakeUpDraft, r: MakeUpResolved, tank: TankVolume): ParamsCheck {
  const errors: Record<string, string> = {};
  const volume = parseAmount(tank.text);
  if (volume === undefined || !(volume > 0)) errors.volume = `Enter the tank volume, a number of ${tank.unit} above 0`;
  const stock = stockOf(d, r.choice);
  if (!r.brings) errors.salt = r.saltMessage ?? 'Write what one mole of the salt brings';
  else if (typeof stock === 'string') errors.salt = stock;
  const target = targetOf(d, r);
  if (typeof target === 'string') errors.target = target;
  if (Object.keys(errors).length > 0 || typeof target === 'string' || typeof stock === 'string' || !r.brings) return { ok: false, errors };
  const name = r.choice?.name ?? r.formula;
  const formula = gramsPerMole(r.formula) !== null ? r.formula : undefined;
  return {
    ok: true,
    params: { volume: { value: volume, unit: tank.unit }, salt: { name, ...(formula ? { formula } : {}), stoich: r.brings, ...(stock ? { stock } : {}) }, target },
  };
}

/** The make-up fields' state and setters. */
export function useMakeUpDraft() {
  const [draft, setDraft] = useState<MakeUpDraft>(FIRST);
  const set = (patch: Partial<MakeUpDraft>) => setDraft((now) => ({ ...now, ...patch }));
  return { draft, set };
}
