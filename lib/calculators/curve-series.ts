// What a curve records at each point: named series read from a result, each with its unit, built
// once per curve so that a 500-point sweep does no name lookups beyond the result's records.
import type { SolveResult, Tableau } from '@/lib/engine';

import { CalculatorInputError } from './errors';
import type { ChemicalSystem } from './system';
import { dissolvedCarriers, share, solidCarriers, sumCarried } from './tally';
import { componentName, solidName } from './validate';

/** A series to record along a curve. */
export type SeriesRequest =
  /** Free concentration of a component, mol/L. */
  | { kind: 'free'; component: string }
  /** Concentration of a dissolved species (or component), mol/L. */
  | { kind: 'species'; name: string }
  /** Fraction of a component's total in each species holding it (or in the listed ones), plus the share in solids. */
  | { kind: 'fractions'; component: string; species?: string[] }
  /** Dissolved total of a component, mol/L: its solubility when a solid is present. */
  | { kind: 'solubility'; component: string }
  /** Amount of a solid present, mol per litre of solution (0 when absent). */
  | { kind: 'solid'; name: string }
  /** Saturation index log10(IAP/Ksp) of a solid; -Infinity when one of its ions is absent. */
  | { kind: 'saturation'; name: string };

/** A recorded series: key for lookups, label and unit for charts and CSV headers. */
export interface SeriesInfo {
  key: string;
  label: string;
  unit: string;
}

/** A series and how to read it from a result (`total` is the tableau's totals at that point, mol/L). */
export interface SeriesReader extends SeriesInfo {
  read: (result: SolveResult, total: readonly number[]) => number;
}

function fractionReaders(system: ChemicalSystem, tab: Tableau, component: string, only: string[] | undefined, field: string): SeriesReader[] {
  const j = tab.components.indexOf(component);
  if (tab.fixed[j]) throw new CalculatorInputError(`${field}.component`, `"${component}" is held at a fixed free concentration; fractions need a component with a total`);
  const carriers = dissolvedCarriers(system, component).filter((c) => only === undefined || only.includes(c.name));
  const missing = only?.find((n) => !carriers.some((c) => c.name === n));
  if (missing !== undefined) throw new CalculatorInputError(`${field}.species`, `${JSON.stringify(missing)} does not contain "${component}"`);
  const out: SeriesReader[] = carriers.map((c) => ({
    key: `fraction:${component}:${c.name}`,
    label: `${component} as ${c.name}`,
    unit: 'fraction of total',
    read: (r, total) => share(c.count * (r.species[c.name] ?? 0), total[j] as number),
  }));
  const inSolids = solidCarriers(system, component);
  if (only === undefined && inSolids.length > 0) {
    out.push({ key: `fraction:${component}:(solids)`, label: `${component} in solids`, unit: 'fraction of total', read: (r, total) => share(sumCarried(inSolids, r.solids), total[j] as number) });
  }
  return out;
}

function speciesName(system: ChemicalSystem, name: unknown, field: string): string {
  if (typeof name === 'string' && (system.components.includes(name) || system.species.some((s) => s.name === name))) return name;
  throw new CalculatorInputError(field, `${JSON.stringify(name)} is not a component or species of the system`);
}

/** Readers for the requested series; throws CalculatorInputError for names the system does not have. */
export function seriesReaders(system: ChemicalSystem, tab: Tableau, requests: SeriesRequest[]): SeriesReader[] {
  if (!Array.isArray(requests) || requests.length === 0) throw new CalculatorInputError('series', 'ask for at least one series, such as { kind: "free", component: "CN-" }');
  return requests.flatMap((q, i): SeriesReader[] => {
    const field = `series[${i}]`;
    switch (q?.kind) {
      case 'free': {
        const c = componentName(system, q.component, `${field}.component`);
        return [{ key: `free:${c}`, label: `free ${c}`, unit: 'mol/L', read: (r) => r.free[c] ?? 0 }];
      }
      case 'species': {
        const n = speciesName(system, q.name, `${field}.name`);
        return [{ key: `species:${n}`, label: n, unit: 'mol/L', read: (r) => r.species[n] ?? 0 }];
      }
      case 'fractions':
        return fractionReaders(system, tab, componentName(system, q.component, `${field}.component`), q.species, field);
      case 'solubility': {
        const c = componentName(system, q.component, `${field}.component`);
        const carriers = dissolvedCarriers(system, c);
        return [{ key: `solubility:${c}`, label: `dissolved ${c}`, unit: 'mol/L', read: (r) => sumCarried(carriers, r.species) }];
      }
      case 'solid': {
        const n = solidName(system, q.name, `${field}.name`);
        return [{ key: `solid:${n}`, label: `${n} present`, unit: 'mol/L', read: (r) => r.solids[n] ?? 0 }];
      }
      case 'saturation': {
        const n = solidName(system, q.name, `${field}.name`);
        return [{ key: `saturation:${n}`, label: `SI ${n}`, unit: 'log10 IAP/Ksp', read: (r) => r.saturation[n] ?? -Infinity }];
      }
      default:
        throw new CalculatorInputError(`${field}.kind`, 'must be one of free, species, fractions, solubility, solid, saturation');
    }
  });
}
