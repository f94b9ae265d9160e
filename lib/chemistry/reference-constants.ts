// A small reference set of equilibrium constants for the chemistry Ligandry is built around:
// silver, copper, gold and zinc with cyanide, ammonia, thiosulfate, thiocyanate and halides.
// Values are for 25 C and zero ionic strength, written as formation from the components
// (cumulative beta), protonation constants, and solubility products for dissolution into the
// components. They were transcribed from memory of the named compilations and must be checked
// against the printed tables before anyone relies on them; the reviewed constants library is
// the place for checked values. Hydroxide solids and hydrolysis species are written with a
// negative H+ count (water is implied).

import type { SolidInput, SpeciesInput } from '../engine/types';

/** Where a reference value comes from. */
export type ReferenceSource = string;

const SM = 'Smith & Martell, Critical Stability Constants (25 C, I = 0; from memory)';
const NIST = 'NIST Critically Selected Stability Constants, SRD 46 (25 C, I = 0; from memory)';
const CRC = 'CRC Handbook of Chemistry and Physics, solubility product table (25 C; from memory)';
const BAES = 'Baes & Mesmer, The Hydrolysis of Cations (1976) (25 C, I = 0; from memory)';
const KW = 'Ion product of water, log Kw = -14.00 at 25 C (common textbook value)';

/** A dissolved species with its source. */
export type ReferenceSpecies = SpeciesInput & { source: ReferenceSource };
/** A solid with its source. */
export type ReferenceSolid = SolidInput & { source: ReferenceSource };

/** Dissolved species beyond the components themselves. */
export const REFERENCE_SPECIES: readonly ReferenceSpecies[] = [
  { name: 'OH-', logK: -14.0, stoich: { 'H+': -1 }, source: KW },
  // Protonation of ligands
  { name: 'HCN', logK: 9.21, stoich: { 'H+': 1, 'CN-': 1 }, deltaH: -43.6, source: SM },
  { name: 'NH4+', logK: 9.25, stoich: { 'H+': 1, NH3: 1 }, deltaH: -52.2, source: SM },
  { name: 'HS2O3-', logK: 1.6, stoich: { 'H+': 1, 'S2O3-2': 1 }, source: SM },
  // Silver(I)
  { name: 'Ag(CN)2-', logK: 20.48, stoich: { 'Ag+': 1, 'CN-': 2 }, source: SM },
  { name: 'Ag(CN)3-2', logK: 21.4, stoich: { 'Ag+': 1, 'CN-': 3 }, source: SM },
  { name: 'Ag(NH3)+', logK: 3.31, stoich: { 'Ag+': 1, NH3: 1 }, source: SM },
  { name: 'Ag(NH3)2+', logK: 7.22, stoich: { 'Ag+': 1, NH3: 2 }, source: SM },
  { name: 'Ag(S2O3)-', logK: 8.82, stoich: { 'Ag+': 1, 'S2O3-2': 1 }, source: SM },
  { name: 'Ag(S2O3)2-3', logK: 13.46, stoich: { 'Ag+': 1, 'S2O3-2': 2 }, source: SM },
  { name: 'Ag(SCN)2-', logK: 8.23, stoich: { 'Ag+': 1, 'SCN-': 2 }, source: SM },
  { name: 'AgCl', logK: 3.04, stoich: { 'Ag+': 1, 'Cl-': 1 }, source: SM },
  { name: 'AgCl2-', logK: 5.04, stoich: { 'Ag+': 1, 'Cl-': 2 }, source: SM },
  // Copper(I) and copper(II)
  { name: 'Cu(CN)2-', logK: 24.0, stoich: { 'Cu+': 1, 'CN-': 2 }, source: SM },
  { name: 'Cu(CN)3-2', logK: 28.6, stoich: { 'Cu+': 1, 'CN-': 3 }, source: SM },
  { name: 'Cu(CN)4-3', logK: 30.3, stoich: { 'Cu+': 1, 'CN-': 4 }, source: SM },
  { name: 'Cu(NH3)+2', logK: 4.04, stoich: { 'Cu+2': 1, NH3: 1 }, source: SM },
  { name: 'Cu(NH3)2+2', logK: 7.47, stoich: { 'Cu+2': 1, NH3: 2 }, source: SM },
  { name: 'Cu(NH3)3+2', logK: 10.27, stoich: { 'Cu+2': 1, NH3: 3 }, source: SM },
  { name: 'Cu(NH3)4+2', logK: 11.75, stoich: { 'Cu+2': 1, NH3: 4 }, source: SM },
  { name: 'CuOH+', logK: -7.95, stoich: { 'Cu+2': 1, 'H+': -1 }, source: BAES },
  // Gold(I)
  { name: 'Au(CN)2-', logK: 38.3, stoich: { 'Au+': 1, 'CN-': 2 }, source: NIST },
  // Zinc(II)
  { name: 'Zn(CN)4-2', logK: 19.62, stoich: { 'Zn+2': 1, 'CN-': 4 }, source: SM },
  { name: 'Zn(OH)4-2', logK: -41.2, stoich: { 'Zn+2': 1, 'H+': -4 }, source: BAES },
];

/** Solids, each written for dissolution into the components. */
export const REFERENCE_SOLIDS: readonly ReferenceSolid[] = [
  { name: 'AgCl(s)', logKsp: -9.74, stoich: { 'Ag+': 1, 'Cl-': 1 }, source: CRC },
  { name: 'AgBr(s)', logKsp: -12.3, stoich: { 'Ag+': 1, 'Br-': 1 }, source: CRC },
  { name: 'AgI(s)', logKsp: -16.08, stoich: { 'Ag+': 1, 'I-': 1 }, source: CRC },
  { name: 'AgSCN(s)', logKsp: -12.0, stoich: { 'Ag+': 1, 'SCN-': 1 }, source: CRC },
  { name: 'AgCN(s)', logKsp: -15.74, stoich: { 'Ag+': 1, 'CN-': 1 }, source: CRC },
  { name: 'Ag2O(s)', logKsp: 12.58, stoich: { 'Ag+': 2, 'H+': -2 }, source: BAES },
  { name: 'CuCN(s)', logKsp: -19.5, stoich: { 'Cu+': 1, 'CN-': 1 }, source: CRC },
  { name: 'Cu(OH)2(s)', logKsp: 8.64, stoich: { 'Cu+2': 1, 'H+': -2 }, source: BAES },
  { name: 'Zn(OH)2(s)', logKsp: 11.5, stoich: { 'Zn+2': 1, 'H+': -2 }, source: BAES },
  { name: 'Zn(CN)2(s)', logKsp: -15.5, stoich: { 'Zn+2': 1, 'CN-': 2 }, source: CRC },
];

/** Every reference species and solid that can form from the given components alone. */
export function referenceSystem(components: readonly string[]): { species: ReferenceSpecies[]; solids: ReferenceSolid[] } {
  const have = new Set(components);
  const fits = (stoich: Record<string, number>) => Object.keys(stoich).every((c) => have.has(c));
  return {
    species: REFERENCE_SPECIES.filter((s) => fits(s.stoich)).map((s) => ({ ...s, stoich: { ...s.stoich } })),
    solids: REFERENCE_SOLIDS.filter((s) => fits(s.stoich)).map((s) => ({ ...s, stoich: { ...s.stoich } })),
  };
}
