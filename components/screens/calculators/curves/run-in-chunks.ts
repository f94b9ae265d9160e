// Long sweeps without freezing the screen: the x range is split into about ten pieces, each worked
// out with runCalculation (the function the server runs) and the screen given a turn between them,
// with progress reported and a way to stop. Short sweeps run in one go.
import { type z } from 'zod';

import { nextTurn } from '@/components/screens/calculators/frame/run';
import { type CalculationRunner } from '@/components/screens/calculators/frame/types';
import { MAX_CURVE_WARNINGS, sweepValues, type Curve } from '@/lib/calculators/curves';
import { runCalculation, type CalculationRun } from '@/lib/calculators/run-calculation';
import { type curvesParamsSchema } from '@/shared/calculations';

/** Sweeps up to this many points run in one go (and redraw live while typing). */
export const LIVE_MAX_POINTS = 200;
/** Pieces a longer sweep is split into. */
export const CHUNKS = 10;

type CurvesParams = z.output<typeof curvesParamsSchema>;

/** Index ranges [first, last] covering 0..n-1 in `pieces` parts of nearly equal size (each of at least 2 points when n >= 2 x pieces). */
export function splitIndices(n: number, pieces: number): [number, number][] {
  const k = Math.max(1, Math.min(pieces, Math.floor(n / 2)));
  return Array.from({ length: k }, (_, i) => [Math.floor((i * n) / k), Math.floor(((i + 1) * n) / k) - 1] as [number, number]);
}

/** The verdict runCalculation writes for a curve, for a curve put together from pieces. */
export function curveVerdict(c: Curve, from: number, to: number): string {
  const unsettled = c.points.filter((p) => p.status !== 'converged').length;
  const tail = unsettled === 0 ? 'every point settled' : `${unsettled} point${unsettled === 1 ? '' : 's'} did not settle and ${unsettled === 1 ? 'is' : 'are'} left out of the charts`;
  return `${c.axis.label} from ${from} to ${to} ${c.axis.unit} over ${c.points.length} points; ${tail}.`;
}

function merge(into: Curve | null, part: Curve): Curve {
  if (!into) return { ...part, points: [...part.points], warnings: [...part.warnings] };
  const warnings = [...new Set([...into.warnings, ...part.warnings])].slice(0, MAX_CURVE_WARNINGS);
  return {
    ...into,
    points: [...into.points, ...part.points],
    status: into.status === 'converged' && part.status === 'converged' ? 'converged' : 'not_converged',
    warnings,
  };
}

/** Runs a curve: in one go up to LIVE_MAX_POINTS points, else in CHUNKS pieces with progress; null when cancelled. */
export const runCurveInChunks: CalculationRunner = async ({ calculator, problem, pH, params, onProgress, cancelled }) => {
  const p = params as unknown as CurvesParams;
  if (p.points <= LIVE_MAX_POINTS) return runCalculation(calculator, problem, pH, params as never);
  const xs = sweepValues({ variable: p.variable, from: p.from, to: p.to, points: p.points, spacing: p.spacing });
  let curve: Curve | null = null;
  onProgress(0);
  for (const [first, last] of splitIndices(xs.length, CHUNKS)) {
    await nextTurn();
    if (cancelled()) return null;
    const piece = { ...p, from: xs[first] as number, to: xs[last] as number, points: last - first + 1 };
    curve = merge(curve, runCalculation('curves', problem, pH, piece).result as Curve);
    onProgress((last + 1) / xs.length);
  }
  if (!curve || cancelled()) return null;
  const run: CalculationRun = { calculator, status: curve.status, verdict: curveVerdict(curve, p.from, p.to), warnings: curve.warnings, result: curve };
  return run;
};
