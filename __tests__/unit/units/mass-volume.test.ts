import { MASS_UNITS, UnitsInputError, VOLUME_UNITS, convertMass, convertVolume, type MassUnit, type VolumeUnit } from '@/lib/units';

import { caught, expectClose } from './support';

// Exact definitions: US gallon 3.785411784 L; avoirdupois pound 453.59237 g = 16 oz of 28.349523125 g;
// troy ounce 31.1034768 g (international yard and pound agreement, 1959). Quotients computed with
// Python's decimal module at 40 digits.
describe('convertVolume', () => {
  it.each<[string, string, VolumeUnit, VolumeUnit, string, string]>([
    ['100 US gallons in litres (exact)', '100', 'gal', 'L', '378.5411784', '0'],
    ['250 mL in litres', '250', 'mL', 'L', '0.25', '0'],
    ['1 L in US gallons (1 / 3.785411784)', '1', 'L', 'gal', '0.2641720523581484153798999216', '1e-28'],
    ['2 L in mL', '2', 'L', 'mL', '2000', '0'],
  ])('%s', (_name, value, from, to, expected, tolerance) => {
    expectClose(convertVolume(value, from, to), expected, tolerance);
  });
});

describe('convertMass', () => {
  it.each<[string, string, MassUnit, MassUnit, string, string]>([
    ['1 lb is 16 oz (definition)', '1', 'lb', 'oz', '16', '0'],
    ['1 troy oz in mg (definition)', '1', 'troy oz', 'mg', '31103.4768', '0'],
    ['1 kg in troy oz (1000 / 31.1034768)', '1', 'kg', 'troy oz', '32.15074656862798052210034603', '1e-26'],
    ['2.2 kg in lb (2200 / 453.59237)', '2.2', 'kg', 'lb', '4.850169768067306775905423630', '1e-27'],
    ['1 troy oz in oz (192/175)', '1', 'troy oz', 'oz', '1.097142857142857142857142857', '1e-27'],
    ['0 g stays 0', '0', 'g', 'lb', '0', '0'],
  ])('%s', (_name, value, from, to, expected, tolerance) => {
    expectClose(convertMass(value, from, to), expected, tolerance);
  });

  it('lists every unit for pickers', () => {
    expect(MASS_UNITS.map((u) => u.id)).toEqual(['g', 'kg', 'mg', 'oz', 'troy oz', 'lb']);
    expect(VOLUME_UNITS.map((u) => u.id)).toEqual(['L', 'mL', 'gal']);
  });
});

describe('mass and volume errors', () => {
  it.each<[string, () => unknown, string, string]>([
    ['a negative volume', () => convertVolume(-2, 'L', 'mL'), 'volume', 'volume must not be negative (got -2).'],
    ['a NaN volume', () => convertVolume(Number.NaN, 'L', 'mL'), 'volume', 'volume must be a finite number (got NaN).'],
    ['an unknown volume unit', () => convertVolume(1, 'quart' as VolumeUnit, 'L'), 'from', 'Unknown volume unit "quart" for from: use one of L, mL, gal.'],
    ['a negative mass', () => convertMass('-0.5', 'g', 'mg'), 'mass', 'mass must not be negative (got -0.5).'],
    ['an infinite mass', () => convertMass(-Infinity, 'g', 'mg'), 'mass', 'mass must be a finite number (got -Infinity).'],
    ['an unknown mass unit', () => convertMass(1, 'g', 'ton' as MassUnit), 'to', 'Unknown mass unit "ton" for to: use one of g, kg, mg, oz, troy oz, lb.'],
  ])('rejects %s', (_name, call, field, message) => {
    expect(call).toThrow(message);
    const e = caught(call);
    expect(e).toBeInstanceOf(UnitsInputError);
    expect(e).toMatchObject({ field });
  });
});
