// The benchmark's measurements, in process. Each solve is timed on its own, twice over: wall
// clock by process.hrtime.bigint() around the call, and the process's CPU time by
// process.cpuUsage() around that. Its "busy time" is the smaller of the two: a wait while the
// scheduler ran another process is wall time but not CPU time, so it drops out; a collector pause
// inside the solve is CPU time, so it stays. Median, p99 and max are of busy times; the plain
// wall-clock figures are kept beside them. A pass of the curve is timed the same way, as a whole.
//
// How the maximum is measured: a case's solves run in many short rounds (40 of 50 solves), the
// rounds of all cases interleaved (round 1 of every case, then round 2, ...), with a full garbage
// collection before each such sweep when node runs with --expose-gc. A case's max is the median of
// its 40 round maxima: the longest solve that a typical stretch of 50 solves contains. Every solve
// of a case is the same computation, so a slow solve that belongs to the problem (a hard phase
// search) is in every round and so in the figure; a stall that belongs to the machine (a collector
// pause, an optimizing compile, a noisy neighbour on a shared host that the busy time cannot see)
// hits fewer than half of the rounds and drops out. The cost of collection still counts in the
// mean, and so in solves per second: collections happen inside rounds as they come. The first
// solve of a round follows other cases' solves (or the collection), with colder caches; it is
// timed like the others, so the max includes the cost of switching problems that a server
// answering different baths pays, and is often that first solve.

import { compileProblem, retarget, solve, solveTableau, type Problem, type SolveResult, type WarmStart } from '@/lib/engine';

import type { BenchCase } from './bench-cases';

/** How much to measure. */
export interface BenchPlan {
  /** Untimed solves per case before timing (JIT warm-up). */
  warmup: number;
  rounds: number;
  /** Run a full collection before each sweep of rounds and each timed curve (about 10-20 ms each). */
  collect: boolean;
  /** Timed solves per case per round. */
  perRound: number;
  /** Time allowed for one case's warm-up, and again for its timed rounds together, in ms (slow problems). */
  caseBudgetMs: number;
  /** Untimed passes of the curve before timing it. */
  curveWarmup: number;
  /** Timed repetitions of the 500-point curve (the median is reported). */
  curveReps: number;
}

/** The full run (about 2000 timed solves per case) and the quick one (--quick, for tests). */
export const PLANS: Record<'full' | 'quick', BenchPlan> = {
  full: { warmup: 500, rounds: 40, collect: true, perRound: 50, caseBudgetMs: 2000, curveWarmup: 2, curveReps: 9 },
  quick: { warmup: 10, rounds: 2, collect: false, perRound: 10, caseBudgetMs: 400, curveWarmup: 0, curveReps: 1 },
};

/** Busy and wall-clock figures, us per solve: of one case, or pooled over all of them. */
export interface Figures {
  medianUs: number;
  p99Us: number;
  maxUs: number;
  /** Plain wall-clock figures, noise included. */
  wallMedianUs: number;
  wallP99Us: number;
  wallMaxUs: number;
}

/** What one case measured, us per solve. */
export interface CaseTiming extends Figures {
  /** Busy time of every timed solve, sorted. */
  times: Float64Array;
  /** Wall-clock time of every timed solve, sorted. */
  wall: Float64Array;
  iterations: number;
  converged: boolean;
  message?: string;
  newtonIterations: number;
}

/** Runs a full collection when node was started with --expose-gc; true if it could. */
export function collect(): boolean {
  if (typeof globalThis.gc !== 'function') return false;
  globalThis.gc();
  return true;
}

/** Value at quantile q (0..1) of sorted values, nearest rank. */
export function quantile(sorted: Float64Array, q: number): number {
  if (sorted.length === 0) return NaN;
  const rank = Math.min(sorted.length, Math.max(1, Math.ceil(q * sorted.length)));
  return sorted[rank - 1] as number;
}

/** Median of sorted values (mean of the middle two for an even count). */
export function median(sorted: Float64Array): number {
  const n = sorted.length;
  if (n === 0) return NaN;
  const mid = n >> 1;
  return n % 2 ? (sorted[mid] as number) : ((sorted[mid - 1] as number) + (sorted[mid] as number)) / 2;
}

/** Where one round writes its figures, us per solve. */
interface RoundBuffers {
  /** Busy time: min(wall, CPU time of the process), see the file header. */
  busy: Float64Array;
  wall: Float64Array;
}

/** Times up to `count` solves of one problem from index `at` (at least one, then until budgetMs); returns how many ran. */
function timeRound(problem: Problem, into: RoundBuffers, at: number, count: number, budgetMs: number): number {
  const budget = BigInt(Math.round(budgetMs * 1e6));
  const start = process.hrtime.bigint();
  let k = 0;
  while (k < count) {
    const c0 = process.cpuUsage();
    const t0 = process.hrtime.bigint();
    solve(problem);
    const t1 = process.hrtime.bigint();
    const cpu = process.cpuUsage(c0);
    const wall = Number(t1 - t0) / 1000;
    into.wall[at + k] = wall;
    into.busy[at + k] = Math.min(wall, cpu.user + cpu.system);
    k++;
    if (t1 - start > budget) break;
  }
  return k;
}

/** Warms every case up, then times them in interleaved rounds. */
export function timeCases(cases: BenchCase[], plan: BenchPlan): CaseTiming[] {
  const first = cases.map((c) => solve(c.problem));
  const warm = new Float64Array(plan.warmup);
  for (const c of cases) timeRound(c.problem, { busy: warm, wall: warm }, 0, plan.warmup, plan.caseBudgetMs);
  const size = plan.rounds * plan.perRound;
  const buffers = cases.map(() => ({ busy: new Float64Array(size), wall: new Float64Array(size) }));
  const filled = cases.map(() => 0);
  const roundMax = cases.map(() => [] as number[]);
  for (let r = 0; r < plan.rounds; r++) {
    if (plan.collect) collect();
    cases.forEach((c, i) => {
      const at = filled[i] as number;
      const buf = buffers[i] as RoundBuffers;
      const ran = timeRound(c.problem, buf, at, plan.perRound, plan.caseBudgetMs / plan.rounds);
      filled[i] = at + ran;
      (roundMax[i] as number[]).push(Math.max(...buf.busy.subarray(at, at + ran)));
    });
  }
  return cases.map((_, i) => {
    const buf = buffers[i] as RoundBuffers;
    const times = buf.busy.slice(0, filled[i]).sort();
    const wall = buf.wall.slice(0, filled[i]).sort();
    const result = first[i] as SolveResult;
    return {
      times,
      wall,
      iterations: times.length,
      medianUs: median(times),
      p99Us: quantile(times, 0.99),
      maxUs: median(Float64Array.from(roundMax[i] as number[]).sort()),
      wallMedianUs: median(wall),
      wallP99Us: quantile(wall, 0.99),
      wallMaxUs: wall[wall.length - 1] as number,
      converged: result.status === 'converged',
      ...(result.message ? { message: result.message } : {}),
      newtonIterations: result.iterations,
    };
  });
}

/** The swept input of the curve: one component's total from `from` to `to` mol/L. */
export interface CurveSpec {
  problem: Problem;
  component: string;
  from: number;
  to: number;
  points: number;
}

/** One pass of the curve: compile once, then retarget and warm-start every point. */
function runCurve(spec: CurveSpec): { busyMs: number; wallMs: number; notConverged: number } {
  const c0 = process.cpuUsage();
  const t0 = process.hrtime.bigint();
  const tab = compileProblem(spec.problem);
  let state: WarmStart | undefined;
  let notConverged = 0;
  const step = (spec.to - spec.from) / (spec.points - 1);
  for (let k = 0; k < spec.points; k++) {
    const point = retarget(tab, { totals: { [spec.component]: spec.from + k * step } });
    const out = solveTableau(point, {}, state);
    state = out.state;
    if (out.result.status !== 'converged') notConverged++;
  }
  const wallMs = Number(process.hrtime.bigint() - t0) / 1e6;
  const cpu = process.cpuUsage(c0);
  return { busyMs: Math.min(wallMs, (cpu.user + cpu.system) / 1000), wallMs, notConverged };
}

/** What the curve measured: medians over the timed passes, ms per 500-point curve. */
export interface CurveTiming {
  /** Median busy time (min of wall clock and process CPU time) of a pass. */
  medianMs: number;
  wallMedianMs: number;
  passes: number;
  /** Points of the last pass that did not converge. */
  notConverged: number;
}

/** Times plan.curveReps passes of the curve after plan.curveWarmup untimed ones. */
export function timeCurve(spec: CurveSpec, plan: BenchPlan): CurveTiming {
  for (let r = 0; r < plan.curveWarmup; r++) runCurve(spec);
  const busy = new Float64Array(plan.curveReps);
  const wall = new Float64Array(plan.curveReps);
  let notConverged = 0;
  for (let r = 0; r < plan.curveReps; r++) {
    if (plan.collect) collect();
    const run = runCurve(spec);
    busy[r] = run.busyMs;
    wall[r] = run.wallMs;
    notConverged = run.notConverged;
  }
  return { medianMs: median(busy.sort()), wallMedianMs: median(wall.sort()), passes: plan.curveReps, notConverged };
}
