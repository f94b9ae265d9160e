// The quantities of a bath analysis and their units: stored in mol/L, entered and shown in the
// bath's units. Mass units count the metal as the element (g/L of Ag), the ligand as the salt the
// bath states it as (g/L of KCN), carbonate as the bath's carbonate salt and bromide as Br.
import { convertConcentration, type ConcentrationUnit } from '@/lib/units';
import type { Bath, BathUnit, Quantity, Range } from '@/shared/baths';

/** What a bath needs for conversions. */
export type BathUnits = Pick<Bath, 'metal' | 'ligandAs' | 'carbonateAs' | 'metalUnit' | 'ligandUnit'>;

/** The element of a metal ion ("Ag+" gives "Ag", "Cu+2" gives "Cu"). */
export function metalElement(metal: string): string {
  return metal.replace(/[+-]\d*$/, '');
}

/** The formula whose molar mass turns a mass unit of `quantity` into moles. */
export function massFormula(bath: BathUnits, quantity: Exclude<Quantity, 'pH'>): string {
  switch (quantity) {
    case 'metal':
      return metalElement(bath.metal);
    case 'freeLigand':
    case 'totalLigand':
      return bath.ligandAs;
    case 'carbonate':
      return bath.carbonateAs ?? 'CO3';
    case 'bromide':
      return 'Br';
  }
}

/** The bath's unit for a quantity (null for pH). */
export function unitOf(bath: BathUnits, quantity: Quantity): BathUnit | null {
  if (quantity === 'pH') return null;
  return quantity === 'metal' ? bath.metalUnit : bath.ligandUnit;
}

/** mol/L from a value in `unit`. */
export function toStored(bath: BathUnits, quantity: Exclude<Quantity, 'pH'>, value: number, unit: BathUnit): number {
  return convertConcentration(value, unit as ConcentrationUnit, 'mol/L', { formula: massFormula(bath, quantity) }).toNumber();
}

/** A stored mol/L value in `unit` (the bath's unit by default). */
export function fromStored(bath: BathUnits, quantity: Exclude<Quantity, 'pH'>, molPerL: number, unit?: BathUnit): number {
  const to = unit ?? (unitOf(bath, quantity) as BathUnit);
  return convertConcentration(molPerL, 'mol/L', to as ConcentrationUnit, { formula: massFormula(bath, quantity) }).toNumber();
}

/** A value shown in the bath's units (pH as it is). */
export function shown(bath: BathUnits, quantity: Quantity, stored: number): number {
  return quantity === 'pH' ? stored : fromStored(bath, quantity, stored);
}

/** Where a shown value lies against a range: inside, below or above. */
export function against(range: Range | undefined, value: number): 'inside' | 'below' | 'above' {
  if (!range) return 'inside';
  // Tolerate the last digit of a rounded display value.
  const eps = 1e-9 * Math.max(1, Math.abs(value));
  if (range.min !== null && value < range.min - eps) return 'below';
  if (range.max !== null && value > range.max + eps) return 'above';
  return 'inside';
}

/** Human words for each quantity, with the bath's ligand. */
export function quantityLabel(quantity: Quantity, bath?: Pick<Bath, 'ligandAs' | 'metal' | 'carbonateAs'>): string {
  switch (quantity) {
    case 'metal':
      return bath ? `${metalElement(bath.metal)} metal` : 'Metal';
    case 'freeLigand':
      return bath ? `Free ${bath.ligandAs}` : 'Free ligand';
    case 'totalLigand':
      return bath ? `Total ${bath.ligandAs}` : 'Total ligand';
    case 'pH':
      return 'pH';
    case 'carbonate':
      return bath?.carbonateAs ? `Carbonate (as ${bath.carbonateAs})` : 'Carbonate';
    case 'bromide':
      return 'Bromide';
  }
}
