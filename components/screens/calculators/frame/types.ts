// The contract between the shared calculator frame and each calculator screen: what a screen hands
// the frame (its parameters, its fields, how to word and export its answer) and what it gets back.
import { type ReactNode } from 'react';

import { type SystemForm } from '@/components/screens/calculate/use-system-form';
import { type CalculationRun } from '@/lib/calculators/run-calculation';
import { type CalculatorKey } from '@/shared/calculators';
import { type BuiltSystem, type ProblemJson, type SolveResultJson, type SystemRequest } from '@/shared/constants';

/**
 * A calculator's parameters as its fields stand: the object sent as `params` (checked against
 * PARAMS_SCHEMAS by the frame too), or messages keyed by param field when they cannot be made yet.
 */
export type ParamsCheck = { ok: true; params: Record<string, unknown> } | { ok: false; errors: Record<string, string>; message?: string };

/** What a calculator can derive its parameters and defaults from: the latest build and the system inputs. */
export type ParamsBase = {
  /** The latest system the library built for the chosen ions (null until the first build): problem, availableSolids. */
  built: BuiltSystem | null;
  /** The system inputs (ions, totals, pH), for defaults that depend on them. */
  form: SystemForm;
};

/** What the calculator's own fields get from the frame on every render. */
export type ParamsSlotContext = ParamsBase & {
  /** Messages to show beside the calculator's fields, keyed by param field ("solid", "from", "series"). */
  errors: Record<string, string>;
  /** True while a calculation runs. */
  disabled: boolean;
  /** Runs the calculation now (wire it to Enter in a field). */
  submit: () => void;
};

/** The last calculation: the request as sent, what the library built, the bath solved here and the calculator's answer. */
export type FrameOutcome = {
  /** Inputs and params as they were (compared with the fields to tell a stale result). */
  key: string;
  request: SystemRequest;
  /** The params as sent (without the display choices). */
  params: Record<string, unknown>;
  built: BuiltSystem;
  /** The bath as given, solved here exactly as the server solves a saved run (null when it could not be). */
  bath: SolveResultJson | null;
  /** The calculator's answer. */
  run: CalculationRun;
};

/** One calculation handed to a runner. */
export type RunnerInput = {
  calculator: CalculatorKey;
  problem: ProblemJson;
  /** The measured pH of the request (undefined when none). */
  pH: number | undefined;
  params: Record<string, unknown>;
  /** Report progress, 0..1, for long runs (shows a bar and a Cancel button). */
  onProgress: (fraction: number) => void;
  /** True once the person pressed Cancel or started another calculation. */
  cancelled: () => boolean;
};

/** Works a calculation out; resolves null when cancelled. Throws CalculatorInputError for input it cannot use. */
export type CalculationRunner = (input: RunnerInput) => Promise<CalculationRun | null>;

/** A text file to download (the result's main table as CSV). */
export type TextFile = { filename: string; text: string };

/** Props of CalculatorFrame: everything a calculator screen supplies. */
export type CalculatorFrameProps = {
  /** Which calculator: its title and "what it does" come from CALCULATOR_LABELS, its result view from result-views.tsx. */
  calculator: CalculatorKey;
  /** The calculator's parameters as the fields stand (see ParamsCheck); a function when defaults depend on the build. */
  params: ParamsCheck | ((base: ParamsBase) => ParamsCheck);
  /** The calculator's own fields, drawn in their own card under the system inputs. */
  renderParams: (ctx: ParamsSlotContext) => ReactNode;
  /**
   * Reading choices (a unit) that change how the answer reads, not what is worked out: given to the
   * result view and the verdict with the params, saved with the run's params, never mark a result stale.
   */
  display?: Record<string, unknown>;
  /** Param field names the screen shows errors beside; an error for any other field is shown at the top. */
  paramFields: readonly string[];
  /** Maps an engine field ("sweep.from", "series[0].component") to a param field ("from", "series"); default: as is. */
  paramField?: (engineField: string) => string;
  /** Recalculate 400 ms after any change (curves); otherwise only on Calculate. */
  live?: boolean;
  /** The one-line answer; default: the calculator's own verdict. */
  verdict?: (run: CalculationRun, outcome: FrameOutcome) => string;
  /** The result's main table as CSV; null or absent: no download offered. */
  csv?: (output: unknown, outcome: FrameOutcome) => TextFile | null;
  /** Last adjustments to the system request before it is built (a pH sweep needs H+ in the system). */
  adjustSystem?: (request: SystemRequest, params: Record<string, unknown>) => SystemRequest;
  /** How to work the calculation out; default: runCalculation in one go. */
  runner?: CalculationRunner;
  /** Shown in the result column before the first calculation. */
  emptyHint?: string;
};
