// The units module's public surface: decimals, atomic weights, formulas, unit conversion, display.
export { ATOMIC_WEIGHTS, NO_STANDARD_ATOMIC_WEIGHT, atomicWeight, isElementSymbol } from './atomic-weights';
export {
  CONCENTRATION_UNITS,
  convertConcentration,
  needsMolarMass,
  resolveMolarMass,
  toMolPerL,
  type ConcentrationBasis,
  type ConcentrationUnit,
  type MolarMassSource,
} from './concentration';
export { AVOIRDUPOIS_OUNCE_G, POUND_G, TROY_OUNCE_G, US_GALLON_L } from './constants';
export { D, toDecimal, type Decimal, type DecimalInput } from './decimal';
export { UnitsInputError } from './errors';
export { analyseFormula, formulaCharge, molarMass, parseFormula, type ParsedFormula } from './formula';
export { amountToMass, massToConcentration } from './make-up';
export {
  MASS_UNITS,
  VOLUME_UNITS,
  convertMass,
  convertVolume,
  type MassUnit,
  type Quantity,
  type UnitInfo,
  type VolumeUnit,
} from './mass-volume';
export { MAX_SIGNIFICANT, formatSignificant, roundSignificant, type FormatOptions } from './significant';
