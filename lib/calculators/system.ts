// The inputs every calculator shares: a chemical system (what can form, under which activity model)
// and a bath state (analytical totals and fixed free concentrations), and the one way to solve a
// bath at a pH, converting a measured pH (an activity) to the free [H+] the engine holds fixed.
import {
  compileProblem,
  EngineInputError,
  retarget,
  solveTableau,
  type ActivityModel,
  type Problem,
  type SolidInput,
  type SolveResult,
  type SpeciesInput,
  type Tableau,
  type WarmStart,
} from '@/lib/engine';

import { CalculatorInputError } from './errors';
import { solveWarmOrCold } from './status';
import { componentName, finiteNumber } from './validate';

/** What can form: components, species and solids with their constants, and how activities are taken. */
export interface ChemicalSystem {
  /** Component names with charges from the trailing sign ("Ag+", "S2O3-2", "H+"). */
  components: string[];
  species: SpeciesInput[];
  solids: SolidInput[];
  /** "ideal" (default) or "davies". */
  activity?: ActivityModel;
  /** Solution temperature, degrees Celsius (default 25). */
  temperatureC?: number;
  /** Ionic strength held fixed for the activity coefficients, mol/L (a swamping medium); Davies only. */
  ionicStrength?: number;
}

/** A bath's composition: each component has either a total or a fixed free concentration. */
export interface BathState {
  /** Analytical totals, mol/L (dissolved plus any solid). */
  totals: Record<string, number>;
  /** Free concentrations held fixed, mol/L (H+ at pH p: 10^-p). */
  fixed?: Record<string, number>;
}

/** A pH set on a bath: by default a measured reading, i.e. -log10 of the H+ activity; it replaces any fixed H+ in the state. */
export interface PhSetting {
  pH: number;
  /** True (default): the pH is an activity and is converted through gamma(H+) under Davies. */
  measured?: boolean;
  /** The component the pH fixes (default "H+"). */
  hComponent?: string;
}

/** A solved bath, with what a nearby solve needs to start from it. */
export interface BathSolution {
  result: SolveResult;
  tableau: Tableau;
  warm: WarmStart;
  /** Free [H+] held fixed, mol/L, when a pH was given; null otherwise. */
  freeH: number | null;
}

const MAX_PH_PASSES = 20;
const PH_RELATIVE_CHANGE = 1e-10;

/** The engine's general problem form for a system and a bath state (mol/L). */
export function toProblem(system: ChemicalSystem, state: BathState): Problem {
  return {
    components: system.components,
    totals: state.totals,
    fixed: state.fixed ?? {},
    species: system.species ?? [],
    solids: system.solids ?? [],
    activity: system.activity ?? 'ideal',
    ...(system.temperatureC !== undefined ? { temperatureC: system.temperatureC } : {}),
    ...(system.ionicStrength !== undefined ? { ionicStrength: system.ionicStrength } : {}),
  };
}

/** Compiles a system and bath state; engine input errors come back as CalculatorInputError under system.* or state.*. */
export function compileBath(system: ChemicalSystem, state: BathState): Tableau {
  if (typeof system !== 'object' || system === null) throw new CalculatorInputError('system', 'give the chemical system: components, species and solids');
  if (typeof state !== 'object' || state === null || typeof state.totals !== 'object' || state.totals === null) {
    throw new CalculatorInputError('state.totals', 'give the bath totals as an object of component name to mol/L');
  }
  try {
    return compileProblem(toProblem(system, state));
  } catch (e) {
    if (!(e instanceof EngineInputError)) throw e;
    const own = e.field.startsWith('totals') || e.field.startsWith('fixed');
    const field = e.field === 'problem' ? 'system' : `${own ? 'state' : 'system'}.${e.field}`;
    throw new CalculatorInputError(field, e.message.slice(e.field.length + 2));
  }
}

/** The bath state with `hComponent` fixed at `freeH` mol/L; throws if the state gives it a total. */
export function withFixedH(system: ChemicalSystem, state: BathState, hComponent: string, freeH: number): BathState {
  componentName(system, hComponent, 'hComponent');
  if (state.totals?.[hComponent] !== undefined) {
    throw new CalculatorInputError('pH', `"${hComponent}" has a total in the bath state; give either a pH or a total for it, not both`);
  }
  return { totals: state.totals, fixed: { ...(state.fixed ?? {}), [hComponent]: freeH } };
}

/** Checks a pH value: finite, within -2..16. */
export function checkPh(pH: unknown, field = 'pH'): number {
  const v = finiteNumber(pH, field, 'the pH');
  if (v < -2 || v > 16) throw new CalculatorInputError(field, `the pH must lie between -2 and 16, got ${v}`);
  return v;
}

/** Solves at a pH; a measured pH under Davies becomes free [H+] = 10^-pH / gamma(H+), iterated to 1e-10 relative. */
export function solveAtPh(
  system: ChemicalSystem,
  state: BathState,
  pH: number,
  { hComponent = 'H+', measured = true }: { hComponent?: string; measured?: boolean } = {},
): BathSolution {
  const p = checkPh(pH);
  const activityH = 10 ** -p;
  let freeH = activityH;
  let tableau = compileBath(system, withFixedH(system, state, hComponent, freeH));
  let { result, state: warm } = solveTableau(tableau);
  if (!measured || tableau.activity !== 'davies') return { result, tableau, warm, freeH };
  let settled = false;
  for (let pass = 0; pass < MAX_PH_PASSES && result.status === 'converged'; pass++) {
    const next = activityH / (result.gamma[hComponent] ?? 1);
    if (Math.abs(next - freeH) <= PH_RELATIVE_CHANGE * freeH) {
      settled = true;
      break;
    }
    freeH = next;
    tableau = retarget(tableau, { fixed: { [hComponent]: freeH } });
    ({ result, state: warm } = solveWarmOrCold(tableau, warm));
  }
  const gamma = result.gamma[hComponent] ?? 1;
  const note = `Measured pH ${p} taken as an activity: free [${hComponent}] = 10^-pH / γ = ${freeH.toPrecision(4)} mol/L (γ(${hComponent}) = ${gamma.toPrecision(4)}, Davies).`;
  const unsettled = settled ? [] : [`The pH conversion did not settle within ${MAX_PH_PASSES} passes; free [${hComponent}] is approximate.`];
  result = { ...result, warnings: [...result.warnings, note, ...unsettled] };
  return { result, tableau, warm, freeH };
}

/** Solves a bath as given, or at a pH when one is set. */
export function solveBath(system: ChemicalSystem, state: BathState, ph?: PhSetting): BathSolution {
  if (ph !== undefined) return solveAtPh(system, state, ph.pH, { hComponent: ph.hComponent, measured: ph.measured });
  const tableau = compileBath(system, state);
  const { result, state: warm } = solveTableau(tableau);
  return { result, tableau, warm, freeH: null };
}
