// The command line of `npm run load`: pure, so the tests can check it without starting anything.
import { parseArgs } from 'node:util';

/** Seconds each endpoint is loaded for: the default, `--quick`, and the largest `--duration` allowed (one hour). */
export const LOAD_DURATION_S = { standard: 30, quick: 3, max: 3600 } as const;

/** What `npm run load` was asked to do. */
export interface LoadOptions {
  /** Seconds of measured load per endpoint. */
  durationS: number;
  /** Print only the JSON array of figures on stdout. */
  json: boolean;
  /** A smoke test: `LOAD_DURATION_S.quick` seconds per endpoint. */
  quick: boolean;
  help: boolean;
}

/** A command line `npm run load` cannot follow; the message is one line, ready for stderr. */
export class UsageError extends Error {
  constructor(message: string) {
    super(`${message} (see --help)`);
    this.name = 'UsageError';
  }
}

const ARGS = {
  options: {
    duration: { type: 'string' },
    json: { type: 'boolean' },
    quick: { type: 'boolean' },
    help: { type: 'boolean', short: 'h' },
  },
  allowPositionals: true,
} as const;

/** Whole seconds from 1 to `LOAD_DURATION_S.max`, written as digits only. */
function durationSeconds(text: string): number {
  const seconds = /^\d+$/.test(text.trim()) ? Number(text.trim()) : NaN;
  if (!Number.isSafeInteger(seconds) || seconds < 1 || seconds > LOAD_DURATION_S.max) {
    throw new UsageError(`--duration must be a whole number of seconds from 1 to ${LOAD_DURATION_S.max}, got "${text}"`);
  }
  return seconds;
}

/** Reads `[--json] [--quick | --duration N] [--help]`; anything else throws UsageError. */
export function parseLoadArgs(argv: string[]): LoadOptions {
  let parsed: ReturnType<typeof parseArgs<typeof ARGS>>;
  try {
    parsed = parseArgs({ args: argv, ...ARGS });
  } catch (err) {
    throw new UsageError((err as Error).message);
  }
  const { values, positionals } = parsed;
  if (positionals.length > 0) throw new UsageError(`unexpected argument "${positionals[0]}"`);
  const quick = values.quick === true;
  if (quick && values.duration !== undefined) throw new UsageError('give --quick or --duration, not both');
  const durationS = quick ? LOAD_DURATION_S.quick : values.duration === undefined ? LOAD_DURATION_S.standard : durationSeconds(values.duration);
  return { durationS, json: values.json === true, quick, help: values.help === true };
}
