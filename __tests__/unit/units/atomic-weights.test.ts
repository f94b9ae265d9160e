import { ATOMIC_WEIGHTS, D, NO_STANDARD_ATOMIC_WEIGHT, UnitsInputError, atomicWeight, isElementSymbol } from '@/lib/units';

// Elements 1-92 in atomic-number order.
const H_TO_U = (
  'H He Li Be B C N O F Ne Na Mg Al Si P S Cl Ar K Ca Sc Ti V Cr Mn Fe Co Ni Cu Zn Ga Ge As Se Br Kr ' +
  'Rb Sr Y Zr Nb Mo Tc Ru Rh Pd Ag Cd In Sn Sb Te I Xe Cs Ba La Ce Pr Nd Pm Sm Eu Gd Tb Dy Ho Er Tm Yb ' +
  'Lu Hf Ta W Re Os Ir Pt Au Hg Tl Pb Bi Po At Rn Fr Ra Ac Th Pa U'
).split(' ');

describe('ATOMIC_WEIGHTS', () => {
  it('covers every element from H (1) to U (92)', () => {
    expect(H_TO_U).toHaveLength(92);
    expect(H_TO_U.filter((s) => !isElementSymbol(s))).toEqual([]);
  });

  it('holds only positive decimal strings', () => {
    for (const [symbol, w] of Object.entries(ATOMIC_WEIGHTS)) {
      expect([symbol, /^\d+(\.\d+)?$/.test(w)]).toEqual([symbol, true]);
      expect(new D(w).greaterThan(0)).toBe(true);
    }
  });

  it('is frozen', () => {
    expect(Object.isFrozen(ATOMIC_WEIGHTS)).toBe(true);
  });

  // Source: IUPAC CIAAW standard atomic weights 2021 (Pure Appl. Chem. 2022, 94, 573); for interval
  // elements the conventional values of that report's table of conventional/abridged values.
  it.each([
    ['H', '1.008'], ['C', '12.011'], ['N', '14.007'], ['O', '15.999'], ['Mg', '24.305'],
    ['S', '32.06'], ['Cl', '35.45'], ['Br', '79.904'], ['Na', '22.98976928'], ['K', '39.0983'],
    ['Ag', '107.8682'], ['Au', '196.966570'], ['Cu', '63.546'], ['Zn', '65.38'], ['I', '126.90447'],
    ['Ni', '58.6934'], ['Cd', '112.414'], ['Pb', '207.2'], ['Fe', '55.845'], ['Pd', '106.42'],
    ['Pt', '195.084'], ['Co', '58.933194'], ['Cr', '51.9961'], ['Sn', '118.710'], ['Hg', '200.592'],
    ['Ca', '40.078'], ['Ba', '137.327'], ['P', '30.973761998'],
    // 2021 value from the 2020 atomic mass evaluation (18.998403163 in the 2013-2019 tables).
    ['F', '18.998403162'],
  ])('%s is %s', (symbol, expected) => {
    expect(ATOMIC_WEIGHTS[symbol]).toBe(expected);
    expect(atomicWeight(symbol).equals(expected)).toBe(true);
  });

  it('flags the elements whose entry is a mass number, not a standard atomic weight', () => {
    for (const s of NO_STANDARD_ATOMIC_WEIGHT) expect(ATOMIC_WEIGHTS[s]).toMatch(/^\d+$/);
    expect(NO_STANDARD_ATOMIC_WEIGHT.has('Ag')).toBe(false);
  });
});

describe('atomicWeight', () => {
  it.each([
    ['an unknown symbol', 'Xx'],
    ['a symbol in the wrong case', 'CU'],
    ['an inherited object key', 'toString'],
  ])('throws for %s', (_name, symbol) => {
    expect(() => atomicWeight(symbol)).toThrow(
      new UnitsInputError('symbol', `Unknown element "${symbol}": symbols are one capital letter and at most one small letter, such as Ag or Cu.`),
    );
    expect(() => atomicWeight(symbol)).toThrow(/^Unknown element/);
  });
});
