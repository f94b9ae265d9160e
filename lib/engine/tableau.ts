// Checks a problem in the general form and compiles it into the tableau the solver works on:
// components as columns, species and solids as rows of stoichiometric coefficients, constants as
// natural logs corrected to the solution temperature.

import { chargeFromName } from './charge';
import { DEFAULTS } from './defaults';
import { EngineInputError } from './errors';
import { daviesA, vantHoff } from './temperature';
import type { ActivityModel, Problem } from './types';

const REFERENCE_TEMPERATURE_C = DEFAULTS.referenceTemperatureC;

/** The compiled problem. Arrays are row-major: a[i * nc + j] is species i's count of component j. */
export interface Tableau {
  nc: number;
  components: string[];
  componentCharge: number[];
  /** 1 where the component's free concentration is fixed. */
  fixed: number[];
  /** Analytical total, mol/L (0 for fixed components). */
  total: number[];
  /** Fixed free concentration as given, mol/L (0 for components with totals). */
  fixedValue: number[];
  /** ln of the fixed free concentration (0 for components with totals). */
  fixedLn: number[];
  ns: number;
  speciesNames: string[];
  speciesCharge: number[];
  lnK: number[];
  a: number[];
  nsol: number;
  solidNames: string[];
  lnKsp: number[];
  b: number[];
  activity: ActivityModel;
  temperatureC: number;
  /** Davies A at the solution temperature. */
  daviesA: number;
  /** Ionic strength held fixed, mol/L, or null to compute it. */
  fixedIonicStrength: number | null;
  /** Cautions known before solving (constants used at another temperature). */
  warnings: string[];
}

type Obj = Record<string, unknown>;

/** A packed array of n zeros (quicker to build and read than new Array(n).fill(0), which starts holey). */
export function zeros(n: number): number[] {
  const out: number[] = [];
  for (let i = 0; i < n; i++) out.push(0);
  return out;
}

function isObject(value: unknown): value is Obj {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}

function finite(value: unknown, field: string, what: string): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new EngineInputError(field, `${what} must be a finite number, got ${describe(value)}`);
  }
  return value;
}

function describe(value: unknown): string {
  if (typeof value === 'number') return String(value);
  if (value === null) return 'null';
  if (typeof value === 'string') return JSON.stringify(value);
  return typeof value;
}

// Component positions are looked up with indexOf on the names: lists are short (a handful of
// components), and a scan of them is quicker than hashing into a Map on every solve.

function readComponents(problem: Obj): string[] {
  const list = problem.components;
  if (!Array.isArray(list) || list.length === 0) {
    throw new EngineInputError('components', 'give a non-empty list of component names such as ["Ag+", "CN-", "H+"]');
  }
  for (let i = 0; i < list.length; i++) {
    const name: unknown = list[i];
    if (typeof name !== 'string' || name.trim() === '') {
      throw new EngineInputError(`components[${i}]`, 'a component name must be a non-empty string');
    }
    if (list.indexOf(name) < i) throw new EngineInputError(`components[${i}]`, `duplicate component "${name}"`);
  }
  return list as string[];
}

/** Reads totals (mol/L, at least 0) or fixed free concentrations (above 0) into `into`; marks `seen`. */
function readAmounts(problem: Obj, key: 'totals' | 'fixed', components: readonly string[], into: number[], seen: number[]): void {
  const raw = problem[key];
  if (raw === undefined) return;
  if (!isObject(raw)) throw new EngineInputError(key, 'must be an object of component name to mol/L');
  for (const name in raw) {
    const value = raw[name];
    const j = components.indexOf(name);
    const v = typeof value === 'number' && Number.isFinite(value) ? value : NaN;
    if (j < 0 || !(key === 'totals' ? v >= 0 : v > 0)) {
      const field = `${key}.${name}`;
      if (j < 0) throw new EngineInputError(field, `"${name}" is not one of the components`);
      finite(value, field, key === 'totals' ? 'a total' : 'a fixed free concentration');
      if (key === 'totals') throw new EngineInputError(field, `a total cannot be negative (got ${v} mol/L)`);
      throw new EngineInputError(field, `a fixed free concentration must be above 0 mol/L (got ${v})`);
    }
    into[j] = v;
    seen[j] = 1;
  }
}

/**
 * Where the reactions of one list are compiled to: a row of counts per entry in `rows` (row-major,
 * nc per entry), its name, its log K as ln K, and (species) its charge. Entries are written in
 * place as they are read, with no per-entry objects.
 */
interface ReactionTable {
  rows: number[];
  names: string[];
  lnK: number[];
  charge: number[] | null;
}

function reactionTable(count: number, nc: number, withCharge: boolean): ReactionTable {
  return { rows: zeros(count * nc), names: new Array<string>(count), lnK: zeros(count), charge: withCharge ? zeros(count) : null };
}

interface ReadContext {
  components: readonly string[];
  nc: number;
  temperatureC: number;
  stale: string[];
}

/** The field path of entry i of a list, e.g. "species[2]"; built only when an error needs it. */
function entryPath(list: 'species' | 'solids', i: number): string {
  return `${list}[${i}]`;
}

/** finite() for a field of entry i of a list; the field path is built only on failure. */
function finiteAt(value: unknown, list: 'species' | 'solids', i: number, field: string, what: string): number {
  return typeof value === 'number' && Number.isFinite(value) ? value : finite(value, `${entryPath(list, i)}.${field}`, what);
}

/** Reads entry i's stoich into row i of `rows` (zeros where a component is not named). */
function readStoich(raw: unknown, list: 'species' | 'solids', i: number, ctx: ReadContext, rows: number[]): void {
  if (!isObject(raw)) throw new EngineInputError(`${entryPath(list, i)}.stoich`, 'must be an object of component name to count');
  const at = i * ctx.nc;
  let any = false;
  for (const name in raw) {
    const j = ctx.components.indexOf(name);
    if (j < 0) {
      throw new EngineInputError(`${entryPath(list, i)}.stoich.${name}`, `unknown component "${name}"; add it to components or fix the name`);
    }
    const value = raw[name];
    const v = typeof value === 'number' && Number.isFinite(value) ? value : finite(value, `${entryPath(list, i)}.stoich.${name}`, 'a stoichiometric coefficient');
    rows[at + j] = v;
    if (v !== 0) any = true;
  }
  if (!any) throw new EngineInputError(`${entryPath(list, i)}.stoich`, 'needs at least one component with a non-zero coefficient');
}

/** Reads entry i of a list into entry i of the table; returns its name. */
function readReaction(raw: unknown, list: 'species' | 'solids', i: number, ctx: ReadContext, into: ReactionTable): string {
  const key = list === 'solids' ? 'logKsp' : 'logK';
  if (!isObject(raw)) throw new EngineInputError(entryPath(list, i), `must be an object with name, ${key} and stoich`);
  const { name } = raw;
  if (typeof name !== 'string' || name.trim() === '') throw new EngineInputError(`${entryPath(list, i)}.name`, 'must be a non-empty string');
  let logK = finiteAt(raw[key], list, i, key, list === 'solids' ? 'log Ksp' : 'log K');
  readStoich(raw.stoich, list, i, ctx, into.rows);
  const refC = raw.temperatureC === undefined ? REFERENCE_TEMPERATURE_C : finiteAt(raw.temperatureC, list, i, 'temperatureC', 'a temperature');
  if (raw.deltaH !== undefined) {
    const dh = finiteAt(raw.deltaH, list, i, 'deltaH', 'an enthalpy in kJ/mol');
    logK = vantHoff(logK, dh, refC, ctx.temperatureC);
  } else if (Math.abs(refC - ctx.temperatureC) > 0.5) {
    ctx.stale.push(name);
  }
  if (into.charge) into.charge[i] = raw.charge !== undefined ? finiteAt(raw.charge, list, i, 'charge', 'a charge') : chargeFromName(name);
  into.names[i] = name;
  into.lnK[i] = logK * Math.LN10;
  return name;
}

function readList(problem: Obj, key: 'species' | 'solids'): unknown[] {
  const raw = problem[key];
  if (raw === undefined) return [];
  if (!Array.isArray(raw)) throw new EngineInputError(key, 'must be a list');
  return raw;
}

function readActivity(problem: Obj): ActivityModel {
  const raw = problem.activity;
  if (raw === undefined) return 'ideal';
  const v = typeof raw === 'string' ? raw.toLowerCase() : raw;
  if (v !== 'ideal' && v !== 'davies') throw new EngineInputError('activity', `must be "ideal" or "davies", got ${describe(raw)}`);
  return v;
}

function readTemperature(input: Obj): number {
  if (input.temperatureC === undefined) return DEFAULTS.referenceTemperatureC;
  const t = finite(input.temperatureC, 'temperatureC', 'the temperature');
  if (t < -5 || t > 150) throw new EngineInputError('temperatureC', `must lie between -5 and 150 C for water, got ${t}`);
  return t;
}

function readIonicStrength(input: Obj): number | null {
  if (input.ionicStrength === undefined) return null;
  const v = finite(input.ionicStrength, 'ionicStrength', 'a fixed ionic strength');
  if (v < 0) throw new EngineInputError('ionicStrength', `cannot be negative (got ${v} mol/L)`);
  return v;
}

/** True when name occurs in names[0..upto). Lists are short; a scan beats building a set. */
function occursBefore(names: readonly string[], name: string, upto: number): boolean {
  for (let k = 0; k < upto; k++) if (names[k] === name) return true;
  return false;
}

/** Whether row s of a row-major table has a non-zero coefficient on a component that is not fixed. */
function hasFreeComponent(rows: readonly number[], s: number, fixed: readonly number[]): boolean {
  const nc = fixed.length;
  for (let j = 0; j < nc; j++) if (rows[s * nc + j] !== 0 && !fixed[j]) return true;
  return false;
}

/** Checks a problem and compiles it; throws EngineInputError naming the field at fault. */
export function compileProblem(input: Problem | unknown): Tableau {
  if (!isObject(input)) throw new EngineInputError('problem', 'must be a JSON object with components, totals, species and solids');
  const components = readComponents(input);
  const nc = components.length;
  const total = zeros(nc);
  const fixedValue = zeros(nc);
  const fixedLn = zeros(nc);
  const hasTotal = zeros(nc);
  const fixed = zeros(nc);
  readAmounts(input, 'totals', components, total, hasTotal);
  readAmounts(input, 'fixed', components, fixedValue, fixed);
  for (let j = 0; j < nc; j++) if (fixed[j]) fixedLn[j] = Math.log(fixedValue[j] as number);
  for (let j = 0; j < nc; j++) {
    const name = components[j] as string;
    if (hasTotal[j] && fixed[j]) throw new EngineInputError(`fixed.${name}`, `"${name}" has both a total and a fixed free concentration; give one`);
    if (!hasTotal[j] && !fixed[j]) throw new EngineInputError(`totals.${name}`, `component "${name}" needs a total (mol/L) or a fixed free concentration`);
  }
  const temperatureC = readTemperature(input);
  const activity = readActivity(input);
  const ctx: ReadContext = { components, nc, temperatureC, stale: [] };

  const rawSpecies = readList(input, 'species');
  const ns = rawSpecies.length;
  const species = reactionTable(ns, nc, true);
  for (let i = 0; i < ns; i++) {
    const name = readReaction(rawSpecies[i], 'species', i, ctx, species);
    if (components.indexOf(name) >= 0 || occursBefore(species.names, name, i)) {
      throw new EngineInputError(`species[${i}].name`, `duplicate name "${name}" (components and species share one list of names)`);
    }
  }
  const rawSolids = readList(input, 'solids');
  const nsol = rawSolids.length;
  const solids = reactionTable(nsol, nc, false);
  for (let i = 0; i < nsol; i++) {
    const name = readReaction(rawSolids[i], 'solids', i, ctx, solids);
    if (occursBefore(solids.names, name, i)) throw new EngineInputError(`solids[${i}].name`, `duplicate solid "${name}"`);
    if (!hasFreeComponent(solids.rows, i, fixed)) {
      throw new EngineInputError(`solids[${i}].stoich`, `"${name}" is made only of fixed components; at least one of its components needs a total`);
    }
  }
  const fixedIonicStrength = readIonicStrength(input);

  const warnings: string[] = [];
  if (ctx.stale.length > 0) {
    warnings.push(`Constants for ${ctx.stale.join(', ')} are for another temperature and have no enthalpy; they are used as given at ${temperatureC} C.`);
  }
  if (activity === 'davies' && Math.abs(temperatureC - 25) > 0.5) {
    warnings.push(`Davies A is scaled from 0.509 at 25 C to ${temperatureC} C through the permittivity of water.`);
  }

  const componentCharge = new Array<number>(nc);
  for (let j = 0; j < nc; j++) componentCharge[j] = chargeFromName(components[j] as string);

  return {
    nc,
    components,
    componentCharge,
    fixed,
    total,
    fixedValue,
    fixedLn,
    ns,
    speciesNames: species.names,
    speciesCharge: species.charge as number[],
    lnK: species.lnK,
    a: species.rows,
    nsol,
    solidNames: solids.names,
    lnKsp: solids.lnK,
    b: solids.rows,
    activity,
    temperatureC,
    daviesA: daviesA(DEFAULTS.daviesA, temperatureC),
    fixedIonicStrength,
    warnings,
  };
}

/** A copy of a compiled tableau with some totals or fixed free concentrations changed (mol/L). */
export function retarget(tab: Tableau, change: { totals?: Record<string, number>; fixed?: Record<string, number> }): Tableau {
  const total = Array.from(tab.total);
  const fixedLn = Array.from(tab.fixedLn);
  const fixedValue = Array.from(tab.fixedValue);
  for (const [name, v] of Object.entries(change.totals ?? {})) {
    const j = tab.components.indexOf(name);
    if (j < 0 || tab.fixed[j]) throw new EngineInputError(`totals.${name}`, `"${name}" is not a component with a total`);
    if (!Number.isFinite(v) || v < 0) throw new EngineInputError(`totals.${name}`, `a total must be a finite number of at least 0 mol/L, got ${v}`);
    total[j] = v;
  }
  for (const [name, v] of Object.entries(change.fixed ?? {})) {
    const j = tab.components.indexOf(name);
    if (j < 0 || !tab.fixed[j]) throw new EngineInputError(`fixed.${name}`, `"${name}" is not a fixed component`);
    if (!Number.isFinite(v) || v <= 0) throw new EngineInputError(`fixed.${name}`, `a fixed free concentration must be above 0 mol/L, got ${v}`);
    fixedLn[j] = Math.log(v);
    fixedValue[j] = v;
  }
  return { ...tab, total, fixedValue, fixedLn };
}

