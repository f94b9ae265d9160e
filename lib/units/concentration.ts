// Concentration units of a plating or recovery bath and conversions between them.
//
// Amount units (mol/L, mmol/L) and mass units (g/L, mg/L, ppm, troy oz/gal, oz/gal) convert among
// themselves exactly; crossing between the two needs the molar mass of the dissolved substance.
import { AVOIRDUPOIS_OUNCE_G, TROY_OUNCE_G, US_GALLON_L } from './constants';
import { toNonNegativeDecimal, toPositiveDecimal, type Decimal, type DecimalInput } from './decimal';
import { UnitsInputError } from './errors';
import { molarMass } from './formula';
import { lookUp, type UnitInfo } from './mass-volume';

/** Concentration units a bath may be stated in. */
export type ConcentrationUnit = 'mol/L' | 'mmol/L' | 'g/L' | 'mg/L' | 'ppm' | 'troy oz/gal' | 'oz/gal';

/** Whether a unit counts moles or grams: crossing from one basis to the other needs a molar mass. */
export type ConcentrationBasis = 'amount' | 'mass';

/** A molar mass in g/mol (number, decimal string or Decimal), or a formula to compute it from. */
export type MolarMassSource = DecimalInput | { formula: string };

/** Concentration units for pickers, in display order, with the basis each one counts in. */
export const CONCENTRATION_UNITS: readonly (UnitInfo<ConcentrationUnit> & { basis: ConcentrationBasis })[] = [
  { id: 'mol/L', basis: 'amount', label: 'mol/L', description: 'moles per litre of solution' },
  { id: 'mmol/L', basis: 'amount', label: 'mmol/L', description: 'millimoles per litre of solution' },
  { id: 'g/L', basis: 'mass', label: 'g/L', description: 'grams per litre of solution' },
  { id: 'mg/L', basis: 'mass', label: 'mg/L', description: 'milligrams per litre of solution' },
  {
    id: 'ppm',
    basis: 'mass',
    label: 'ppm',
    description: 'taken as mg/L, as for dilute aqueous solution (density 1 kg/L assumed, common practice)',
  },
  {
    id: 'troy oz/gal',
    basis: 'mass',
    label: 'troy oz/gal',
    description: 'troy ounces per US gallon, as precious-metal platers state metal content (common practice)',
  },
  {
    id: 'oz/gal',
    basis: 'mass',
    label: 'oz/gal',
    description: 'avoirdupois ounces per US gallon, as salts and free cyanide are stated in plating shops (common practice)',
  },
];

// [numerator, denominator]: mol/L per unit for the amount basis, g/L per unit for the mass basis.
const PER_BASE: Readonly<Record<ConcentrationUnit, readonly [string, string]>> = {
  'mol/L': ['1', '1'],
  'mmol/L': ['1', '1000'],
  'g/L': ['1', '1'],
  'mg/L': ['1', '1000'],
  ppm: ['1', '1000'],
  'troy oz/gal': [TROY_OUNCE_G, US_GALLON_L],
  'oz/gal': [AVOIRDUPOIS_OUNCE_G, US_GALLON_L],
};

const BASIS: Readonly<Record<ConcentrationUnit, ConcentrationBasis>> = Object.fromEntries(
  CONCENTRATION_UNITS.map((u) => [u.id, u.basis]),
) as Record<ConcentrationUnit, ConcentrationBasis>;

/** Whether converting `from` to `to` needs a molar mass (one is per mole, the other per gram). */
export function needsMolarMass(from: ConcentrationUnit, to: ConcentrationUnit): boolean {
  return basisOf(from, 'from') !== basisOf(to, 'to');
}

/** Converts a concentration (not negative); `molarMassGPerMol` is required only across mol and mass units. */
export function convertConcentration(
  value: DecimalInput,
  from: ConcentrationUnit,
  to: ConcentrationUnit,
  molarMassGPerMol?: MolarMassSource,
): Decimal {
  const v = toNonNegativeDecimal(value, 'value');
  const fromBasis = basisOf(from, 'from');
  const toBasis = basisOf(to, 'to');
  const [fromNum, fromDen] = PER_BASE[from];
  const [toNum, toDen] = PER_BASE[to];
  let base = v.times(fromNum).div(fromDen);
  if (fromBasis !== toBasis) {
    if (molarMassGPerMol === undefined || molarMassGPerMol === null) {
      throw new UnitsInputError(
        'molarMass',
        `Converting ${from} to ${to} needs the molar mass (g/mol) of the dissolved substance, or its formula.`,
      );
    }
    const m = resolveMolarMass(molarMassGPerMol);
    base = fromBasis === 'amount' ? base.times(m) : base.div(m);
  }
  return base.times(toDen).div(toNum);
}

/** A molar mass in g/mol from a number or a formula; throws UnitsInputError('molarMass') unless above zero. */
export function resolveMolarMass(source: MolarMassSource): Decimal {
  if (typeof source === 'object' && source !== null && 'formula' in source) {
    return toPositiveDecimal(molarMass(source.formula), 'molarMass');
  }
  return toPositiveDecimal(source, 'molarMass');
}

/** Converts to mol/L, the engine's unit; shorthand for convertConcentration(value, from, 'mol/L', m). */
export function toMolPerL(value: DecimalInput, from: ConcentrationUnit, molarMassGPerMol?: MolarMassSource): Decimal {
  return convertConcentration(value, from, 'mol/L', molarMassGPerMol);
}

function basisOf(unit: ConcentrationUnit, field: string): ConcentrationBasis {
  lookUp(PER_BASE, unit, field, 'concentration');
  return BASIS[unit];
}
