// Checks shared by the calculators; each throws CalculatorInputError naming the field and the fix.
import { CalculatorInputError } from './errors';
import type { BathState, ChemicalSystem } from './system';

function show(value: unknown): string {
  if (typeof value === 'number') return String(value);
  if (typeof value === 'string') return JSON.stringify(value);
  return value === null ? 'null' : typeof value;
}

/** A finite number, or a throw naming `field`. */
export function finiteNumber(value: unknown, field: string, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new CalculatorInputError(field, `${what} must be a finite number, got ${show(value)}`);
  }
  return value;
}

/** A finite number of at least 0 (amounts, volumes added), or a throw. */
export function nonNegative(value: unknown, field: string, what: string): number {
  const v = finiteNumber(value, field, what);
  if (v < 0) throw new CalculatorInputError(field, `${what} cannot be negative, got ${v}`);
  return v;
}

/** A finite number above 0 (volumes, targets one divides by), or a throw. */
export function positive(value: unknown, field: string, what: string): number {
  const v = finiteNumber(value, field, what);
  if (v <= 0) throw new CalculatorInputError(field, `${what} must be above 0, got ${v}`);
  return v;
}

/** A name that is one of the system's components, or a throw listing them. */
export function componentName(system: ChemicalSystem, name: unknown, field: string): string {
  if (typeof name !== 'string' || !system.components.includes(name)) {
    throw new CalculatorInputError(field, `${show(name)} is not a component of the system; use one of ${system.components.join(', ')}`);
  }
  return name;
}

/** A component that has an analytical total in the bath state, or a throw. */
export function totalComponent(system: ChemicalSystem, state: BathState, name: unknown, field: string): string {
  const c = componentName(system, name, field);
  if (state.totals?.[c] === undefined) {
    throw new CalculatorInputError(field, `"${c}" needs a total (mol/L) in the bath state, not a fixed free concentration`);
  }
  return c;
}

/** A solid of the system by name, or a throw listing the solids there are. */
export function solidName(system: ChemicalSystem, name: unknown, field: string): string {
  const solids = system.solids ?? [];
  if (typeof name !== 'string' || !solids.some((s) => s.name === name)) {
    const known = solids.length > 0 ? `use one of ${solids.map((s) => s.name).join(', ')}` : 'the system has no solids; add one';
    throw new CalculatorInputError(field, `${show(name)} is not a solid of the system; ${known}`);
  }
  return name;
}
