// The engine's public shapes: the general problem form (what the JSON command line and the API
// accept) and the result every solve returns. Concentrations are mol/L throughout.

/** A dissolved species formed from components: log C = log K + sum(stoich_j * log a_j) - log gamma. */
export interface SpeciesInput {
  name: string;
  /** log10 of the cumulative formation constant from the components (dimensionless). */
  logK: number;
  /** Moles of each component in one mole of the species; negative allowed (OH- is {"H+": -1}). */
  stoich: Record<string, number>;
  /** Charge; when absent it is read from the trailing sign of the name ("+", "-2", "+3"). */
  charge?: number;
  /** Temperature the constant was measured at, in degrees Celsius (default 25). */
  temperatureC?: number;
  /** Standard reaction enthalpy for the formation, kJ/mol; enables the van 't Hoff correction. */
  deltaH?: number;
}

/** A solid that is present only when saturated: log IAP = log Ksp. */
export interface SolidInput {
  name: string;
  /** log10 of the solubility product written for dissolution into the components. */
  logKsp: number;
  /** Moles of each component released by one mole of solid; negative allowed ({"H+": -2}). */
  stoich: Record<string, number>;
  /** Temperature the constant was measured at, degrees Celsius (default 25). */
  temperatureC?: number;
  /** Standard enthalpy of dissolution, kJ/mol; enables the van 't Hoff correction. */
  deltaH?: number;
}

export type ActivityModel = 'ideal' | 'davies';

/** The general problem form. */
export interface Problem {
  /** Component names; charges from the trailing sign ("Ag+", "S2O3-2", "H+"). */
  components: string[];
  /** Analytical totals, mol/L, for the components that are not fixed. */
  totals?: Record<string, number>;
  /** Free concentrations, mol/L, held fixed (for H+ at pH p: 10^-p). */
  fixed?: Record<string, number>;
  species?: SpeciesInput[];
  solids?: SolidInput[];
  /** Activity model; "ideal" by default. */
  activity?: ActivityModel;
  /** Solution temperature, degrees Celsius; 25 by default. */
  temperatureC?: number;
  /**
   * Ionic strength, mol/L, held at this value for the activity coefficients instead of being
   * computed from the species (a swamping medium such as 1 M NaClO4). Davies only.
   */
  ionicStrength?: number;
}

/** Whether the solve met its tolerances. */
export type SolveStatus = 'converged' | 'not_converged';

/** What a solve returns; every number finite except saturation of a solid whose ion is absent (-Infinity). */
export interface SolveResult {
  status: SolveStatus;
  /** Present when status is not "converged": what went wrong, in words. */
  message?: string;
  /** Free concentration of every component, mol/L (fixed ones as given). */
  free: Record<string, number>;
  /** Concentration of every dissolved species, mol/L, components included as their free value. */
  species: Record<string, number>;
  /** Solids present at equilibrium and their amount, mol per litre of solution. */
  solids: Record<string, number>;
  /** Saturation index log10(IAP/Ksp) of every solid; 0 for a present solid. */
  saturation: Record<string, number>;
  /** Activity coefficient of every dissolved species (1 under the ideal model). */
  gamma: Record<string, number>;
  /** Ionic strength, mol/L, from the dissolved species (or the value held fixed). */
  ionicStrength: number;
  /** Newton iterations used, summed over the phase loop. */
  iterations: number;
  /** Largest relative mass-balance residual over the components with totals. */
  residual: number;
  /** Plain-language cautions about the validity of the result. */
  warnings: string[];
  activity: ActivityModel;
  temperatureC: number;
}
