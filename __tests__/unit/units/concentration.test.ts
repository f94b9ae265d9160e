import {
  CONCENTRATION_UNITS,
  UnitsInputError,
  convertConcentration,
  molarMass,
  needsMolarMass,
  toMolPerL,
  type ConcentrationUnit,
} from '@/lib/units';

import { caught, expectClose } from './support';

// Exact definitions used for the check values: troy ounce 31.1034768 g, avoirdupois ounce
// 28.349523125 g (international yard and pound agreement, 1959), US gallon 3.785411784 L (231 in³).
// Quotients below were computed with Python's decimal module at 40 digits and checked by hand to 5.
describe('convertConcentration', () => {
  it.each<[string, string, ConcentrationUnit, ConcentrationUnit, string | undefined, string, string]>([
    ['1 troy oz/gal in g/L (31.1034768 / 3.785411784)', '1', 'troy oz/gal', 'g/L', undefined, '8.216669301730054528725480398', '1e-25'],
    ['1 oz/gal in g/L (28.349523125 / 3.785411784)', '1', 'oz/gal', 'g/L', undefined, '7.489151707306039283994578488', '1e-25'],
    ['1 troy oz/gal in oz/gal (480 grains / 437.5 grains = 192/175)', '1', 'troy oz/gal', 'oz/gal', undefined, '1.097142857142857142857142857', '1e-25'],
    ['ppm is mg/L in dilute water', '150', 'ppm', 'mg/L', undefined, '150', '0'],
    ['150 ppm in g/L', '150', 'ppm', 'g/L', undefined, '0.15', '0'],
    ['12 mmol/L in mol/L', '12', 'mmol/L', 'mol/L', undefined, '0.012', '0'],
    ['0.25 mol/L NaCN in g/L (0.25 x 49.00776928)', '0.25', 'mol/L', 'g/L', 'NaCN', '12.25194232', '1e-30'],
    ['2.5 g/L silver in mol/L (2.5 / 107.8682)', '2.5', 'g/L', 'mol/L', 'Ag', '0.02317643197902625611626039926', '1e-28'],
    ['2 troy oz/gal gold in mol/L (2 x 8.2166693... / 196.966570)', '2', 'troy oz/gal', 'mol/L', 'Au', '0.08343212050379975169111672502', '1e-28'],
    ['0.015 mol/L silver in troy oz/gal', '0.015', 'mol/L', 'troy oz/gal', 'Ag', '0.1969195717368494315722286069', '1e-27'],
    ['zero stays zero', '0', 'g/L', 'mol/L', 'AgNO3', '0', '0'],
  ])('%s', (_name, value, from, to, formula, expected, tolerance) => {
    const m = formula === undefined ? undefined : { formula };
    expectClose(convertConcentration(value, from, to, m), expected, tolerance);
  });

  it('takes the molar mass as a number, a string or a formula alike', () => {
    const byFormula = convertConcentration(0.1, 'mol/L', 'g/L', { formula: 'AgNO3' });
    expect(byFormula.toString()).toBe('16.98722');
    expect(convertConcentration(0.1, 'mol/L', 'g/L', 169.8722).equals(byFormula)).toBe(true);
    expect(convertConcentration(0.1, 'mol/L', 'g/L', '169.8722').equals(byFormula)).toBe(true);
    expect(convertConcentration(0.1, 'mol/L', 'g/L', molarMass('AgNO3')).equals(byFormula)).toBe(true);
  });

  it('returns to the start after a round trip through every pair of units', () => {
    const ids = CONCENTRATION_UNITS.map((u) => u.id);
    for (const from of ids) {
      for (const to of ids) {
        const there = convertConcentration('3.7', from, to, { formula: 'K[Ag(CN)2]' });
        expect(there.isNegative()).toBe(false);
        expectClose(convertConcentration(there, to, from, { formula: 'K[Ag(CN)2]' }), '3.7', '1e-30');
      }
    }
  });

  it('toMolPerL is convertConcentration to mol/L', () => {
    expect(toMolPerL(250, 'mmol/L').toString()).toBe('0.25');
    expect(toMolPerL('12.25194232', 'g/L', { formula: 'NaCN' }).toString()).toBe('0.25');
  });

  it('labels every unit and says which cross the mole/mass line', () => {
    expect(CONCENTRATION_UNITS.map((u) => u.id)).toEqual(['mol/L', 'mmol/L', 'g/L', 'mg/L', 'ppm', 'troy oz/gal', 'oz/gal']);
    for (const u of CONCENTRATION_UNITS) expect(u.label.length * u.description.length).toBeGreaterThan(0);
    expect(CONCENTRATION_UNITS.find((u) => u.id === 'ppm')?.description).toMatch(/density 1 kg\/L assumed/);
    expect(needsMolarMass('mol/L', 'oz/gal')).toBe(true);
    expect(needsMolarMass('troy oz/gal', 'ppm')).toBe(false);
    expect(needsMolarMass('mmol/L', 'mol/L')).toBe(false);
  });
});

describe('convertConcentration errors', () => {
  it.each<[string, () => unknown, string, string | RegExp]>([
    ['a molar mass missing for mol/L to g/L', () => convertConcentration(1, 'mol/L', 'g/L'), 'molarMass',
      'Converting mol/L to g/L needs the molar mass (g/mol) of the dissolved substance, or its formula.'],
    ['a molar mass missing for troy oz/gal to mmol/L', () => convertConcentration(1, 'troy oz/gal', 'mmol/L'), 'molarMass',
      'Converting troy oz/gal to mmol/L needs the molar mass (g/mol) of the dissolved substance, or its formula.'],
    ['a zero molar mass', () => convertConcentration(1, 'mol/L', 'g/L', 0), 'molarMass', 'molarMass must be greater than zero (got 0).'],
    ['a negative molar mass', () => convertConcentration(1, 'g/L', 'mol/L', -58), 'molarMass', 'molarMass must be greater than zero (got -58).'],
    ['a molar mass that is not a number', () => convertConcentration(1, 'g/L', 'mol/L', 'AgNO3'), 'molarMass',
      /^molarMass "AgNO3" is not a number/],
    ['a bad formula for the molar mass', () => convertConcentration(1, 'g/L', 'mol/L', { formula: 'AgXx' }), 'formula',
      /^Unknown element "Xx" at position 3 in "AgXx"/],
    ['a negative concentration', () => convertConcentration(-1, 'g/L', 'mg/L'), 'value', 'value must not be negative (got -1).'],
    ['a NaN concentration', () => convertConcentration(Number.NaN, 'g/L', 'mg/L'), 'value', 'value must be a finite number (got NaN).'],
    ['an infinite concentration', () => convertConcentration(Infinity, 'g/L', 'mg/L'), 'value', 'value must be a finite number (got Infinity).'],
    ['an unknown source unit', () => convertConcentration(1, 'M' as ConcentrationUnit, 'g/L'), 'from',
      'Unknown concentration unit "M" for from: use one of mol/L, mmol/L, g/L, mg/L, ppm, troy oz/gal, oz/gal.'],
    ['an unknown target unit', () => convertConcentration(1, 'g/L', 'g/gal' as ConcentrationUnit), 'to',
      /^Unknown concentration unit "g\/gal" for to: use one of /],
    ['an inherited key as a unit', () => convertConcentration(1, 'toString' as ConcentrationUnit, 'g/L'), 'from',
      /^Unknown concentration unit "toString" for from/],
  ])('rejects %s', (_name, call, field, message) => {
    expect(call).toThrow(message);
    const e = caught(call);
    expect(e).toBeInstanceOf(UnitsInputError);
    expect(e).toMatchObject({ field });
  });
});
