// The hazard rules' public surface: the rules on a situation, the situations of a calculation and
// of a bath, and the GHS statements and reagent recognition they draw on. Pure: no React, no I/O.
export {
  DEFAULT_CYANIDE_CODES,
  GHS_STATEMENTS,
  REAGENT_SOURCE,
  REAGENTS,
  STATEMENT_PICTOGRAM,
  cyanideGroups,
  ghsStatements,
  isAcidReagent,
  isAmmoniaReagent,
  isCyanideFormula,
  isCyanideReagent,
  isSilverReagent,
  isThiosulfateReagent,
  pictogramsFor,
  recogniseReagent,
  type GhsCode,
  type Reagent,
  type ReagentKind,
} from './ghs';
export { HCN_PKA, evaluateHazards, hcnRatioFromPh, isFlagged } from './rules';
export { calculationHazards, calculationSituation, solutionOf, type CalculationHazardInput } from './from-calculation';
export { bathHazards, bathSituation } from './from-bath';
export type * from './types';
