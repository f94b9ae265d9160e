// Temperature corrections: van 't Hoff for constants with a known enthalpy, and the Davies A
// parameter scaled with the dielectric constant of water.

/** Gas constant, J/(mol K) (CODATA 2018, exact). */
export const GAS_CONSTANT = 8.314462618;
const KELVIN = 273.15;

/**
 * log10 K at temperatureC from log10 K at referenceC and the reaction enthalpy in kJ/mol
 * (van 't Hoff, enthalpy taken as constant over the interval).
 */
export function vantHoff(logK: number, deltaHkJ: number, referenceC: number, temperatureC: number): number {
  const invDiff = 1 / (temperatureC + KELVIN) - 1 / (referenceC + KELVIN);
  return logK - ((deltaHkJ * 1000) / (GAS_CONSTANT * Math.LN10)) * invDiff;
}

// Relative permittivity of water, t in C: Malmberg & Maryott, J. Res. NBS 56 (1956) 1, fit for
// 0-100 C (coefficients from memory).
function waterPermittivity(t: number): number {
  return 87.74 - 0.40008 * t + 9.398e-4 * t * t - 1.41e-6 * t * t * t;
}

/** Davies A, (L/mol)^0.5, at temperatureC: the 25 C value scaled by (eps T)^-3/2 (density held at 1). */
export function daviesA(a25: number, temperatureC: number): number {
  if (Math.abs(temperatureC - 25) < 1e-9) return a25;
  return (a25 * permittivityFactor(temperatureC)) / permittivityFactor(25);
}

/** (eps T)^-3/2 at t, degrees Celsius. */
function permittivityFactor(t: number): number {
  return Math.pow(waterPermittivity(t) * (t + KELVIN), -1.5);
}
