import { UnitsInputError, amountToMass, massToConcentration, type VolumeUnit } from '@/lib/units';

import { caught, expectClose } from './support';

// Invented make-up additions. Molar masses from IUPAC CIAAW 2021 standard atomic weights
// (conventional values for C, N, O); unit definitions as in mass-volume.test.ts. Products and
// quotients computed with Python's decimal module at 40 digits and checked by hand to 4 figures.
describe('amountToMass', () => {
  it.each<[string, () => ReturnType<typeof amountToMass>, string, string]>([
    ['0.05 mol/L K[Ag(CN)2] in 200 L (0.05 x 200 x 199.0025 g)',
      () => amountToMass(0.05, { value: 200, unit: 'L' }, { formula: 'K[Ag(CN)2]' }), '1990.025', '0'],
    ['0.1 mol/L NaCN in 50 US gal, in pounds (18.92705892 mol x 49.00776928 g / 453.59237)',
      () => amountToMass('0.1', { value: 50, unit: 'gal' }, { formula: 'NaCN' }, 'lb'), '2.044948279664241216403177152', '1e-27'],
    ['the same in grams', () => amountToMass('0.1', { value: 50, unit: 'gal' }, { formula: 'NaCN' }, 'g'), '927.5729367003259776', '1e-24'],
    ['a molar mass given as a number', () => amountToMass(0.2, { value: 500, unit: 'mL' }, 249.677, 'g'), '24.9677', '1e-30'],
    ['zero concentration needs nothing', () => amountToMass(0, { value: 10, unit: 'L' }, { formula: 'AgNO3' }), '0', '0'],
  ])('%s', (_name, call, expected, tolerance) => {
    expectClose(call(), expected, tolerance);
  });
});

describe('massToConcentration', () => {
  it.each<[string, () => ReturnType<typeof massToConcentration>, string, string]>([
    ['1990.025 g K[Ag(CN)2] made up to 200 L is 0.05 mol/L',
      () => massToConcentration({ value: '1990.025', unit: 'g' }, { value: 200, unit: 'L' }, { formula: 'K[Ag(CN)2]' }), '0.05', '1e-35'],
    ['the same in g/L of salt (1990.025 / 200)',
      () => massToConcentration({ value: '1990.025', unit: 'g' }, { value: 200, unit: 'L' }, { formula: 'K[Ag(CN)2]' }, 'g/L'), '9.950125', '1e-35'],
    ['1 lb CuCN in 10 gal is 1.6 oz/gal whatever the molar mass (16 oz / 10 gal)',
      () => massToConcentration({ value: 1, unit: 'lb' }, { value: 10, unit: 'gal' }, { formula: 'CuCN' }, 'oz/gal'), '1.6', '1e-35'],
    ['1 troy oz of KAu(CN)2 in 1 gal is 1 troy oz/gal of that salt (mass units only)',
      () => massToConcentration({ value: 1, unit: 'troy oz' }, { value: 1, unit: 'gal' }, { formula: 'KAu(CN)2' }, 'troy oz/gal'), '1', '1e-35'],
  ])('%s', (_name, call, expected, tolerance) => {
    expectClose(call(), expected, tolerance);
  });

  it('undoes amountToMass', () => {
    const volume = { value: '37.5', unit: 'gal' as VolumeUnit };
    const grams = amountToMass('0.0832', volume, { formula: 'Na2S2O3·5H2O' }, 'kg');
    expectClose(massToConcentration({ value: grams, unit: 'kg' }, volume, { formula: 'Na2S2O3·5H2O' }), '0.0832', '1e-35');
  });
});

describe('make-up errors', () => {
  it.each<[string, () => unknown, string, string | RegExp]>([
    ['a negative concentration', () => amountToMass(-0.1, { value: 1, unit: 'L' }, 58), 'molPerL', 'molPerL must not be negative (got -0.1).'],
    ['a NaN concentration', () => amountToMass(Number.NaN, { value: 1, unit: 'L' }, 58), 'molPerL', 'molPerL must be a finite number (got NaN).'],
    ['a negative volume', () => amountToMass(0.1, { value: -1, unit: 'L' }, 58), 'volume', 'volume must not be negative (got -1).'],
    ['no volume at all', () => amountToMass(0.1, undefined as unknown as { value: number; unit: 'L' }, 58), 'volume',
      'volume must be a number, a decimal string or a Decimal.'],
    ['an unknown volume unit', () => amountToMass(0.1, { value: 1, unit: 'bucket' as VolumeUnit }, 58), 'volume.unit',
      'Unknown volume unit "bucket" for volume.unit: use one of L, mL, gal.'],
    ['an unknown mass unit', () => amountToMass(0.1, { value: 1, unit: 'L' }, 58, 'stone' as 'g'), 'massUnit',
      'Unknown mass unit "stone" for massUnit: use one of g, kg, mg, oz, troy oz, lb.'],
    ['a missing molar mass', () => amountToMass(0.1, { value: 1, unit: 'L' }, undefined as unknown as number), 'molarMass',
      'molarMass must be a number, a decimal string or a Decimal.'],
    ['a zero volume to dissolve into', () => massToConcentration({ value: 5, unit: 'g' }, { value: 0, unit: 'L' }, 58), 'volume',
      'volume must be greater than zero (got 0).'],
    ['a negative mass', () => massToConcentration({ value: -5, unit: 'g' }, { value: 1, unit: 'L' }, 58), 'mass', 'mass must not be negative (got -5).'],
    ['an unknown mass unit on the weighed salt', () => massToConcentration({ value: 5, unit: 'grain' as 'g' }, { value: 1, unit: 'L' }, 58), 'mass.unit',
      /^Unknown mass unit "grain" for mass\.unit/],
    ['a bad formula', () => massToConcentration({ value: 5, unit: 'g' }, { value: 1, unit: 'L' }, { formula: 'nacn' }), 'formula',
      /^Element symbols start with a capital letter/],
  ])('rejects %s', (_name, call, field, message) => {
    expect(call).toThrow(message);
    const e = caught(call);
    expect(e).toBeInstanceOf(UnitsInputError);
    expect(e).toMatchObject({ field });
  });
});
