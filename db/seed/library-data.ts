// The reviewed starting library: the species catalogue and the equilibrium constants the demo
// shop starts with, as data. The seed writes these as approved constants proposed by no one.
//
// Conventions (checked by __tests__/unit/library/seed-data.test.ts):
// - Basis species (metal, ligand, proton, water, counter_ion) are the building blocks. Every
//   other species (complex or solid) is defined by exactly one constant.
// - Formation constants are cumulative (log beta_n from the free metal ion and n ligands).
// - Hydroxide is the complex OH-, defined by "H+ + OH- = H2O" (log K = pKw). Hydroxo complexes and
//   hydroxide solids are written with OH-, as handbooks print them; values from Baes & Mesmer
//   (printed as hydrolysis with loss of H+) are converted with log Kw = 14.00.
// - 25 C and I → 0 unless the medium says otherwise.
// - Every value below was written from memory of the named compilation, and its source says so.
//   A reviewer who checks a value against the printed table should revise it with the page.
//
// Left out on purpose: copper(II) with cyanide, thiosulfate or thiocyanate (copper(II) oxidises
// them and ends as copper(I)); Cd(CN)2(s), whose solubility product is not well established; the
// aqueous Zn(CN)2 complex (its formula is the salt shops buy, and beta3 and beta4 carry a bath).
import type { ConstantKind, SpeciesRole } from '@/shared/constants';

export type SeedSpecies = { formula: string; name: string; role: SpeciesRole; aliases?: string[] };
export type SeedConstant = {
  kind: ConstantKind;
  reaction: string;
  logValue: number;
  uncertainty?: number | null;
  temperatureC: number;
  ionicStrength: number;
  medium: string;
  enthalpyKjMol?: number | null;
  source: string;
  note?: string;
};

// ---------------------------------------------------------------------------------------------
// Species
// ---------------------------------------------------------------------------------------------

function sp(formula: string, name: string, role: SpeciesRole, aliases?: string[]): SeedSpecies {
  return aliases ? { formula, name, role, aliases } : { formula, name, role };
}

const BASIS_SPECIES: SeedSpecies[] = [
  sp('H2O', 'water', 'water'),
  sp('H+', 'hydrogen ion', 'proton', ['proton', 'hydronium']),
  // Metal ions
  sp('Ag+', 'silver(I) ion', 'metal', ['silver ion']),
  sp('Cu+', 'copper(I) ion', 'metal', ['cuprous ion']),
  sp('Cu+2', 'copper(II) ion', 'metal', ['cupric ion']),
  sp('Au+', 'gold(I) ion', 'metal', ['aurous ion']),
  sp('Zn+2', 'zinc(II) ion', 'metal', ['zinc ion']),
  sp('Cd+2', 'cadmium(II) ion', 'metal', ['cadmium ion']),
  sp('Ni+2', 'nickel(II) ion', 'metal', ['nickel ion']),
  sp('Pb+2', 'lead(II) ion', 'metal', ['lead ion', 'plumbous ion']),
  // Ligands
  sp('NH3', 'ammonia', 'ligand', ['aqua ammonia', 'ammonium hydroxide', 'ammonia solution']),
  sp('CN-', 'cyanide', 'ligand'),
  sp('S2O3-2', 'thiosulfate', 'ligand', ['thiosulphate']),
  sp('SCN-', 'thiocyanate', 'ligand', ['sulfocyanide', 'rhodanide']),
  sp('Cl-', 'chloride', 'ligand'),
  sp('Br-', 'bromide', 'ligand'),
  sp('I-', 'iodide', 'ligand'),
  sp('S-2', 'sulfide', 'ligand', ['sulphide']),
  sp('CO3-2', 'carbonate', 'ligand'),
  // Counter-ions
  sp('Na+', 'sodium ion', 'counter_ion'),
  sp('K+', 'potassium ion', 'counter_ion'),
  sp('NO3-', 'nitrate', 'counter_ion'),
  sp('SO4-2', 'sulfate', 'counter_ion', ['sulphate']),
];

const PROTONATED_SPECIES: SeedSpecies[] = [
  sp('OH-', 'hydroxide', 'complex'),
  sp('NH4+', 'ammonium', 'complex'),
  sp('HCN', 'hydrogen cyanide', 'complex', ['hydrocyanic acid']),
  sp('HS2O3-', 'hydrogen thiosulfate', 'complex'),
  sp('HSCN', 'thiocyanic acid', 'complex'),
  sp('HS-', 'hydrogen sulfide ion', 'complex', ['bisulfide']),
  sp('H2S', 'hydrogen sulfide', 'complex'),
  sp('HCO3-', 'hydrogen carbonate', 'complex', ['bicarbonate']),
  sp('H2CO3', 'carbonic acid (dissolved CO2 included)', 'complex', ['dissolved CO2']),
  sp('HSO4-', 'hydrogen sulfate', 'complex', ['bisulfate']),
];

const SILVER_COMPLEXES: SeedSpecies[] = [
  sp('Ag(NH3)+', 'amminesilver(I)', 'complex'),
  sp('Ag(NH3)2+', 'diamminesilver(I)', 'complex', ['silver diammine']),
  sp('Ag(CN)2-', 'dicyanoargentate(I)', 'complex', ['silver cyanide complex']),
  sp('Ag(CN)3-2', 'tricyanoargentate(I)', 'complex'),
  sp('Ag(CN)4-3', 'tetracyanoargentate(I)', 'complex'),
  sp('AgS2O3-', 'thiosulfatoargentate(I)', 'complex'),
  sp('Ag(S2O3)2-3', 'bis(thiosulfato)argentate(I)', 'complex', ['silver thiosulfate complex']),
  sp('AgSCN', 'silver thiocyanate (dissolved)', 'complex'),
  sp('Ag(SCN)2-', 'dithiocyanatoargentate(I)', 'complex'),
  sp('Ag(SCN)3-2', 'trithiocyanatoargentate(I)', 'complex'),
  sp('Ag(SCN)4-3', 'tetrathiocyanatoargentate(I)', 'complex'),
  sp('AgCl', 'silver chloride (dissolved)', 'complex'),
  sp('AgCl2-', 'dichloroargentate(I)', 'complex'),
  sp('AgCl3-2', 'trichloroargentate(I)', 'complex'),
  sp('AgBr', 'silver bromide (dissolved)', 'complex'),
  sp('AgBr2-', 'dibromoargentate(I)', 'complex'),
  sp('AgBr3-2', 'tribromoargentate(I)', 'complex'),
  sp('AgBr4-3', 'tetrabromoargentate(I)', 'complex'),
  sp('AgI', 'silver iodide (dissolved)', 'complex'),
  sp('AgI2-', 'diiodoargentate(I)', 'complex'),
  sp('AgI3-2', 'triiodoargentate(I)', 'complex'),
  sp('AgOH', 'silver hydroxide (dissolved)', 'complex'),
  sp('Ag(OH)2-', 'dihydroxoargentate(I)', 'complex'),
];

const COPPER_COMPLEXES: SeedSpecies[] = [
  sp('Cu(CN)2-', 'dicyanocuprate(I)', 'complex'),
  sp('Cu(CN)3-2', 'tricyanocuprate(I)', 'complex'),
  sp('Cu(CN)4-3', 'tetracyanocuprate(I)', 'complex'),
  sp('Cu(NH3)+', 'amminecopper(I)', 'complex'),
  sp('Cu(NH3)2+', 'diamminecopper(I)', 'complex'),
  sp('CuS2O3-', 'thiosulfatocuprate(I)', 'complex'),
  sp('Cu(S2O3)2-3', 'bis(thiosulfato)cuprate(I)', 'complex'),
  sp('Cu(S2O3)3-5', 'tris(thiosulfato)cuprate(I)', 'complex'),
  sp('CuCl2-', 'dichlorocuprate(I)', 'complex'),
  sp('CuCl3-2', 'trichlorocuprate(I)', 'complex'),
  sp('CuBr2-', 'dibromocuprate(I)', 'complex'),
  sp('CuI2-', 'diiodocuprate(I)', 'complex'),
  sp('Cu(NH3)+2', 'amminecopper(II)', 'complex'),
  sp('Cu(NH3)2+2', 'diamminecopper(II)', 'complex'),
  sp('Cu(NH3)3+2', 'triamminecopper(II)', 'complex'),
  sp('Cu(NH3)4+2', 'tetraamminecopper(II)', 'complex', ['copper tetrammine']),
  sp('CuOH+', 'hydroxocopper(II)', 'complex'),
  sp('Cu(OH)3-', 'trihydroxocuprate(II)', 'complex'),
  sp('Cu(OH)4-2', 'tetrahydroxocuprate(II)', 'complex'),
  sp('Cu2(OH)2+2', 'di-mu-hydroxodicopper(II)', 'complex'),
];

const GOLD_COMPLEXES: SeedSpecies[] = [
  sp('Au(CN)2-', 'dicyanoaurate(I)', 'complex', ['gold cyanide complex']),
  sp('Au(S2O3)2-3', 'bis(thiosulfato)aurate(I)', 'complex'),
];

const ZINC_COMPLEXES: SeedSpecies[] = [
  sp('Zn(CN)3-', 'tricyanozincate', 'complex'),
  sp('Zn(CN)4-2', 'tetracyanozincate', 'complex'),
  sp('Zn(NH3)+2', 'amminezinc(II)', 'complex'),
  sp('Zn(NH3)2+2', 'diamminezinc(II)', 'complex'),
  sp('Zn(NH3)3+2', 'triamminezinc(II)', 'complex'),
  sp('Zn(NH3)4+2', 'tetraamminezinc(II)', 'complex'),
  sp('ZnOH+', 'hydroxozinc(II)', 'complex'),
  sp('Zn(OH)2', 'zinc hydroxide (dissolved)', 'complex'),
  sp('Zn(OH)3-', 'trihydroxozincate', 'complex'),
  sp('Zn(OH)4-2', 'tetrahydroxozincate', 'complex', ['zincate']),
];

const CADMIUM_COMPLEXES: SeedSpecies[] = [
  sp('Cd(CN)+', 'cyanocadmium(II)', 'complex'),
  sp('Cd(CN)2', 'cadmium cyanide (dissolved)', 'complex'),
  sp('Cd(CN)3-', 'tricyanocadmate', 'complex'),
  sp('Cd(CN)4-2', 'tetracyanocadmate', 'complex'),
  sp('Cd(NH3)+2', 'amminecadmium(II)', 'complex'),
  sp('Cd(NH3)2+2', 'diamminecadmium(II)', 'complex'),
  sp('Cd(NH3)3+2', 'triamminecadmium(II)', 'complex'),
  sp('Cd(NH3)4+2', 'tetraamminecadmium(II)', 'complex'),
  sp('CdOH+', 'hydroxocadmium(II)', 'complex'),
  sp('Cd(OH)2', 'cadmium hydroxide (dissolved)', 'complex'),
  sp('Cd(OH)3-', 'trihydroxocadmate', 'complex'),
  sp('Cd(OH)4-2', 'tetrahydroxocadmate', 'complex'),
  sp('CdCl+', 'chlorocadmium(II)', 'complex'),
  sp('CdCl2', 'cadmium chloride (dissolved)', 'complex'),
];

const NICKEL_COMPLEXES: SeedSpecies[] = [
  sp('Ni(CN)4-2', 'tetracyanonickelate(II)', 'complex'),
  sp('Ni(NH3)+2', 'amminenickel(II)', 'complex'),
  sp('Ni(NH3)2+2', 'diamminenickel(II)', 'complex'),
  sp('Ni(NH3)3+2', 'triamminenickel(II)', 'complex'),
  sp('Ni(NH3)4+2', 'tetraamminenickel(II)', 'complex'),
  sp('Ni(NH3)5+2', 'pentaamminenickel(II)', 'complex'),
  sp('Ni(NH3)6+2', 'hexaamminenickel(II)', 'complex'),
  sp('NiOH+', 'hydroxonickel(II)', 'complex'),
];

const LEAD_COMPLEXES: SeedSpecies[] = [
  sp('PbOH+', 'hydroxolead(II)', 'complex'),
  sp('Pb(OH)2', 'lead hydroxide (dissolved)', 'complex'),
  sp('Pb(OH)3-', 'trihydroxoplumbate(II)', 'complex', ['plumbite']),
  sp('Pb3(OH)4+2', 'tetrahydroxotrilead(II)', 'complex'),
  sp('Pb4(OH)4+4', 'tetrahydroxotetralead(II)', 'complex'),
  sp('PbCl+', 'chlorolead(II)', 'complex'),
  sp('PbCl2', 'lead chloride (dissolved)', 'complex'),
  sp('PbI+', 'iodolead(II)', 'complex'),
  sp('PbI2', 'lead iodide (dissolved)', 'complex'),
  sp('PbI3-', 'triiodoplumbate(II)', 'complex'),
  sp('PbI4-2', 'tetraiodoplumbate(II)', 'complex'),
];

const SOLIDS: SeedSpecies[] = [
  sp('AgCl(s)', 'silver chloride', 'solid'),
  sp('AgBr(s)', 'silver bromide', 'solid'),
  sp('AgI(s)', 'silver iodide', 'solid'),
  sp('AgCN(s)', 'silver cyanide (solid)', 'solid'),
  sp('AgSCN(s)', 'silver thiocyanate', 'solid'),
  sp('Ag2S(s)', 'silver sulfide (acanthite)', 'solid'),
  sp('AgOH(s)', 'silver oxide, per silver (Ag2O as AgOH)', 'solid', ['Ag2O', 'silver oxide']),
  sp('CuCN(s)', 'copper(I) cyanide (solid)', 'solid'),
  sp('CuCl(s)', 'copper(I) chloride', 'solid', ['cuprous chloride']),
  sp('CuBr(s)', 'copper(I) bromide', 'solid', ['cuprous bromide']),
  sp('CuI(s)', 'copper(I) iodide', 'solid', ['cuprous iodide']),
  sp('CuSCN(s)', 'copper(I) thiocyanate', 'solid', ['cuprous thiocyanate']),
  sp('Cu(OH)2(s)', 'copper(II) hydroxide', 'solid', ['cupric hydroxide']),
  sp('Zn(CN)2(s)', 'zinc cyanide (solid)', 'solid'),
  sp('Zn(OH)2(s)', 'zinc hydroxide', 'solid'),
  sp('Cd(OH)2(s)', 'cadmium hydroxide', 'solid'),
  sp('Ni(OH)2(s)', 'nickel(II) hydroxide', 'solid'),
  sp('Pb(OH)2(s)', 'lead(II) hydroxide / oxide (PbO as Pb(OH)2)', 'solid', ['PbO', 'litharge']),
  sp('PbCl2(s)', 'lead(II) chloride', 'solid'),
  sp('PbBr2(s)', 'lead(II) bromide', 'solid'),
  sp('PbI2(s)', 'lead(II) iodide', 'solid'),
  sp('PbSO4(s)', 'lead(II) sulfate', 'solid', ['anglesite']),
];

// Salts shops buy. They need no constants: the system builder turns them into their ions.
const SALTS: SeedSpecies[] = [
  sp('NaCN', 'sodium cyanide', 'salt'),
  sp('KCN', 'potassium cyanide', 'salt'),
  sp('AgCN', 'silver cyanide', 'salt'),
  sp('AgNO3', 'silver nitrate', 'salt', ['lunar caustic']),
  sp('K[Ag(CN)2]', 'potassium silver cyanide', 'salt', ['potassium dicyanoargentate', 'KAg(CN)2']),
  sp('K[Au(CN)2]', 'potassium gold cyanide', 'salt', ['potassium dicyanoaurate', 'PGC', 'KAu(CN)2']),
  sp('CuCN', 'copper(I) cyanide', 'salt', ['cuprous cyanide']),
  sp('Zn(CN)2', 'zinc cyanide', 'salt'),
  sp('CdO', 'cadmium oxide', 'salt'),
  sp('Na2S2O3·5H2O', 'sodium thiosulfate pentahydrate', 'salt', ['hypo', 'sodium hyposulfite']),
  sp('Na2S2O3', 'sodium thiosulfate, anhydrous', 'salt'),
  sp('(NH4)2S2O3', 'ammonium thiosulfate', 'salt', ['rapid fixer salt']),
  sp('NaOH', 'sodium hydroxide', 'salt', ['caustic soda', 'lye']),
  sp('KOH', 'potassium hydroxide', 'salt', ['caustic potash']),
  sp('Na2CO3', 'sodium carbonate', 'salt', ['soda ash', 'washing soda (anhydrous)']),
  sp('K2CO3', 'potassium carbonate', 'salt', ['potash']),
  sp('CuSO4·5H2O', 'copper(II) sulfate pentahydrate', 'salt', ['blue vitriol', 'bluestone']),
  sp('Cu(NO3)2·3H2O', 'copper(II) nitrate trihydrate', 'salt'),
  sp('ZnO', 'zinc oxide', 'salt'),
  sp('NiSO4·6H2O', 'nickel(II) sulfate hexahydrate', 'salt', ['nickel sulfate']),
  sp('NiCl2·6H2O', 'nickel(II) chloride hexahydrate', 'salt', ['nickel chloride']),
  sp('Pb(NO3)2', 'lead(II) nitrate', 'salt'),
  sp('Na2S·9H2O', 'sodium sulfide nonahydrate', 'salt', ['sodium sulfide']),
  sp('NaCl', 'sodium chloride', 'salt', ['salt', 'common salt']),
  sp('KBr', 'potassium bromide', 'salt'),
  sp('KI', 'potassium iodide', 'salt'),
  sp('KSCN', 'potassium thiocyanate', 'salt', ['potassium sulfocyanide']),
  sp('NH4SCN', 'ammonium thiocyanate', 'salt'),
  sp('NH4Cl', 'ammonium chloride', 'salt', ['sal ammoniac']),
  sp('(NH4)2SO4', 'ammonium sulfate', 'salt'),
];

export const SEED_SPECIES: readonly SeedSpecies[] = [
  ...BASIS_SPECIES,
  ...PROTONATED_SPECIES,
  ...SILVER_COMPLEXES,
  ...COPPER_COMPLEXES,
  ...GOLD_COMPLEXES,
  ...ZINC_COMPLEXES,
  ...CADMIUM_COMPLEXES,
  ...NICKEL_COMPLEXES,
  ...LEAD_COMPLEXES,
  ...SOLIDS,
  ...SALTS,
];

// ---------------------------------------------------------------------------------------------
// Sources (every one written from memory of the named table)
// ---------------------------------------------------------------------------------------------

const SM = 'Smith & Martell, Critical Stability Constants (from memory)';
const NIST = 'NIST Critically Selected Stability Constants of Metal Complexes, SRD 46 (from memory)';
const LANGE = "Lange's Handbook of Chemistry, table of cumulative formation constants (from memory)";
const CRC_KSP = 'CRC Handbook of Chemistry and Physics, Solubility product constants table (from memory)';
const CRC_KW = 'CRC Handbook of Chemistry and Physics, Ion product of water table (pKw 13.995 at 25 C; from memory)';
const CRC_ACIDS = 'CRC Handbook of Chemistry and Physics, Dissociation constants of inorganic acids and bases (from memory)';
const BAES = 'Baes & Mesmer, The Hydrolysis of Cations, 1976, converted to OH- with log Kw 14.00 (from memory)';
const HSCN_RANGE =
  "Range of values printed in Lange's Handbook of Chemistry and the CRC Handbook of Chemistry and Physics acid dissociation tables (from memory)";

const NBS_ENTHALPY = 'Enthalpy of dissolution from the NBS Tables (Wagman et al., 1982) enthalpies of formation (from memory).';

const I0 = 'I → 0 (extrapolated)';

/** Optional fields of a constant. */
type Extra = { uncertainty?: number | null; enthalpyKjMol?: number | null; note?: string };

function constant(kind: ConstantKind, reaction: string, logValue: number, source: string, extra: Extra): SeedConstant {
  const c: SeedConstant = {
    kind,
    reaction,
    logValue,
    uncertainty: extra.uncertainty ?? null,
    temperatureC: 25,
    ionicStrength: 0,
    medium: I0,
    enthalpyKjMol: extra.enthalpyKjMol ?? null,
    source,
  };
  if (extra.note) c.note = extra.note;
  return c;
}

/** A cumulative formation constant, log beta_n. */
function beta(reaction: string, logValue: number, source: string, extra: Extra = {}): SeedConstant {
  return constant('cumulative_formation', reaction, logValue, source, extra);
}

/** A protonation constant, log K(H) = pKa of the acid formed. */
function protonation(reaction: string, logValue: number, source: string, extra: Extra = {}): SeedConstant {
  return constant('protonation', reaction, logValue, source, extra);
}

/** A solubility product, log Ksp, for the solid dissolving into its ions. */
function ksp(reaction: string, logValue: number, source: string, extra: Extra = {}): SeedConstant {
  return constant('solubility_product', reaction, logValue, source, extra);
}

// ---------------------------------------------------------------------------------------------
// Constants
// ---------------------------------------------------------------------------------------------

const PROTONATION: SeedConstant[] = [
  protonation('H+ + OH- = H2O', 14.0, CRC_KW, {
    uncertainty: 0.01,
    enthalpyKjMol: -55.8,
    note: 'The ion product of water written as protonation of hydroxide: log K = pKw. Defines OH-.',
  }),
  protonation('H+ + NH3 = NH4+', 9.25, SM, { uncertainty: 0.01, enthalpyKjMol: -52.2 }),
  protonation('H+ + CN- = HCN', 9.21, SM, { uncertainty: 0.02, enthalpyKjMol: -43.6 }),
  protonation('H+ + S2O3-2 = HS2O3-', 1.6, SM, {
    uncertainty: 0.2,
    note: 'Second dissociation of thiosulfuric acid. H2S2O3 (pKa about 0.6) is left out: thiosulfate decomposes to sulfur and SO2 in acid, so nothing below pH 3 is at equilibrium anyway.',
  }),
  protonation('H+ + SCN- = HSCN', -1.3, HSCN_RANGE, {
    uncertainty: 1.0,
    note: 'Thiocyanic acid is a strong acid: reported pKa values run from about -1.8 to +0.9. Mid-range value; HSCN is negligible above pH 2 whichever is right.',
  }),
  protonation('H+ + S-2 = HS-', 19.0, CRC_ACIDS, {
    uncertainty: 1.0,
    note: 'pKa2 of H2S is poorly known: older tables print 12.9 to 14, newer work 17 to 19. Sulfide is HS- at any bath pH either way. Ag2S(s) below is written to match this value, so change them together.',
  }),
  protonation('H+ + HS- = H2S', 7.02, SM, { uncertainty: 0.03, note: 'CRC prints pKa1 7.05.' }),
  protonation('H+ + CO3-2 = HCO3-', 10.33, SM, { uncertainty: 0.01, enthalpyKjMol: -14.9 }),
  protonation('H+ + HCO3- = H2CO3', 6.35, SM, {
    uncertainty: 0.01,
    enthalpyKjMol: -9.2,
    note: 'H2CO3 stands for all dissolved CO2 (CO2(aq) + H2CO3), the usual analytical convention.',
  }),
  protonation('H+ + SO4-2 = HSO4-', 1.99, SM, { uncertainty: 0.02 }),
];

const SILVER: SeedConstant[] = [
  beta('Ag+ + NH3 = Ag(NH3)+', 3.31, SM, { uncertainty: 0.05 }),
  beta('Ag+ + 2 NH3 = Ag(NH3)2+', 7.22, SM, { uncertainty: 0.05, note: "Lange's prints log beta1 3.24, log beta2 7.05." }),
  beta('Ag+ + 2 CN- = Ag(CN)2-', 20.48, SM, { uncertainty: 0.2 }),
  beta('Ag+ + 3 CN- = Ag(CN)3-2', 21.4, SM, { uncertainty: 0.2 }),
  beta('Ag+ + 4 CN- = Ag(CN)4-3', 20.8, SM, {
    uncertainty: 0.5,
    note: 'Less well known than beta2 and beta3; matters only at high free cyanide (above about 1 M).',
  }),
  beta('Ag+ + S2O3-2 = AgS2O3-', 8.82, SM, { uncertainty: 0.1 }),
  beta('Ag+ + 2 S2O3-2 = Ag(S2O3)2-3', 13.46, SM, {
    uncertainty: 0.1,
    note: 'Ag(S2O3)3-5 (log beta3 about 14) is reported for concentrated fixers but is not seeded.',
  }),
  beta('Ag+ + SCN- = AgSCN', 4.8, SM, { uncertainty: 0.2 }),
  beta('Ag+ + 2 SCN- = Ag(SCN)2-', 8.23, SM, { uncertainty: 0.2 }),
  beta('Ag+ + 3 SCN- = Ag(SCN)3-2', 9.45, SM, { uncertainty: 0.3 }),
  beta('Ag+ + 4 SCN- = Ag(SCN)4-3', 9.67, SM, { uncertainty: 0.3 }),
  beta('Ag+ + Cl- = AgCl', 3.31, SM, {
    uncertainty: 0.1,
    note: "Lange's prints 3.04 and 5.04 for beta1 and beta2; the I → 0 values are 3.3 and 5.25. The earlier reference set used 3.04 and 5.04 under a Smith & Martell label.",
  }),
  beta('Ag+ + 2 Cl- = AgCl2-', 5.25, SM, { uncertainty: 0.1 }),
  beta('Ag+ + 3 Cl- = AgCl3-2', 5.2, SM, { uncertainty: 0.4, note: 'Less well known; matters in strong chloride (brine) only.' }),
  beta('Ag+ + Br- = AgBr', 4.38, LANGE, { uncertainty: 0.2 }),
  beta('Ag+ + 2 Br- = AgBr2-', 7.34, LANGE, { uncertainty: 0.2 }),
  beta('Ag+ + 3 Br- = AgBr3-2', 8.0, LANGE, { uncertainty: 0.3 }),
  beta('Ag+ + 4 Br- = AgBr4-3', 8.73, LANGE, { uncertainty: 0.3 }),
  beta('Ag+ + I- = AgI', 6.58, LANGE, { uncertainty: 0.3 }),
  beta('Ag+ + 2 I- = AgI2-', 11.74, LANGE, { uncertainty: 0.3 }),
  beta('Ag+ + 3 I- = AgI3-2', 13.68, LANGE, { uncertainty: 0.3 }),
  beta('Ag+ + OH- = AgOH', 2.0, BAES, { uncertainty: 0.3, note: 'Printed as log *K -12.0 for Ag+ + H2O = AgOH + H+.' }),
  beta('Ag+ + 2 OH- = Ag(OH)2-', 4.0, BAES, { uncertainty: 0.3, note: 'Printed as log *beta2 -24.0.' }),
];

const SILVER_SOLIDS: SeedConstant[] = [
  ksp('AgCl(s) = Ag+ + Cl-', -9.74, SM, { uncertainty: 0.02, enthalpyKjMol: 65.5, note: NBS_ENTHALPY }),
  ksp('AgBr(s) = Ag+ + Br-', -12.3, SM, { uncertainty: 0.03, enthalpyKjMol: 84.4, note: NBS_ENTHALPY }),
  ksp('AgI(s) = Ag+ + I-', -16.08, SM, { uncertainty: 0.03, enthalpyKjMol: 112.2, note: NBS_ENTHALPY }),
  ksp('AgCN(s) = Ag+ + CN-', -15.66, SM, {
    uncertainty: 0.5,
    note: 'Tables disagree: many print 2.2e-16 (-15.66), the CRC table and the NBS Gibbs energies give about -16.2. The earlier reference set had -15.74.',
  }),
  ksp('AgSCN(s) = Ag+ + SCN-', -11.97, SM, { uncertainty: 0.05 }),
  ksp(
    'Ag2S(s) = 2 Ag+ + S-2',
    -55.3,
    'Derived: NBS Tables (Wagman et al., 1982) Gibbs energies give Ag2S(s) + H+ = 2 Ag+ + HS-, log K -36.3, combined with log K 19.0 for H+ + S-2 = HS- (from memory)',
    {
      uncertainty: 1.0,
      note: 'Poorly known as written, because pKa2 of H2S is. Tables that print -49 to -50 pair it with pKa2 near 13; what is well known is the value through HS- (-36.3). Revise together with H+ + S-2 = HS-.',
    },
  ),
  ksp('AgOH(s) = Ag+ + OH-', -7.71, BAES, {
    uncertainty: 0.1,
    note: 'Silver oxide: 1/2 Ag2O(s) + 1/2 H2O = Ag+ + OH-. Printed as log *K 6.29 for 1/2 Ag2O + H+ = Ag+ + 1/2 H2O. Written per silver because a solubility product has one solid and nothing else on the left.',
  }),
];

const COPPER_I: SeedConstant[] = [
  beta('Cu+ + 2 CN- = Cu(CN)2-', 24.0, SM, { uncertainty: 0.3 }),
  beta('Cu+ + 3 CN- = Cu(CN)3-2', 28.59, SM, { uncertainty: 0.2 }),
  beta('Cu+ + 4 CN- = Cu(CN)4-3', 30.3, SM, { uncertainty: 0.2 }),
  beta('Cu+ + NH3 = Cu(NH3)+', 5.93, LANGE, { uncertainty: 0.3, note: 'Ionic medium of the measurement not recalled.' }),
  beta('Cu+ + 2 NH3 = Cu(NH3)2+', 10.86, LANGE, { uncertainty: 0.3, note: 'Ionic medium of the measurement not recalled.' }),
  beta('Cu+ + S2O3-2 = CuS2O3-', 10.35, LANGE, { uncertainty: 0.3 }),
  beta('Cu+ + 2 S2O3-2 = Cu(S2O3)2-3', 12.27, LANGE, { uncertainty: 0.3 }),
  beta('Cu+ + 3 S2O3-2 = Cu(S2O3)3-5', 13.71, LANGE, { uncertainty: 0.3 }),
  beta('Cu+ + 2 Cl- = CuCl2-', 5.5, SM, { uncertainty: 0.2 }),
  beta('Cu+ + 3 Cl- = CuCl3-2', 5.7, SM, { uncertainty: 0.3 }),
  beta('Cu+ + 2 Br- = CuBr2-', 5.89, LANGE, { uncertainty: 0.3 }),
  beta('Cu+ + 2 I- = CuI2-', 8.85, LANGE, { uncertainty: 0.3 }),
];

const COPPER_I_SOLIDS: SeedConstant[] = [
  ksp('CuCN(s) = Cu+ + CN-', -19.46, CRC_KSP, { uncertainty: 0.3, note: 'CRC prints Ksp 3.47e-20.' }),
  ksp('CuCl(s) = Cu+ + Cl-', -6.76, CRC_KSP, { uncertainty: 0.1, note: 'CRC prints Ksp 1.72e-7.' }),
  ksp('CuBr(s) = Cu+ + Br-', -8.2, CRC_KSP, { uncertainty: 0.1, note: 'CRC prints Ksp 6.27e-9.' }),
  ksp('CuI(s) = Cu+ + I-', -11.9, CRC_KSP, { uncertainty: 0.1, note: 'CRC prints Ksp 1.27e-12.' }),
  ksp('CuSCN(s) = Cu+ + SCN-', -12.75, CRC_KSP, {
    uncertainty: 0.7,
    note: 'CRC prints Ksp 1.77e-13; older tables print about 4.8e-15 (-14.3). Poorly agreed.',
  }),
];

const COPPER_II: SeedConstant[] = [
  beta('Cu+2 + NH3 = Cu(NH3)+2', 4.04, SM, { uncertainty: 0.05 }),
  beta('Cu+2 + 2 NH3 = Cu(NH3)2+2', 7.47, SM, { uncertainty: 0.1 }),
  beta('Cu+2 + 3 NH3 = Cu(NH3)3+2', 10.27, SM, { uncertainty: 0.1 }),
  beta('Cu+2 + 4 NH3 = Cu(NH3)4+2', 11.75, SM, {
    uncertainty: 0.3,
    note: 'The I → 0 chain: log K1..K4 = 4.04, 3.43, 2.80, 1.48, so log beta4 = 11.75. Textbooks often print log beta4 about 13.1 to 13.3: that is the value measured in 2 M NH4NO3 (Bjerrum), not at I → 0. Seeded at I → 0 to match the rest of the library; a medium-specific version can be proposed for concentrated ammoniacal etchants.',
  }),
  beta('Cu+2 + OH- = CuOH+', 6.0, BAES, { uncertainty: 0.2, note: 'Printed as log *K -8.0.' }),
  beta('Cu+2 + 3 OH- = Cu(OH)3-', 15.1, BAES, { uncertainty: 0.5, note: 'Printed as log *beta3 -26.9.' }),
  beta('Cu+2 + 4 OH- = Cu(OH)4-2', 16.4, BAES, { uncertainty: 0.5, note: 'Printed as log *beta4 -39.6.' }),
  beta('2 Cu+2 + 2 OH- = Cu2(OH)2+2', 17.64, BAES, { uncertainty: 0.2, note: 'Printed as log *beta22 -10.36.' }),
  ksp('Cu(OH)2(s) = Cu+2 + 2 OH-', -19.36, BAES, {
    uncertainty: 0.2,
    note: 'Printed as log *Ks 8.64 for Cu(OH)2 + 2 H+. The CRC table prints 2.2e-20 (-19.66); aged CuO (tenorite) is less soluble (about -20.4).',
  }),
];

const GOLD: SeedConstant[] = [
  beta('Au+ + 2 CN- = Au(CN)2-', 38.3, NIST, {
    uncertainty: 1.0,
    note: 'An estimate of order 10^38 to 10^39, derived from electrode potentials (free Au+ is not stable in water). Every table value depends on the E° chosen for Au+/Au.',
  }),
  beta('Au+ + 2 S2O3-2 = Au(S2O3)2-3', 26.0, NIST, {
    uncertainty: 1.5,
    note: 'Derived from electrode potentials, like Au(CN)2-; reported values run from 26 to 28.7 depending on the E° used for Au+/Au. Keep it consistent with Au(CN)2-: the difference (about 12.5 log units) is better known than either.',
  }),
];

const ZINC: SeedConstant[] = [
  beta('Zn+2 + 3 CN- = Zn(CN)3-', 16.05, SM, { uncertainty: 0.3 }),
  beta('Zn+2 + 4 CN- = Zn(CN)4-2', 19.62, SM, { uncertainty: 0.3, note: "Lange's prints 16.7 (an older value)." }),
  beta('Zn+2 + NH3 = Zn(NH3)+2', 2.21, SM, { uncertainty: 0.1 }),
  beta('Zn+2 + 2 NH3 = Zn(NH3)2+2', 4.5, SM, { uncertainty: 0.1 }),
  beta('Zn+2 + 3 NH3 = Zn(NH3)3+2', 6.86, SM, { uncertainty: 0.2 }),
  beta('Zn+2 + 4 NH3 = Zn(NH3)4+2', 8.89, SM, {
    uncertainty: 0.2,
    note: 'I → 0. Tables also print 9.06, and 9.46 for 2 M NH4NO3.',
  }),
  beta('Zn+2 + OH- = ZnOH+', 5.04, BAES, { uncertainty: 0.2, note: 'Printed as log *K -8.96.' }),
  beta('Zn+2 + 2 OH- = Zn(OH)2', 11.1, BAES, { uncertainty: 0.5, note: 'Printed as log *beta2 -16.9.' }),
  beta('Zn+2 + 3 OH- = Zn(OH)3-', 13.6, BAES, { uncertainty: 0.3, note: 'Printed as log *beta3 -28.4.' }),
  beta('Zn+2 + 4 OH- = Zn(OH)4-2', 14.8, BAES, { uncertainty: 0.3, note: 'Printed as log *beta4 -41.2.' }),
  ksp('Zn(CN)2(s) = Zn+2 + 2 CN-', -15.5, CRC_KSP, {
    uncertainty: 1.0,
    note: "Poorly agreed: Lange's prints pKsp 12.59. Kept from the earlier reference set.",
  }),
  ksp('Zn(OH)2(s) = Zn+2 + 2 OH-', -16.5, BAES, {
    uncertainty: 0.3,
    note: 'Printed as log *Ks about 11.5 for Zn(OH)2 + 2 H+; fresh amorphous precipitate is more soluble (about -15.5), ZnO slightly less.',
  }),
];

const CADMIUM: SeedConstant[] = [
  beta('Cd+2 + CN- = Cd(CN)+', 5.48, SM, { uncertainty: 0.2 }),
  beta('Cd+2 + 2 CN- = Cd(CN)2', 10.6, SM, { uncertainty: 0.2 }),
  beta('Cd+2 + 3 CN- = Cd(CN)3-', 15.23, SM, { uncertainty: 0.2 }),
  beta('Cd+2 + 4 CN- = Cd(CN)4-2', 18.78, SM, { uncertainty: 0.2 }),
  beta('Cd+2 + NH3 = Cd(NH3)+2', 2.55, SM, { uncertainty: 0.1 }),
  beta('Cd+2 + 2 NH3 = Cd(NH3)2+2', 4.56, SM, { uncertainty: 0.2 }),
  beta('Cd+2 + 3 NH3 = Cd(NH3)3+2', 5.9, SM, { uncertainty: 0.3 }),
  beta('Cd+2 + 4 NH3 = Cd(NH3)4+2', 6.74, SM, {
    uncertainty: 0.3,
    note: "I → 0. Lange's prints 7.12 (2 M NH4NO3).",
  }),
  beta('Cd+2 + OH- = CdOH+', 3.92, BAES, { uncertainty: 0.2, note: 'Printed as log *K -10.08.' }),
  beta('Cd+2 + 2 OH- = Cd(OH)2', 7.65, BAES, { uncertainty: 0.5, note: 'Printed as log *beta2 -20.35.' }),
  beta('Cd+2 + 3 OH- = Cd(OH)3-', 8.7, BAES, { uncertainty: 0.5, note: 'Printed as log *beta3 -33.3 (an upper limit).' }),
  beta('Cd+2 + 4 OH- = Cd(OH)4-2', 8.65, BAES, { uncertainty: 0.5, note: 'Printed as log *beta4 -47.35.' }),
  beta('Cd+2 + Cl- = CdCl+', 1.98, SM, { uncertainty: 0.1 }),
  beta('Cd+2 + 2 Cl- = CdCl2', 2.6, SM, { uncertainty: 0.2 }),
  ksp('Cd(OH)2(s) = Cd+2 + 2 OH-', -14.35, BAES, { uncertainty: 0.2, note: 'Printed as log *Ks 13.65 for Cd(OH)2 + 2 H+.' }),
];

const NICKEL: SeedConstant[] = [
  beta('Ni+2 + 4 CN- = Ni(CN)4-2', 30.2, SM, {
    uncertainty: 0.5,
    note: "Reported 30.2 to 31.3 (Lange's prints the higher value).",
  }),
  beta('Ni+2 + NH3 = Ni(NH3)+2', 2.73, SM, { uncertainty: 0.1 }),
  beta('Ni+2 + 2 NH3 = Ni(NH3)2+2', 4.89, SM, { uncertainty: 0.1 }),
  beta('Ni+2 + 3 NH3 = Ni(NH3)3+2', 6.55, SM, { uncertainty: 0.2 }),
  beta('Ni+2 + 4 NH3 = Ni(NH3)4+2', 7.67, SM, { uncertainty: 0.2 }),
  beta('Ni+2 + 5 NH3 = Ni(NH3)5+2', 8.34, SM, { uncertainty: 0.3 }),
  beta('Ni+2 + 6 NH3 = Ni(NH3)6+2', 8.31, SM, {
    uncertainty: 0.3,
    note: "I → 0. Lange's prints 8.74 (Bjerrum, 2 M NH4NO3).",
  }),
  beta('Ni+2 + OH- = NiOH+', 4.14, BAES, { uncertainty: 0.2, note: 'Printed as log *K -9.86.' }),
  ksp('Ni(OH)2(s) = Ni+2 + 2 OH-', -15.26, CRC_KSP, {
    uncertainty: 0.5,
    note: 'CRC prints 5.48e-16, which fits freshly precipitated hydroxide in a bath. Baes & Mesmer print log *Ks 10.8 for the aged crystalline solid (-17.2).',
  }),
];

const LEAD: SeedConstant[] = [
  beta('Pb+2 + OH- = PbOH+', 6.29, BAES, { uncertainty: 0.1, note: 'Printed as log *K -7.71.' }),
  beta('Pb+2 + 2 OH- = Pb(OH)2', 10.88, BAES, { uncertainty: 0.3, note: 'Printed as log *beta2 -17.12.' }),
  beta('Pb+2 + 3 OH- = Pb(OH)3-', 13.94, BAES, { uncertainty: 0.2, note: 'Printed as log *beta3 -28.06.' }),
  beta('3 Pb+2 + 4 OH- = Pb3(OH)4+2', 32.12, BAES, { uncertainty: 0.2, note: 'Printed as log *beta43 -23.88.' }),
  beta('4 Pb+2 + 4 OH- = Pb4(OH)4+4', 35.12, BAES, { uncertainty: 0.2, note: 'Printed as log *beta44 -20.88.' }),
  beta('Pb+2 + Cl- = PbCl+', 1.6, SM, { uncertainty: 0.1 }),
  beta('Pb+2 + 2 Cl- = PbCl2', 1.8, SM, { uncertainty: 0.2 }),
  beta('Pb+2 + I- = PbI+', 2.0, LANGE, { uncertainty: 0.3 }),
  beta('Pb+2 + 2 I- = PbI2', 3.15, LANGE, { uncertainty: 0.3 }),
  beta('Pb+2 + 3 I- = PbI3-', 3.92, LANGE, { uncertainty: 0.4 }),
  beta('Pb+2 + 4 I- = PbI4-2', 4.47, LANGE, { uncertainty: 0.4 }),
  ksp('Pb(OH)2(s) = Pb+2 + 2 OH-', -15.3, BAES, {
    uncertainty: 0.3,
    note: 'Lead(II) oxide written as Pb(OH)2: printed as log *Ks 12.7 for PbO(red) + 2 H+. The CRC table prints 1.43e-20 (-19.85) for "Pb(OH)2", which does not fit the measured solubility of PbO and is not used.',
  }),
  ksp('PbCl2(s) = Pb+2 + 2 Cl-', -4.77, CRC_KSP, { uncertainty: 0.1, note: 'CRC prints Ksp 1.70e-5.' }),
  ksp('PbBr2(s) = Pb+2 + 2 Br-', -5.18, CRC_KSP, { uncertainty: 0.1, note: 'CRC prints Ksp 6.60e-6.' }),
  ksp('PbI2(s) = Pb+2 + 2 I-', -8.01, CRC_KSP, { uncertainty: 0.1, note: 'CRC prints Ksp 9.8e-9.' }),
  ksp('PbSO4(s) = Pb+2 + SO4-2', -7.79, SM, { uncertainty: 0.1, note: 'CRC prints 2.53e-8 (-7.60).' }),
];

export const SEED_CONSTANTS: readonly SeedConstant[] = [
  ...PROTONATION,
  ...SILVER,
  ...SILVER_SOLIDS,
  ...COPPER_I,
  ...COPPER_I_SOLIDS,
  ...COPPER_II,
  ...GOLD,
  ...ZINC,
  ...CADMIUM,
  ...NICKEL,
  ...LEAD,
];
