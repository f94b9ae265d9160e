// GHS hazard statements and pictograms for the reagents the hazard rules speak about, and the
// recognition of a reagent from what a chemist types: a name, a trade name or a formula. Every
// classification here is from memory of typical supplier safety data sheets; the SDS the shop
// holds is the one that counts.
import { GHS_PICTOGRAMS, type GhsPictogram, type GhsStatement } from '@/shared/safety';

/** Standard English wording of the GHS (and EU supplemental) hazard statements the rules use. */
export const GHS_STATEMENTS = {
  H224: 'Extremely flammable liquid and vapour.',
  H272: 'May intensify fire; oxidiser.',
  H280: 'Contains gas under pressure; may explode if heated.',
  H290: 'May be corrosive to metals.',
  H300: 'Fatal if swallowed.',
  H301: 'Toxic if swallowed.',
  H310: 'Fatal in contact with skin.',
  H311: 'Toxic in contact with skin.',
  H314: 'Causes severe skin burns and eye damage.',
  H330: 'Fatal if inhaled.',
  H331: 'Toxic if inhaled.',
  H335: 'May cause respiratory irritation.',
  H372: 'Causes damage to organs through prolonged or repeated exposure.',
  H400: 'Very toxic to aquatic life.',
  H410: 'Very toxic to aquatic life with long lasting effects.',
  EUH032: 'Contact with acids liberates very toxic gas.',
} as const;
export type GhsCode = keyof typeof GHS_STATEMENTS;

/** The pictogram each statement calls for; EUH032 is an EU supplemental statement with none. */
export const STATEMENT_PICTOGRAM: Record<GhsCode, GhsPictogram | null> = {
  H224: 'GHS02',
  H272: 'GHS03',
  H280: 'GHS04',
  H290: 'GHS05',
  H300: 'GHS06',
  H301: 'GHS06',
  H310: 'GHS06',
  H311: 'GHS06',
  H314: 'GHS05',
  H330: 'GHS06',
  H331: 'GHS06',
  H335: 'GHS07',
  H372: 'GHS08',
  H400: 'GHS09',
  H410: 'GHS09',
  EUH032: null,
};

const CODE_ORDER = Object.keys(GHS_STATEMENTS) as GhsCode[];
const PICTOGRAM_ORDER = Object.keys(GHS_PICTOGRAMS) as GhsPictogram[];

/** The statements for these codes, each once, in code order (H before EUH). */
export function ghsStatements(codes: Iterable<GhsCode>): GhsStatement[] {
  const wanted = new Set(codes);
  return CODE_ORDER.filter((c) => wanted.has(c)).map((code) => ({ code, text: GHS_STATEMENTS[code] }));
}

/** The pictograms these statements call for, each once, in GHS order; GHS06 displaces GHS07 (GHS precedence rule). */
export function pictogramsFor(codes: Iterable<GhsCode>, extra: Iterable<GhsPictogram> = []): GhsPictogram[] {
  const wanted = new Set<GhsPictogram>(extra);
  for (const c of codes) {
    const p = STATEMENT_PICTOGRAM[c];
    if (p) wanted.add(p);
  }
  if (wanted.has('GHS06')) wanted.delete('GHS07');
  return PICTOGRAM_ORDER.filter((p) => wanted.has(p));
}

/** What a reagent is, for the rules. */
export type ReagentKind = 'cyanide' | 'silver' | 'thiosulfate' | 'ammonia' | 'acid' | 'base' | 'gas';

/** One reagent the app knows by name, with the statements a typical supplier SDS gives it. */
export interface Reagent {
  /** How the reagent is shown ("NaCN", "aqueous ammonia"). */
  label: string;
  /** Names, trade names and formulas it is recognised by (compared without case). */
  names: readonly string[];
  codes: readonly GhsCode[];
  kinds: readonly ReagentKind[];
  /** Where the classification comes from. */
  source: string;
}

/** Where every classification in REAGENTS comes from. */
export const REAGENT_SOURCE = 'from memory, typical supplier SDS; check the SDS you hold';

const ALKALI_CYANIDE: readonly GhsCode[] = ['H290', 'H300', 'H310', 'H330', 'H372', 'H410', 'EUH032'];
const METAL_CYANIDE: readonly GhsCode[] = ['H300', 'H310', 'H330', 'H410', 'EUH032'];

/** Statements shown for cyanide when no cyanide reagent is named: those of NaCN and KCN (acute toxicity, aquatic, EUH032). */
export const DEFAULT_CYANIDE_CODES: readonly GhsCode[] = ['H300', 'H310', 'H330', 'H410', 'EUH032'];

const reagent = (label: string, names: readonly string[], codes: readonly GhsCode[], kinds: readonly ReagentKind[]): Reagent => ({
  label,
  names: [label, ...names],
  codes,
  kinds,
  source: REAGENT_SOURCE,
});

/** The reagents recognised by name, with their statements (from memory, typical supplier SDS; check the SDS you hold). */
export const REAGENTS: readonly Reagent[] = [
  reagent('NaCN', ['sodium cyanide'], ALKALI_CYANIDE, ['cyanide']),
  reagent('KCN', ['potassium cyanide'], ALKALI_CYANIDE, ['cyanide']),
  reagent('CuCN', ['copper cyanide', 'copper(I) cyanide', 'cuprous cyanide'], METAL_CYANIDE, ['cyanide']),
  reagent('Zn(CN)2', ['zinc cyanide'], METAL_CYANIDE, ['cyanide']),
  reagent('AgCN', ['silver cyanide'], METAL_CYANIDE, ['cyanide', 'silver']),
  reagent(
    'K[Ag(CN)2]',
    ['KAg(CN)2', 'potassium silver cyanide', 'silver potassium cyanide', 'potassium dicyanoargentate', 'potassium argentocyanide'],
    METAL_CYANIDE,
    ['cyanide', 'silver'],
  ),
  reagent(
    'K[Au(CN)2]',
    ['KAu(CN)2', 'potassium gold cyanide', 'gold potassium cyanide', 'PGC', 'potassium dicyanoaurate', 'potassium aurocyanide'],
    METAL_CYANIDE,
    ['cyanide'],
  ),
  reagent('HCN', ['hydrogen cyanide', 'hydrocyanic acid', 'HCN gas'], ['H224', 'H300', 'H310', 'H330', 'H410'], ['cyanide', 'acid', 'gas']),
  reagent('AgNO3', ['silver nitrate'], ['H272', 'H290', 'H314', 'H410'], ['silver']),
  reagent(
    'aqueous ammonia',
    ['NH3', 'NH3(aq)', 'NH4OH', 'ammonia', 'ammonia solution', 'ammonia water', 'aqua ammonia', 'ammonium hydroxide'],
    ['H314', 'H335', 'H400'],
    ['ammonia', 'base'],
  ),
  reagent('SO2', ['sulfur dioxide', 'sulphur dioxide'], ['H280', 'H314', 'H331'], ['gas']),
  reagent('H2SO4', ['sulfuric acid', 'sulphuric acid'], ['H290', 'H314'], ['acid']),
  reagent('HCl', ['hydrochloric acid', 'muriatic acid'], ['H290', 'H314', 'H335'], ['acid']),
  reagent('NaOH', ['sodium hydroxide', 'caustic soda', 'lye'], ['H290', 'H314'], ['base']),
  // Not classified as hazardous on typical supplier SDS: no statements.
  reagent('Na2S2O3', ['sodium thiosulfate', 'sodium thiosulphate', 'hypo', 'Na2S2O3·5H2O'], [], ['thiosulfate']),
  reagent('(NH4)2S2O3', ['ammonium thiosulfate', 'ammonium thiosulphate'], [], ['thiosulfate']),
];

/** Lower case, square brackets as round ones, no phase or hydrate suffix, single spaces. */
function normalise(text: string): string {
  return text
    .toLowerCase()
    .replace(/[[{]/g, '(')
    .replace(/[\]}]/g, ')')
    .replace(/\s*[·.*•]\s*\d*\s*h2o\b/g, '')
    .replace(/\((s|l|g|aq)\)/g, '')
    .replace(/\s+/g, ' ')
    .trim();
}

const ALIASES: readonly { alias: string; reagent: Reagent; spaced: boolean }[] = REAGENTS.flatMap((r) =>
  r.names.map((n) => ({ alias: normalise(n), reagent: r, spaced: /^[a-z() ]+$/.test(normalise(n)) && normalise(n).length >= 4 })),
).sort((a, b) => b.alias.length - a.alias.length);

const escape = (s: string) => s.replace(/[.*+?^${}()|[\]\\]/g, '\\$&');

/** The reagent a name or formula stands for ("sodium cyanide", "NaCN", "PGC", "K[Au(CN)2]", "hypo"); null when unknown. */
export function recogniseReagent(text: unknown): Reagent | null {
  if (typeof text !== 'string') return null;
  const t = normalise(text);
  if (t === '') return null;
  const exact = ALIASES.find((a) => a.alias === t);
  if (exact) return exact.reagent;
  // Otherwise the longest name found as whole words ("sodium cyanide, 98 %"), or a formula as a whole token ("HCl 37 %").
  const tokens = new Set(t.split(/[\s,;]+/));
  for (const a of ALIASES) {
    if (tokens.has(a.alias)) return a.reagent;
    if (a.spaced && new RegExp(`(^|[^a-z0-9])${escape(a.alias)}($|[^a-z0-9])`).test(t)) return a.reagent;
  }
  return null;
}

/** Thiocyanate, selenocyanate, cyanate and fulminate: a C-N group that is not cyanide. */
const NOT_CYANIDE = /SeCN|SCN|OCN|CNO/g;

/** True when a formula holds a cyanide group, thiocyanate (SCN) and cyanate (OCN) not counted: "CN-", "Ag(CN)2-", "NaCN" yes; "SCN-", "KSCN" no. */
export function isCyanideFormula(s: unknown): boolean {
  return typeof s === 'string' && s.replace(NOT_CYANIDE, '#').includes('CN');
}

/** Cyanide groups in one formula unit: "CN-" 1, "Ag(CN)2-" 2, "K3[Fe(CN)6]" 6, "SCN-" 0. */
export function cyanideGroups(s: unknown): number {
  if (typeof s !== 'string') return 0;
  let n = 0;
  const rest = s.replace(NOT_CYANIDE, '#').replace(/\(CN\)(\d*)/g, (_m, count: string) => {
    n += count === '' ? 1 : Number(count);
    return '#';
  });
  return n + (rest.match(/CN/g)?.length ?? 0);
}

// Acids by formula and by name (besides anything with "acid" in its name); common practice.
const ACID_FORMULAS = new Set(['hcl', 'h2so4', 'hno3', 'h3po4', 'ch3cooh', 'hoac', 'c6h8o7', 'nh2so3h', 'h3nso3', 'nahso4', 'khso4', 'hcn']);
const ACID_NAMES = /\bacid\b|\bacetic\b|\bcitric\b|\bsulfamic\b|\bsulphamic\b|\bbisulfate\b|\bbisulphate\b|\bhydrogen ?sulfate\b|\bhydrogen ?sulphate\b|\bvinegar\b/;

/** True when a reagent brings acid: its stoichiometry brings H+ (> 0), or it is a known acid (HCl, H2SO4, HNO3, acetic, citric, sulfamic, NaHSO4, "... acid"). */
export function isAcidReagent(name: unknown, stoich?: Record<string, unknown> | null): boolean {
  const h = stoich?.['H+'];
  if (typeof h === 'number' && Number.isFinite(h) && h > 0) return true;
  if (typeof name !== 'string') return false;
  const t = normalise(name);
  if (ACID_NAMES.test(t)) return true;
  if ([t, ...t.split(/[\s,;]+/)].some((tok) => ACID_FORMULAS.has(tok))) return true;
  return recogniseReagent(name)?.kinds.includes('acid') ?? false;
}

/** True when a name or formula is a cyanide reagent: a known one, a cyanide formula or "cyanide" in the name. */
export function isCyanideReagent(text: unknown): boolean {
  if (typeof text !== 'string') return false;
  return (recogniseReagent(text)?.kinds.includes('cyanide') ?? false) || isCyanideFormula(text) || /cyanide/i.test(text);
}

/** True when a name or formula is a silver reagent: a known one, silver in the formula ("AgBr(s)") or "silver" in the name. */
export function isSilverReagent(text: unknown): boolean {
  if (typeof text !== 'string') return false;
  return (recogniseReagent(text)?.kinds.includes('silver') ?? false) || /Ag(?![a-z])/.test(text) || /silver/i.test(text);
}

/** True when a name or formula is a thiosulfate ("hypo", "Na2S2O3", "ammonium thiosulfate"). */
export function isThiosulfateReagent(text: unknown): boolean {
  if (typeof text !== 'string') return false;
  return (recogniseReagent(text)?.kinds.includes('thiosulfate') ?? false) || /S2O3/.test(text) || /thiosulph?ate/i.test(text);
}

/** True when a name or formula is ammonia ("aqueous ammonia", "NH3", "ammonium hydroxide"). */
export function isAmmoniaReagent(text: unknown): boolean {
  return recogniseReagent(text)?.kinds.includes('ammonia') ?? false;
}
