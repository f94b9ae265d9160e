import { useEffect, useRef, useState } from 'react';

import { type SystemForm } from '@/components/screens/calculate/use-system-form';
import { ApiError } from '@/lib/api/fetcher';
import { NO_ERRORS } from '@/lib/api/form-errors';
import { useBuildSystem } from '@/lib/api/use-system';
import { PARAMS_SCHEMAS } from '@/shared/calculations';
import { type BuiltSystem, type RunInput, type SystemRequest } from '@/shared/constants';

import { placeApiError, placeCalculatorError, placeField, placeParamIssues, type FieldNames, type PlacedErrors } from './errors';
import { runAtOnce, selectionOf, solveBathHere } from './run';
import { type CalculatorFrameProps, type FrameOutcome } from './types';
import { usePreviewBuild, type BuiltFor } from './use-preview-build';

/** Wait after the last keystroke before a live recalculation, ms. */
export const LIVE_DEBOUNCE_MS = 400;

type Options = Pick<CalculatorFrameProps, 'calculator' | 'params' | 'display' | 'paramFields' | 'paramField' | 'live' | 'adjustSystem' | 'runner'>;
type Checked = { ok: true; request: SystemRequest; raw: Record<string, unknown>; run: Record<string, unknown> } | { ok: false };
type Shown = { params: Record<string, string>; top?: string };

/**
 * The calculation behind a calculator screen: checks the system and the params, builds the system
 * (POST /api/systems/build), solves the bath and runs the calculator here, live when asked, with
 * progress and Cancel for long runs; and the request a saved run sends. Errors land beside fields.
 */
export function useCalculation(form: SystemForm, bathId: string | null, opts: Options) {
  const build = useBuildSystem();
  const [outcome, setOutcome] = useState<FrameOutcome | null>(null);
  const [built, setBuilt] = useState<BuiltFor | null>(null);
  const [running, setRunning] = useState(false);
  const [progress, setProgress] = useState<number | null>(null);
  const [shown, setShown] = useState<Shown>({ params: {} });
  const [attempted, setAttempted] = useState(false);
  const generation = useRef(0);
  const cache = useRef<{ key: string; built: BuiltSystem } | null>(null);
  usePreviewBuild(form, (b) => setBuilt((now) => (now?.key === b.key ? now : b)));

  const base = { built: built?.built ?? null, form };
  const paramsFor = (b: typeof base) => (typeof opts.params === 'function' ? opts.params(b) : opts.params);
  const paramsNow = paramsFor(base);
  const params = paramsNow;
  const names: FieldNames = { system: form.knownFields(), params: opts.paramFields, paramField: opts.paramField };
  const key = `${form.version}|${JSON.stringify(params)}`;

  const show = (placed: PlacedErrors) => {
    form.setErrors(placed.system);
    setShown({ params: placed.params, top: placed.top });
  };

  /** The request and params to send, or false with the errors shown (unless quiet). */
  const check = (quiet: boolean, params = paramsNow): Checked => {
    const sys = form.toRequest();
    const placed: PlacedErrors = { system: sys.ok ? NO_ERRORS : sys.errors, params: {} };
    let run: Record<string, unknown> | null = null;
    if (!params.ok) {
      for (const [field, message] of Object.entries(params.errors)) placeField(`params.${field}`, message, names, placed);
      if (params.message) placed.top = params.message;
    } else {
      const parsed = PARAMS_SCHEMAS[opts.calculator].safeParse(params.params);
      if (parsed.success) run = { ...params.params, ...(parsed.data as Record<string, unknown>) };
      else {
        const issues = placeParamIssues(parsed.error.issues, names);
        placed.params = issues.params;
        placed.top = issues.top;
      }
    }
    if (!sys.ok || !params.ok || run === null) {
      if (!quiet) show(placed);
      return { ok: false };
    }
    show({ system: NO_ERRORS, params: {} });
    const request = opts.adjustSystem ? opts.adjustSystem(sys.request, params.params) : sys.request;
    return { ok: true, request, raw: params.params, run };
  };

  const buildFor = async (request: SystemRequest, reuse: boolean): Promise<BuiltSystem> => {
    const k = JSON.stringify(request);
    // Live redraws reuse the last build for the same request; Calculate always asks the library again.
    if (reuse && cache.current?.key === k) return cache.current.built;
    const fresh = await build.trigger(request);
    cache.current = { key: k, built: fresh };
    return fresh;
  };

  /** One calculation; `live` for a redraw after typing (quiet until Calculate was pressed once, reusing the last build). */
  const calculate = async (live: boolean) => {
    const quiet = live && !attempted;
    if (!live) setAttempted(true);
    const gen = ++generation.current;
    let c = check(quiet);
    if (!c.ok && !live && typeof opts.params === 'function') {
      // Parameters that depend on the built system (a solid to offer, say) may be waiting for a
      // build still on its way: build now from the system as entered, then check them again.
      const sys = form.toRequest();
      if (!sys.ok) return;
      try {
        const made = await buildFor(sys.request, true);
        if (gen !== generation.current) return;
        c = check(quiet, paramsFor({ built: made, form }));
      } catch {
        return;
      }
    }
    if (!c.ok) return;
    const current = () => gen === generation.current;
    setRunning(true);
    setProgress(null);
    try {
      const made = await buildFor(c.request, live);
      if (!current()) return;
      setBuilt({ key: JSON.stringify(selectionOf(c.request)), built: made });
      const bath = solveBathHere(made.problem, c.request.pH);
      const runner = opts.runner ?? runAtOnce;
      const run = await runner({
        calculator: opts.calculator,
        problem: made.problem,
        pH: c.request.pH,
        params: c.run,
        onProgress: (f) => current() && setProgress(f),
        cancelled: () => !current(),
      });
      if (!current() || run === null) return;
      setOutcome({ key, request: c.request, params: c.raw, built: made, bath, run });
    } catch (error) {
      if (!current()) return;
      setOutcome(null);
      show(error instanceof ApiError ? placeApiError(error, names) : placeCalculatorError(error, names));
    } finally {
      if (current()) {
        setRunning(false);
        setProgress(null);
      }
    }
  };

  const latest = useRef(calculate);
  latest.current = calculate;
  useEffect(() => {
    if (!opts.live) return;
    const timer = setTimeout(() => void latest.current(true), LIVE_DEBOUNCE_MS);
    return () => clearTimeout(timer);
  }, [opts.live, key]);

  return {
    outcome,
    /** The build and form the params were derived from. */
    base,
    /** The latest build for the ions now chosen (from a preview or a calculation). */
    built: built?.built ?? null,
    running,
    progress,
    paramErrors: shown.params,
    top: shown.top,
    /** True when the fields moved on since the result shown was worked out (and it will not redo itself). */
    stale: !!outcome && outcome.key !== key && !opts.live,
    /** Whether the last calculation was refused (errors are shown beside the fields). */
    failed: !running && (!!shown.top || Object.keys(shown.params).length > 0 || Object.keys(form.errors.fields).length > 0),
    calculate: () => void calculate(false),
    cancel: () => {
      generation.current += 1;
      setRunning(false);
      setProgress(null);
    },
    /** The body of POST /api/runs without its title, or null with the errors shown. */
    runBody: (): Omit<RunInput, 'title'> | null => {
      const c = check(false);
      if (!c.ok) return null;
      // Display choices travel with the params (the schema ignores them) so the saved run reads the same.
      return { calculator: opts.calculator, system: c.request, params: { ...c.raw, ...opts.display }, ...(bathId ? { bathId } : {}) };
    },
    /** Shows a refused save beside the fields; returns the message for the title field, if any. */
    showSaveError: (error: unknown): { title?: string; top?: string } => {
      const placed = placeApiError(error, names);
      show(placed);
      return { title: placed.title, top: placed.top };
    },
  };
}

/** The calculation state a frame draws. */
export type Calculation = ReturnType<typeof useCalculation>;
