// Choosing a solid from a built system: which solids there are, a sensible first choice, and the
// metal components a solid holds. Shared by the calculators that ask for a solid.
import { type BuiltSystem } from '@/shared/constants';

/** Positively charged components other than H+ ("Ag+", "Cu+2"). */
export function isCation(component: string): boolean {
  return component !== 'H+' && /\+\d*$/.test(component);
}

/** Stoichiometry of a solid in the built problem (empty when the solid is not in it). */
export function solidStoich(built: BuiltSystem | null, solid: string): Record<string, number> {
  return built?.problem.solids.find((s) => s.name === solid)?.stoich ?? {};
}

/** The solid that holds the first chosen metal with the first chosen ligand, else the first holding the metal, else the first there is. */
export function defaultSolid(built: BuiltSystem | null, metals: readonly string[], ligands: readonly string[]): string | null {
  const names = built?.availableSolids ?? [];
  const metal = metals[0];
  const holds = (name: string, c: string | undefined) => c !== undefined && (solidStoich(built, name)[c] ?? 0) > 0;
  return names.find((n) => holds(n, metal) && holds(n, ligands[0])) ?? names.find((n) => holds(n, metal)) ?? names[0] ?? null;
}

/** Metal components released by a solid, in the system's component order. */
export function metalsOf(built: BuiltSystem | null, solid: string): string[] {
  const stoich = solidStoich(built, solid);
  return (built?.problem.components ?? []).filter((c) => isCation(c) && (stoich[c] ?? 0) > 0);
}
