// Checks that hold for every converged result, computed here from the problem and the printed
// result alone (independent of the solver's own bookkeeping).
import type { Problem, SolveResult } from '@/lib/engine';

const LN10 = Math.LN10;

/** Largest relative mass-balance misfit over components with totals. */
export function massBalanceMisfit(problem: Problem, result: SolveResult): number {
  let worst = 0;
  for (const [component, total] of Object.entries(problem.totals ?? {})) {
    let calc = result.free[component] ?? NaN;
    let scale = Math.abs(calc);
    for (const sp of problem.species ?? []) {
      const a = sp.stoich[component] ?? 0;
      if (a === 0) continue;
      const term = a * (result.species[sp.name] ?? NaN);
      calc += term;
      scale += Math.abs(term);
    }
    for (const so of problem.solids ?? []) {
      const b = so.stoich[component] ?? 0;
      const n = result.solids[so.name] ?? 0;
      calc += b * n;
      scale += Math.abs(b * n);
    }
    const misfit = Math.abs(calc - total) / Math.max(total, scale, 1e-300);
    worst = Math.max(worst, Number.isNaN(misfit) ? Infinity : misfit);
  }
  return worst;
}

/** Largest |log10| misfit of a species against log C = log K + sum(a log(gamma x)) - log gamma. */
export function lawOfMassActionMisfit(problem: Problem, result: SolveResult): number {
  let worst = 0;
  for (const sp of problem.species ?? []) {
    const c = result.species[sp.name] as number;
    if (!(c > 1e-290)) continue;
    let logc = sp.logK - Math.log10(result.gamma[sp.name] as number);
    let underflow = false;
    for (const [component, a] of Object.entries(sp.stoich)) {
      const x = result.free[component] as number;
      if (!(x > 1e-300)) underflow = true;
      logc += a * (Math.log(x) + Math.log(result.gamma[component] as number)) / LN10;
    }
    if (underflow) continue;
    worst = Math.max(worst, Math.abs(Math.log10(c) - logc));
  }
  return worst;
}

/** Every number in the result (nested), for NaN checks. */
export function allNumbers(value: unknown, out: number[] = []): number[] {
  if (typeof value === 'number') out.push(value);
  else if (Array.isArray(value)) value.forEach((v) => allNumbers(v, out));
  else if (value && typeof value === 'object') Object.values(value).forEach((v) => allNumbers(v, out));
  return out;
}
