// Shared helpers for the calculator tests: closeness, the error a call throws, invariants every
// result must keep, and small systems built from the reference constants.
import type { SolveResult } from '@/lib/engine';
import { CalculatorInputError, type BathState, type ChemicalSystem } from '@/lib/calculators';
import { dissolvedTotal, solidTotal } from '@/lib/calculators/tally';
import { REFERENCE_SOLIDS, REFERENCE_SPECIES, referenceSystem } from '@/lib/chemistry/reference-constants';

/** Fails with both numbers when |actual - expected| > relative x |expected| + absolute. */
export function expectClose(actual: number, expected: number, relative: number, absolute = 0): void {
  const diff = Math.abs(actual - expected);
  if (!(diff <= relative * Math.abs(expected) + absolute)) {
    throw new Error(`expected ${expected} within ${relative} relative (+${absolute}), got ${actual} (off by ${(diff / Math.abs(expected)).toExponential(2)} relative)`);
  }
}

/** Runs `fn` and returns the CalculatorInputError it threw; fails otherwise. */
export function inputError(fn: () => unknown): CalculatorInputError {
  try {
    fn();
  } catch (e) {
    if (e instanceof CalculatorInputError) return e;
    throw new Error(`expected a CalculatorInputError, got ${String(e)}`);
  }
  throw new Error('expected a throw, got a return');
}

/** Fails if any number anywhere in `value` is NaN. */
export function expectNoNaN(value: unknown, path = 'result'): void {
  if (typeof value === 'number') {
    if (Number.isNaN(value)) throw new Error(`NaN at ${path}`);
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => expectNoNaN(v, `${path}[${i}]`));
  } else if (typeof value === 'object' && value !== null) {
    for (const [k, v] of Object.entries(value)) expectNoNaN(v, `${path}.${k}`);
  }
}

/** Mass balance (dissolved + solids = total, 1e-9 relative), no negative amounts, no NaN. */
export function expectInvariants(system: ChemicalSystem, state: BathState, result: SolveResult): void {
  expectNoNaN(result);
  for (const v of [...Object.values(result.species), ...Object.values(result.solids)]) expect(v).toBeGreaterThanOrEqual(0);
  for (const [c, total] of Object.entries(state.totals)) {
    expectClose(dissolvedTotal(system, result, c) + solidTotal(system, result, c), total, 1e-9, 1e-300);
  }
}

/** Reference species and solids (sources named in reference-constants.ts) that form from these components, without the source text. */
export function referenceBath(components: string[], activity: 'ideal' | 'davies' = 'ideal', only?: string[]): ChemicalSystem {
  const { species, solids } = referenceSystem(components);
  const keep = <T extends { name: string; source: string }>(list: T[]) =>
    list.filter((x) => only === undefined || only.includes(x.name)).map(({ source: _source, ...rest }) => rest);
  return { components, species: keep(species), solids: keep(solids), activity };
}

/** log K or log Ksp of a reference constant by name (Smith & Martell, CRC, Baes & Mesmer; from memory). */
export function refLog(name: string): number {
  const found = REFERENCE_SPECIES.find((s) => s.name === name)?.logK ?? REFERENCE_SOLIDS.find((s) => s.name === name)?.logKsp;
  if (found === undefined) throw new Error(`no reference constant ${name}`);
  return found;
}
