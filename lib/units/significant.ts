// Rounding to significant figures and the one display format for measured values.
import { D, toDecimal, type Decimal, type DecimalInput } from './decimal';
import { UnitsInputError } from './errors';

/** Display options: `ascii` writes 1.23e-5 instead of 1.23 × 10⁻⁵ (for CSV and plain-text logs). */
export interface FormatOptions {
  ascii?: boolean;
}

/** Largest significant-figure count accepted: beyond 15 a JS number's digits are noise. */
export const MAX_SIGNIFICANT = 15;

// Plain notation for |x| in [1e-3, 1e6); scientific outside.
const PLAIN_MIN = new D('1e-3');
const PLAIN_MAX = new D('1e6');
const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

/** Rounds to `sig` significant figures, half away from zero (2.675 → 2.68 at 3, from its decimal text). */
export function roundSignificant(value: DecimalInput, sig: number): Decimal {
  checkSig(sig);
  return toDecimal(value, 'value').toSignificantDigits(sig, D.ROUND_HALF_UP);
}

/** Text for display at `sig` (1-15, default 3) significant figures: 0.00123, 2.50, 1230, 1.23 × 10⁻⁵; never "-0". */
export function formatSignificant(value: DecimalInput, sig = 3, opts: FormatOptions = {}): string {
  const r = roundSignificant(value, sig);
  if (r.isZero()) return '0';
  const abs = r.abs();
  if (abs.greaterThanOrEqualTo(PLAIN_MIN) && abs.lessThan(PLAIN_MAX)) {
    const exponent = r.e;
    return r.toFixed(Math.max(0, sig - 1 - exponent));
  }
  const [mantissa, exp] = r.toExponential(sig - 1).split('e') as [string, string];
  if (opts.ascii) return `${mantissa}e${exp}`;
  return `${mantissa} × 10${superscript(Number(exp))}`;
}

function superscript(n: number): string {
  const digits = String(Math.abs(n))
    .split('')
    .map((d) => SUPERSCRIPT_DIGITS[Number(d)])
    .join('');
  return (n < 0 ? '⁻' : '') + digits;
}

function checkSig(sig: number): void {
  if (typeof sig !== 'number' || !Number.isInteger(sig) || sig < 1 || sig > MAX_SIGNIFICANT) {
    throw new UnitsInputError('sig', `Significant figures must be a whole number from 1 to ${MAX_SIGNIFICANT} (got ${String(sig)}).`);
  }
}
