// Target ranges are typed in the bath's units; when those units (or the salt the ligand is stated
// as) change, the typed ranges are converted so they keep meaning the same concentration.
import { readNumber } from '@/components/screens/library/number-text';
import { convertConcentration, roundSignificant, type ConcentrationUnit } from '@/lib/units';
import { type BathUnit } from '@/shared/baths';

/** Significant figures kept when a typed range is converted to other units. */
const CONVERTED_SIGNIFICANT = 4;

/** A unit and the formula whose molar mass turns its mass into moles ("g/L" of "Ag", "oz/gal" of "NaCN"). */
export type StatedAs = { unit: BathUnit; formula: string };

/**
 * Typed text converted from one statement to another; the text as it was when it is empty, not a
 * number, or the formula is unknown (the form's checks then speak for it).
 */
export function convertText(text: string, from: StatedAs, to: StatedAs): string {
  const read = readNumber(text, 'null');
  if (read.bad || read.value == null || read.value < 0) return text;
  if (from.unit === to.unit && from.formula === to.formula) return text;
  try {
    const mol = convertConcentration(read.value, from.unit as ConcentrationUnit, 'mol/L', { formula: from.formula });
    const out = convertConcentration(mol, 'mol/L', to.unit as ConcentrationUnit, { formula: to.formula });
    return roundSignificant(out, CONVERTED_SIGNIFICANT).toString();
  } catch {
    return text;
  }
}
