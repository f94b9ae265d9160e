// Make-up arithmetic: how much salt gives a concentration in a tank, and what a weighed salt gives.
//
// One formula unit of the salt supplies one unit of what is counted: 1 mol of K[Ag(CN)2] per
// mol/L of silver. For a salt carrying two of the counted ion per formula, halve the target.
// Volumes are of the finished solution, not of the water added.
import { convertConcentration, resolveMolarMass, type ConcentrationUnit, type MolarMassSource } from './concentration';
import { toNonNegativeDecimal, toPositiveDecimal, type Decimal, type DecimalInput } from './decimal';
import { gramsPer, litresPer, type MassUnit, type Quantity, type VolumeUnit } from './mass-volume';

/** Mass of salt (in `massUnit`) that brings `volume` of solution to `molPerL` (mol/L) of that salt. */
export function amountToMass(
  molPerL: DecimalInput,
  volume: Quantity<VolumeUnit>,
  substance: MolarMassSource,
  massUnit: MassUnit = 'g',
): Decimal {
  const c = toNonNegativeDecimal(molPerL, 'molPerL');
  const litres = toNonNegativeDecimal(volume?.value, 'volume').times(litresPer(volume.unit, 'volume.unit'));
  const grams = c.times(litres).times(resolveMolarMass(substance));
  return grams.div(gramsPer(massUnit, 'massUnit'));
}

/** Concentration (in `unit`, default mol/L) of a salt after dissolving `mass` of it to make `volume` of solution. */
export function massToConcentration(
  mass: Quantity<MassUnit>,
  volume: Quantity<VolumeUnit>,
  substance: MolarMassSource,
  unit: ConcentrationUnit = 'mol/L',
): Decimal {
  const grams = toNonNegativeDecimal(mass?.value, 'mass').times(gramsPer(mass.unit, 'mass.unit'));
  const litres = toPositiveDecimal(volume?.value, 'volume').times(litresPer(volume.unit, 'volume.unit'));
  const m = resolveMolarMass(substance);
  return convertConcentration(grams.div(litres).div(m), 'mol/L', unit, m);
}
