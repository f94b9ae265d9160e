// Molar masses for the calculators' g/L figures, through lib/units (IUPAC standard atomic weights).
import { molarMass, UnitsInputError } from '@/lib/units';

/** Molar mass in g/mol of a formula or an ion name ("AgBr(s)", "Cu+2"), or null when it does not parse as a formula. */
export function gramsPerMol(formula: string): number | null {
  try {
    const m = molarMass(formula).toNumber();
    return m > 0 && Number.isFinite(m) ? m : null;
  } catch (e) {
    if (e instanceof UnitsInputError) return null;
    throw e;
  }
}

/** mol/L times g/mol, or null when the molar mass is unknown; g/L. */
export function gramsPerLitre(molPerL: number, formula: string): number | null {
  const m = gramsPerMol(formula);
  return m === null ? null : molPerL * m;
}
