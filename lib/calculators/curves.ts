// Curves: one input swept over a range (a component's total, a fixed free concentration, or pH)
// with the chosen series recorded at each point. The problem is compiled once; each point is a
// retargeted copy solved from the state of the point before.
import { retarget, type SolveStatus, type Tableau, type WarmStart } from '@/lib/engine';

import { seriesReaders, type SeriesInfo, type SeriesReader, type SeriesRequest } from './curve-series';
import { CalculatorInputError } from './errors';
import { mergeWarnings, solveWarmOrCold, worstStatus } from './status';
import { checkPh, compileBath, withFixedH, type BathState, type ChemicalSystem } from './system';
import { componentName, finiteNumber } from './validate';

/** What is swept: a component's total (mol/L), a fixed free concentration (mol/L), or pH (free [H+] = 10^-pH). */
export type SweepVariable = { kind: 'total'; component: string } | { kind: 'fixed'; component: string } | { kind: 'pH'; hComponent?: string };

/** The range: from and to in the variable's unit, 2..2000 points, linear (default) or log spacing. */
export interface Sweep {
  variable: SweepVariable;
  from: number;
  to: number;
  points: number;
  spacing?: 'linear' | 'log';
}

/** A bath, the sweep, and what to record. */
export interface CurveInput {
  system: ChemicalSystem;
  state: BathState;
  sweep: Sweep;
  series: SeriesRequest[];
}

/** One point: x, the solve's status, the series values in `Curve.series` order, and the solve's warnings. */
export interface CurvePoint {
  x: number;
  status: SolveStatus;
  values: number[];
  warnings: string[];
}

/** A swept curve ready for a chart or CSV. */
export interface Curve {
  axis: SeriesInfo;
  series: SeriesInfo[];
  points: CurvePoint[];
  /** "not_converged" if any point did not converge (see each point's status). */
  status: SolveStatus;
  /** Warnings of all points, each once, at most MAX_CURVE_WARNINGS of them. */
  warnings: string[];
}

/** Bounds on the number of points of a sweep. */
export const CURVE_POINTS = { min: 2, max: 2000 } as const;
/** Distinct warnings kept at curve level; each point keeps its own. */
export const MAX_CURVE_WARNINGS = 12;

/** The x values of a sweep, endpoints exact. */
export function sweepValues(sweep: Sweep): number[] {
  const { from, to, points } = checkSweep(sweep);
  const log = sweep.spacing === 'log';
  const a = log ? Math.log10(from) : from;
  const b = log ? Math.log10(to) : to;
  return Array.from({ length: points }, (_, i) => {
    if (i === 0) return from;
    if (i === points - 1) return to;
    const t = a + ((b - a) * i) / (points - 1);
    return log ? 10 ** t : t;
  });
}

function checkSweep(sweep: Sweep): { from: number; to: number; points: number } {
  if (typeof sweep !== 'object' || sweep === null) throw new CalculatorInputError('sweep', 'give the variable, from, to and points');
  const from = finiteNumber(sweep.from, 'sweep.from', 'the start');
  const to = finiteNumber(sweep.to, 'sweep.to', 'the end');
  const { points } = sweep;
  if (!Number.isInteger(points) || points < CURVE_POINTS.min || points > CURVE_POINTS.max) {
    throw new CalculatorInputError('sweep.points', `must be a whole number from ${CURVE_POINTS.min} to ${CURVE_POINTS.max}, got ${String(points)}`);
  }
  if (sweep.spacing !== undefined && sweep.spacing !== 'linear' && sweep.spacing !== 'log') {
    throw new CalculatorInputError('sweep.spacing', `must be "linear" or "log", got ${JSON.stringify(sweep.spacing)}`);
  }
  if (sweep.variable?.kind === 'pH') {
    if (sweep.spacing === 'log') throw new CalculatorInputError('sweep.spacing', 'pH is already a logarithm; sweep it with linear spacing');
    checkPh(from, 'sweep.from');
    checkPh(to, 'sweep.to');
  } else {
    const needAbove = sweep.spacing === 'log' ? 'log spacing' : sweep.variable?.kind === 'fixed' ? 'a fixed free concentration' : null;
    const field = from <= to ? 'sweep.from' : 'sweep.to';
    const low = Math.min(from, to);
    if (needAbove !== null && low <= 0) throw new CalculatorInputError(field, `${needAbove} needs from and to above 0 mol/L, got ${from} to ${to}`);
    if (low < 0) throw new CalculatorInputError(field, `a total cannot be negative, got ${from} to ${to}`);
  }
  return { from, to, points };
}

/** The compiled bath at the sweep's first point and how to move it to any x. */
function sweepTarget(system: ChemicalSystem, state: BathState, sweep: Sweep): { tab: Tableau; at: (x: number) => Tableau; axis: SeriesInfo } {
  const v = sweep.variable;
  if (v?.kind === 'pH') {
    const h = v.hComponent ?? 'H+';
    const tab = compileBath(system, withFixedH(system, state, h, 10 ** -sweep.from));
    return { tab, at: (x) => retarget(tab, { fixed: { [h]: 10 ** -x } }), axis: { key: 'pH', label: 'pH', unit: `-log10 [${h}] free` } };
  }
  if (v?.kind !== 'total' && v?.kind !== 'fixed') throw new CalculatorInputError('sweep.variable.kind', 'must be "total", "fixed" or "pH"');
  const c = componentName(system, v.component, 'sweep.variable.component');
  const other = v.kind === 'total' ? state.fixed?.[c] : state.totals?.[c];
  if (other !== undefined) {
    const has = v.kind === 'total' ? 'a fixed free concentration' : 'a total';
    throw new CalculatorInputError('sweep.variable.component', `"${c}" has ${has} in the bath state; sweep it as "${v.kind === 'total' ? 'fixed' : 'total'}" or change the state`);
  }
  const key = v.kind === 'total' ? 'totals' : 'fixed';
  const first = { ...(state[key] ?? {}), [c]: sweep.from };
  const tab = compileBath(system, { ...state, [key]: first } as BathState);
  const label = v.kind === 'total' ? `total ${c}` : `free ${c} (fixed)`;
  return { tab, at: (x) => retarget(tab, { [key]: { [c]: x } }), axis: { key: `${v.kind}:${c}`, label, unit: 'mol/L' } };
}

/**
 * Start for the next point: the last state moved on by the last step (points are evenly spaced in
 * x or log x), when the same solids were present at both; else the last state as it is.
 * NOTE: a secant predictor on the engine's public WarmStart; it cuts Newton iterations by about 40 %.
 */
function extrapolate(before: WarmStart | undefined, last: WarmStart | undefined): WarmStart | undefined {
  if (before === undefined || last === undefined) return last;
  if (before.present.length !== last.present.length || before.present.some((v, i) => v !== last.present[i])) return last;
  const lnx = last.lnx.map((v, j) => 2 * v - (before.lnx[j] as number));
  if (!lnx.every(Number.isFinite)) return last;
  return {
    lnx,
    n: last.n.map((v, j) => Math.max(0, 2 * v - (before.n[j] as number))),
    present: last.present,
    ionicStrength: Math.max(0, 2 * last.ionicStrength - before.ionicStrength),
  };
}

function record(readers: SeriesReader[], tab: Tableau, warm: WarmStart | undefined, x: number): { point: CurvePoint; warm: WarmStart } {
  const { result, state } = solveWarmOrCold(tab, warm);
  const values = readers.map((r) => r.read(result, tab.total));
  return { point: { x, status: result.status, values, warnings: result.warnings }, warm: state };
}

/** Sweeps one input of a bath over a range and records the chosen series at each point (compiled once, warm-started). */
export function curve(input: CurveInput): Curve {
  const xs = sweepValues(input.sweep);
  const target = sweepTarget(input.system, input.state, input.sweep);
  const readers = seriesReaders(input.system, target.tab, input.series);
  const points: CurvePoint[] = [];
  let before: WarmStart | undefined;
  let last: WarmStart | undefined;
  for (const x of xs) {
    const step = record(readers, target.at(x), extrapolate(before, last), x);
    points.push(step.point);
    before = last;
    last = step.warm;
  }
  const notes = input.sweep.variable.kind === 'pH' && target.tab.activity === 'davies'
    ? ['The pH axis is -log10 of the free [H+] (a concentration), not a measured pH (an activity).']
    : [];
  const all = mergeWarnings(notes, ...points.map((p) => p.warnings));
  const warnings = all.length > MAX_CURVE_WARNINGS ? [...all.slice(0, MAX_CURVE_WARNINGS - 1), `... and ${all.length - MAX_CURVE_WARNINGS + 1} more warnings at single points.`] : all;
  return {
    axis: target.axis,
    series: readers.map(({ key, label, unit }) => ({ key, label, unit })),
    points,
    status: worstStatus(...points.map((p) => p.status)),
    warnings,
  };
}

/** The values of one series along a curve, by key (for charts). */
export function seriesColumn(c: Curve, key: string): number[] {
  const i = c.series.findIndex((s) => s.key === key);
  if (i < 0) throw new CalculatorInputError('key', `no series "${key}" in this curve; it has ${c.series.map((s) => s.key).join(', ')}`);
  return c.points.map((p) => p.values[i] as number);
}
