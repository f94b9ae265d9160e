import { D, UnitsInputError, formatSignificant, roundSignificant } from '@/lib/units';

import { caught } from './support';

// Expected strings follow the usual significant-figure rules (round half away from zero, keep
// significant trailing zeros); each was worked by hand.
describe('formatSignificant', () => {
  it.each<[string, number | string | InstanceType<typeof D>, number, string]>([
    ['a small number in plain notation', 0.00123456, 3, '0.00123'],
    ['the lower plain bound, 1e-3', 0.001, 3, '0.00100'],
    ['a mid-range number', 12.345, 3, '12.3'],
    ['thousands without an exponent', 1234, 3, '1230'],
    ['hundreds of thousands without an exponent', 123456, 3, '123000'],
    ['a significant trailing zero', 2.5, 3, '2.50'],
    ['trailing zeros from a string', '0.0450', 3, '0.0450'],
    ['fewer figures than the string has', '0.0450', 2, '0.045'],
    ['zero', 0, 3, '0'],
    ['negative zero', -0, 3, '0'],
    ['negative zero as text', '-0.000', 4, '0'],
    ['a negative plain number', -0.00123456, 3, '-0.00123'],
    ['half rounds away from zero (2.675 read as decimal text)', 2.675, 3, '2.68'],
    ['negative half rounds away from zero', -2.675, 3, '-2.68'],
    ['one figure, half up', 1.5, 1, '2'],
    ['one figure, negative half', -1.5, 1, '-2'],
    ['one figure of a round hundred', 100, 1, '100'],
    ['rounding up to the next power of ten, still plain', 0.0009996, 3, '0.00100'],
    ['just below the plain range', 0.000999, 3, '9.99 × 10⁻⁴'],
    ['a small concentration', 0.000012345, 3, '1.23 × 10⁻⁵'],
    ['a negative small number', -0.000012345, 3, '-1.23 × 10⁻⁵'],
    ['a million', 1234567, 3, '1.23 × 10⁶'],
    ['rounding up to the plain upper bound', 999999.7, 3, '1.00 × 10⁶'],
    ['a two-digit exponent', 1e-12, 2, '1.0 × 10⁻¹²'],
    ['a Decimal beyond the range of a JS number', new D('6.02214076e400'), 4, '6.022 × 10⁴⁰⁰'],
    ['fifteen figures', '3.14159265358979323846', 15, '3.14159265358979'],
  ])('%s: %s at %d s.f. → %s', (_name, value, sig, expected) => {
    expect(formatSignificant(value, sig)).toBe(expected);
  });

  it('uses 3 significant figures by default', () => {
    expect(formatSignificant(Math.PI)).toBe('3.14');
  });

  it.each<[string, number, string]>([
    ['a small number', 0.000012345, '1.23e-5'],
    ['a large number', 1234567, '1.23e+6'],
    ['a plain-range number, unchanged', 12.345, '12.3'],
  ])('writes ASCII exponents on request: %s', (_name, value, expected) => {
    expect(formatSignificant(value, 3, { ascii: true })).toBe(expected);
  });
});

describe('roundSignificant', () => {
  it.each<[string, number | string, number, string]>([
    ['to two figures', 123.456, 2, '120'],
    ['half away from zero', '0.125', 2, '0.13'],
    ['negative half away from zero', '-0.125', 2, '-0.13'],
    ['a value with fewer figures, unchanged', 0.5, 3, '0.5'],
  ])('%s: %s at %d s.f. → %s', (_name, value, sig, expected) => {
    expect(roundSignificant(value, sig).toString()).toBe(expected);
  });
});

describe('significant-figure errors', () => {
  it.each<[string, () => unknown, string, string]>([
    ['zero figures', () => roundSignificant(1, 0), 'sig', 'Significant figures must be a whole number from 1 to 15 (got 0).'],
    ['sixteen figures', () => formatSignificant(1, 16), 'sig', 'Significant figures must be a whole number from 1 to 15 (got 16).'],
    ['a fractional count', () => formatSignificant(1, 2.5), 'sig', 'Significant figures must be a whole number from 1 to 15 (got 2.5).'],
    ['NaN figures', () => formatSignificant(1, Number.NaN), 'sig', 'Significant figures must be a whole number from 1 to 15 (got NaN).'],
    ['a NaN value', () => formatSignificant(Number.NaN), 'value', 'value must be a finite number (got NaN).'],
    ['an infinite value', () => roundSignificant(-Infinity, 3), 'value', 'value must be a finite number (got -Infinity).'],
    ['text that is not a number', () => formatSignificant('1.2.3'), 'value', 'value "1.2.3" is not a number: write digits such as 12.5 or 1.2e-3.'],
  ])('rejects %s', (_name, call, field, message) => {
    expect(call).toThrow(message);
    const e = caught(call);
    expect(e).toBeInstanceOf(UnitsInputError);
    expect(e).toMatchObject({ field });
  });
});
