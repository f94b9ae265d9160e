// What a make-up calculation takes: the salt (or stock solution), the target and the bath volume,
// with their checks.
import { convertVolume, MASS_UNITS, molarMass, UnitsInputError, VOLUME_UNITS, type MassUnit, type VolumeUnit } from '@/lib/units';

import { CalculatorInputError } from './errors';
import type { BathState, ChemicalSystem, PhSetting } from './system';
import { componentName, finiteNumber, positive, solidName, totalComponent } from './validate';

/** A salt or a stock solution to add. */
export interface Salt {
  /** What the person adds, e.g. "sodium cyanide". */
  name: string;
  /** Formula for the molar mass, e.g. "NaCN", "Na2S2O3·5H2O", "NH3"; without it no mass is given. */
  formula?: string;
  /** Moles of each component per mole of salt, e.g. {"Na+": 2, "S2O3-2": 1}. */
  stoich: Record<string, number>;
  /** A stock solution of the substance: mass fraction (0..1] and density in kg/L (25 % w/w NH3: 0.25 and 0.91). */
  stock?: { massFraction: number; densityKgPerL: number };
}

/** The target: a free concentration (mol/L) of a component, or a headroom (mol/L of solid) for a solid. */
export type MakeUpTarget = { kind: 'free'; component: string; molPerL: number } | { kind: 'headroom'; solid: string; molPerL: number };

/** A bath, its volume, the salt and the target. */
export interface MakeUpInput {
  system: ChemicalSystem;
  state: BathState;
  pH?: PhSetting;
  /** Volume of the bath as it is. */
  volume: { value: number; unit: VolumeUnit };
  salt: Salt;
  target: MakeUpTarget;
  /** Unit for the mass to weigh out (default g). */
  massUnit?: MassUnit;
  /** Most salt considered, mol per litre of bath (default 10). */
  maxAddMolPerL?: number;
}

/** The checked input in the units the search works in. */
export interface MakeUpPlan {
  litres: number;
  massUnit: MassUnit;
  max: number;
  /** g/mol of the salt (or the substance of the stock), null without a formula. */
  gramsPerMol: number | null;
  /** mol/L of the substance in the stock solution; null for a dry salt. */
  stockMolPerL: number | null;
}

function checkSalt(input: MakeUpInput): number | null {
  const { salt, system, state } = input;
  if (typeof salt !== 'object' || salt === null || typeof salt.name !== 'string' || salt.name.trim() === '') {
    throw new CalculatorInputError('salt.name', 'name the salt, such as "sodium cyanide"');
  }
  const counts = Object.entries(salt.stoich ?? {});
  for (const [c, n] of counts) {
    componentName(system, c, `salt.stoich.${c}`);
    finiteNumber(n, `salt.stoich.${c}`, 'a count');
    if (n < 0 && state.totals[c] !== undefined) throw new CalculatorInputError(`salt.stoich.${c}`, `a salt cannot take "${c}" out of the bath (count ${n}); use a count of 0 or more`);
  }
  if (!counts.some(([c, n]) => n > 0 && state.totals[c] !== undefined)) {
    throw new CalculatorInputError('salt.stoich', 'the salt must bring at least one component that has a total in the bath, such as {"Na+": 1, "CN-": 1}');
  }
  if (salt.formula === undefined) return null;
  try {
    return molarMass(salt.formula).toNumber();
  } catch (e) {
    if (e instanceof UnitsInputError) throw new CalculatorInputError('salt.formula', e.message);
    throw e;
  }
}

function checkTarget(input: MakeUpInput): void {
  const t = input.target;
  if (t?.kind === 'free') totalComponent(input.system, input.state, t.component, 'target.component');
  else if (t?.kind === 'headroom') solidName(input.system, t.solid, 'target.solid');
  else throw new CalculatorInputError('target.kind', 'must be "free" or "headroom"');
  positive(t.molPerL, 'target.molPerL', 'the target (mol/L)');
}

function stockMolarity(input: MakeUpInput, gramsPerMol: number | null): number | null {
  const stock = input.salt.stock;
  if (stock === undefined) return null;
  if (gramsPerMol === null) throw new CalculatorInputError('salt.formula', 'a stock solution needs the formula of its substance, such as NH3');
  const w = positive(stock.massFraction, 'salt.stock.massFraction', 'the mass fraction');
  if (w > 1) throw new CalculatorInputError('salt.stock.massFraction', `is a fraction from 0 to 1 (25 % is 0.25), got ${w}`);
  const rho = positive(stock.densityKgPerL, 'salt.stock.densityKgPerL', 'the density (kg/L)');
  return (w * rho * 1000) / gramsPerMol;
}

/** Checks a make-up input; throws CalculatorInputError naming the field. */
export function checkMakeUp(input: MakeUpInput): MakeUpPlan {
  const unit = input.volume?.unit;
  if (!VOLUME_UNITS.some((u) => u.id === unit)) throw new CalculatorInputError('volume.unit', `use one of ${VOLUME_UNITS.map((u) => u.id).join(', ')}, got ${JSON.stringify(unit)}`);
  const litres = convertVolume(positive(input.volume.value, 'volume.value', 'the bath volume'), unit, 'L').toNumber();
  const massUnit = input.massUnit ?? 'g';
  if (!MASS_UNITS.some((u) => u.id === massUnit)) throw new CalculatorInputError('massUnit', `use one of ${MASS_UNITS.map((u) => u.id).join(', ')}, got ${JSON.stringify(massUnit)}`);
  const max = input.maxAddMolPerL === undefined ? 10 : positive(input.maxAddMolPerL, 'maxAddMolPerL', 'the most salt considered (mol/L)');
  checkTarget(input);
  const gramsPerMol = checkSalt(input);
  return { litres, massUnit, max, gramsPerMol, stockMolPerL: stockMolarity(input, gramsPerMol) };
}
