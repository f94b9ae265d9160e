// Stepwise and cumulative formation constants: handbooks print either; the engine wants
// cumulative log beta_n = log K1 + ... + log Kn for ML_n formed from M and n L.
import { CalculatorInputError } from './errors';
import { finiteNumber } from './validate';

function checkList(values: unknown, field: string, what: string): number[] {
  if (!Array.isArray(values) || values.length === 0) {
    throw new CalculatorInputError(field, `give a non-empty list of ${what}, first step first`);
  }
  return values.map((v, i) => finiteNumber(v, `${field}[${i}]`, what.replace(/s$/, '')));
}

/** Cumulative log beta_n (dimensionless, log10) from stepwise log K_1..K_n: the running sums. */
export function cumulativeFromStepwise(logKs: number[]): number[] {
  const steps = checkList(logKs, 'logKs', 'stepwise log Ks');
  let sum = 0;
  return steps.map((k) => (sum += k));
}

/** Stepwise log K_n (log10) from cumulative log beta_1..beta_n: the successive differences. */
export function stepwiseFromCumulative(logBetas: number[]): number[] {
  const betas = checkList(logBetas, 'logBetas', 'cumulative log betas');
  return betas.map((b, i) => (i === 0 ? b : b - (betas[i - 1] as number)));
}
