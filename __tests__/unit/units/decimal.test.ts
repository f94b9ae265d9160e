import { D, UnitsInputError, toDecimal } from '@/lib/units';

import { caught } from './support';

describe('D', () => {
  it('carries 40 significant digits and rounds half away from zero', () => {
    expect(new D(1).div(3).toString()).toBe('0.' + '3'.repeat(40));
    expect(new D('2.5').toDecimalPlaces(0).toString()).toBe('3');
    expect(new D('-2.5').toDecimalPlaces(0).toString()).toBe('-3');
  });
});

describe('toDecimal', () => {
  it.each([
    ['a number', 1.5, '1.5'],
    ['a number that is not exact in binary, read from its shortest text', 0.1, '0.1'],
    ['a decimal string', '12.50', '12.5'],
    ['scientific text with spaces around it', ' 2e-3 ', '0.002'],
    ['a leading plus sign', '+4', '4'],
    ['a Decimal', new D('7.25'), '7.25'],
  ])('accepts %s', (_name, input, expected) => {
    expect(toDecimal(input, 'x').toString()).toBe(expected);
  });

  it.each([
    ['NaN', Number.NaN, /^value must be a finite number \(got NaN\)\.$/],
    ['Infinity', Number.POSITIVE_INFINITY, /^value must be a finite number \(got Infinity\)\.$/],
    ['an infinite Decimal', new D(Infinity), /^value must be a finite number \(got Infinity\)\.$/],
    ['words', 'twelve', /^value "twelve" is not a number: write digits such as 12\.5 or 1\.2e-3\.$/],
    ['hex text, which decimal.js would otherwise take', '0x10', /^value "0x10" is not a number/],
    ['the text Infinity', 'Infinity', /^value "Infinity" is not a number/],
    ['an empty string', '', /^value "" is not a number/],
    ['a decimal comma', '1,5', /^value "1,5" is not a number/],
    ['undefined', undefined as unknown as number, /^value must be a number, a decimal string or a Decimal\.$/],
  ])('rejects %s with a UnitsInputError naming the field', (_name, input, message) => {
    expect(() => toDecimal(input, 'value')).toThrow(message);
    const e = caught(() => toDecimal(input, 'value'));
    expect(e).toBeInstanceOf(UnitsInputError);
    expect(e).toMatchObject({ name: 'UnitsInputError', field: 'value' });
  });
});
