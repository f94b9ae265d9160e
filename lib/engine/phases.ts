// Which solids are present: the phase-rule loop. Solve with a set of solids; drop the one whose
// amount comes out most negative; else add the most supersaturated absent solid; repeat until
// neither applies. A set met twice means the loop cycles; then subsets of the solids involved are
// tried, smallest first, and the first consistent one is taken.

import { DEFAULTS } from './defaults';
import { illinois } from './illinois';
import { type Assemblage, assemblageFor, type NewtonOutcome, type TraceLine } from './newton';
import { type Tableau, zeros } from './tableau';

/** State carried from one solve to the next (curves start each point from the last). */
export interface WarmStart {
  /** ln(free concentration) per component. */
  lnx: number[];
  /** Amount of each solid, mol/L. */
  n: number[];
  present: number[];
  ionicStrength: number;
}

/** What the loop settles on. */
export interface PhaseOutcome {
  asm: Assemblage;
  converged: boolean;
  message?: string;
  iterations: number;
  possible: number[];
  state: WarmStart;
  trace: TraceLine[] | null;
}

const SUPERSATURATED = 1e-12;
const NEGATIVE_AMOUNT = 1e-14;
// Copied out of DEFAULTS: read once per attempt and per phase change.
const ITERATION_BUDGET = DEFAULTS.iterationBudget;
const FALLBACK_SWEEPS = DEFAULTS.fallbackSweeps;
const MAX_PHASE_CHANGES = DEFAULTS.maxPhaseChanges;
const NO_SOLIDS: readonly number[] = [];

function ascending(x: number, y: number): number {
  return x - y;
}

/** The list without one value (a new array). */
function without(list: readonly number[], value: number): number[] {
  const out: number[] = [];
  for (const v of list) if (v !== value) out.push(v);
  return out;
}

/** Whether solid s is among the assemblage's present solids. */
function isPresent(asm: Assemblage, s: number): boolean {
  for (let r = 0; r < asm.p; r++) if (asm.present[r] === s) return true;
  return false;
}

/** Components that cannot exist: a zero total and no species that consumes them. */
function findAbsent(tab: Tableau): number[] {
  const absent = zeros(tab.nc);
  for (let j = 0; j < tab.nc; j++) {
    if (tab.fixed[j] || tab.total[j] !== 0) continue;
    let consumes = false;
    for (let i = 0; i < tab.ns; i++) if ((tab.a[i * tab.nc + j] as number) < 0) consumes = true;
    absent[j] = consumes ? 0 : 1;
  }
  return absent;
}

/** Saturation index log10(IAP/Ksp) of solid s at the assemblage's current state. */
export function saturationIndex(asm: Assemblage, s: number): number {
  const { tab } = asm;
  let lnIap = 0;
  for (let j = 0; j < tab.nc; j++) {
    const b = tab.b[s * tab.nc + j] as number;
    if (b === 0) continue;
    const k = asm.componentRow[j] as number;
    let lnx: number;
    if (k >= 0) lnx = asm.lnx[k] as number;
    else if (tab.fixed[j]) lnx = tab.fixedLn[j] as number;
    else return -Infinity;
    lnIap += b * (lnx + asm.lnGammaComponent(j));
  }
  return (lnIap - (tab.lnKsp[s] as number)) / Math.LN10;
}

function coldStart(tab: Tableau): WarmStart {
  const lnx: number[] = [];
  for (let j = 0; j < tab.nc; j++) {
    const t = tab.total[j] as number;
    lnx.push(Math.log(t > 0 ? t : 1e-7));
  }
  // First guess of I from the totals as free ions (complexes usually change it by a fraction).
  let ionic = 0;
  for (let j = 0; j < tab.nc; j++) {
    const z = tab.componentCharge[j] as number;
    ionic += 0.5 * z * z * (tab.fixed[j] ? (tab.fixedValue[j] as number) : (tab.total[j] as number));
  }
  return { lnx, n: zeros(tab.nsol), present: [], ionicStrength: ionic };
}

class PhaseLoop {
  iterations = 0;
  trace: TraceLine[] | null;
  constructor(
    readonly tab: Tableau,
    readonly absent: number[],
    readonly possible: number[],
    readonly tolerance: number,
    readonly maxIterations: number,
    public cur: WarmStart,
    wantTrace: boolean,
  ) {
    this.trace = wantTrace ? [] : null;
  }

  /** Loads the carried state into a freshly configured work space (solid amounts optional). */
  private load(present: number[], withAmounts: boolean): Assemblage {
    const asm = assemblageFor(this.tab, this.absent, present);
    asm.trace = this.trace;
    for (let k = 0; k < asm.m; k++) {
      const v = this.cur.lnx[asm.u[k] as number] as number;
      asm.lnx[k] = Number.isFinite(v) ? v : Math.log(1e-7);
    }
    for (let r = 0; r < present.length; r++) asm.n[r] = withAmounts ? Math.max(0, this.cur.n[present[r] as number] as number) : 0;
    if (withAmounts) this.scaleAmountsToFit(present, asm);
    asm.setIonicStrength(this.cur.ionicStrength);
    return asm;
  }

  /**
   * Amounts carried over from another set of solids can claim more of a component than its total
   * (the set they came from had a negative amount elsewhere); scale them back so that each total
   * keeps some part dissolved.
   */
  private scaleAmountsToFit(present: number[], asm: Assemblage): void {
    const { tab } = this;
    let factor = 1;
    for (let j = 0; j < tab.nc; j++) {
      if (tab.fixed[j]) continue;
      let used = 0;
      for (let r = 0; r < present.length; r++) used += Math.max(0, tab.b[(present[r] as number) * tab.nc + j] as number) * (asm.n[r] as number);
      const t = tab.total[j] as number;
      if (used > 0.99 * t) factor = Math.min(factor, (0.99 * t) / used);
    }
    if (factor < 1) for (let r = 0; r < present.length; r++) asm.n[r] = (asm.n[r] as number) * factor;
  }

  /**
   * Solves one set of solids: Newton from the carried state; with solids, Newton again with the
   * log form for their balances; under Davies, the ionic-strength fallback from the same start;
   * then the bracketing sweeps from the start with no solid amounts, and Newton once more; last,
   * with solids, Newton with the solids' products projected onto one unknown each.
   */
  attempt(present: number[]): { asm: Assemblage; out: NewtonOutcome } {
    let asm = this.load(present, true);
    asm.linearOnly = present.length === 0;
    let out = asm.newton(this.maxIterations, this.tolerance);
    this.iterations += out.iterations;
    // A singular Jacobian with solids present is the phase rule's business; without solids it is
    // numerical (an underflowed column), and the fallbacks below may still succeed.
    if (this.shouldRetry(out, present) && present.length > 0) {
      asm = this.load(present, true);
      asm.solidLogForm = true;
      out = asm.newton(this.maxIterations, this.tolerance);
      this.iterations += out.iterations;
    }
    if (this.shouldRetry(out, present) && asm.ionFree) {
      asm = this.load(present, true);
      asm.solidLogForm = true;
      out = asm.ionicStrengthFallback(this.maxIterations, this.tolerance);
      this.iterations += out.iterations;
    }
    if (this.shouldRetry(out, present)) {
      asm = this.load(present, false);
      asm.bracketSweeps(FALLBACK_SWEEPS);
      out = asm.newton(this.maxIterations * 2, this.tolerance);
      this.iterations += out.iterations;
    }
    if (this.shouldRetry(out, present) && present.length > 0) {
      asm = this.load(present, true);
      asm.projection = true;
      out = asm.newton(this.maxIterations * 2, this.tolerance);
      this.iterations += out.iterations;
    }
    return { asm, out };
  }

  /** Whether a failed attempt is worth a fallback (and the iteration budget allows one). */
  private shouldRetry(out: NewtonOutcome, present: number[]): boolean {
    return !out.converged && (!out.singular || present.length === 0) && this.iterations < ITERATION_BUDGET;
  }

  save(asm: Assemblage): void {
    const lnx = Array.from(this.cur.lnx);
    for (let k = 0; k < asm.m; k++) lnx[asm.u[k] as number] = asm.lnx[k] as number;
    const n = zeros(this.tab.nsol);
    for (let r = 0; r < asm.p; r++) n[asm.present[r] as number] = asm.n[r] as number;
    this.cur = { lnx, n, present: asm.presentList(), ionicStrength: asm.ionicStrength };
  }

  /** Index (within asm.present) of the most negative solid amount, or -1. */
  mostNegative(asm: Assemblage): number {
    let worst = -1;
    let worstValue = 0;
    for (let r = 0; r < asm.p; r++) {
      const rel = (asm.n[r] as number) / this.amountScale(asm.present[r] as number);
      if (rel < -NEGATIVE_AMOUNT && rel < worstValue) {
        worst = r;
        worstValue = rel;
      }
    }
    return worst;
  }

  /** Largest mol/L of solid s the totals could make; a scale for "negligibly negative". */
  amountScale(s: number): number {
    let scale = Infinity;
    for (let j = 0; j < this.tab.nc; j++) {
      const b = this.tab.b[s * this.tab.nc + j] as number;
      if (b > 0 && !this.tab.fixed[j]) scale = Math.min(scale, (this.tab.total[j] as number) / b);
    }
    return Number.isFinite(scale) && scale > 0 ? scale : 1;
  }

  /** The most supersaturated possible solid not in the set, excluding some, or -1. */
  mostSupersaturated(asm: Assemblage, exclude: readonly number[]): number {
    let best = -1;
    let bestSi = SUPERSATURATED;
    for (let s = 0; s < this.tab.nsol; s++) {
      if (!this.possible[s] || exclude.includes(s) || isPresent(asm, s)) continue;
      const si = saturationIndex(asm, s);
      if (si > bestSi) {
        best = s;
        bestSi = si;
      }
    }
    return best;
  }

  consistent(asm: Assemblage, out: NewtonOutcome): boolean {
    return out.converged && this.mostNegative(asm) < 0 && this.mostSupersaturated(asm, NO_SOLIDS) < 0;
  }

  /** Tries subsets of the solids involved, smallest first; the first consistent one wins. */
  search(candidates: number[]): { asm: Assemblage; out: NewtonOutcome } | null {
    const list = candidates.slice(0, 12);
    const start = this.cur;
    const subsets: number[][] = [];
    for (let mask = 0; mask < 1 << list.length; mask++) subsets.push(list.filter((_, i) => mask & (1 << i)));
    subsets.sort((x, y) => x.length - y.length);
    for (const subset of subsets) {
      if (this.iterations > ITERATION_BUDGET) break;
      this.cur = start;
      const tried = this.attempt(subset);
      if (this.consistent(tried.asm, tried.out)) return tried;
    }
    this.cur = start;
    return null;
  }
}

/** Solids worth trying in the subset search: all of them when few, else those involved so far. */
function searchCandidates(tab: Tableau, possible: number[], involved: readonly number[]): number[] {
  const all: number[] = [];
  for (let s = 0; s < tab.nsol; s++) if (possible[s]) all.push(s);
  return all.length <= 10 ? all : [...involved];
}

/** Clears solid amounts a hair below zero; true if any was. */
function clampNegligible(asm: Assemblage): boolean {
  let changed = false;
  for (let r = 0; r < asm.p; r++) {
    if ((asm.n[r] as number) < 0) {
      asm.n[r] = 0;
      changed = true;
    }
  }
  return changed;
}

/**
 * The loop's outcome with this assemblage (amounts a hair below zero cleared if converged).
 * `saved`: the loop already saved this assemblage's state (saved again only if a clamp changed it).
 */
function finishWith(loop: PhaseLoop, asm: Assemblage, converged: boolean, message?: string, saved = false): PhaseOutcome {
  if (converged && clampNegligible(asm)) saved = false;
  if (!saved) loop.save(asm);
  return { asm, converged, message, iterations: loop.iterations, possible: loop.possible, state: loop.cur, trace: loop.trace };
}

/** Runs the phase-rule loop from a warm or cold start. */
export function settlePhases(tab: Tableau, opts: { tolerance: number; maxIterations: number; trace: boolean }, warm?: WarmStart): PhaseOutcome {
  const absent = findAbsent(tab);
  const possible = zeros(tab.nsol);
  for (let s = 0; s < tab.nsol; s++) {
    possible[s] = 1;
    for (let j = 0; j < tab.nc; j++) if (absent[j] && tab.b[s * tab.nc + j] !== 0) possible[s] = 0;
  }
  const start = warm && warm.lnx.length === tab.nc ? warm : coldStart(tab);
  const loop = new PhaseLoop(tab, absent, possible, opts.tolerance, opts.maxIterations, start, opts.trace);
  let present: number[] = [];
  for (const s of start.present) if (s < tab.nsol && possible[s]) present.push(s);
  // Small lists (a handful of solids): arrays are cheaper than sets on every solve.
  const visited: string[] = [];
  const involved: number[] = [...present];
  const blocked: number[] = [];
  let lastAdded = -1;

  for (let change = 0; change <= MAX_PHASE_CHANGES; change++) {
    const key = present.length === 0 ? '' : present.length === 1 ? String(present[0]) : present.slice().sort(ascending).join(',');
    if (visited.includes(key)) {
      const found = loop.search(searchCandidates(tab, possible, involved));
      if (found) return finishWith(loop, found.asm, true);
      const last = loop.attempt(present);
      return finishWith(loop, last.asm, false, 'The set of solids present did not settle (the phase-rule loop cycled and no consistent set was found).');
    }
    visited.push(key);
    let { asm, out } = loop.attempt(present);
    if (!out.converged && out.singular && lastAdded >= 0) {
      // The added solid is not independent of those present: try it in place of each of them.
      const others = without(present, lastAdded);
      let swapped = false;
      for (const t of others) {
        const trial = loop.attempt(without(present, t));
        if (trial.out.converged) {
          ({ asm, out } = trial);
          present = without(present, t);
          swapped = true;
          break;
        }
      }
      if (!swapped) {
        if (!blocked.includes(lastAdded)) blocked.push(lastAdded);
        present = without(present, lastAdded);
        lastAdded = -1;
        continue;
      }
    }
    if (!out.converged) {
      // This set will not solve; another set of solids may (the answer may not need this one).
      const residual = out.residual;
      const found = present.length > 0 ? loop.search(searchCandidates(tab, possible, involved)) : null;
      if (found) return finishWith(loop, found.asm, true);
      return finishWith(loop, asm, false, `Newton iteration did not converge (relative mass-balance residual ${residual.toExponential(2)} after ${loop.iterations} iterations).`);
    }
    loop.save(asm);
    const neg = loop.mostNegative(asm);
    if (neg >= 0) {
      present = without(present, asm.present[neg] as number);
      lastAdded = -1;
      continue;
    }
    const add = loop.mostSupersaturated(asm, blocked);
    if (add >= 0) {
      present = [...present, add];
      if (!involved.includes(add)) involved.push(add);
      lastAdded = add;
      continue;
    }
    if (blocked.length > 0 && loop.mostSupersaturated(asm, NO_SOLIDS) >= 0) {
      return finishWith(loop, asm, false, 'A supersaturated solid could not be added: its formula is not independent of the solids present (phase rule).', true);
    }
    return finishWith(loop, asm, true, undefined, true);
  }
  const last = loop.attempt(present);
  return finishWith(loop, last.asm, false, 'The set of solids present did not settle within the allowed number of changes.');
}

/**
 * Last resort for Davies with the ionic strength computed, when the coupled solve failed: solve
 * the whole phase problem with I held, and find the I that its solution gives back, first by
 * successive substitution, then by Illinois false position on g(I) = I(solution at I) - I
 * (g(0) >= 0, and g < 0 once I passes what the solution can hold). Each held solve is the
 * well-behaved fixed-I problem, started from the one before. Returns null when it cannot
 * (a held solve fails, or no bracket is found).
 */
export function settleOuterIonicStrength(tab: Tableau, opts: { tolerance: number; maxIterations: number }, start: number): PhaseOutcome | null {
  let state: WarmStart | undefined;
  let iterations = 0;
  const at = (I: number): number => {
    if (iterations > ITERATION_BUDGET) return NaN;
    const out = settlePhases({ ...tab, fixedIonicStrength: I }, { ...opts, trace: false }, state);
    iterations += out.iterations;
    if (!out.converged) return NaN;
    state = out.state;
    return out.asm.computedIonicStrength - I;
  };
  const close = (I: number, g: number) => Math.abs(g) <= 10 * opts.tolerance * Math.max(I, 1e-12);
  let I = Math.max(0, start);
  let g = at(I);
  for (let n = 0; n < 8 && Number.isFinite(g) && !close(I, g); n++) {
    I += g;
    g = at(I);
  }
  if (Number.isNaN(g)) return null;
  if (!close(I, g)) {
    const g0 = at(0);
    if (Number.isNaN(g0)) return null;
    let hi = Math.max(2 * I, 2 * g0, 1e-6);
    let ghi = at(hi);
    for (let n = 0; n < 40 && ghi > 0; n++) {
      hi *= 2;
      ghi = at(hi);
    }
    if (!(ghi <= 0)) return null;
    const found = illinois(at, { a: 0, fa: g0, b: hi, fb: ghi }, (x, fx, a, b) => close(x, fx) || Math.abs(b - a) <= 1e-15 * Math.max(a, b));
    if (Number.isNaN(found.fx)) return null;
    I = found.x;
  }
  // Solve once more at the answer: the pooled work space holds the last solve tried.
  const final = settlePhases({ ...tab, fixedIonicStrength: I }, { ...opts, trace: false }, state);
  iterations += final.iterations;
  if (!final.converged || !close(I, final.asm.computedIonicStrength - I)) return null;
  return { ...final, iterations };
}
