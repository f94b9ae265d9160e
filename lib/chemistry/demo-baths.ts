// Invented baths of an invented shop (Harbourside Finishing) in the general problem form: the
// demo data, the built-in benchmark cases and test fixtures. Compositions are typical of the
// trade (common practice), not taken from any one published bath.

import type { Problem } from '../engine/types';
import { referenceSystem } from './reference-constants';

/** A named demo bath and its problem. */
export interface DemoBath {
  key: string;
  name: string;
  process: string;
  problem: Problem;
}

function bath(key: string, name: string, process: string, totals: Record<string, number>, pH: number, activity: 'ideal' | 'davies' = 'davies'): DemoBath {
  const components = [...Object.keys(totals), 'H+'];
  const { species, solids } = referenceSystem(components);
  const strip = <T extends { source: string }>(list: T[]) => list.map(({ source: _source, ...rest }) => rest);
  return {
    key,
    name,
    process,
    problem: { components, totals, fixed: { 'H+': 10 ** -pH }, species: strip(species), solids: strip(solids), activity },
  };
}

/** The demo shop's baths. Totals in mol/L; K+ and Na+ are carried for ionic strength. */
export const DEMO_BATHS: readonly DemoBath[] = [
  bath('silver-strike', 'Silver strike, line 2', 'cyanide silver strike', { 'Ag+': 0.015, 'CN-': 0.75, 'K+': 0.75 }, 12.0),
  bath('silver-plate', 'Bright silver, line 2', 'cyanide silver plating', { 'Ag+': 0.3, 'CN-': 0.95, 'K+': 0.95, 'Cl-': 0.001 }, 12.2),
  bath('copper-strike', 'Copper strike, rack line', 'cyanide copper strike', { 'Cu+': 0.25, 'CN-': 0.7, 'Na+': 0.7 }, 12.5),
  bath('gold-strike', 'Gold strike, selective cell', 'cyanide gold strike', { 'Au+': 0.01, 'CN-': 0.08, 'K+': 0.08 }, 11.0),
  bath('fixer-a', 'Fixer tank A, radiography', 'thiosulfate fixer', { 'Ag+': 0.04, 'Br-': 0.045, 'S2O3-2': 0.8, 'Na+': 1.6 }, 6.5),
  bath('ammonia-copper', 'Ammoniacal copper etch', 'ammoniacal copper', { 'Cu+2': 0.4, NH3: 2.5, 'Cl-': 0.8 }, 9.0),
  bath('zinc-cyanide', 'Zinc barrel line', 'cyanide zinc', { 'Zn+2': 0.25, 'CN-': 1.1, 'Na+': 1.1 }, 12.5),
];
