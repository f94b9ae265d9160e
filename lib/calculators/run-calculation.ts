// One calculation request (shared/calculations.ts) run on a system built from the library: the
// same function in the browser and on the server, so a saved run says what the screen said.
import type { z } from 'zod';

import type { SolveResult } from '@/lib/engine';
import type {
  CalculatorKey,
  curvesParamsSchema,
  dosingPlanParamsSchema,
  fixerLoadingParamsSchema,
  headroomParamsSchema,
  makeUpParamsSchema,
  precipitationOrderParamsSchema,
} from '@/shared/calculations';
import type { ProblemJson } from '@/shared/constants';

import { curve } from './curves';
import { dosingPlan } from './dosing-plan';
import { CalculatorInputError } from './errors';
import { fixerLoading } from './fixer-loading';
import { headroom } from './headroom';
import { makeUp } from './make-up';
import { precipitationOrder } from './precipitation-order';
import { speciation } from './speciation';
import type { BathState, ChemicalSystem, PhSetting } from './system';

/** What a calculation answers (JSON-safe: infinities and NaN become null). */
export interface CalculationRun {
  calculator: CalculatorKey;
  status: 'converged' | 'not_converged';
  verdict: string;
  warnings: string[];
  result: unknown;
}

type Params = {
  headroom: z.output<typeof headroomParamsSchema>;
  fixer_loading: z.output<typeof fixerLoadingParamsSchema>;
  speciation: Record<string, never>;
  curves: z.output<typeof curvesParamsSchema>;
  precipitation_order: z.output<typeof precipitationOrderParamsSchema>;
  dosing_plan: z.output<typeof dosingPlanParamsSchema>;
  make_up: z.output<typeof makeUpParamsSchema>;
};

/** The built problem as the calculators take it: a system, a bath state and the measured pH. */
export function calculatorInputs(problem: ProblemJson, pH: number | undefined): { system: ChemicalSystem; state: BathState; ph?: PhSetting } {
  const system: ChemicalSystem = {
    components: problem.components,
    species: problem.species,
    solids: problem.solids,
    activity: problem.activity,
    ...(problem.temperatureC !== undefined ? { temperatureC: problem.temperatureC } : {}),
  };
  const fixed = { ...problem.fixed };
  if (pH !== undefined) delete fixed['H+'];
  return { system, state: { totals: problem.totals, fixed }, ...(pH !== undefined ? { ph: { pH, measured: true } } : {}) };
}

const nonFiniteAsNull = (_k: string, v: unknown) => (typeof v === 'number' && !Number.isFinite(v) ? null : v);

/** JSON.stringify then JSON.parse: for what the walk below does not copy itself (dates, maps, typed arrays). */
function throughJson(value: unknown): unknown {
  return JSON.parse(JSON.stringify(value, nonFiniteAsNull) ?? 'null');
}

/** One value as JSON carries it; undefined means "left out" (undefined, functions, symbols). */
function jsonValue(v: unknown): unknown {
  switch (typeof v) {
    case 'number':
      // Infinity and NaN become null; -0 is written as 0.
      return Number.isFinite(v) ? v + 0 : null;
    case 'string':
    case 'boolean':
      return v;
    case 'undefined':
    case 'function':
    case 'symbol':
      return undefined;
    case 'object': {
      if (v === null) return null;
      if (Array.isArray(v)) return v.map((item) => jsonValue(item) ?? null);
      const proto = Object.getPrototypeOf(v) as unknown;
      if ((proto !== Object.prototype && proto !== null) || typeof (v as { toJSON?: unknown }).toJSON === 'function') return throughJson(v);
      const out: Record<string, unknown> = {};
      for (const key of Object.keys(v)) {
        const item = jsonValue((v as Record<string, unknown>)[key]);
        if (item !== undefined) out[key] = item;
      }
      return out;
    }
    default:
      return throughJson(v);
  }
}

/**
 * A value made safe for JSON: what JSON.stringify would write (infinities and NaN as null),
 * read back. Plain objects and arrays are copied by a walk, which costs a fraction of writing
 * and parsing the text (every calculation's result passes through here).
 */
export function jsonSafe<T>(value: T): unknown {
  return jsonValue(value) ?? null;
}

function percent(x: number): string {
  return x >= 0.995 ? '> 99 %' : x < 0.005 ? '< 1 %' : `${Math.round(x * 100)} %`;
}

/** "Ag+ is held mostly as Ag(CN)2- (97 %)", per metal, and the solids present. */
function speciationVerdict(problem: ProblemJson, components: ReturnType<typeof speciation>['components'], result: SolveResult): string {
  const metals = problem.components.filter((c) => c !== 'H+' && /\+\d*$/.test(c) && !['Na+', 'K+', 'NH4+'].includes(c));
  const parts = components
    .filter((c) => metals.includes(c.component) && c.total > 0)
    .map((c) => {
      const top = [...c.species].sort((a, b) => b.fraction - a.fraction)[0];
      const free = c.freeFraction;
      return top && top.fraction >= free ? `${c.component} is held mostly as ${top.name} (${percent(top.fraction)})` : `${c.component} is mostly free (${percent(free)})`;
    });
  const solids = Object.entries(result.solids)
    .filter(([, v]) => v > 0)
    .map(([k]) => k);
  const solidText = solids.length > 0 ? `${solids.join(', ')} present as solid` : 'no solid forms';
  return `${parts.length > 0 ? parts.join('; ') : 'No metal in the bath'}; ${solidText}.`;
}

/** Runs one calculator; throws CalculatorInputError (field under params or system) for input it cannot use. */
export function runCalculation<K extends CalculatorKey>(calculator: K, problem: ProblemJson, pH: number | undefined, params: Params[K]): CalculationRun {
  const { system, state, ph } = calculatorInputs(problem, pH);
  const base = { ...(ph ? { pH: ph } : {}) };
  switch (calculator) {
    case 'headroom': {
      const p = params as Params['headroom'];
      const r = headroom({ system, state, ...base, solid: p.solid, ...(p.metal ? { metal: p.metal } : {}) });
      return { calculator, status: r.status, verdict: r.message, warnings: r.warnings, result: jsonSafe(r) };
    }
    case 'fixer_loading': {
      const p = params as Params['fixer_loading'];
      const r = fixerLoading({ system, state, ...base, solid: p.solid, silver: p.silver });
      return { calculator, status: r.status, verdict: r.message, warnings: r.warnings, result: jsonSafe(r) };
    }
    case 'speciation': {
      const r = speciation({ system, state, ...base });
      return { calculator, status: r.status, verdict: speciationVerdict(problem, r.components, r.result), warnings: r.warnings, result: jsonSafe(r) };
    }
    case 'curves': {
      const p = params as Params['curves'];
      // A swept pH is a free [H+]; otherwise a measured pH is held as its free concentration.
      const fixedH: Record<string, number> = ph && p.variable.kind !== 'pH' ? { 'H+': 10 ** -ph.pH } : {};
      const r = curve({
        system,
        state: { totals: state.totals, fixed: { ...state.fixed, ...fixedH } },
        sweep: { variable: p.variable, from: p.from, to: p.to, points: p.points, spacing: p.spacing },
        series: p.series,
      });
      const unsettled = r.points.filter((pt) => pt.status !== 'converged').length;
      const verdict = `${r.axis.label} from ${p.from} to ${p.to} ${r.axis.unit} over ${r.points.length} points; ${unsettled === 0 ? 'every point settled' : `${unsettled} point${unsettled === 1 ? '' : 's'} did not settle and ${unsettled === 1 ? 'is' : 'are'} left out of the charts`}.`;
      return { calculator, status: r.status, verdict, warnings: r.warnings, result: jsonSafe(r) };
    }
    case 'precipitation_order': {
      const p = params as Params['precipitation_order'];
      const r = precipitationOrder({ system, state, ...base, precipitant: p.precipitant, cations: p.cations, ...(p.maxPrecipitantMolPerL ? { maxPrecipitantMolPerL: p.maxPrecipitantMolPerL } : {}) });
      return { calculator, status: r.status, verdict: r.message, warnings: r.warnings, result: jsonSafe(r) };
    }
    case 'dosing_plan': {
      const p = params as Params['dosing_plan'];
      const amounts = Object.fromEntries(Object.entries(state.totals).map(([k, v]) => [k, v * p.volumeL]));
      const r = dosingPlan({ system, vessel: { volumeL: p.volumeL, amounts, fixed: state.fixed, ...(ph ? { pH: ph } : {}) }, steps: p.steps });
      const last = r.states[r.states.length - 1];
      const solids = last ? Object.entries(last.result.solids).filter(([, v]) => v > 0).map(([k]) => k) : [];
      const verdict = `After ${p.steps.length} step${p.steps.length === 1 ? '' : 's'}: ${(last?.volumeL ?? p.volumeL).toPrecision(4)} L${solids.length ? `, with ${solids.join(', ')} as solid` : ', nothing solid'}.`;
      return { calculator, status: r.status, verdict, warnings: r.warnings, result: jsonSafe(r) };
    }
    case 'make_up': {
      const p = params as Params['make_up'];
      const r = makeUp({ system, state, ...base, volume: p.volume, salt: p.salt, target: p.target, massUnit: p.massUnit });
      return { calculator, status: r.status, verdict: r.message, warnings: r.warnings, result: jsonSafe(r) };
    }
    default:
      throw new CalculatorInputError('calculator', `no calculator named ${String(calculator)}`);
  }
}
