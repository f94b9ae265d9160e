// npm run bench [-- [--json] [--quick] [DIR]]: how fast the engine answers, measured in process.
// Each case is one problem run through solve(problem), the full path the command line and the API
// pay (validation, compile, solve). Cases: the demo baths (DEMO_BATHS), then every *.json file in
// DIR (one problem or an array; each problem is a case). Each case is warmed up (500 solves), then
// timed one solve at a time in 40 interleaved rounds of 50 (2000 solves; for a slow problem the
// warm-up and the rounds each stop after about 2 s). The curve: the bright silver bath's cyanide
// total swept from 0.4 to 2.0 mol/L over 500 points (compileProblem once, retarget per point, each
// point warm-started from the last), compile included, timed 9 times; the median is reported.
//
// Figures (how they are measured is in lib/bench-timing.ts): median and p99 (nearest rank) of the
// busy time of all timed solves, busy = min(wall clock, process CPU time), so a wait while the
// scheduler runs another process drops out and a collector pause stays; max = the largest over
// cases of the median of a case's 40 round maxima; solves per second = timed solves / total busy time
// = 1e6 / mean busy us; the curve in busy ms too. Plain wall-clock figures are printed beside them.
// The entry runs node with --expose-gc so a full collection precedes each sweep of rounds; without
// it the run goes on and says so.
//
// --json prints exactly one JSON object on stdout: {cases, medianUs, p99Us, maxUs, solvesPerSecond,
// curve500Ms}; notes (a case not converged) go to stderr. --quick (for tests) times 20 solves per
// case and one curve, without warm-up passes or collections: the figures are only a smoke test.
//
// Exit codes: 0 measured (a case that did not converge is reported, not fatal); 1 bad folder, file
// or problem (one line on stderr); 2 bad command line; 3 the engine threw on a valid problem.

import { cpus } from 'node:os';
import { parseArgs } from 'node:util';

import { DEMO_BATHS } from '@/lib/chemistry/demo-baths';

import { builtInCases, EngineBugError, folderCases, type BenchCase } from './lib/bench-cases';
import { collect, type CaseTiming, type CurveSpec, type CurveTiming, type Figures, median, PLANS, quantile, timeCases, timeCurve } from './lib/bench-timing';
import { InputError } from './lib/json-text';

const USAGE = `Usage: npm run bench [-- [--json] [--quick] [DIR]]   (bundled with esbuild, as the engine ships)
       node --expose-gc --import tsx scripts/bench.ts [--json] [--quick] [DIR]   (unbundled, through tsx)

Times solve(problem) on the demo baths and on every *.json problem file in DIR (one problem or
an array of problems per file), and a 500-point warm-started curve.
  --json   print only {cases, medianUs, p99Us, maxUs, solvesPerSecond, curve500Ms} as JSON
  --quick  few repetitions (a smoke test, for the tests); figures are not meaningful
Exit codes: 0 measured, 1 bad folder/file/problem, 2 bad command line, 3 engine bug.`;

/** Targets for a 2-core machine: us per solve (4-6 components), us for any one solve, ms per curve. */
const TARGETS = { medianUs: 20, maxUs: 1000, curveMs: 25 } as const;

const CURVE = { bath: 'silver-plate', component: 'CN-', from: 0.4, to: 2.0, points: 500 } as const;

class Exit extends Error {
  constructor(
    readonly code: number,
    message: string,
  ) {
    super(message);
  }
}

interface Options {
  json: boolean;
  quick: boolean;
  dir: string | null;
  help: boolean;
}

const ARGS = {
  options: { json: { type: 'boolean' }, quick: { type: 'boolean' }, help: { type: 'boolean', short: 'h' } },
  allowPositionals: true,
} as const;

function readOptions(argv: string[]): Options {
  let parsed: ReturnType<typeof parseArgs<typeof ARGS>>;
  try {
    parsed = parseArgs({ args: argv, ...ARGS });
  } catch (err) {
    throw new Exit(2, `${(err as Error).message} (see --help)`);
  }
  const { values, positionals } = parsed;
  if (positionals.length > 1) throw new Exit(2, `give at most one folder, got ${positionals.length}: ${positionals.join(' ')} (see --help)`);
  return { json: values.json === true, quick: values.quick === true, help: values.help === true, dir: positionals[0] ?? null };
}

function curveSpec(): CurveSpec {
  const bath = DEMO_BATHS.find((b) => b.key === CURVE.bath);
  if (!bath) throw new Error(`the built-in bath "${CURVE.bath}" used for the curve is missing from DEMO_BATHS`);
  return { problem: bath.problem, component: CURVE.component, from: CURVE.from, to: CURVE.to, points: CURVE.points };
}

interface Summary extends Figures {
  cases: number;
  solvesPerSecond: number;
  /** Pooled median of the cases with 4 to 6 components (the median target), or NaN if none. */
  targetMedianUs: number;
  targetCases: number;
}

function pooled(timings: CaseTiming[], key: 'times' | 'wall'): Float64Array {
  const all = new Float64Array(timings.reduce((n, t) => n + t[key].length, 0));
  let at = 0;
  for (const t of timings) {
    all.set(t[key], at);
    at += t[key].length;
  }
  return all.sort();
}

function summarize(cases: BenchCase[], timings: CaseTiming[]): Summary {
  const all = pooled(timings, 'times');
  const wall = pooled(timings, 'wall');
  const total = all.reduce((s, v) => s + v, 0);
  const sized = timings.filter((_, i) => (cases[i] as BenchCase).components >= 4 && (cases[i] as BenchCase).components <= 6);
  return {
    cases: cases.length,
    medianUs: median(all),
    p99Us: quantile(all, 0.99),
    maxUs: Math.max(...timings.map((t) => t.maxUs)),
    wallMedianUs: median(wall),
    wallP99Us: quantile(wall, 0.99),
    wallMaxUs: wall[wall.length - 1] as number,
    solvesPerSecond: all.length / (total / 1e6),
    targetMedianUs: sized.length > 0 ? median(pooled(sized, 'times')) : NaN,
    targetCases: sized.length,
  };
}

const round = (v: number, places: number) => Math.round(v * 10 ** places) / 10 ** places;
const us = (v: number) => v.toFixed(1);
const pad = (s: string | number, w: number) => String(s).padStart(w);
const verdict = (ok: boolean) => (ok ? 'met' : 'NOT met');

/** Column widths of the case table after the name: sizes, busy figures, wall figures, count. */
const WIDTHS = [5, 5, 4, 7, 9, 8, 8, 10, 8, 9, 7];

function tableRow(name: string, cells: (string | number)[]): string {
  return name.padEnd(20) + cells.map((c, k) => pad(c, WIDTHS[k] as number)).join('');
}

function caseTable(cases: BenchCase[], timings: CaseTiming[]): string[] {
  const head = tableRow('', ['', '', '', '', 'busy us:', '', '', 'wall us:', '', '', '']);
  const head2 = tableRow('case', ['comp', 'spec', 'sol', 'newton', 'median', 'p99', 'max', 'median', 'p99', 'max', 'solves']);
  const rows = cases.map((c, i) => {
    const t = timings[i] as CaseTiming;
    const figures = [t.medianUs, t.p99Us, t.maxUs, t.wallMedianUs, t.wallP99Us, t.wallMaxUs].map(us);
    const row = tableRow(c.name, [c.components, c.species, c.solids, t.newtonIterations, ...figures, t.iterations]);
    return t.converged ? row : `${row}  NOT CONVERGED: ${t.message ?? ''}`;
  });
  return [head, head2, ...rows];
}

function targetLines(s: Summary, curveMs: number): string[] {
  const medianOk = s.targetCases > 0 && s.targetMedianUs <= TARGETS.medianUs;
  const medianText = s.targetCases > 0 ? `${us(s.targetMedianUs)} us over ${s.targetCases} cases` : 'no such case';
  return [
    'targets (2-core machine):',
    `  median <= ${TARGETS.medianUs} us per solve, 4-6 components:  ${medianText}  ${verdict(medianOk)}`,
    `  no single solve over ${TARGETS.maxUs / 1000} ms:                  max ${us(s.maxUs)} us  ${verdict(s.maxUs <= TARGETS.maxUs)}`,
    `  500-point curve <= ${TARGETS.curveMs} ms:                   ${curveMs.toFixed(2)} ms  ${verdict(curveMs <= TARGETS.curveMs)}`,
  ];
}

function humanReport(cases: BenchCase[], timings: CaseTiming[], s: Summary, curve: CurveTiming, gc: boolean, quick: boolean): string {
  const plan = quick ? PLANS.quick : PLANS.full;
  const curveNote = curve.notConverged ? `; ${curve.notConverged} points NOT converged` : '';
  const lines = [
    'Ligandry engine benchmark: solve(problem) = validate + compile + solve, each call timed alone',
    `node ${process.version}, ${process.platform}/${process.arch}, ${cpus().length} CPUs; ${plan.warmup} warm-up + ${plan.rounds} rounds x ${plan.perRound} timed solves per case; ` +
      `GC before each sweep of rounds: ${!plan.collect ? 'no (quick)' : gc ? 'yes' : 'NO (run node with --expose-gc)'}${quick ? '; QUICK: a smoke test, figures not meaningful' : ''}`,
    'busy = min(wall, process CPU time) per solve; busy max = median of 40 round maxima (see scripts/lib/bench-timing.ts)',
    '',
    ...caseTable(cases, timings),
    '',
    `overall (${s.cases} cases), busy: median ${us(s.medianUs)} us, p99 ${us(s.p99Us)} us, max ${us(s.maxUs)} us`,
    `overall, wall clock:  median ${us(s.wallMedianUs)} us, p99 ${us(s.wallP99Us)} us, largest ${us(s.wallMaxUs)} us`,
    `solves per second: ${Math.round(s.solvesPerSecond)} (timed solves / total busy time = 1e6 / mean busy us)`,
    `500-point curve (${CURVE.bath}, ${CURVE.component} total ${CURVE.from.toFixed(1)} to ${CURVE.to.toFixed(1)} mol/L, warm start): ` +
      `busy ${curve.medianMs.toFixed(2)} ms, wall ${curve.wallMedianMs.toFixed(2)} ms, medians of ${curve.passes} (compile included)${curveNote}`,
    '',
    ...targetLines(s, curve.medianMs),
  ];
  return `${lines.join('\n')}\n`;
}

function main(argv: string[]): void {
  const options = readOptions(argv);
  if (options.help) {
    process.stdout.write(`${USAGE}\n`);
    return;
  }
  const cases = [...builtInCases(), ...(options.dir === null ? [] : folderCases(options.dir))];
  if (options.dir !== null && cases.length === DEMO_BATHS.length) process.stderr.write(`note: no *.json files in "${options.dir}"; built-in cases only\n`);
  const plan = options.quick ? PLANS.quick : PLANS.full;
  const gc = collect();
  const timings = timeCases(cases, plan);
  const curve = timeCurve(curveSpec(), plan);
  const s = summarize(cases, timings);
  if (!options.json) {
    process.stdout.write(humanReport(cases, timings, s, curve, gc, options.quick));
    return;
  }
  const failed = cases.filter((_, i) => !(timings[i] as CaseTiming).converged).map((c) => c.name);
  if (failed.length > 0) process.stderr.write(`note: not converged: ${failed.join(', ')}\n`);
  if (curve.notConverged > 0) process.stderr.write(`note: ${curve.notConverged} curve points not converged\n`);
  const out = { cases: s.cases, medianUs: round(s.medianUs, 2), p99Us: round(s.p99Us, 2), maxUs: round(s.maxUs, 2), solvesPerSecond: Math.round(s.solvesPerSecond), curve500Ms: round(curve.medianMs, 3) };
  process.stdout.write(`${JSON.stringify(out)}\n`);
}

try {
  main(process.argv.slice(2));
} catch (err) {
  const code = err instanceof Exit ? err.code : err instanceof InputError ? 1 : 3;
  const text = err instanceof Error ? err.message : String(err);
  const message = err instanceof Exit || err instanceof InputError || err instanceof EngineBugError ? text : `internal error: ${text}`;
  process.stderr.write(`${message.replace(/\s*\n\s*/g, ' ')}\n`);
  process.exitCode = code;
}
