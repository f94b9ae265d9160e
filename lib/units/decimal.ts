// The configured decimal.js clone every units function computes with, and the one way in.
import DecimalJs from 'decimal.js';

import { UnitsInputError } from './errors';

/** Decimal with 40 significant digits and half-away-from-zero rounding, so conversions stay exact far past display. */
export const D = DecimalJs.clone({ precision: 40, rounding: DecimalJs.ROUND_HALF_UP });

/** A decimal.js value; instances of any clone interoperate. */
export type Decimal = DecimalJs;

/** What numeric arguments may be: a JS number, a decimal string ("12.5", "1.2e-3") or a Decimal. */
export type DecimalInput = number | string | Decimal;

// Plain or scientific decimal notation only: decimal.js would also take hex, binary and "Infinity".
const DECIMAL_TEXT = /^[+-]?(\d+\.?\d*|\.\d+)(e[+-]?\d+)?$/i;

/** Converts a caller's number to a finite Decimal or throws UnitsInputError naming `field`. */
export function toDecimal(x: DecimalInput, field: string): Decimal {
  if (typeof x === 'number') {
    if (!Number.isFinite(x)) throw new UnitsInputError(field, `${field} must be a finite number (got ${x}).`);
    return new D(x);
  }
  if (typeof x === 'string') {
    const text = x.trim();
    if (!DECIMAL_TEXT.test(text)) {
      throw new UnitsInputError(field, `${field} "${x}" is not a number: write digits such as 12.5 or 1.2e-3.`);
    }
    return new D(text);
  }
  if (DecimalJs.isDecimal(x)) {
    if (!x.isFinite()) throw new UnitsInputError(field, `${field} must be a finite number (got ${x.toString()}).`);
    return new D(x);
  }
  throw new UnitsInputError(field, `${field} must be a number, a decimal string or a Decimal.`);
}

/** Like toDecimal, and also refuses values below zero (amounts, volumes, masses, concentrations). */
export function toNonNegativeDecimal(x: DecimalInput, field: string): Decimal {
  const d = toDecimal(x, field);
  if (d.isNegative() && !d.isZero()) {
    throw new UnitsInputError(field, `${field} must not be negative (got ${d.toString()}).`);
  }
  return d;
}

/** Like toDecimal, and also requires a value above zero (molar masses, volumes one divides by). */
export function toPositiveDecimal(x: DecimalInput, field: string): Decimal {
  const d = toDecimal(x, field);
  if (!d.isPositive() || d.isZero()) {
    throw new UnitsInputError(field, `${field} must be greater than zero (got ${d.toString()}).`);
  }
  return d;
}
