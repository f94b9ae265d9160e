// Reading a solved speciation problem for people: each species' share of its metal, the solids and
// a one-line verdict. Pure functions over the shared problem and result shapes (fresh or stored).
import { formatSignificant } from '@/lib/units';
import { type ProblemJson, type SolveResultJson } from '@/shared/constants';

/** A component a person can pick: the formula as the library writes it and a plain name. */
export type ComponentChoice = { formula: string; name: string };

/** Metal ions offered by the system builder, with the word used in verdicts. */
export const METAL_CHOICES: readonly ComponentChoice[] = [
  { formula: 'Ag+', name: 'Silver' },
  { formula: 'Cu+', name: 'Copper(I)' },
  { formula: 'Cu+2', name: 'Copper(II)' },
  { formula: 'Au+', name: 'Gold(I)' },
  { formula: 'Zn+2', name: 'Zinc' },
  { formula: 'Cd+2', name: 'Cadmium' },
  { formula: 'Ni+2', name: 'Nickel' },
  { formula: 'Pb+2', name: 'Lead' },
];

/** Ligands offered by the system builder. */
export const LIGAND_CHOICES: readonly ComponentChoice[] = [
  { formula: 'NH3', name: 'Ammonia' },
  { formula: 'CN-', name: 'Cyanide' },
  { formula: 'S2O3-2', name: 'Thiosulfate' },
  { formula: 'SCN-', name: 'Thiocyanate' },
  { formula: 'Cl-', name: 'Chloride' },
  { formula: 'Br-', name: 'Bromide' },
  { formula: 'I-', name: 'Iodide' },
  { formula: 'S-2', name: 'Sulfide' },
];

/** Counter-ions offered by the system builder (they carry charge but form nothing here). */
export const COUNTER_CHOICES: readonly ComponentChoice[] = [
  { formula: 'Na+', name: 'Sodium' },
  { formula: 'K+', name: 'Potassium' },
  { formula: 'NO3-', name: 'Nitrate' },
];

/** The plain name of a metal ion, or its formula when it is not one of the choices. */
export function metalName(formula: string): string {
  return METAL_CHOICES.find((m) => m.formula === formula)?.name ?? formula;
}

/** A number for people at `sig` significant figures; a dash for anything that is not a finite number. */
export function formatNumber(value: number | undefined | null, sig = 3): string {
  return typeof value === 'number' && Number.isFinite(value) ? formatSignificant(value, sig) : '—';
}

/** A percentage: three significant figures, "0" for nothing, a dash when it cannot be read. */
export function formatPercent(pct: number | undefined | null): string {
  return formatNumber(pct, 3);
}

/** One dissolved species for the table: mol/L and, when it holds a chosen metal, its share of that metal. */
export type SpeciesRow = { name: string; molL: number; metal: string | null; pctOfMetal: number | null };

/** One solid for the table: amount present (mol per litre of solution, 0 when absent) and saturation index. */
export type SolidRow = { name: string; present: boolean; molL: number; saturationIndex: number; pctOfMetal: number | null; metal: string | null };

function stoichOf(problem: ProblemJson): Map<string, Record<string, number>> {
  const map = new Map<string, Record<string, number>>();
  for (const c of problem.components) map.set(c, { [c]: 1 });
  for (const s of problem.species) map.set(s.name, s.stoich);
  for (const s of problem.solids) map.set(s.name, s.stoich);
  return map;
}

function shareOf(stoich: Record<string, number> | undefined, molL: number, metals: readonly string[], problem: ProblemJson) {
  const metal = metals.find((m) => (stoich?.[m] ?? 0) > 0) ?? null;
  if (!metal || !stoich) return { metal: null, pctOfMetal: null };
  const total = problem.totals[metal];
  if (!(typeof total === 'number' && total > 0) || !Number.isFinite(molL)) return { metal, pctOfMetal: null };
  return { metal, pctOfMetal: ((molL * (stoich[metal] ?? 0)) / total) * 100 };
}

/** Every dissolved species, largest concentration first, with its share of its metal. */
export function speciesRows(problem: ProblemJson, result: SolveResultJson, metals: readonly string[]): SpeciesRow[] {
  const stoich = stoichOf(problem);
  return Object.entries(result.species)
    .map(([name, molL]) => ({ name, molL, ...shareOf(stoich.get(name), molL, metals, problem) }))
    .sort((a, b) => (Number.isFinite(b.molL) ? b.molL : -1) - (Number.isFinite(a.molL) ? a.molL : -1));
}

/** Every solid the problem allowed: present ones first, then by saturation index, highest first. */
export function solidRows(problem: ProblemJson, result: SolveResultJson, metals: readonly string[]): SolidRow[] {
  const stoich = stoichOf(problem);
  const names = new Set([...problem.solids.map((s) => s.name), ...Object.keys(result.saturation), ...Object.keys(result.solids)]);
  return [...names]
    .map((name) => {
      const molL = result.solids[name] ?? 0;
      return {
        name,
        present: molL > 0,
        molL,
        saturationIndex: result.saturation[name] ?? Number.NaN,
        ...shareOf(stoich.get(name), molL, metals, problem),
      };
    })
    .sort((a, b) => Number(b.present) - Number(a.present) || safe(b.saturationIndex) - safe(a.saturationIndex));
}

function safe(x: number): number {
  return Number.isFinite(x) ? x : -1e9;
}

function roundPct(pct: number): string {
  if (pct >= 99.5 && pct < 100) return '> 99';
  if (pct < 1) return '< 1';
  return String(Math.round(pct));
}

/** "Silver is held mostly as Ag(S2O3)2-3 (93 %); no solid forms", one sentence per metal with a total. */
export function verdict(problem: ProblemJson, result: SolveResultJson, metals: readonly string[]): string {
  if (result.status !== 'converged') return 'The calculation did not settle, so there is no answer to show.';
  const species = speciesRows(problem, result, metals);
  const solids = solidRows(problem, result, metals).filter((s) => s.present);
  const sentences = metals.map((metal) => {
    const name = metalName(metal);
    if (!((problem.totals[metal] ?? 0) > 0)) return `No ${name.toLowerCase()} in the solution`;
    const top = species.filter((s) => s.metal === metal && s.pctOfMetal !== null).sort((a, b) => (b.pctOfMetal ?? 0) - (a.pctOfMetal ?? 0))[0];
    const held = top ? `${name} is held mostly as ${top.name} (${roundPct(top.pctOfMetal ?? 0)} %)` : `${name}: no dissolved form found`;
    const own = solids.filter((s) => s.metal === metal);
    if (own.length === 0) return `${held}; no solid forms`;
    const list = own.map((s) => (s.pctOfMetal === null ? s.name : `${s.name} (${roundPct(s.pctOfMetal)} % of the ${name.toLowerCase()})`));
    return `${held}; ${list.join(' and ')} ${own.length === 1 ? 'is' : 'are'} present as a solid`;
  });
  const otherSolids = solids.filter((s) => s.metal === null).map((s) => s.name);
  if (otherSolids.length > 0) sentences.push(`${otherSolids.join(' and ')} present as a solid`);
  return `${sentences.join('. ')}.`;
}

/** Why a result cannot be used, in words, when the solver did not settle. */
export function notSettledMessage(result: Pick<SolveResultJson, 'status' | 'message'>): string | null {
  if (result.status === 'converged') return null;
  const why = result.message ? ` ${result.message.replace(/\.?$/, '.')}` : '';
  return `The calculation did not settle, so these numbers cannot be trusted.${why} Check the totals and the pH, try fewer solids, or try the ideal activity model.`;
}
