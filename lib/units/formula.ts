// Chemical formulas as chemists type them: element counts, molar mass and charge.
//
// Accepted: "AgNO3", "K[Ag(CN)2]", "Cu(NH3)4SO4", "{...}" brackets nested to any depth; hydrates
// joined by "·", "•", "*" or "." with a leading multiplier ("Na2S2O3·5H2O", "CaSO4·0.5H2O",
// "CaSO4·½H2O", "3CdSO4·8H2O"); a trailing phase "(s)", "(l)", "(g)", "(aq)", which is ignored;
// a trailing charge read by the rule in formula-text.ts (so "Cu2+" is Cu2 with charge +1).
// Subscripts are whole numbers; only a multiplier may have decimals.
import { atomicWeight, isElementSymbol } from './atomic-weights';
import { D, type Decimal } from './decimal';
import { UnitsInputError } from './errors';
import { positionOf, splitFormulaTail, type MappedText } from './formula-text';

type Counts = Map<string, Decimal>;

/** A parsed formula: element counts in order of first appearance and the net charge. */
export interface ParsedFormula {
  /** Atoms of each element per formula unit (decimal for fractional hydrates such as ·0.5H2O). */
  counts: ReadonlyMap<string, Decimal>;
  /** Net charge in elementary charges. */
  charge: number;
}

const OPEN_TO_CLOSE: Record<string, string> = { '(': ')', '[': ']', '{': '}' };
const CLOSERS = new Set([')', ']', '}']);
const SEPARATORS = new Set(['·', '•', '∙', '⋅', '*', '.']);

interface Cursor {
  text: MappedText;
  i: number;
  end: number;
}

/** Parses a formula to exact element counts and charge; throws UnitsInputError saying what to fix. */
export function analyseFormula(formula: string): ParsedFormula {
  if (typeof formula !== 'string') {
    throw new UnitsInputError('formula', 'formula must be text such as "AgNO3".');
  }
  const { text, start, end, charge } = splitFormulaTail(formula);
  const cur: Cursor = { text, i: start, end };
  const counts: Counts = new Map();
  let separatorAt = -1;
  while (cur.i < cur.end || separatorAt >= 0) {
    const segment = parseSegment(cur, separatorAt);
    addScaled(counts, segment.counts, segment.multiplier);
    separatorAt = segment.separatorAt;
  }
  return { counts, charge };
}

/** Atoms of each element in one formula unit; "Na2S2O3·5H2O" gives {Na: 2, S: 2, O: 8, H: 10}. */
export function parseFormula(formula: string): Record<string, number> {
  const out: Record<string, number> = {};
  for (const [symbol, n] of analyseFormula(formula).counts) out[symbol] = n.toNumber();
  return out;
}

/** Molar mass in g/mol from IUPAC 2021 standard atomic weights; the charge is ignored (electron mass neglected, < 0.0006 g/mol each). */
export function molarMass(formula: string): Decimal {
  let total = new D(0);
  for (const [symbol, n] of analyseFormula(formula).counts) total = total.plus(atomicWeight(symbol).times(n));
  return total;
}

/** Net charge in elementary charges written at the end of `formula` ("S2O3-2" gives -2, "AgNO3" 0). */
export function formulaCharge(formula: string): number {
  return analyseFormula(formula).charge;
}

// One hydrate part: optional multiplier, then atoms and brackets up to a separator or the end.
function parseSegment(cur: Cursor, prevSeparator: number): { counts: Counts; multiplier: Decimal; separatorAt: number } {
  skipSpaces(cur);
  const multiplierAt = cur.i;
  const multiplier = readMultiplier(cur);
  const stack: { counts: Counts; open: string; at: number }[] = [{ counts: new Map(), open: '', at: cur.i }];
  let separatorAt = -1;
  while (cur.i < cur.end) {
    const ch = cur.text.chars[cur.i] as string;
    const top = stack[stack.length - 1] as (typeof stack)[number];
    if (/[A-Z]/.test(ch)) {
      const symbol = readSymbol(cur);
      addScaled(top.counts, new Map([[symbol, new D(1)]]), readCount(cur));
    } else if (OPEN_TO_CLOSE[ch]) {
      stack.push({ counts: new Map(), open: ch, at: cur.i });
      cur.i++;
    } else if (CLOSERS.has(ch)) {
      const group = closeGroup(cur, stack);
      addScaled((stack[stack.length - 1] as (typeof stack)[number]).counts, group, readCount(cur));
    } else if (SEPARATORS.has(ch)) {
      if (stack.length > 1) throw fail(`Hydrate dot "${ch}" at position ${pos(cur, cur.i)} in "${cur.text.original}" is inside brackets: close the brackets before it.`);
      separatorAt = cur.i;
      cur.i++;
      break;
    } else if (/\s/.test(ch)) {
      skipSpacesBeforeSeparator(cur);
    } else {
      throw unexpected(cur, ch);
    }
  }
  const open = stack[stack.length - 1] as (typeof stack)[number];
  if (stack.length > 1) {
    throw fail(`Unclosed "${open.open}" at position ${pos(cur, open.at)} in "${cur.text.original}": add "${OPEN_TO_CLOSE[open.open]}".`);
  }
  const counts = (stack[0] as (typeof stack)[number]).counts;
  if (counts.size === 0) throw emptySegment(cur, prevSeparator, separatorAt, multiplier ? multiplierAt : -1);
  return { counts, multiplier: multiplier ?? new D(1), separatorAt };
}

function closeGroup(cur: Cursor, stack: { counts: Counts; open: string; at: number }[]): Counts {
  const ch = cur.text.chars[cur.i] as string;
  const { original } = cur.text;
  if (stack.length === 1) {
    throw fail(`Unmatched "${ch}" at position ${pos(cur, cur.i)} in "${original}": remove it or add its opening bracket.`);
  }
  const group = stack.pop() as { counts: Counts; open: string; at: number };
  const wanted = OPEN_TO_CLOSE[group.open];
  if (ch !== wanted) {
    throw fail(`"${group.open}" at position ${pos(cur, group.at)} is closed by "${ch}" at position ${pos(cur, cur.i)} in "${original}": close it with "${wanted}".`);
  }
  if (group.counts.size === 0) {
    throw fail(`Empty brackets "${group.open}${ch}" at position ${pos(cur, group.at)} in "${original}": put atoms inside or remove them.`);
  }
  cur.i++;
  return group.counts;
}

function readSymbol(cur: Cursor): string {
  const { chars } = cur.text;
  const at = cur.i;
  const next = chars[at + 1];
  const symbol = (chars[at] as string) + (next !== undefined && /[a-z]/.test(next) ? next : '');
  if (!isElementSymbol(symbol)) {
    throw fail(`Unknown element "${symbol}" at position ${pos(cur, at)} in "${cur.text.original}": check the spelling and capitals (Co is cobalt, CO is carbon and oxygen).`);
  }
  cur.i += symbol.length;
  return symbol;
}

// A subscript after a symbol or bracket: whole number of 1 or more; none means 1.
function readCount(cur: Cursor): Decimal {
  const at = cur.i;
  const digits = readWhile(cur, /\d/);
  if (digits === '') return new D(1);
  if (/^0+$/.test(digits)) {
    throw fail(`Count 0 at position ${pos(cur, at)} in "${cur.text.original}": counts are whole numbers of 1 or more.`);
  }
  return new D(digits);
}

// A leading multiplier ("5" in ·5H2O, "0.5", "½"); undefined when there is none.
function readMultiplier(cur: Cursor): Decimal | undefined {
  const at = cur.i;
  if (cur.text.chars[at] === '½') {
    cur.i++;
    return new D('0.5');
  }
  let digits = readWhile(cur, /\d/);
  if (digits === '') return undefined;
  if (cur.text.chars[cur.i] === '.' && /\d/.test(cur.text.chars[cur.i + 1] ?? '')) {
    cur.i++;
    digits += '.' + readWhile(cur, /\d/);
  }
  const value = new D(digits);
  if (value.isZero()) {
    throw fail(`Multiplier ${digits} at position ${pos(cur, at)} in "${cur.text.original}": it must be greater than 0.`);
  }
  skipSpaces(cur);
  return value;
}

function readWhile(cur: Cursor, re: RegExp): string {
  let s = '';
  while (cur.i < cur.end && re.test(cur.text.chars[cur.i] as string)) s += cur.text.chars[cur.i++];
  return s;
}

function skipSpaces(cur: Cursor): void {
  while (cur.i < cur.end && /\s/.test(cur.text.chars[cur.i] as string)) cur.i++;
}

// Spaces are allowed only around a hydrate dot ("CuSO4 · 5H2O").
function skipSpacesBeforeSeparator(cur: Cursor): void {
  const at = cur.i;
  skipSpaces(cur);
  if (cur.i < cur.end && !SEPARATORS.has(cur.text.chars[cur.i] as string)) {
    throw fail(`Unexpected space at position ${pos(cur, at)} in "${cur.text.original}": remove spaces inside a formula, and write a charge as SO4^2- or SO4-2.`);
  }
}

function emptySegment(cur: Cursor, prevSeparator: number, separatorAt: number, multiplierAt: number): UnitsInputError {
  const { original, chars } = cur.text;
  if (multiplierAt >= 0) {
    return fail(`The multiplier at position ${pos(cur, multiplierAt)} in "${original}" is not followed by a formula: write it as ·5H2O.`);
  }
  if (prevSeparator >= 0) {
    return fail(`Nothing after "${chars[prevSeparator]}" at position ${pos(cur, prevSeparator)} in "${original}": write the water as ·5H2O, or remove the dot.`);
  }
  return fail(`Nothing before "${chars[separatorAt]}" at position ${pos(cur, separatorAt)} in "${original}": start with the salt, as in CuSO4·5H2O.`);
}

function unexpected(cur: Cursor, ch: string): UnitsInputError {
  const at = cur.i;
  const { original } = cur.text;
  if (/[a-z]/.test(ch)) {
    return fail(`Element symbols start with a capital letter: "${ch}" at position ${pos(cur, at)} in "${original}". Write each symbol as a capital and at most one small letter, such as Na, Cu or Ag.`);
  }
  if (/\d/.test(ch)) {
    return fail(`Number at position ${pos(cur, at)} in "${original}" counts nothing: put a count right after an element or a closing bracket.`);
  }
  if (ch === '+' || ch === '-') {
    return fail(`"${ch}" at position ${pos(cur, at)} in "${original}": a charge goes at the very end, such as Ag(CN)2- or S2O3-2.`);
  }
  return fail(`Unexpected "${ch}" at position ${pos(cur, at)} in "${original}": use element symbols, counts, brackets, a hydrate dot and a charge at the end.`);
}

function pos(cur: Cursor, i: number): number {
  return positionOf(cur.text, i);
}

function fail(message: string): UnitsInputError {
  return new UnitsInputError('formula', message);
}

function addScaled(into: Counts, from: ReadonlyMap<string, Decimal>, factor: Decimal): void {
  for (const [symbol, n] of from) into.set(symbol, (into.get(symbol) ?? new D(0)).plus(n.times(factor)));
}
