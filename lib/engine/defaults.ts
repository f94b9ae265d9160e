// Tuning of the solver in one place. Tolerances are relative (mass balance) or in log10 units
// (saturation); steps are in natural-log units of concentration.

export const DEFAULTS = {
  /** Davies A at 25 C, (L/mol)^0.5; scaled with temperature through the dielectric constant of water. */
  daviesA: 0.509,
  /** Above this ionic strength, mol/L, the Davies equation is outside its usual range. */
  daviesLimitI: 0.5,
  /** Largest relative mass-balance residual accepted as converged (dimensionless). */
  tolerance: 1e-12,
  /** Residual accepted by the fallbacks when round-off stops further progress (dimensionless). */
  looseTolerance: 1e-11,
  /** Largest |log10(IAP/Ksp)| accepted for a solid present at equilibrium. */
  saturationTolerance: 1e-11,
  /** A solid is reported "close to saturation" when its index lies within this of 0 (log10 units). */
  nearSaturation: 0.3,
  /** Newton iterations per attempt for one assemblage of solids. */
  maxIterations: 80,
  /** Largest step of any ln(free concentration) in one Newton iteration (about 3 decades). */
  maxLnStep: 6.9,
  /** Halvings of a Newton step while the residual grows. */
  maxBacktracks: 6,
  /** Assemblages of solids tried before giving up. */
  maxPhaseChanges: 40,
  /** Newton iterations allowed for one solve in all, fallbacks and phase search included. */
  iterationBudget: 4000,
  /** Gauss-Seidel sweeps of one-dimensional root finding in the bracketing fallback. */
  fallbackSweeps: 60,
  /** Temperature, degrees Celsius, at which constants are taken when none is given. */
  referenceTemperatureC: 25,
} as const;

/** Per-solve overrides of DEFAULTS, plus debugging aids. */
export interface SolveOptions {
  tolerance?: number;
  maxIterations?: number;
  /** Record one line per Newton iteration in result.trace. */
  trace?: boolean;
}
