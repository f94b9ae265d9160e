// Headroom for people: the answer in the unit a shop uses, the verdict, the now-against-saturation
// table and its CSV. Pure functions over the JSON-safe HeadroomResult (a missing number is null).
import { COUNTER_CHOICES } from '@/components/screens/calculate/speciation-summary';
import { csvName, tableCsv } from '@/components/screens/calculators/frame/csv';
import { type TextFile } from '@/components/screens/calculators/frame/types';
import { type HeadroomResult } from '@/lib/calculators/headroom';
import { convertConcentration, formatSignificant, type ConcentrationUnit } from '@/lib/units';
import { type ProblemJson, type SolveResultJson } from '@/shared/constants';

/** Units the answer can be read in; troy oz/gal counts the precious metal, the others the solid. */
export const HEADROOM_UNITS = ['g/L', 'mol/L', 'oz/gal', 'troy oz/gal'] as const;
export type HeadroomUnit = (typeof HEADROOM_UNITS)[number];

const PRECIOUS = new Set(['Ag', 'Au', 'Pt', 'Pd', 'Rh', 'Ir', 'Ru', 'Os']);

/** The element of an ion ("Ag+" → "Ag", "Cu+2" → "Cu"). */
export function elementOf(component: string): string {
  return component.replace(/[+-]\d*$/, '');
}

/** A solid's formula without its phase mark ("AgCN(s)" → "AgCN"). */
export function solidFormula(solid: string): string {
  return solid.replace(/\(s\)$/, '');
}

/** Whether troy ounces make sense: the metal is a precious one. */
export function isPrecious(component: string | null | undefined): boolean {
  return !!component && PRECIOUS.has(elementOf(component));
}

/** The unit to use: troy oz/gal only for a precious metal (g/L otherwise). */
export function usableUnit(unit: unknown, metal: string | null | undefined): HeadroomUnit {
  const u = HEADROOM_UNITS.find((x) => x === unit) ?? 'g/L';
  return u === 'troy oz/gal' && !isPrecious(metal) ? 'g/L' : u;
}

function finite(x: unknown): x is number {
  return typeof x === 'number' && Number.isFinite(x);
}

/** Converts mol/L of `formula` to `unit`; null when it cannot (no molar mass, not a number). */
export function molPerLIn(molPerL: unknown, unit: ConcentrationUnit, formula: string): number | null {
  if (!finite(molPerL) || molPerL < 0) return null;
  try {
    return convertConcentration(molPerL, 'mol/L', unit, { formula }).toNumber();
  } catch {
    return null;
  }
}

/** The headroom in `unit`: value, and what it counts ("AgCN" or "Ag (as AgCN)"). */
export function headroomAmount(r: HeadroomResult, unit: HeadroomUnit): { value: number | null; text: string; what: string } {
  const solid = solidFormula(r.solid);
  const troy = unit === 'troy oz/gal' && r.metal;
  const value = troy ? molPerLIn(r.metal?.molPerL, 'troy oz/gal', elementOf(r.metal?.component ?? '')) : molPerLIn(r.molPerL, unit, solid);
  const what = troy ? `${elementOf(r.metal?.component ?? '')} (as ${solid})` : solid;
  return { value, text: value === null ? '—' : `${formatSignificant(value, 3)} ${unit}`, what };
}

/** "The bath takes 12.4 g/L more AgCN before a solid persists." */
export function headroomVerdict(r: HeadroomResult, unit: HeadroomUnit, fallback: string): string {
  const solid = solidFormula(r.solid);
  if (r.outcome === 'already_saturated') return `The bath is already saturated with ${solid}: it takes no more before a solid persists.`;
  if (r.outcome !== 'headroom') return fallback;
  const amount = headroomAmount(r, unit);
  if (amount.value === null) return fallback;
  return `The bath takes ${amount.text} more ${amount.what} before a solid persists.`;
}

/** One row of the now-against-saturation table, mol/L (null: not known). */
export type HeadroomRow = { key: string; label: string; now: number | null; saturated: number | null };

function isMetal(c: string): boolean {
  return c !== 'H+' && /\+\d*$/.test(c) && !COUNTER_CHOICES.some((x) => x.formula === c) && c !== 'NH4+';
}

function isLigand(c: string): boolean {
  return c !== 'H+' && !isMetal(c) && !COUNTER_CHOICES.some((x) => x.formula === c);
}

/** Dissolved total of a component: every species holding it, counted by its stoichiometry (mol/L). */
export function dissolved(problem: ProblemJson, result: Pick<SolveResultJson, 'species'> | undefined, component: string): number | null {
  if (!result) return null;
  let sum = 0;
  for (const [name, conc] of Object.entries(result.species)) {
    if (!finite(conc)) return null;
    const n = name === component ? 1 : (problem.species.find((s) => s.name === name)?.stoich[component] ?? 0);
    sum += n * conc;
  }
  return sum;
}

/** Free ligands and dissolved metals, now and once the bath is saturated with the solid. */
export function headroomRows(problem: ProblemJson, r: HeadroomResult): HeadroomRow[] {
  const now = r.now as unknown as SolveResultJson | undefined;
  const sat = r.atSaturation as unknown as SolveResultJson | undefined;
  const value = (x: unknown) => (finite(x) ? x : null);
  const ligands = problem.components.filter(isLigand).map((c) => ({ key: `free:${c}`, label: `Free ${c}`, now: value(now?.free[c]), saturated: value(sat?.free[c]) }));
  const metals = problem.components.filter(isMetal).map((c) => ({ key: `dissolved:${c}`, label: `Dissolved ${c}`, now: dissolved(problem, now, c), saturated: dissolved(problem, sat, c) }));
  return [...ligands, ...metals];
}

/** The table as CSV, with the headroom itself first. */
export function headroomCsv(problem: ProblemJson, r: HeadroomResult): TextFile {
  const rows = headroomRows(problem, r).map((row) => [row.label, row.now, row.saturated]);
  const text = tableCsv(
    ['quantity', 'now (mol/L)', 'at saturation (mol/L)'],
    [[`headroom of ${r.solid} (mol/L)`, r.molPerL, null], [`headroom of ${r.solid} (g/L)`, r.gramsPerL, null], ...rows],
  );
  return { filename: csvName('headroom', solidFormula(r.solid)), text };
}
