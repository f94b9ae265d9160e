// Speciation: where each component of a bath sits (free, in each complex, in solids), and how much
// of a ligand is protonated (cyanide as HCN at the bath pH).
import type { SolveResult, SolveStatus } from '@/lib/engine';

import { CalculatorInputError } from './errors';
import { dissolvedCarriers, share, solidCarriers, sumCarried } from './tally';
import { solveBath, type BathState, type ChemicalSystem, type PhSetting } from './system';
import { componentName } from './validate';

/** One species or solid holding part of a component. */
export interface Holder {
  name: string;
  /** Count of the component in one formula unit (negative for species that consume it, such as OH- for H+). */
  count: number;
  /** Concentration of the species or amount of the solid, mol per litre of solution. */
  molPerL: number;
  /** count x molPerL / the component's total (dimensionless). */
  fraction: number;
}

/** Where one component with a total sits. */
export interface ComponentSpeciation {
  component: string;
  /** Analytical total, mol/L. */
  total: number;
  /** Free concentration, mol/L, and its share of the total. */
  free: number;
  freeFraction: number;
  /** Total in solution and its share, mol/L. */
  dissolved: number;
  dissolvedFraction: number;
  /** Total held in solids and its share, mol per litre of solution. */
  inSolids: number;
  solidFraction: number;
  /** Dissolved species holding it, the component itself included, largest share first. */
  species: Holder[];
  /** Solids present holding it, largest share first. */
  solids: Holder[];
}

function holders(carriers: ReturnType<typeof dissolvedCarriers>, amounts: Record<string, number>, total: number): Holder[] {
  return carriers
    .map((c) => ({ name: c.name, count: c.count, molPerL: amounts[c.name] ?? 0, fraction: share(c.count * (amounts[c.name] ?? 0), total) }))
    .sort((x, y) => y.fraction - x.fraction || x.name.localeCompare(y.name));
}

/** Speciation of every component that has a total, from a solved bath (the system gives the stoichiometry). */
export function speciationOf(system: ChemicalSystem, state: BathState, result: SolveResult): ComponentSpeciation[] {
  return system.components
    .filter((c) => state.totals[c] !== undefined)
    .map((component) => {
      const total = state.totals[component] as number;
      const dissolved = sumCarried(dissolvedCarriers(system, component), result.species);
      const inSolids = sumCarried(solidCarriers(system, component), result.solids);
      const free = result.free[component] ?? 0;
      return {
        component,
        total,
        free,
        freeFraction: share(free, total),
        dissolved,
        dissolvedFraction: share(dissolved, total),
        inSolids,
        solidFraction: share(inSolids, total),
        species: holders(dissolvedCarriers(system, component), result.species, total),
        solids: holders(solidCarriers(system, component), result.solids, total).filter((h) => h.molPerL > 0),
      };
    });
}

/** A bath to speciate. */
export interface SpeciationInput {
  system: ChemicalSystem;
  state: BathState;
  pH?: PhSetting;
}

/** A solved bath with the speciation of each component. */
export interface SpeciationResult {
  status: SolveStatus;
  warnings: string[];
  result: SolveResult;
  components: ComponentSpeciation[];
  freeH: number | null;
}

/** Solves a bath and reports where each component sits, mol/L and fractions of its total. */
export function speciation(input: SpeciationInput): SpeciationResult {
  const bath = solveBath(input.system, input.state, input.pH);
  return {
    status: bath.result.status,
    warnings: bath.result.warnings,
    result: bath.result,
    components: speciationOf(input.system, input.state, bath.result),
    freeH: bath.freeH,
  };
}

/** How much of a ligand is protonated: mol/L as ligand, share of its total, and protonated/(protonated + free). */
export interface ProtonatedShare {
  ligand: string;
  protonated: string[];
  /** Ligand held in the protonated species (count x concentration), mol/L. */
  protonatedMolPerL: number;
  /** Free ligand, mol/L. */
  freeMolPerL: number;
  /** Ligand total (dissolved plus solids) from the result, mol/L. */
  totalMolPerL: number;
  /** protonatedMolPerL / totalMolPerL (dimensionless). */
  fractionOfTotal: number;
  /** protonated / (protonated + free) (dimensionless): 1 / (1 + 10^(pH - pKa)) for one protonation step. */
  ratio: number;
}

/** Share of a ligand present as its protonated forms (e.g. HCN for CN-); the system gives the stoichiometry. */
export function protonatedShare(system: ChemicalSystem, result: SolveResult, ligand: string, protonatedSpecies: string[]): ProtonatedShare {
  const name = componentName(system, ligand, 'ligand');
  if (!Array.isArray(protonatedSpecies) || protonatedSpecies.length === 0) {
    throw new CalculatorInputError('protonatedSpecies', `name at least one protonated species of "${name}", such as HCN for CN-`);
  }
  const carriers = dissolvedCarriers(system, name).filter((c) => c.name !== name && protonatedSpecies.includes(c.name));
  const missing = protonatedSpecies.find((p) => !carriers.some((c) => c.name === p));
  if (missing !== undefined) {
    throw new CalculatorInputError('protonatedSpecies', `${JSON.stringify(missing)} is not a species of the system that contains "${name}"`);
  }
  const protonatedMolPerL = sumCarried(carriers, result.species);
  const freeMolPerL = result.free[name] ?? 0;
  const totalMolPerL = sumCarried(dissolvedCarriers(system, name), result.species) + sumCarried(solidCarriers(system, name), result.solids);
  return {
    ligand: name,
    protonated: [...protonatedSpecies],
    protonatedMolPerL,
    freeMolPerL,
    totalMolPerL,
    fractionOfTotal: share(protonatedMolPerL, totalMolPerL),
    ratio: share(protonatedMolPerL, protonatedMolPerL + freeMolPerL),
  };
}

/** Cyanide present as HCN (the gas that escapes at low pH): share of total cyanide and HCN/(HCN + CN-). */
export function cyanideAsHcn(system: ChemicalSystem, result: SolveResult, names: { cyanide?: string; hcn?: string } = {}): ProtonatedShare {
  return protonatedShare(system, result, names.cyanide ?? 'CN-', [names.hcn ?? 'HCN']);
}
