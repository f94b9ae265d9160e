// Activity coefficients: ideal, or the Davies equation
// log10 gamma = -A z^2 (sqrt(I)/(1 + sqrt(I)) - 0.3 I)  (Davies, Ion Association, 1962).
// Written as ln gamma = z^2 phi(s) with s = sqrt(I), so that the solver can carry s as an
// unknown: phi has a finite derivative in s at I = 0, unlike its derivative in I.

/** phi(s) = ln gamma / z^2 at s = sqrt(ionic strength in mol/L), for Davies parameter A. */
export function daviesPhi(s: number, a: number): number {
  return -a * Math.LN10 * (s / (1 + s) - 0.3 * s * s);
}

/** d phi / d s. */
export function daviesPhiSlope(s: number, a: number): number {
  return -a * Math.LN10 * (1 / ((1 + s) * (1 + s)) - 0.6 * s);
}
