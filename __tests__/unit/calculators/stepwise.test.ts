import { cumulativeFromStepwise, stepwiseFromCumulative } from '@/lib/calculators';

import { inputError } from './support';

describe('cumulativeFromStepwise', () => {
  it.each<[string, number[], number[], number]>([
    // Cu(II)-ammine stepwise log K 4.04, 3.43, 2.80, 1.48 (Smith & Martell, from memory); log beta4 = 11.75.
    ['copper(II) ammines to log beta4 = 11.75', [4.04, 3.43, 2.8, 1.48], [4.04, 7.47, 10.27, 11.75], 1e-12],
    ['a single step is its own beta', [8.82], [8.82], 0],
    // Ag-thiosulfate: log K1 8.82, K2 4.64 gives log beta2 13.46 (Smith & Martell, from memory).
    ['silver thiosulfate to log beta2 = 13.46', [8.82, 4.64], [8.82, 13.46], 1e-12],
  ])('%s', (_name, steps, expected, tolerance) => {
    const got = cumulativeFromStepwise(steps);
    expect(got).toHaveLength(expected.length);
    got.forEach((v, i) => expect(Math.abs(v - (expected[i] as number))).toBeLessThanOrEqual(tolerance));
  });

  it('round-trips through stepwiseFromCumulative', () => {
    const steps = [4.04, 3.43, 2.8, 1.48];
    stepwiseFromCumulative(cumulativeFromStepwise(steps)).forEach((v, i) => expect(v).toBeCloseTo(steps[i] as number, 12));
  });
});

describe('stepwiseFromCumulative', () => {
  it('gives the copper(II) ammine steps from the reference betas (Smith & Martell, from memory)', () => {
    const got = stepwiseFromCumulative([4.04, 7.47, 10.27, 11.75]);
    [4.04, 3.43, 2.8, 1.48].forEach((k, i) => expect(got[i]).toBeCloseTo(k, 12));
  });
});

describe('stepwise errors', () => {
  it.each<[string, () => unknown, string, string]>([
    ['an empty list', () => cumulativeFromStepwise([]), 'logKs', 'logKs: give a non-empty list of stepwise log Ks, first step first'],
    ['not a list', () => stepwiseFromCumulative('11.75' as unknown as number[]), 'logBetas', 'logBetas: give a non-empty list of cumulative log betas, first step first'],
    ['a NaN step', () => cumulativeFromStepwise([4.04, Number.NaN]), 'logKs[1]', 'logKs[1]: stepwise log K must be a finite number, got NaN'],
    ['an infinite beta', () => stepwiseFromCumulative([Infinity]), 'logBetas[0]', 'logBetas[0]: cumulative log beta must be a finite number, got Infinity'],
  ])('%s', (_name, call, field, message) => {
    const e = inputError(call);
    expect(e.field).toBe(field);
    expect(e.message).toBe(message);
  });
});
