// Headroom: how much more of a solid (AgBr, AgCl, AgCN, CuCN ...) a bath dissolves before the
// solid persists, on the full equilibrium, per litre of bath, as solid and as metal.
import { chargeFromName, type SolveResult, type SolveStatus } from '@/lib/engine';

import { CalculatorInputError } from './errors';
import { headroomOnTableau, MAX_EXCESS_MOL_PER_L, type HeadroomOutcome } from './headroom-core';
import { gramsPerLitre } from './mass';
import { solveBath, type BathState, type ChemicalSystem, type PhSetting } from './system';
import { componentName, solidName } from './validate';

/** A bath and the solid to offer it. */
export interface HeadroomInput {
  system: ChemicalSystem;
  state: BathState;
  /** pH of the bath; when given, it fixes H+ (converted from a measured reading under Davies). */
  pH?: PhSetting;
  /** A solid of the system, e.g. "AgBr(s)". */
  solid: string;
  /** Component reported as the metal; default: the first positively charged component of the solid with a total. */
  metal?: string;
}

/** The headroom as metal: mol/L of the metal component and g/L of the element. */
export interface MetalHeadroom {
  component: string;
  molPerL: number;
  /** null when the component's name does not parse as a formula. */
  gramsPerL: number | null;
}

/** How much more of the solid the bath takes, and the bath at saturation. */
export interface HeadroomResult {
  status: SolveStatus;
  outcome: HeadroomOutcome;
  message: string;
  warnings: string[];
  solid: string;
  /** Solid that still dissolves, mol per litre of bath (0 when already saturated). */
  molPerL: number;
  /** The same as g/L of solid; null when the solid's name is not a formula. */
  gramsPerL: number | null;
  metal: MetalHeadroom | null;
  /** The bath as given. */
  now: SolveResult;
  /** The bath saturated with the solid: free ligand left, species, other solids. */
  atSaturation: SolveResult;
  /** Free [H+] held, mol/L, when a pH was given. */
  freeH: number | null;
}

function pickMetal(input: HeadroomInput, fixed: Set<string>): string | null {
  const stoich = input.system.solids.find((s) => s.name === input.solid)?.stoich ?? {};
  if (input.metal !== undefined) {
    const metal = componentName(input.system, input.metal, 'metal');
    if (!((stoich[metal] ?? 0) > 0)) throw new CalculatorInputError('metal', `"${metal}" is not released by "${input.solid}"; name a component the solid holds`);
    return metal;
  }
  const found = Object.keys(stoich).find((c) => (stoich[c] ?? 0) > 0 && chargeFromName(c) > 0 && !fixed.has(c));
  return found ?? null;
}

function describe(outcome: HeadroomOutcome, solid: string, molPerL: number): string {
  if (outcome === 'already_saturated') return `The bath is already saturated with ${solid}: headroom 0.`;
  if (outcome === 'not_reached') return `${solid} still dissolves completely at ${molPerL.toPrecision(3)} mol/L offered; no limit found up to ${MAX_EXCESS_MOL_PER_L} mol/L.`;
  return `${molPerL.toPrecision(4)} mol/L more ${solid} dissolves before it persists.`;
}

/** Headroom of one solid in a bath, mol/L of solid, mol/L and g/L of metal, g/L of solid. */
export function headroom(input: HeadroomInput): HeadroomResult {
  const solid = solidName(input.system, input.solid, 'solid');
  const bath = solveBath(input.system, input.state, input.pH);
  const core = headroomOnTableau(bath.tableau, solid, { result: bath.result, state: bath.warm });
  const fixed = new Set(bath.tableau.components.filter((_, j) => bath.tableau.fixed[j]));
  const metal = pickMetal(input, fixed);
  const perMetal = input.system.solids.find((s) => s.name === solid)?.stoich[metal ?? ''] ?? 0;
  return {
    status: core.status,
    outcome: core.outcome,
    message: describe(core.outcome, solid, core.molPerL),
    warnings: core.warnings,
    solid,
    molPerL: core.molPerL,
    gramsPerL: gramsPerLitre(core.molPerL, solid),
    metal: metal === null ? null : { component: metal, molPerL: core.molPerL * perMetal, gramsPerL: gramsPerLitre(core.molPerL * perMetal, metal) },
    now: bath.result,
    atSaturation: core.atSaturation,
    freeH: bath.freeH,
  };
}
