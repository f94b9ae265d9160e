// What one mole of a reagent brings to a solution, read from its formula for simple salts, acids
// and bases ("NaCN" → Na+ 1, CN- 1; "NaOH" → H+ -1; "Na2S2O3·5H2O" → Na+ 2, S2O3-2 1), then put in
// the components of the system at hand. Anything not recognised is left to the person to write as
// "component: count" pairs. Pure functions; shared by the dosing plan and make-up screens.
import { molarMass } from '@/lib/units';

/** An ion a salt is made of, and the charges it may carry (copper and gold have two). */
type IonSpec = { token: string; names: readonly string[]; charges: readonly number[] };

const IONS: readonly IonSpec[] = [
  { token: 'Na', names: ['Na+'], charges: [1] },
  { token: 'K', names: ['K+'], charges: [1] },
  { token: 'Ag', names: ['Ag+'], charges: [1] },
  { token: 'Au', names: ['Au+', 'Au+3'], charges: [1, 3] },
  { token: 'Cu', names: ['Cu+', 'Cu+2'], charges: [1, 2] },
  { token: 'Zn', names: ['Zn+2'], charges: [2] },
  { token: 'Cd', names: ['Cd+2'], charges: [2] },
  { token: 'Ni', names: ['Ni+2'], charges: [2] },
  { token: 'Pb', names: ['Pb+2'], charges: [2] },
  { token: 'NH4', names: ['NH4+'], charges: [1] },
  { token: 'H', names: ['H+'], charges: [1] },
  { token: 'CN', names: ['CN-'], charges: [-1] },
  { token: 'SCN', names: ['SCN-'], charges: [-1] },
  { token: 'S2O3', names: ['S2O3-2'], charges: [-2] },
  { token: 'Cl', names: ['Cl-'], charges: [-1] },
  { token: 'Br', names: ['Br-'], charges: [-1] },
  { token: 'I', names: ['I-'], charges: [-1] },
  { token: 'NO3', names: ['NO3-'], charges: [-1] },
  { token: 'OH', names: ['OH-'], charges: [-1] },
  { token: 'SO4', names: ['SO4-2'], charges: [-2] },
  { token: 'SO3', names: ['SO3-2'], charges: [-2] },
  { token: 'CO3', names: ['CO3-2'], charges: [-2] },
  { token: 'S', names: ['S-2'], charges: [-2] },
];

/** Longest first, so "SCN" and "S2O3" are read before "S". */
const TOKENS = [...IONS].sort((a, b) => b.token.length - a.token.length);

/** Plain names a shop uses, to the formula read. */
const NAMES: Readonly<Record<string, string>> = {
  'sodium cyanide': 'NaCN',
  'potassium cyanide': 'KCN',
  'silver nitrate': 'AgNO3',
  'silver cyanide': 'AgCN',
  'copper cyanide': 'CuCN',
  'copper(i) cyanide': 'CuCN',
  'zinc cyanide': 'Zn(CN)2',
  'potassium silver cyanide': 'K[Ag(CN)2]',
  'potassium gold cyanide': 'K[Au(CN)2]',
  'sodium hydroxide': 'NaOH',
  'caustic soda': 'NaOH',
  'potassium hydroxide': 'KOH',
  'hydrochloric acid': 'HCl',
  'nitric acid': 'HNO3',
  'sulfuric acid': 'H2SO4',
  'sodium thiosulfate': 'Na2S2O3·5H2O',
  'ammonium thiosulfate': '(NH4)2S2O3',
  'sodium sulfite': 'Na2SO3',
  'sodium chloride': 'NaCl',
  'potassium bromide': 'KBr',
  'potassium iodide': 'KI',
  'sodium sulfide': 'Na2S',
  ammonia: 'NH3',
  'aqueous ammonia': 'NH3',
};

/** Moles of each ion in one mole of the reagent ({"Na+": 1, "CN-": 1}). */
export type IonCounts = Record<string, number>;

/** A reagent read: its formula (for the molar mass) and the ions it brings, or why it could not be read. */
export type ReagentReading = { ok: true; formula: string; ions: IonCounts } | { ok: false; formula: string | null; reason: string };

type Part = { spec: IonSpec; count: number };

/** The formula a name or formula stands for, tidied ("sodium cyanide" → "NaCN"). */
export function reagentFormula(text: string): string {
  const t = text.trim();
  return NAMES[t.toLowerCase()] ?? t.replace(/\s+/g, '');
}

function readCount(s: string, i: number): [number, number] {
  const m = /^\d+/.exec(s.slice(i));
  return m ? [Number(m[0]), i + m[0].length] : [1, i];
}

const CLOSE: Record<string, string> = { '(': ')', '[': ']', '{': '}' };

/** Parts of a formula without hydrate water: ions, brackets multiplying what they hold; null when a piece is not an ion we know. */
function readParts(s: string, start: number, close: string | null): { parts: Part[]; end: number } | null {
  const parts: Part[] = [];
  let i = start;
  while (i < s.length) {
    const ch = s[i] as string;
    if (ch === close) return { parts, end: i + 1 };
    if (CLOSE[ch]) {
      const inner = readParts(s, i + 1, CLOSE[ch] as string);
      if (!inner) return null;
      const [n, next] = readCount(s, inner.end);
      parts.push(...inner.parts.map((p) => ({ spec: p.spec, count: p.count * n })));
      i = next;
      continue;
    }
    const spec = TOKENS.find((t) => s.startsWith(t.token, i) && !/[a-z]/.test(s[i + t.token.length] ?? ''));
    if (!spec) return null;
    const [n, next] = readCount(s, i + spec.token.length);
    parts.push({ spec, count: n });
    i = next;
  }
  return close === null ? { parts, end: i } : null;
}

/** Charges for the ions that may carry more than one, chosen so the reagent is neutral; null when none is. */
function balance(parts: readonly Part[]): number[] | null {
  const options = parts.map((p) => p.spec.charges.map((_, k) => k));
  const pick = (i: number, chosen: number[]): number[] | null => {
    if (i === parts.length) return parts.reduce((sum, p, j) => sum + p.count * (p.spec.charges[chosen[j] as number] as number), 0) === 0 ? chosen : null;
    for (const k of options[i] as number[]) {
      const found = pick(i + 1, [...chosen, k]);
      if (found) return found;
    }
    return null;
  };
  return pick(0, []);
}

/** Splits off hydrate water and a phase mark; null when what follows the dot is not water. */
function anhydrous(formula: string): string | null {
  const bare = formula.replace(/\((s|aq|l)\)$/, '');
  const dot = bare.search(/[·•∙⋅*.]/);
  if (dot < 0) return bare;
  return /^(\d+(\.\d+)?|½)?H2O$/.test(bare.slice(dot + 1)) ? bare.slice(0, dot) : null;
}

/** The ions one mole of a reagent brings, from its formula or a shop name; NH3 and NH4OH count as ammonia. */
export function readReagent(text: string): ReagentReading {
  const formula = reagentFormula(text);
  if (formula === '') return { ok: false, formula: null, reason: 'Name the reagent or give its formula, such as NaCN.' };
  const main = anhydrous(formula);
  if (main === 'NH3' || main === 'NH4OH') return { ok: true, formula, ions: { NH3: 1 } };
  const read = main ? readParts(main, 0, null) : null;
  const charges = read && read.parts.length > 1 ? balance(read.parts) : null;
  if (!read || !charges) {
    return { ok: false, formula: validFormula(formula) ? formula : null, reason: `${text.trim()} is not a salt, acid or base we can read: write what one mole brings.` };
  }
  const ions: IonCounts = {};
  read.parts.forEach((p, j) => {
    const name = p.spec.names[charges[j] as number] as string;
    ions[name] = (ions[name] ?? 0) + p.count;
  });
  return { ok: true, formula, ions };
}

/** Whether a formula has a molar mass (every element known). */
export function validFormula(formula: string): boolean {
  try {
    return molarMass(formula).toNumber() > 0;
  } catch {
    return false;
  }
}

/** g/mol of a formula, or null when it has none. */
export function gramsPerMole(formula: string | null): number | null {
  if (!formula) return null;
  try {
    const m = molarMass(formula).toNumber();
    return Number.isFinite(m) && m > 0 ? m : null;
  } catch {
    return null;
  }
}

/** What the reagent brings in the system's own components, and the ions left out (with why). */
export type InSystem = { stoich: Record<string, number>; leftOut: { ion: string; why: string }[] };

function addTo(stoich: Record<string, number>, c: string, n: number): void {
  stoich[c] = (stoich[c] ?? 0) + n;
}

/**
 * Puts ions in the system's components: OH- as one H+ taken away, ammonium as NH3 + H+ (when the
 * system has both), anything the system does not hold left out and named.
 */
export function inSystem(ions: IonCounts, components: readonly string[]): InSystem {
  const has = (c: string) => components.includes(c);
  const stoich: Record<string, number> = {};
  const leftOut: InSystem['leftOut'] = [];
  for (const [ion, n] of Object.entries(ions)) {
    if (ion === 'OH-' || ion === 'H+') {
      if (has('H+')) addTo(stoich, 'H+', ion === 'H+' ? n : -n);
      else leftOut.push({ ion, why: 'enter a pH to bring H+ into the solution' });
    } else if (ion === 'NH4+' && has('NH3')) {
      if (has('H+')) {
        addTo(stoich, 'NH3', n);
        addTo(stoich, 'H+', n);
      } else leftOut.push({ ion, why: 'enter a pH so ammonium counts as NH3 and H+' });
    } else if (has(ion)) addTo(stoich, ion, n);
    else leftOut.push({ ion, why: 'not among the ions chosen' });
  }
  for (const [c, n] of Object.entries(stoich)) if (n === 0) delete stoich[c];
  return { stoich, leftOut };
}

/** "Na+: 1, CN-: 1" for a stoichiometry. */
export function stoichText(stoich: Record<string, number>): string {
  return Object.entries(stoich)
    .map(([c, n]) => `${c}: ${n}`)
    .join(', ');
}

/** Reads "Na+: 1, CN-: 1" (commas, semicolons or new lines between pairs); the message says what to fix. */
export function parseStoich(text: string): { ok: true; stoich: Record<string, number> } | { ok: false; message: string } {
  const pairs = text.split(/[,;\n]/).map((p) => p.trim()).filter(Boolean);
  if (pairs.length === 0) return { ok: false, message: 'Write what one mole brings, such as "Na+: 1, CN-: 1"' };
  const stoich: Record<string, number> = {};
  for (const pair of pairs) {
    const m = /^(\S+?)\s*[:=]\s*([-+]?\d*\.?\d+(?:[eE][-+]?\d+)?)$/.exec(pair);
    if (!m) return { ok: false, message: `Cannot read "${pair}": write it as "component: count"` };
    const n = Number(m[2]);
    if (!Number.isFinite(n)) return { ok: false, message: `The count in "${pair}" is not a number` };
    addTo(stoich, m[1] as string, n);
  }
  return { ok: true, stoich };
}

/** Whether a reagent adds acid: it brings H+ (read from its formula or as written). */
export function addsAcid(reagent: string, stoich: Record<string, number>): boolean {
  const read = readReagent(reagent);
  return (stoich['H+'] ?? 0) > 0 || (read.ok && (read.ions['H+'] ?? 0) > 0);
}

/** The caution for an acid step in a cyanide bath (the hazard rules of the Safety section say more). */
export const CYANIDE_ACID_CAUTION = 'adds acid to a cyanide bath: hydrogen cyanide gas can be released — follow the SDS and local codes.';

/** The caution for a pH set point that lowers the pH of a cyanide bath (acid is what lowers it). */
export const CYANIDE_PH_CAUTION = 'lowers the pH of a cyanide bath, which takes acid: hydrogen cyanide gas can be released — follow the SDS and local codes.';
