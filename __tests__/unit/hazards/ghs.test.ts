// GHS statements and pictograms, the reagent table, and the recognition of reagents, cyanide
// formulas and acids from what a chemist types.
import {
  GHS_STATEMENTS,
  REAGENT_SOURCE,
  REAGENTS,
  STATEMENT_PICTOGRAM,
  cyanideGroups,
  ghsStatements,
  isAcidReagent,
  isCyanideFormula,
  isCyanideReagent,
  isSilverReagent,
  isThiosulfateReagent,
  pictogramsFor,
  recogniseReagent,
  type GhsCode,
} from '@/lib/hazards';

describe('GHS statements', () => {
  // Standard English wording of the GHS hazard statements (UN GHS Annex 3; EUH032 from the EU CLP
  // supplemental list), from memory.
  it.each<[GhsCode, string, string | null]>([
    ['H224', 'Extremely flammable liquid and vapour.', 'GHS02'],
    ['H272', 'May intensify fire; oxidiser.', 'GHS03'],
    ['H280', 'Contains gas under pressure; may explode if heated.', 'GHS04'],
    ['H290', 'May be corrosive to metals.', 'GHS05'],
    ['H300', 'Fatal if swallowed.', 'GHS06'],
    ['H301', 'Toxic if swallowed.', 'GHS06'],
    ['H310', 'Fatal in contact with skin.', 'GHS06'],
    ['H311', 'Toxic in contact with skin.', 'GHS06'],
    ['H314', 'Causes severe skin burns and eye damage.', 'GHS05'],
    ['H330', 'Fatal if inhaled.', 'GHS06'],
    ['H331', 'Toxic if inhaled.', 'GHS06'],
    ['H335', 'May cause respiratory irritation.', 'GHS07'],
    ['H372', 'Causes damage to organs through prolonged or repeated exposure.', 'GHS08'],
    ['H400', 'Very toxic to aquatic life.', 'GHS09'],
    ['H410', 'Very toxic to aquatic life with long lasting effects.', 'GHS09'],
    ['EUH032', 'Contact with acids liberates very toxic gas.', null],
  ])('%s: "%s", pictogram %s (UN GHS, from memory)', (code, text, pictogram) => {
    expect(GHS_STATEMENTS[code]).toBe(text);
    expect(STATEMENT_PICTOGRAM[code]).toBe(pictogram);
  });

  it('lists statements once each in code order, EUH last', () => {
    expect(ghsStatements(['EUH032', 'H410', 'H300', 'H300']).map((s) => s.code)).toEqual(['H300', 'H410', 'EUH032']);
  });

  it('gives pictograms in GHS order, GHS06 displacing GHS07 (GHS precedence rule, from memory)', () => {
    expect(pictogramsFor(['H410', 'H300', 'EUH032'])).toEqual(['GHS06', 'GHS09']);
    expect(pictogramsFor(['H314', 'H335', 'H400'])).toEqual(['GHS05', 'GHS07', 'GHS09']);
    expect(pictogramsFor(['H335', 'H331'])).toEqual(['GHS06']);
  });
});

describe('reagent table', () => {
  // Classifications from memory, typical supplier SDS; check the SDS you hold.
  it.each<[string, string, GhsCode[]]>([
    ['NaCN', 'NaCN', ['H290', 'H300', 'H310', 'H330', 'H372', 'H410', 'EUH032']],
    ['KCN', 'KCN', ['H290', 'H300', 'H310', 'H330', 'H372', 'H410', 'EUH032']],
    ['CuCN', 'CuCN', ['H300', 'H310', 'H330', 'H410', 'EUH032']],
    ['Zn(CN)2', 'Zn(CN)2', ['H300', 'H310', 'H330', 'H410', 'EUH032']],
    ['K[Ag(CN)2]', 'K[Ag(CN)2]', ['H300', 'H310', 'H330', 'H410', 'EUH032']],
    ['KAu(CN)2', 'K[Au(CN)2]', ['H300', 'H310', 'H330', 'H410', 'EUH032']],
    ['HCN gas', 'HCN', ['H224', 'H300', 'H310', 'H330', 'H410']],
    ['AgNO3', 'AgNO3', ['H272', 'H290', 'H314', 'H410']],
    ['aqueous ammonia', 'aqueous ammonia', ['H314', 'H335', 'H400']],
    ['SO2', 'SO2', ['H280', 'H314', 'H331']],
    ['H2SO4', 'H2SO4', ['H290', 'H314']],
    ['HCl', 'HCl', ['H290', 'H314', 'H335']],
    ['NaOH', 'NaOH', ['H290', 'H314']],
    ['sodium thiosulfate (not classified)', 'Na2S2O3', []],
    ['ammonium thiosulfate (not classified)', '(NH4)2S2O3', []],
  ])('%s carries %j', (name, label, codes) => {
    const r = recogniseReagent(name);
    expect(r?.label).toBe(label);
    expect(ghsStatements(r?.codes ?? []).map((s) => s.code)).toEqual(codes);
    expect(r?.source).toBe('from memory, typical supplier SDS; check the SDS you hold');
  });

  it('labels every entry with its source', () => {
    for (const r of REAGENTS) expect(r.source).toBe(REAGENT_SOURCE);
  });
});

describe('recogniseReagent', () => {
  it.each<[string, string | null]>([
    ['sodium cyanide', 'NaCN'],
    ['Sodium Cyanide, 98 %', 'NaCN'],
    ['nacn', 'NaCN'],
    ['potassium cyanide', 'KCN'],
    ['potassium gold cyanide', 'K[Au(CN)2]'],
    ['PGC', 'K[Au(CN)2]'],
    ['K[Au(CN)2]', 'K[Au(CN)2]'],
    ['KAu(CN)2', 'K[Au(CN)2]'],
    ['potassium silver cyanide', 'K[Ag(CN)2]'],
    ['KAg(CN)2', 'K[Ag(CN)2]'],
    ['cuprous cyanide', 'CuCN'],
    ['hypo', 'Na2S2O3'],
    ['Na2S2O3·5H2O', 'Na2S2O3'],
    ['ammonium thiosulfate', '(NH4)2S2O3'],
    ['aqueous ammonia', 'aqueous ammonia'],
    ['ammonium hydroxide', 'aqueous ammonia'],
    ['NH3', 'aqueous ammonia'],
    ['hydrochloric acid', 'HCl'],
    ['HCl 37 %', 'HCl'],
    ['muriatic acid', 'HCl'],
    ['sulphuric acid', 'H2SO4'],
    ['caustic soda', 'NaOH'],
    ['silver nitrate', 'AgNO3'],
    ['hydrogen cyanide', 'HCN'],
    ['sodium hypochlorite', null],
    ['Ag(NH3)2+', null],
    ['', null],
  ])('%j is %j', (text, label) => {
    expect(recogniseReagent(text)?.label ?? null).toBe(label);
  });

  it('takes anything without throwing', () => {
    for (const v of [null, undefined, 42, {}, []]) expect(recogniseReagent(v)).toBeNull();
  });
});

describe('isCyanideFormula', () => {
  it.each<[string, boolean, number]>([
    ['CN-', true, 1],
    ['HCN', true, 1],
    ['Ag(CN)2-', true, 2],
    ['NaCN', true, 1],
    ['Cu(CN)3-2', true, 3],
    ['K[Au(CN)2]', true, 2],
    ['Zn(CN)4-2', true, 4],
    ['K3[Fe(CN)6]', true, 6],
    // Thiocyanate and cyanate are not cyanide.
    ['SCN-', false, 0],
    ['AgSCN(s)', false, 0],
    ['KSCN', false, 0],
    ['Ag(SCN)2-', false, 0],
    ['OCN-', false, 0],
    ['Ag+', false, 0],
    ['S2O3-2', false, 0],
  ])('%s: cyanide %s, %d groups', (formula, cyanide, groups) => {
    expect(isCyanideFormula(formula)).toBe(cyanide);
    expect(cyanideGroups(formula)).toBe(groups);
  });
});

describe('isAcidReagent', () => {
  it.each<[string, string, Record<string, number> | undefined, boolean]>([
    ['HCl by formula', 'HCl', undefined, true],
    ['H2SO4', 'H2SO4', undefined, true],
    ['HNO3', 'HNO3', undefined, true],
    ['nitric acid ("acid" in the name)', 'nitric acid', undefined, true],
    ['acetic', 'glacial acetic', undefined, true],
    ['citric', 'citric acid', undefined, true],
    ['sulfamic', 'sulfamic', undefined, true],
    ['sodium bisulfate', 'sodium bisulfate', undefined, true],
    ['NaHSO4', 'NaHSO4', undefined, true],
    ['an unnamed reagent bringing H+', 'bath additive 7', { 'H+': 1 }, true],
    ['NaOH (takes H+ away)', 'NaOH', { 'H+': -1 }, false],
    ['NaCN', 'NaCN', { 'Na+': 1, 'CN-': 1 }, false],
    ['aqueous ammonia', 'aqueous ammonia', { NH3: 1 }, false],
    ['sodium thiosulfate', 'sodium thiosulfate', undefined, false],
  ])('%s: %s', (_case, name, stoich, acid) => {
    expect(isAcidReagent(name, stoich)).toBe(acid);
  });
});

describe('reagent kinds', () => {
  it('recognises cyanide, silver and thiosulfate reagents by name or formula', () => {
    expect(['NaCN', 'AgCN(s)', 'copper cyanide', 'Ag(CN)2-'].every(isCyanideReagent)).toBe(true);
    expect(['KSCN', 'sodium thiocyanate', 'AgBr(s)'].some(isCyanideReagent)).toBe(false);
    expect(['AgNO3', 'AgBr(s)', 'silver chloride', 'K[Ag(CN)2]'].every(isSilverReagent)).toBe(true);
    expect(['agar', 'MgSO4', 'NaCN'].some(isSilverReagent)).toBe(false);
    expect(['hypo', 'Na2S2O3', 'ammonium thiosulphate'].every(isThiosulfateReagent)).toBe(true);
    expect(isThiosulfateReagent('Na2SO3')).toBe(false);
  });
});
