// Bath quantities between shop units and mol/L. Check values are worked by hand from IUPAC 2021
// standard atomic weights (Ag 107.8682, K 39.0983, C 12.011, N 14.007, O 15.999, H 1.008,
// S 32.06) and the exact troy ounce (31.1034768 g), avoirdupois ounce (28.349523125 g) and US
// gallon (3.785411784 L).
import { against, fromStored, massFormula, metalElement, quantityLabel, toStored } from '@/lib/baths/quantities';

const silver = { metal: 'Ag+', ligandAs: 'KCN', carbonateAs: 'K2CO3', metalUnit: 'troy oz/gal', ligandUnit: 'oz/gal' } as const;
const fixer = { metal: 'Ag+', ligandAs: '(NH4)2S2O3', carbonateAs: null, metalUnit: 'g/L', ligandUnit: 'g/L' } as const;

describe('bath quantities', () => {
  it('counts the metal as the element and the ligand as the stated salt', () => {
    expect(metalElement('Cu+2')).toBe('Cu');
    expect(massFormula(silver, 'metal')).toBe('Ag');
    expect(massFormula(silver, 'freeLigand')).toBe('KCN');
    expect(massFormula(silver, 'carbonate')).toBe('K2CO3');
    expect(massFormula(fixer, 'bromide')).toBe('Br');
  });

  it('converts troy ounces of silver per gallon to mol/L and back', () => {
    // 1 troy oz/gal = 31.1034768 / 3.785411784 = 8.216618 g/L; / 107.8682 = 0.0761730 mol/L.
    expect(toStored(silver, 'metal', 1, 'troy oz/gal')).toBeCloseTo(0.076173, 6);
    expect(fromStored(silver, 'metal', 0.076173)).toBeCloseTo(1, 4);
  });

  it('converts free cyanide stated as oz/gal of KCN', () => {
    // 16 oz/gal KCN = 16 x 28.349523125 / 3.785411784 = 119.82643 g/L; / 65.1163 g/mol = 1.840191 mol/L CN-.
    expect(toStored(silver, 'freeLigand', 16, 'oz/gal')).toBeCloseTo(1.840191, 5);
  });

  it('converts fixer thiosulfate stated as g/L of ammonium thiosulfate', () => {
    // (NH4)2S2O3: 2 x 14.007 + 8 x 1.008 + 2 x 32.06 + 3 x 15.999 = 148.195 g/mol; 148.195 g/L = 1 mol/L.
    expect(toStored(fixer, 'freeLigand', 148.195, 'g/L')).toBeCloseTo(1, 6);
  });

  it('places a value against a range with open ends', () => {
    expect(against({ min: 4, max: 5.5 }, 3.9)).toBe('below');
    expect(against({ min: 4, max: 5.5 }, 5.5)).toBe('inside');
    expect(against({ min: null, max: 6 }, 6.2)).toBe('above');
    expect(against({ min: null, max: null }, 1e9)).toBe('inside');
  });

  it('labels quantities with the bath words', () => {
    expect(quantityLabel('freeLigand', silver)).toBe('Free KCN');
    expect(quantityLabel('carbonate', silver)).toBe('Carbonate (as K2CO3)');
    expect(quantityLabel('metal', fixer)).toBe('Ag metal');
  });
});
