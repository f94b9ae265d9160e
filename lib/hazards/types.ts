// What the hazard rules look at: a solution (totals, pH, its solved speciation when there is one),
// the reagents named, and the steps of a dosing plan. Pure data; lib/hazards builds it from a
// calculation, a bath or a dosing plan and evaluates the rules on it.
export type { Evidence, GhsPictogram, GhsStatement, Hazard, HazardRule, HazardSeverity, HazardThresholds } from '@/shared/safety';

/** A solved equilibrium as the engine returns it (only what the rules read). */
export interface SolvedSolution {
  /** Free concentration of each component, mol/L. */
  free: Record<string, number>;
  /** Concentration of each dissolved species by name, mol/L ("HCN", "Ag(NH3)2+"). */
  species: Record<string, number>;
}

/** The vessel just before and just after one dosing step. */
export interface HazardStep {
  /** 1 = the first step. */
  index: number;
  label: string;
  kind: 'add' | 'set-ph' | 'dilute';
  /** add: the reagent by name or formula, and the moles of each component one mole brings. */
  reagent?: string;
  stoich?: Record<string, number>;
  mol?: number;
  /** set-ph: the pH set. */
  setPh?: number;
  /** Analytical totals, mol/L, and pH (null: not known) before the step. */
  before: { totals: Record<string, number>; pH: number | null };
  /** After the step; `solution` when the plan was solved. */
  after: { totals: Record<string, number>; pH: number | null; solution?: SolvedSolution | null };
}

/** Everything the rules are evaluated on. */
export interface HazardSituation {
  /** Analytical totals, mol/L, keyed by component formula ("CN-", "Ag+", "NH3", "S2O3-2"). */
  totals: Record<string, number>;
  /** Measured or set pH; null when not known. */
  pH: number | null;
  /** The solved equilibrium, when there is one. */
  solution?: SolvedSolution | null;
  /** Reagents named in the work (make-up salts, reagents dosed, the solid dissolved), by name or formula. */
  reagents?: string[];
  /** The steps of a dosing plan, in order. */
  steps?: HazardStep[];
}
