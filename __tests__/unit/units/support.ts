// Shared helpers for the units tests: closeness of Decimals, and the error a call throws.
import { D, type Decimal } from '@/lib/units';

/** Fails with both numbers in the message when |actual - expected| > tolerance. */
export function expectClose(actual: Decimal, expected: string, tolerance: string): void {
  const diff = new D(actual).minus(expected).abs();
  if (diff.greaterThan(tolerance)) {
    throw new Error(`expected ${expected} ± ${tolerance}, got ${actual.toString()} (off by ${diff.toString()})`);
  }
}

/** Runs `fn` and returns what it threw; fails when it returns normally. */
export function caught(fn: () => unknown): unknown {
  try {
    fn();
  } catch (e) {
    return e;
  }
  throw new Error('expected a throw, got a return');
}
