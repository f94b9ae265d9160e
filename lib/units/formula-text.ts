// The text around a formula's atoms: Unicode sub/superscripts, the phase suffix and the charge.
//
// Charge rule (written here once, referred to from formula.ts):
//   "SO4^2-", "SO4^-2", "Ag^+"   after "^": digits and a sign in either order; "^+" is +1.
//   "Cu+2", "S2O3-2"             a sign followed by digits at the end: the digits are the charge.
//   "Ag+", "Ag(CN)2-", "Fe+++"   signs alone at the end: one per unit of charge.
// So "Cu2+" reads as Cu2 with charge +1: digits before a bare sign belong to the formula.
// Write copper(II) as "Cu+2" or "Cu^2+". Unicode superscripts ("SO₄²⁻") read like the "^" form.
import { UnitsInputError } from './errors';

/** One character of the normalised text and its index in what the caller typed. */
export interface MappedText {
  /** Normalised characters: ASCII digits, "-" for minus signs, "^" before a superscript run. */
  chars: string[];
  /** Index in the caller's text of each character in `chars` (0-based). */
  from: number[];
  /** The caller's text, quoted in error messages. */
  original: string;
}

/** Where the atoms are and what charge the tail gave. */
export interface FormulaParts {
  text: MappedText;
  /** First index of the atom part in `text.chars` (inclusive). */
  start: number;
  /** Last index of the atom part in `text.chars` (exclusive). */
  end: number;
  /** Net charge in elementary charges; 0 when none is written. */
  charge: number;
}

const SUBSCRIPTS = '₀₁₂₃₄₅₆₇₈₉';
const SUPERSCRIPTS = '⁰¹²³⁴⁵⁶⁷⁸⁹';
const MINUS_SIGNS = '−–'; // U+2212 minus, U+2013 en dash
const PHASE = /\((?:s|l|g|aq)\)$/;

/** Maps sub/superscripts and minus signs to ASCII, keeping each character's original index. */
export function normaliseFormulaText(original: string): MappedText {
  const chars: string[] = [];
  const from: number[] = [];
  let inSuperscript = false;
  for (let i = 0; i < original.length; i++) {
    const ch = original[i] as string;
    let out = ch;
    const sub = SUBSCRIPTS.indexOf(ch);
    const sup = SUPERSCRIPTS.indexOf(ch);
    const superSign = ch === '⁺' ? '+' : ch === '⁻' ? '-' : '';
    if (sub >= 0) out = String(sub);
    else if (MINUS_SIGNS.includes(ch)) out = '-';
    if (sup >= 0 || superSign) {
      if (!inSuperscript) {
        chars.push('^');
        from.push(i);
      }
      out = sup >= 0 ? String(sup) : superSign;
    }
    inSuperscript = sup >= 0 || superSign !== '';
    chars.push(out);
    from.push(i);
  }
  return { chars, from, original };
}

/** 1-based position in the caller's text of normalised index `i`, for error messages. */
export function positionOf(text: MappedText, i: number): number {
  const index = text.from[Math.min(i, text.from.length - 1)] ?? 0;
  return index + 1;
}

/** Splits a formula into its atom part and its charge, dropping a trailing phase such as "(aq)". */
export function splitFormulaTail(original: string): FormulaParts {
  const text = normaliseFormulaText(original);
  const { chars } = text;
  let start = 0;
  let end = chars.length;
  while (start < end && /\s/.test(chars[start] as string)) start++;
  end = trimEnd(chars, start, end);
  end = dropPhase(chars, start, end);
  const { charge, chargeStart } = readCharge(text, start, end);
  if (chargeStart < end) end = dropPhase(chars, start, trimEnd(chars, start, chargeStart));
  if (start >= end) {
    const what = charge !== 0 ? 'Empty formula before the charge' : 'Empty formula';
    throw new UnitsInputError('formula', `${what}: enter one such as AgNO3.`);
  }
  return { text, start, end, charge };
}

function trimEnd(chars: string[], start: number, end: number): number {
  let e = end;
  while (e > start && /\s/.test(chars[e - 1] as string)) e--;
  return e;
}

function dropPhase(chars: string[], start: number, end: number): number {
  const tail = chars.slice(start, end).join('');
  const m = PHASE.exec(tail);
  return m ? trimEnd(chars, start, end - m[0].length) : end;
}

// Reads the charge at the end of chars[start, end); chargeStart is where it begins (end if none).
function readCharge(text: MappedText, start: number, end: number): { charge: number; chargeStart: number } {
  const tail = text.chars.slice(start, end).join('');
  const at = (offset: number) => start + offset;
  const caret = tail.lastIndexOf('^');
  if (caret >= 0) {
    const m = /^\^(?:(\d*)([+-])|([+-])(\d*))$/.exec(tail.slice(caret));
    if (!m) {
      throw new UnitsInputError('formula', `Charge after "^" at position ${positionOf(text, at(caret))} in "${text.original}": write digits then a sign, such as SO4^2-.`);
    }
    const digits = m[1] ?? m[4] ?? '';
    const sign = (m[2] ?? m[3]) === '-' ? -1 : 1;
    return { charge: sign * chargeSize(text, at(caret), digits), chargeStart: at(caret) };
  }
  const signDigits = /([+-]+)(\d+)$/.exec(tail);
  if (signDigits) {
    const signs = signDigits[1] as string;
    const s0 = at(signDigits.index);
    if (signs.length > 1) throw mixedSigns(text, s0, signDigits[0]);
    return { charge: (signs === '-' ? -1 : 1) * chargeSize(text, s0, signDigits[2] as string), chargeStart: s0 };
  }
  const bare = /[+-]+$/.exec(tail);
  if (bare) {
    const signs = bare[0];
    const s0 = at(bare.index);
    if (!/^(\++|-+)$/.test(signs)) throw mixedSigns(text, s0, signs);
    return { charge: (signs[0] === '-' ? -1 : 1) * signs.length, chargeStart: s0 };
  }
  return { charge: 0, chargeStart: end };
}

function chargeSize(text: MappedText, i: number, digits: string): number {
  const n = digits === '' ? 1 : Number(digits);
  if (n === 0) {
    throw new UnitsInputError('formula', `Charge of 0 at position ${positionOf(text, i)} in "${text.original}": leave the charge off for a neutral formula.`);
  }
  return n;
}

function mixedSigns(text: MappedText, i: number, written: string): UnitsInputError {
  return new UnitsInputError('formula', `Charge "${written}" at position ${positionOf(text, i)} in "${text.original}": use one sign, such as 2- or +2.`);
}
