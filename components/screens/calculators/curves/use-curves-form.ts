import { useState } from 'react';

import { parseAmount, type SystemForm } from '@/components/screens/calculate/use-system-form';
import { type ParamsBase, type ParamsCheck } from '@/components/screens/calculators/frame/types';
import { type SeriesRequest } from '@/lib/calculators/curve-series';
import { CURVE_MAX_POINTS } from '@/shared/calculations';

import { curveChoices, defaultSeries, defaultVariable, seriesKey, validSeries, variableChoices, type CurveChoices, type SeriesKind, type VariableKey } from './curve-options';
import { LIVE_MAX_POINTS } from './run-in-chunks';

/** Spacing of the swept values. */
export type Spacing = 'linear' | 'log';

/** Most series one curve records (the schema's limit). */
export const MAX_SERIES = 12;

function short(x: number): string {
  return String(Number(x.toPrecision(3)));
}

/** The range offered for a swept input: pH 2 to 12; a total from 0 (a thousandth of the end on a log scale) to twice the bath's total, or 0.1 mol/L. */
export function defaultRange(variable: VariableKey, form: SystemForm, spacing: Spacing): { from: string; to: string } {
  if (variable === 'pH') return { from: '2', to: '12' };
  const total = parseAmount(form.totals[variable.slice(6)] ?? '');
  const to = total !== undefined && total > 0 && Number.isFinite(total) ? Math.min(20, 2 * total) : 0.1;
  return { from: spacing === 'log' ? short(to / 1000) : '0', to: short(to) };
}

/** The curve's fields as they stand, defaults filled in from the system. */
export type CurvesFields = {
  choices: CurveChoices;
  variables: VariableKey[];
  variable: VariableKey;
  from: string;
  to: string;
  points: string;
  spacing: Spacing;
  series: SeriesRequest[];
};

/** The curve's own inputs: what is swept and over what range, how finely, and what is drawn. */
export function useCurvesForm() {
  const [variable, setVariable] = useState<VariableKey | null>(null);
  const [from, setFrom] = useState<string | null>(null);
  const [to, setTo] = useState<string | null>(null);
  const [points, setPoints] = useState('100');
  const [spacing, setSpacing] = useState<Spacing>('linear');
  const [series, setSeries] = useState<SeriesRequest[] | null>(null);

  /** The fields with the defaults the system suggests where the person has not typed. */
  const resolve = (base: ParamsBase): CurvesFields => {
    const choices = curveChoices(base);
    const variables = variableChoices(choices);
    const v = variable !== null && variables.includes(variable) ? variable : defaultVariable(choices);
    const space: Spacing = v === 'pH' ? 'linear' : spacing;
    const range = defaultRange(v, base.form, space);
    return {
      choices,
      variables,
      variable: v,
      from: from ?? range.from,
      to: to ?? range.to,
      points,
      spacing: space,
      series: series === null ? defaultSeries(v, choices) : validSeries(series, choices),
    };
  };

  const n = parseAmount(points);
  return {
    resolve,
    /** Short sweeps redraw as one types; long ones wait for Calculate. */
    live: n !== undefined && Number.isInteger(n) && n >= 2 && n <= LIVE_MAX_POINTS,
    setVariable: (v: VariableKey) => {
      setVariable(v);
      // A new input has its own range.
      setFrom(null);
      setTo(null);
    },
    setFrom,
    setTo,
    setPoints,
    setSpacing: (s: Spacing) => {
      setSpacing(s);
      if (s === 'log' && from !== null && (parseAmount(from) ?? 0) <= 0) setFrom(null);
    },
    /** Adds or removes one series, starting from what is drawn now. */
    toggleSeries: (kind: SeriesKind, name: string, current: readonly SeriesRequest[]) => {
      const key = `${kind}:${name}`;
      const on = current.some((s) => seriesKey(s) === key);
      const next = on ? current.filter((s) => seriesKey(s) !== key) : [...current, kind === 'species' || kind === 'solid' || kind === 'saturation' ? { kind, name } : { kind, component: name }];
      setSeries(next.slice(0, MAX_SERIES) as SeriesRequest[]);
    },
  };
}

/** The curve's form state and actions. */
export type CurvesForm = ReturnType<typeof useCurvesForm>;

function numberField(text: string, what: string, errors: Record<string, string>, field: string): number | undefined {
  const v = parseAmount(text);
  if (v === undefined) errors[field] = `Enter ${what}`;
  else if (Number.isNaN(v)) errors[field] = `Must be a number (${what})`;
  return v !== undefined && !Number.isNaN(v) ? v : undefined;
}

/** The params for the calculation, or the messages beside the fields. */
export function curvesParams(f: CurvesFields): ParamsCheck {
  const errors: Record<string, string> = {};
  const unit = f.variable === 'pH' ? 'the pH' : 'mol/L';
  const from = numberField(f.from, `the start of the range in ${unit}`, errors, 'from');
  const to = numberField(f.to, `the end of the range in ${unit}`, errors, 'to');
  const points = numberField(f.points, `from 2 to ${CURVE_MAX_POINTS} points`, errors, 'points');
  if (f.series.length === 0) errors.series = 'Choose at least one thing to draw';
  if (Object.keys(errors).length > 0) return { ok: false, errors };
  const variable = f.variable === 'pH' ? { kind: 'pH' } : { kind: 'total', component: f.variable.slice(6) };
  return { ok: true, params: { variable, from, to, points, spacing: f.spacing, series: f.series } };
}
