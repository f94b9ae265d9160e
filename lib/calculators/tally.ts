// Where a component's moles are in a solved bath: summed over the species and solids that carry
// it, from the system's stoichiometry (a SolveResult carries concentrations, not formulas).
import type { SolveResult } from '@/lib/engine';

import type { ChemicalSystem } from './system';

/** One species or solid carrying a component: its name and the component's count in it. */
export interface Carrier {
  name: string;
  count: number;
}

/** Dissolved carriers of `component`: itself (count 1) and every species with a non-zero count. */
export function dissolvedCarriers(system: ChemicalSystem, component: string): Carrier[] {
  const out: Carrier[] = [{ name: component, count: 1 }];
  for (const s of system.species ?? []) {
    const count = s.stoich[component] ?? 0;
    if (count !== 0) out.push({ name: s.name, count });
  }
  return out;
}

/** Solids carrying `component` with a non-zero count. */
export function solidCarriers(system: ChemicalSystem, component: string): Carrier[] {
  const out: Carrier[] = [];
  for (const s of system.solids ?? []) {
    const count = s.stoich[component] ?? 0;
    if (count !== 0) out.push({ name: s.name, count });
  }
  return out;
}

/** Sum of count x concentration (mol/L) over carriers, reading `amounts` (species or solids of a result). */
export function sumCarried(carriers: readonly Carrier[], amounts: Record<string, number>): number {
  let sum = 0;
  for (const c of carriers) sum += c.count * (amounts[c.name] ?? 0);
  return sum;
}

/** Dissolved total of `component` in a result, mol/L. */
export function dissolvedTotal(system: ChemicalSystem, result: SolveResult, component: string): number {
  return sumCarried(dissolvedCarriers(system, component), result.species);
}

/** Amount of `component` held in solids in a result, mol per litre of solution. */
export function solidTotal(system: ChemicalSystem, result: SolveResult, component: string): number {
  return sumCarried(solidCarriers(system, component), result.solids);
}

/** value / total, or 0 when the total is 0 (no NaN in a result). */
export function share(value: number, total: number): number {
  return total > 0 && Number.isFinite(value) ? value / total : 0;
}
