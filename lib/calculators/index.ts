// The calculators' public surface: pure functions on the engine, one per screen, plus the shared
// inputs (a chemical system, a bath state, a pH) and the one error they throw.
export { CalculatorInputError } from './errors';
export {
  compileBath,
  solveAtPh,
  solveBath,
  toProblem,
  type BathSolution,
  type BathState,
  type ChemicalSystem,
  type PhSetting,
} from './system';
export { cumulativeFromStepwise, stepwiseFromCumulative } from './stepwise';
export { headroom, type HeadroomInput, type HeadroomResult, type MetalHeadroom } from './headroom';
export { MAX_EXCESS_MOL_PER_L, type HeadroomOutcome } from './headroom-core';
export { fixerLoading, type FixerLoadingInput, type FixerLoadingResult } from './fixer-loading';
export {
  cyanideAsHcn,
  protonatedShare,
  speciation,
  speciationOf,
  type ComponentSpeciation,
  type Holder,
  type ProtonatedShare,
  type SpeciationInput,
  type SpeciationResult,
} from './speciation';
export type { SeriesInfo, SeriesRequest } from './curve-series';
export {
  CURVE_POINTS,
  curve,
  MAX_CURVE_WARNINGS,
  seriesColumn,
  sweepValues,
  type Curve,
  type CurveInput,
  type CurvePoint,
  type Sweep,
  type SweepVariable,
} from './curves';
export { CSV_SIGNIFICANT, curvesToCsv } from './curves-csv';
export {
  precipitationOrder,
  type LeftDissolved,
  type PrecipitationOrderInput,
  type PrecipitationOrderResult,
  type SingleEquilibriumEstimate,
  type SolidThreshold,
} from './precipitation-order';
export { LOWEST_PRECIPITANT_MOL_PER_L } from './threshold';
export type { AddStep, DiluteStep, DosingStep, SetPhStep, Vessel } from './dosing-steps';
export { dosingPlan, type DosingPlanInput, type DosingPlanResult, type DosingState } from './dosing-plan';
export { makeUp, type MakeUpInput, type MakeUpOutcome, type MakeUpResult, type MakeUpTarget, type Salt } from './make-up';
