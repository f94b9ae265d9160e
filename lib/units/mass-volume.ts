// Mass and volume units a shop weighs salts and measures tanks in, and exact conversions between them.
import { AVOIRDUPOIS_OUNCE_G, POUND_G, TROY_OUNCE_G, US_GALLON_L } from './constants';
import { D, toNonNegativeDecimal, type Decimal, type DecimalInput } from './decimal';
import { UnitsInputError } from './errors';

/** Volume units: litre, millilitre, US liquid gallon. */
export type VolumeUnit = 'L' | 'mL' | 'gal';

/** Mass units: gram, kilogram, milligram, avoirdupois ounce, troy ounce, avoirdupois pound. */
export type MassUnit = 'g' | 'kg' | 'mg' | 'oz' | 'troy oz' | 'lb';

/** A number with its unit, as forms and API bodies carry it. */
export interface Quantity<U extends string> {
  value: DecimalInput;
  unit: U;
}

/** A unit for pickers: its id, a short label and what it means. */
export interface UnitInfo<U extends string> {
  id: U;
  label: string;
  description: string;
}

/** Volume units for pickers, in display order. */
export const VOLUME_UNITS: readonly UnitInfo<VolumeUnit>[] = [
  { id: 'L', label: 'L', description: 'litres' },
  { id: 'mL', label: 'mL', description: 'millilitres' },
  { id: 'gal', label: 'gal (US)', description: 'US liquid gallons, 3.785411784 L' },
];

/** Mass units for pickers, in display order. */
export const MASS_UNITS: readonly UnitInfo<MassUnit>[] = [
  { id: 'g', label: 'g', description: 'grams' },
  { id: 'kg', label: 'kg', description: 'kilograms' },
  { id: 'mg', label: 'mg', description: 'milligrams' },
  { id: 'oz', label: 'oz', description: 'avoirdupois ounces, 28.349523125 g, as salts are weighed in US shops' },
  { id: 'troy oz', label: 'troy oz', description: 'troy ounces, 31.1034768 g, as precious metals are weighed' },
  { id: 'lb', label: 'lb', description: 'avoirdupois pounds, 453.59237 g' },
];

const LITRES_PER: Readonly<Record<VolumeUnit, string>> = { L: '1', mL: '0.001', gal: US_GALLON_L };

const GRAMS_PER: Readonly<Record<MassUnit, string>> = {
  g: '1',
  kg: '1000',
  mg: '0.001',
  oz: AVOIRDUPOIS_OUNCE_G,
  'troy oz': TROY_OUNCE_G,
  lb: POUND_G,
};

/** Litres in one `unit`, checking the unit at run time (API bodies are not typed). */
export function litresPer(unit: VolumeUnit, field = 'unit'): Decimal {
  return new D(lookUp(LITRES_PER, unit, field, 'volume'));
}

/** Grams in one `unit`, checking the unit at run time. */
export function gramsPer(unit: MassUnit, field = 'unit'): Decimal {
  return new D(lookUp(GRAMS_PER, unit, field, 'mass'));
}

/** Converts a volume (not negative) between units; exact for the defined units. */
export function convertVolume(value: DecimalInput, from: VolumeUnit, to: VolumeUnit): Decimal {
  const v = toNonNegativeDecimal(value, 'volume');
  return v.times(litresPer(from, 'from')).div(litresPer(to, 'to'));
}

/** Converts a mass (not negative) between units; exact for the defined units. */
export function convertMass(value: DecimalInput, from: MassUnit, to: MassUnit): Decimal {
  const m = toNonNegativeDecimal(value, 'mass');
  return m.times(gramsPer(from, 'from')).div(gramsPer(to, 'to'));
}

/** Looks `unit` up in a factor table, or throws UnitsInputError listing the units there are. */
export function lookUp<U extends string, V>(table: Readonly<Record<U, V>>, unit: U, field: string, kind: string): V {
  if (typeof unit !== 'string' || !Object.prototype.hasOwnProperty.call(table, unit)) {
    const known = Object.keys(table).join(', ');
    throw new UnitsInputError(field, `Unknown ${kind} unit "${String(unit)}" for ${field}: use one of ${known}.`);
  }
  return table[unit];
}
