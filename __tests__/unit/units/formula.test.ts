import { UnitsInputError, analyseFormula, formulaCharge, molarMass, parseFormula } from '@/lib/units';

import { caught, expectClose } from './support';

describe('parseFormula', () => {
  it.each<[string, string, Record<string, number>]>([
    ['a plain salt', 'AgNO3', { Ag: 1, N: 1, O: 3 }],
    ['two-letter symbols next to one-letter ones', 'NaCN', { Na: 1, C: 1, N: 1 }],
    ['repeated elements summed', 'Na2S2O3', { Na: 2, S: 2, O: 3 }],
    ['brackets around parentheses', 'K[Ag(CN)2]', { K: 1, Ag: 1, C: 2, N: 2 }],
    ['an ammine complex salt', 'Cu(NH3)4SO4', { Cu: 1, N: 4, H: 12, S: 1, O: 4 }],
    ['a leading group with a count', '(NH4)2SO4', { N: 2, H: 8, S: 1, O: 4 }],
    ['a phosphate', 'Ca3(PO4)2', { Ca: 3, P: 2, O: 8 }],
    ['braces, brackets and parentheses nested', 'Ba{[Ag(CN)2]2}', { Ba: 1, Ag: 2, C: 4, N: 4 }],
    ['an element that appears inside and outside brackets', 'K4[Fe(CN)6]·3H2O', { K: 4, Fe: 1, C: 6, N: 6, H: 6, O: 3 }],
    ['a pentahydrate with a middle dot', 'Na2S2O3·5H2O', { Na: 2, S: 2, O: 8, H: 10 }],
    ['a bullet as the hydrate dot', 'CuSO4•5H2O', { Cu: 1, S: 1, O: 9, H: 10 }],
    ['a full stop as the hydrate dot', 'CuSO4.5H2O', { Cu: 1, S: 1, O: 9, H: 10 }],
    ['an asterisk as the hydrate dot', 'CuSO4*5H2O', { Cu: 1, S: 1, O: 9, H: 10 }],
    ['spaces around the hydrate dot', 'CuSO4 · 5H2O', { Cu: 1, S: 1, O: 9, H: 10 }],
    ['a fractional hydrate', 'CaSO4·0.5H2O', { Ca: 1, S: 1, O: 4.5, H: 1 }],
    ['a fractional hydrate after a full stop', 'CaSO4.0.5H2O', { Ca: 1, S: 1, O: 4.5, H: 1 }],
    ['a one-half sign', 'CaSO4·½H2O', { Ca: 1, S: 1, O: 4.5, H: 1 }],
    ['a multiplier on the first part', '3CdSO4·8H2O', { Cd: 3, S: 3, O: 20, H: 16 }],
    ['Unicode subscripts', 'Na₂S₂O₃', { Na: 2, S: 2, O: 3 }],
    ['a count of more than one digit', 'C12H22O11', { C: 12, H: 22, O: 11 }],
    ['a phase suffix, ignored', 'AgCl(s)', { Ag: 1, Cl: 1 }],
    ['an ion with a charge, which adds no atoms', '[Au(CN)2]-', { Au: 1, C: 2, N: 2 }],
    ['Cu2+ read as Cu2 with charge +1 (documented rule)', 'Cu2+', { Cu: 2 }],
    ['carbon monoxide versus cobalt: capitals decide', 'CO', { C: 1, O: 1 }],
    ['leading and trailing spaces', '  Co  ', { Co: 1 }],
  ])('reads %s: %s', (_name, formula, expected) => {
    expect(parseFormula(formula)).toEqual(expected);
  });

  it('keeps counts exact where a float would not', () => {
    // 0.1 + 0.2 in binary is 0.30000000000000004; the parser counts in decimal.
    expect(analyseFormula('NaCl·0.1H2O·0.2H2O').counts.get('O')?.toString()).toBe('0.3');
  });
});

describe('formulaCharge', () => {
  it.each<[string, string, number]>([
    ['no charge written', 'AgNO3', 0],
    ['a bare plus', 'Ag+', 1],
    ['sign then digits', 'S2O3-2', -2],
    ['sign then digits on a metal', 'Cu+2', 2],
    ['a bare minus after a count', 'Ag(CN)2-', -1],
    ['a bare minus after brackets', '[Au(CN)2]-', -1],
    ['caret, digits then sign', 'SO4^2-', -2],
    ['caret, sign then digits', 'SO4^-2', -2],
    ['caret and a bare sign', 'Ag^+', 1],
    ['digits before a bare sign belong to the formula', 'Cu2+', 1],
    ['repeated signs', 'Fe+++', 3],
    ['Unicode superscripts', 'SO₄²⁻', -2],
    ['a Unicode minus sign', 'Au(CN)2−', -1],
    ['a charge followed by a phase', 'Ag+(aq)', 1],
    ['a phase followed by a charge', 'Ag(aq)+', 1],
    ['a superscript charge followed by a phase', 'Ag⁺(aq)', 1],
    ['a neutral solid with a phase', 'AgCl(s)', 0],
    ['a four-minus complex', 'Fe(CN)6-4', -4],
  ])('reads %s: %s → %d', (_name, formula, charge) => {
    expect(formulaCharge(formula)).toBe(charge);
  });
});

describe('molarMass', () => {
  // Check values: sums of IUPAC CIAAW 2021 standard atomic weights (conventional values for
  // H, C, N, O, S, Cl, Br), computed by hand and again with Python's decimal module. The sums are
  // exact in decimal arithmetic, so the 1e-12 g/mol tolerance is only a guard.
  it.each<[string, string, string, string]>([
    ['silver nitrate', 'AgNO3', '169.8722', '1e-12'],
    ['sodium cyanide', 'NaCN', '49.00776928', '1e-12'],
    ['sodium thiosulfate pentahydrate', 'Na2S2O3·5H2O', '248.17153856', '1e-12'],
    ['potassium dicyanoargentate', 'K[Ag(CN)2]', '199.0025', '1e-12'],
    ['copper(I) cyanide', 'CuCN', '89.564', '1e-12'],
    ['silver chloride', 'AgCl', '143.3182', '1e-12'],
    ['silver bromide', 'AgBr', '187.7722', '1e-12'],
    ['ammonium sulfate', '(NH4)2SO4', '132.134', '1e-12'],
    ['copper sulfate pentahydrate', 'CuSO4·5H2O', '249.677', '1e-12'],
    ['potassium dicyanoaurate', 'KAu(CN)2', '288.10087', '1e-12'],
    ['zinc cyanide', 'Zn(CN)2', '117.416', '1e-12'],
    ['tetraammine copper sulfate', 'Cu(NH3)4SO4', '227.726', '1e-12'],
    ['calcium phosphate', 'Ca3(PO4)2', '310.173523996', '1e-12'],
    ['calcium sulfate hemihydrate', 'CaSO4·0.5H2O', '145.1415', '1e-12'],
  ])('%s, %s = %s g/mol', (_name, formula, expected, tolerance) => {
    expectClose(molarMass(formula), expected, tolerance);
  });

  // Same source as above; the ion's mass is that of its atoms (electron mass, 0.00055 g/mol, neglected).
  it.each<[string, string, string, string]>([
    ['a cation', 'Ag+', 'Ag', '107.8682'],
    ['an anion', 'S2O3-2', 'S2O3', '112.117'],
    ['a complex anion in brackets', '[Ag(CN)2]-', 'Ag(CN)2', '159.9042'],
  ])('ignores the charge of %s: %s weighs as %s, %s g/mol', (_name, ion, neutral, expected) => {
    expect(molarMass(ion).equals(molarMass(neutral))).toBe(true);
    expectClose(molarMass(ion), expected, '1e-12');
  });

  it('gives the same mass however the hydrate dot is written', () => {
    const forms = ['CuSO4·5H2O', 'CuSO4•5H2O', 'CuSO4.5H2O', 'CuSO4*5H2O', 'CuSO4 · 5H2O'];
    const masses = forms.map((f) => molarMass(f).toString());
    expect(new Set(masses)).toEqual(new Set(['249.677']));
  });
});

describe('formula errors', () => {
  it.each<[string, string, string | RegExp]>([
    ['an empty formula', '', 'Empty formula: enter one such as AgNO3.'],
    ['only spaces', '   ', 'Empty formula: enter one such as AgNO3.'],
    ['only a charge', '+', 'Empty formula before the charge: enter one such as AgNO3.'],
    ['only a phase', '(aq)', 'Empty formula: enter one such as AgNO3.'],
    ['an unknown element', 'AgXx', /^Unknown element "Xx" at position 3 in "AgXx": check the spelling and capitals/],
    ['an all-lowercase formula', 'nacn', /^Element symbols start with a capital letter: "n" at position 1 in "nacn"\./],
    ['a lowercase letter after a symbol', 'Nacn', /^Element symbols start with a capital letter: "c" at position 3 in "Nacn"/],
    ['an unclosed bracket', 'K[Ag(CN)2', /^Unclosed "\[" at position 2 in "K\[Ag\(CN\)2": add "\]"\.$/],
    ['an unclosed parenthesis', 'Cu(NH3', /^Unclosed "\(" at position 3 in "Cu\(NH3": add "\)"\.$/],
    ['a closing parenthesis with no opening one', 'KCN)', /^Unmatched "\)" at position 4 in "KCN\)": remove it or add its opening bracket\.$/],
    ['a bracket closed by the wrong kind', 'K[Ag(CN)2)', /^"\[" at position 2 is closed by "\)" at position 10 in "K\[Ag\(CN\)2\)": close it with "\]"\.$/],
    ['empty parentheses', 'Cu()', /^Empty brackets "\(\)" at position 3 in "Cu\(\)": put atoms inside or remove them\.$/],
    ['a zero count', 'H0', /^Count 0 at position 2 in "H0": counts are whole numbers of 1 or more\.$/],
    ['a decimal subscript', 'Fe0.95O', /^Count 0 at position 3 in "Fe0\.95O"/],
    ['a hydrate dot with nothing after it', 'CuSO4·', /^Nothing after "·" at position 6 in "CuSO4·": write the water as ·5H2O, or remove the dot\.$/],
    ['a hydrate dot with nothing before it', '·5H2O', /^Nothing before "·" at position 1 in "·5H2O": start with the salt/],
    ['a multiplier with no formula', 'CuSO4·5', /^The multiplier at position 7 in "CuSO4·5" is not followed by a formula/],
    ['a zero multiplier', 'CuSO4·0H2O', /^Multiplier 0 at position 7 in "CuSO4·0H2O": it must be greater than 0\.$/],
    ['a hydrate dot inside brackets', 'Cu(SO4·5H2O)', /^Hydrate dot "·" at position 7 in "Cu\(SO4·5H2O\)" is inside brackets/],
    ['a space before a charge', 'SO4 2-', /^Unexpected space at position 4 in "SO4 2-": remove spaces inside a formula, and write a charge as SO4\^2- or SO4-2\.$/],
    ['a sign in the middle', 'Ag+Cl', /^"\+" at position 3 in "Ag\+Cl": a charge goes at the very end, such as Ag\(CN\)2- or S2O3-2\.$/],
    ['mixed signs', 'Cu+-', /^Charge "\+-" at position 3 in "Cu\+-": use one sign, such as 2- or \+2\.$/],
    ['mixed signs before digits', 'Cu-+2', /^Charge "-\+2" at position 3 in "Cu-\+2": use one sign/],
    ['a zero charge', 'Cu+0', /^Charge of 0 at position 3 in "Cu\+0": leave the charge off for a neutral formula\.$/],
    ['a caret with no sign', 'SO4^2', /^Charge after "\^" at position 4 in "SO4\^2": write digits then a sign, such as SO4\^2-\.$/],
    ['a stray symbol', 'Ag%', /^Unexpected "%" at position 3 in "Ag%": use element symbols, counts, brackets/],
    ['a number that counts nothing', '½2H2O', /^Number at position 2 in "½2H2O" counts nothing/],
    ['something that is not text', 123 as unknown as string, 'formula must be text such as "AgNO3".'],
  ])('rejects %s (%s)', (_name, formula, message) => {
    expect(() => parseFormula(formula)).toThrow(message);
    expect(caught(() => molarMass(formula))).toMatchObject({ name: 'UnitsInputError', field: 'formula' });
    expect(caught(() => formulaCharge(formula))).toBeInstanceOf(UnitsInputError);
  });
});
