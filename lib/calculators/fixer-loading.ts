// Fixer loading: how much silver a thiosulfate fixer holds now, how much more it can take as
// silver halide (AgBr by default), and the loading as a share of its capacity.
import type { SolveStatus } from '@/lib/engine';

import { CalculatorInputError } from './errors';
import { headroom, type HeadroomResult } from './headroom';
import type { HeadroomOutcome } from './headroom-core';
import { gramsPerLitre } from './mass';
import { type BathState, type ChemicalSystem, type PhSetting } from './system';
import { solidName, totalComponent } from './validate';

/** A fixer bath; silver and the halide solid default to "Ag+" and "AgBr(s)". */
export interface FixerLoadingInput {
  system: ChemicalSystem;
  state: BathState;
  pH?: PhSetting;
  silver?: string;
  solid?: string;
}

/** Silver now, the capacity left, and the loading. */
export interface FixerLoadingResult {
  status: SolveStatus;
  outcome: HeadroomOutcome;
  message: string;
  warnings: string[];
  /** Silver held now (the bath's silver total): mol/L and g/L of Ag. */
  silverNow: { molPerL: number; gramsPerL: number };
  /** Silver the fixer can still take as the halide solid: mol/L and g/L of Ag, g/L of the solid. */
  capacity: { molPerL: number; gramsPerL: number; solidGramsPerL: number | null };
  /** now / (now + capacity) x 100, percent; 100 when already saturated. */
  loadingPercent: number;
  headroom: HeadroomResult;
}

const SILVER_G_PER_MOL = gramsPerLitre(1, 'Ag') as number;

/** Loading of a thiosulfate fixer with silver, as g/L now, capacity left and percent of capacity. */
export function fixerLoading(input: FixerLoadingInput): FixerLoadingResult {
  const silver = totalComponent(input.system, input.state, input.silver ?? 'Ag+', 'silver');
  const solid = solidName(input.system, input.solid ?? 'AgBr(s)', 'solid');
  if (!((input.system.solids.find((s) => s.name === solid)?.stoich[silver] ?? 0) > 0)) {
    throw new CalculatorInputError('solid', `"${solid}" holds no "${silver}"; pick the silver halide the fixer dissolves, such as AgBr(s)`);
  }
  const h = headroom({ system: input.system, state: input.state, pH: input.pH, solid, metal: silver });
  const now = input.state.totals[silver] as number;
  const more = h.metal?.molPerL ?? 0;
  const loadingPercent = now + more > 0 ? (100 * now) / (now + more) : 0;
  return {
    status: h.status,
    outcome: h.outcome,
    message: `${h.message} Silver held ${(now * SILVER_G_PER_MOL).toPrecision(3)} g/L; loading ${loadingPercent.toPrecision(3)} % of capacity.`,
    warnings: h.warnings,
    silverNow: { molPerL: now, gramsPerL: now * SILVER_G_PER_MOL },
    capacity: { molPerL: more, gramsPerL: more * SILVER_G_PER_MOL, solidGramsPerL: h.gramsPerL },
    loadingPercent,
    headroom: h,
  };
}
