// Newton-Raphson for one assemblage of solids (Westall's tableau formulation). Unknowns: ln(free
// concentration) of each component with a total, the amount of each present solid and, under
// Davies with a computed ionic strength, s = sqrt(I). Equations: the mass balances, log IAP =
// log Ksp for each present solid, and s^2 = I(concentrations). A mass balance whose terms are all
// positive is written as ln(calculated total / analytical total), which makes steps from far
// away nearly exact for a dominant complex; others are scaled linearly. Steps are damped (a cap
// on any ln step, then halving while the residual grows). A start far from the answer is first
// relaxed one balance at a time; when Newton stalls, a bracketing fallback solves each balance
// for its own unknown (monotone in it) before Newton resumes.
//
// NOTE: longer than most files: the kernel keeps its arrays in one object so that an iteration
// allocates nothing, which is what keeps a solve in the tens of microseconds.

import { daviesPhi, daviesPhiSlope } from './activity';
import { DEFAULTS } from './defaults';
import { illinois } from './illinois';
import { rowsIndependent, solveInPlace } from './linear';
import type { Tableau } from './tableau';

const MAX_LN = 700;
// Copied out of DEFAULTS: read in the hot loops, where a module binding beats a property chain.
const SATURATION_TOLERANCE = DEFAULTS.saturationTolerance;
const MAX_LN_STEP = DEFAULTS.maxLnStep;
const MAX_BACKTRACKS = DEFAULTS.maxBacktracks;
const FALLBACK_SWEEPS = DEFAULTS.fallbackSweeps;
/** Mass residual below which s = sqrt(I) joins the Newton system (see maybeActivateIon). */
const ION_ACTIVATE_BELOW = 1e-2;
/** Start-up sweeps stop once one shrinks the distance by less than this factor (see relax). */
const RELAX_SLOW = 0.7;
// NOTE: module-level copies of imported functions: under a CommonJS transform (tsx, jest) an
// imported function is read through a getter at each call, and evaluate() runs thousands of times.
const phiAt = daviesPhi;
const phiSlopeAt = daviesPhiSlope;

/** Outcome of one Newton attempt on one assemblage. */
export interface NewtonOutcome {
  converged: boolean;
  singular: boolean;
  iterations: number;
  residual: number;
}

/** One line of the optional trace. */
export interface TraceLine {
  iteration: number;
  residual: number;
  step: number;
  solids: string[];
}

/** Which components are unknown, which species can exist, which solids are present. */
export class Assemblage {
  tab!: Tableau;
  m = 0;
  p = 0;
  nl = 0;
  private dim = 0;
  /** Component index of each unknown; componentRow[j] is the unknown's row or -1. */
  readonly u: Int32Array;
  readonly componentRow: Int32Array;
  /** Species index of each live row; speciesRow[i] is the row or -1 (species that cannot form). */
  readonly live: Int32Array;
  readonly speciesRow: Int32Array;
  readonly present: Int32Array;
  /** Nonzero coefficients of live row r over the unknowns: rowK/rowA[rowStart[r] .. rowStart[r + 1]). */
  private readonly rowStart: Int32Array;
  private readonly rowK: Int32Array;
  private readonly rowA: Float64Array;
  /** The same for present solid r over the unknowns (solStart, solK, solB). */
  private readonly solStart: Int32Array;
  private readonly solK: Int32Array;
  private readonly solB: Float64Array;
  /**
   * The exponents behind x and c at the last evaluation: a sweep that moves one unknown leaves
   * most of them unchanged, and an unchanged exponent reuses its exponential.
   */
  private readonly lastLnx: Float64Array;
  private readonly lastL: Float64Array;
  /** Whether dcalc and dIon belong to the last evaluation. */
  private derivativesFresh = false;
  private readonly bu: Float64Array;
  private readonly allPos: Uint8Array;
  /** 1 where a present solid contains the unknown's component. */
  private readonly hasSolid: Uint8Array;
  private readonly T: Float64Array;
  private readonly base0: Float64Array;
  private readonly sbase0: Float64Array;
  private readonly qS: Float64Array;
  private readonly z2S: Float64Array;
  private readonly z2U: Float64Array;
  private readonly qB: Float64Array;
  private fixedIon = 0;
  /** Whether the present solids' formulas are independent over the unknowns (else the phase rule is broken). */
  private solidsIndependent = true;
  /** 'ideal': gamma 1; 'held': I fixed by the problem; 'free': I solved with the rest. */
  private mode: 'ideal' | 'held' | 'free' = 'ideal';
  private ionActive = false;
  /**
   * Whether balances with a solid term may take the log form. Off by default: the linear form
   * handles a solid taking up most of a total in few steps. On as a fallback: the log form
   * handles a solid taking up nearly all of two totals at once (a stoichiometric point), where
   * the linear form crawls one e-fold per iteration.
   */
  solidLogForm = false;
  /**
   * Fallback for sets without solids: every balance linear, and steps judged by the convex
   * function F = sum(c) - sum(T ln x), whose gradient is the mass-balance residual and whose
   * Hessian is positive definite, so that damped Newton cannot stall.
   */
  linearOnly = false;
  /**
   * Fallback for sets with solids: after each step, the present solids' products set one
   * unknown each exactly (projectSolids). Helps when a very insoluble solid takes nearly all of
   * a component; off by default because elsewhere it can pull the start into a worse region.
   */
  projection = false;
  /** Set while the ionic-strength fallback holds s and solves the rest around it. */
  private ionHeld = false;
  // state
  readonly lnx: Float64Array;
  readonly n: Float64Array;
  private s = 0;
  private phi = 0;
  // results of the last evaluation
  readonly c: Float64Array;
  readonly x: Float64Array;
  private readonly calc: Float64Array;
  /** Sum of b n over the present solids, per unknown. */
  private readonly solidPart: Float64Array;
  private readonly absSum: Float64Array;
  private readonly diag: Float64Array;
  private ionCalc = 0;
  private readonly f: Float64Array;
  private readonly dF: Float64Array;
  // work
  private readonly dcalc: Float64Array;
  private readonly dIon: Float64Array;
  private readonly G: Float64Array;
  private readonly J: Float64Array;
  private readonly rowDiv: Float64Array;
  private readonly logForm: Uint8Array;
  private readonly step: Float64Array;
  private readonly saveLnx: Float64Array;
  private readonly saveN: Float64Array;
  /** Per present solid, the unknown whose ln x its solubility product sets (projection), or -1. */
  private readonly pivot: Int32Array;
  /** 1 where an unknown is already some solid's pivot (scratch for choosePivots). */
  private readonly pivotTaken: Uint8Array;
  private pivotsReady = false;
  private readonly pm: Float64Array;
  private readonly prhs: Float64Array;
  trace: TraceLine[] | null = null;

  /** Work space for tableaux of up to nc components, ns species and nsol solids. */
  constructor(nc: number, ns: number, nsol: number) {
    const maxDim = nc + nsol + 1;
    this.u = new Int32Array(nc);
    this.componentRow = new Int32Array(nc);
    this.live = new Int32Array(ns);
    this.speciesRow = new Int32Array(ns);
    this.present = new Int32Array(nsol);
    this.rowStart = new Int32Array(ns + 1);
    this.rowK = new Int32Array(ns * nc);
    this.rowA = new Float64Array(ns * nc);
    this.solStart = new Int32Array(nsol + 1);
    this.solK = new Int32Array(nsol * nc);
    this.solB = new Float64Array(nsol * nc);
    this.bu = new Float64Array(nsol * nc);
    this.allPos = new Uint8Array(nc);
    this.hasSolid = new Uint8Array(nc);
    this.T = new Float64Array(nc);
    this.base0 = new Float64Array(ns);
    this.sbase0 = new Float64Array(nsol);
    this.qS = new Float64Array(ns);
    this.z2S = new Float64Array(ns);
    this.z2U = new Float64Array(nc);
    this.qB = new Float64Array(nsol);
    this.lnx = new Float64Array(nc);
    this.n = new Float64Array(nsol);
    this.c = new Float64Array(ns);
    this.lastLnx = new Float64Array(nc);
    this.lastL = new Float64Array(ns);
    this.x = new Float64Array(nc);
    this.calc = new Float64Array(nc);
    this.solidPart = new Float64Array(nc);
    this.absSum = new Float64Array(nc);
    this.diag = new Float64Array(nc);
    this.f = new Float64Array(nsol);
    this.dF = new Float64Array(nsol);
    this.dcalc = new Float64Array(nc * maxDim);
    this.dIon = new Float64Array(maxDim);
    this.G = new Float64Array(maxDim);
    this.J = new Float64Array(maxDim * maxDim);
    this.rowDiv = new Float64Array(nc);
    this.logForm = new Uint8Array(nc);
    this.step = new Float64Array(maxDim);
    this.saveLnx = new Float64Array(nc);
    this.saveN = new Float64Array(nsol);
    this.pivot = new Int32Array(nsol);
    this.pivotTaken = new Uint8Array(nc);
    this.pm = new Float64Array(nsol * nsol);
    this.prhs = new Float64Array(nsol);
  }

  /** Sets up the unknowns and equations for one set of present solids. */
  configure(tab: Tableau, absent: ArrayLike<number>, present: readonly number[]): this {
    this.tab = tab;
    this.trace = null;
    const { nc, ns, a, b, fixed, fixedLn, componentCharge, speciesCharge } = tab;
    let m = 0;
    for (let j = 0; j < nc; j++) {
      if (!fixed[j] && !absent[j]) {
        this.componentRow[j] = m;
        this.u[m] = j;
        this.T[m] = tab.total[j] as number;
        this.z2U[m] = (componentCharge[j] as number) ** 2;
        this.allPos[m] = 1;
        this.hasSolid[m] = 0;
        m++;
      } else {
        this.componentRow[j] = -1;
      }
    }
    this.m = m;
    let fixedIon = 0;
    for (let j = 0; j < nc; j++) if (fixed[j]) fixedIon += 0.5 * (componentCharge[j] as number) ** 2 * (tab.fixedValue[j] as number);
    this.fixedIon = fixedIon;
    let nl = 0;
    let nz = 0;
    for (let i = 0; i < ns; i++) {
      let dead = false;
      for (let j = 0; j < nc; j++) if (absent[j] && a[i * nc + j] !== 0) dead = true;
      if (dead) {
        this.speciesRow[i] = -1;
        continue;
      }
      const z = speciesCharge[i] as number;
      let base = tab.lnK[i] as number;
      let q = -z * z;
      this.rowStart[nl] = nz;
      for (let j = 0; j < nc; j++) {
        const aij = a[i * nc + j] as number;
        if (aij === 0) continue;
        q += aij * (componentCharge[j] as number) ** 2;
        if (fixed[j]) base += aij * (fixedLn[j] as number);
        const k = this.componentRow[j] as number;
        if (k >= 0) {
          this.rowK[nz] = k;
          this.rowA[nz++] = aij;
          if (aij < 0) this.allPos[k] = 0;
        }
      }
      this.speciesRow[i] = nl;
      this.live[nl] = i;
      this.base0[nl] = base;
      this.qS[nl] = q;
      this.z2S[nl] = z * z;
      nl++;
    }
    this.nl = nl;
    this.rowStart[nl] = nz;
    const p = present.length;
    nz = 0;
    for (let r = 0; r < p; r++) {
      const sIdx = present[r] as number;
      this.present[r] = sIdx;
      let base = -(tab.lnKsp[sIdx] as number);
      let q = 0;
      for (let k = 0; k < m; k++) this.bu[r * m + k] = 0;
      this.solStart[r] = nz;
      for (let j = 0; j < nc; j++) {
        const bj = b[sIdx * nc + j] as number;
        if (bj === 0) continue;
        q += bj * (componentCharge[j] as number) ** 2;
        if (fixed[j]) base += bj * (fixedLn[j] as number);
        const k = this.componentRow[j] as number;
        if (k >= 0) {
          this.bu[r * m + k] = bj;
          this.solK[nz] = k;
          this.solB[nz++] = bj;
          this.hasSolid[k] = 1;
        }
      }
      this.sbase0[r] = base;
      this.qB[r] = q;
      this.n[r] = 0;
    }
    this.solStart[p] = nz;
    this.p = p;
    this.derivativesFresh = false;
    this.lastLnx.fill(NaN);
    this.lastL.fill(NaN);
    this.solidsIndependent = p === 0 || rowsIndependent(this.bu, p, m, this.J);
    this.pivotsReady = false;
    this.mode = tab.activity === 'ideal' ? 'ideal' : tab.fixedIonicStrength !== null ? 'held' : 'free';
    this.ionActive = false;
    this.ionHeld = false;
    this.solidLogForm = false;
    this.linearOnly = false;
    this.projection = false;
    this.dim = m + p;
    this.s = 0;
    return this;
  }

  /** The present solids as a plain list of solid indices. */
  presentList(): number[] {
    const list: number[] = [];
    for (let r = 0; r < this.p; r++) list.push(this.present[r] as number);
    return list;
  }

  /** Starts (or holds) the ionic strength at I, mol/L. */
  setIonicStrength(I: number): void {
    this.s = Math.sqrt(Math.max(0, this.tab.fixedIonicStrength ?? I));
  }

  /** Ionic strength of the current concentrations, mol/L (whatever the activity coefficients used). */
  get computedIonicStrength(): number {
    return this.ionCalc;
  }

  /** Ionic strength, mol/L: the value used for activities, or computed from the species if ideal. */
  get ionicStrength(): number {
    return this.mode === 'ideal' ? this.ionCalc : this.s * this.s;
  }

  /** ln gamma of component j at the current ionic strength. */
  lnGammaComponent(j: number): number {
    return this.phi * (this.tab.componentCharge[j] as number) ** 2;
  }

  /** ln gamma = phi z^2 at the current ionic strength (0 when ideal). */
  get phiValue(): number {
    return this.phi;
  }

  /**
   * Concentrations and calculated totals at the current state. Their derivatives are worked out
   * from these when the Jacobian is next built, so that rejected trial steps skip them.
   */
  evaluate(): void {
    const { m, p, lnx, x, c, calc, solidPart, absSum, diag, z2U, base0, qS, z2S, rowStart, rowK, rowA, solStart, solK, solB, lastLnx, lastL } = this;
    const phi = this.mode !== 'ideal' ? phiAt(this.s, this.tab.daviesA) : 0;
    this.phi = phi;
    let ion = this.fixedIon;
    for (let k = 0; k < m; k++) {
      const v = lnx[k] as number;
      let xv = x[k] as number;
      if (v !== lastLnx[k]) {
        xv = Math.exp(v > MAX_LN ? MAX_LN : v);
        x[k] = xv;
        lastLnx[k] = v;
      }
      calc[k] = xv;
      solidPart[k] = 0;
      absSum[k] = xv;
      diag[k] = xv;
      ion += 0.5 * (z2U[k] as number) * xv;
    }
    for (let r = 0, nl = this.nl; r < nl; r++) {
      const lo = rowStart[r] as number;
      const hi = rowStart[r + 1] as number;
      let l = (base0[r] as number) + phi * (qS[r] as number);
      for (let e = lo; e < hi; e++) l += (rowA[e] as number) * (lnx[rowK[e] as number] as number);
      let cr = c[r] as number;
      if (l !== lastL[r]) {
        cr = Math.exp(l > MAX_LN ? MAX_LN : l);
        c[r] = cr;
        lastL[r] = l;
      }
      if (cr === 0) continue;
      ion += 0.5 * (z2S[r] as number) * cr;
      for (let e = lo; e < hi; e++) {
        const k = rowK[e] as number;
        const a = rowA[e] as number;
        const ac = a * cr;
        calc[k] = (calc[k] as number) + ac;
        absSum[k] = (absSum[k] as number) + Math.abs(ac);
        diag[k] = (diag[k] as number) + ac * a;
      }
    }
    for (let r = 0; r < p; r++) {
      const nr = this.n[r] as number;
      let fs = (this.sbase0[r] as number) + phi * (this.qB[r] as number);
      for (let e = solStart[r] as number, hi = solStart[r + 1] as number; e < hi; e++) {
        const k = solK[e] as number;
        const b = solB[e] as number;
        fs += b * (lnx[k] as number);
        calc[k] = (calc[k] as number) + b * nr;
        solidPart[k] = (solidPart[k] as number) + b * nr;
        absSum[k] = (absSum[k] as number) + Math.abs(b * nr);
      }
      this.f[r] = fs;
    }
    this.ionCalc = ion;
    this.derivativesFresh = false;
  }

  /** Derivatives of the calculated totals, solid equations and ionic strength at the last evaluation. */
  private derivatives(): void {
    const { m, p, dim, x, c, dcalc, dIon, z2U, rowStart, rowK, rowA, solStart, solK, solB } = this;
    const ionCol = this.ionActive ? m + p : -1;
    const dphi = ionCol >= 0 ? phiSlopeAt(this.s, this.tab.daviesA) : 0;
    let dIonDs = 0;
    for (let q = 0, end = m * dim; q < end; q++) dcalc[q] = 0;
    for (let q = 0; q < dim; q++) dIon[q] = 0;
    for (let k = 0; k < m; k++) {
      const xv = x[k] as number;
      dcalc[k * dim + k] = xv;
      dIon[k] = 0.5 * (z2U[k] as number) * xv;
    }
    for (let r = 0, nl = this.nl; r < nl; r++) {
      const cr = c[r] as number;
      if (cr === 0) continue;
      const lo = rowStart[r] as number;
      const hi = rowStart[r + 1] as number;
      const zc = 0.5 * (this.z2S[r] as number) * cr;
      const dLnCds = dphi * (this.qS[r] as number);
      if (ionCol >= 0) dIonDs += zc * dLnCds;
      for (let e = lo; e < hi; e++) {
        const k = rowK[e] as number;
        const a = rowA[e] as number;
        const ac = a * cr;
        const row = k * dim;
        for (let g = lo; g < hi; g++) {
          const q = row + (rowK[g] as number);
          dcalc[q] = (dcalc[q] as number) + ac * (rowA[g] as number);
        }
        if (ionCol >= 0) dcalc[row + ionCol] = (dcalc[row + ionCol] as number) + ac * dLnCds;
        dIon[k] = (dIon[k] as number) + zc * a;
      }
    }
    for (let r = 0; r < p; r++) {
      for (let e = solStart[r] as number, hi = solStart[r + 1] as number; e < hi; e++) dcalc[(solK[e] as number) * dim + m + r] = solB[e] as number;
      this.dF[r] = dphi * (this.qB[r] as number);
    }
    if (ionCol >= 0) dIon[ionCol] = dIonDs;
    this.derivativesFresh = true;
  }

  /**
   * ln(dissolved / (total - solids)) for a balance whose dissolved terms are all positive, or NaN
   * when that form does not apply (a negative coefficient, or solids claiming the whole total).
   */
  private logMisfit(k: number, forNewton = true): number {
    if (!this.allPos[k] || (forNewton && this.linearOnly) || (!this.solidLogForm && this.hasSolid[k])) return NaN;
    const rhs = (this.T[k] as number) - (this.solidPart[k] as number);
    const dissolved = (this.calc[k] as number) - (this.solidPart[k] as number);
    return rhs > 0 && dissolved > 0 ? Math.log(dissolved / rhs) : NaN;
  }

  /** F = sum of all dissolved concentrations - sum(T ln x) over the unknowns (a convex function). */
  private potential(): number {
    let f = 0;
    for (let r = 0; r < this.nl; r++) f += this.c[r] as number;
    for (let k = 0; k < this.m; k++) f += (this.x[k] as number) - (this.T[k] as number) * (this.lnx[k] as number);
    return f;
  }

  /** Largest relative mass-balance residual at the last evaluation. */
  massResidual(): number {
    let worst = 0;
    for (let k = 0; k < this.m; k++) {
      const t = this.T[k] as number;
      const scale = Math.max(t, this.absSum[k] as number);
      const r = scale > 0 ? Math.abs((this.calc[k] as number) - t) / scale : 0;
      if (!(r <= worst)) worst = r;
    }
    return worst;
  }

  private saturationResidual(): number {
    let worst = 0;
    for (let r = 0; r < this.p; r++) {
      const v = Math.abs(this.f[r] as number) / Math.LN10;
      if (!(v <= worst)) worst = v;
    }
    return worst;
  }

  private ionResidual(): number {
    if (this.mode !== 'free' || this.ionHeld) return 0;
    if (!this.ionActive) return Infinity;
    return Math.abs(this.s * this.s - this.ionCalc) / Math.max(this.ionCalc, 1e-20);
  }

  /**
   * Puts s = sqrt(I) into the Newton system once the balances are roughly met (to 1%) at the
   * current activity coefficients: far from the answer I is absurd, and the coupled system is
   * best started near a solution at fixed activity coefficients.
   */
  private maybeActivateIon(): boolean {
    if (this.mode !== 'free' || this.ionHeld || this.ionActive || !(this.massResidual() < ION_ACTIVATE_BELOW)) return false;
    this.ionActive = true;
    this.dim = this.m + this.p + 1;
    this.s = Math.sqrt(this.ionCalc);
    return true;
  }

  /**
   * Each balance is written, at the current point, either as ln(dissolved / (total - solids))
   * (all dissolved terms positive: steps from far away are then nearly exact for a dominant
   * complex) or linearly, scaled by the larger of the total and the sum of absolute terms.
   */
  private chooseForms(): void {
    for (let k = 0; k < this.m; k++) {
      const log = !Number.isNaN(this.logMisfit(k));
      this.logForm[k] = log ? 1 : 0;
      this.rowDiv[k] = log ? (this.calc[k] as number) - (this.solidPart[k] as number) : Math.max(this.T[k] as number, this.absSum[k] as number, 1e-300);
    }
  }

  /** Residual vector for the chosen forms; returns its squared norm (Infinity if undefined). */
  private residualVector(): number {
    const { m, p } = this;
    let merit = 0;
    for (let k = 0; k < m; k++) {
      let g: number;
      if (this.logForm[k]) {
        g = this.logMisfit(k);
        if (Number.isNaN(g)) return Infinity;
      } else {
        g = ((this.calc[k] as number) - (this.T[k] as number)) / (this.rowDiv[k] as number);
      }
      this.G[k] = g;
      merit += g * g;
    }
    for (let r = 0; r < p; r++) {
      const g = this.f[r] as number;
      this.G[m + r] = g;
      merit += g * g;
    }
    if (this.ionActive) {
      const g = (this.s * this.s - this.ionCalc) / Math.max(this.s * this.s, this.ionCalc, 1e-20);
      this.G[m + p] = g;
      merit += g * g;
    }
    return Number.isFinite(merit) ? merit : Infinity;
  }

  private buildJacobian(): void {
    if (!this.derivativesFresh) this.derivatives();
    const { m, p, dim } = this;
    for (let k = 0; k < m; k++) {
      const row = k * dim;
      if (this.logForm[k]) {
        const dissolved = (this.calc[k] as number) - (this.solidPart[k] as number);
        const rhs = (this.T[k] as number) - (this.solidPart[k] as number);
        for (let q = 0; q < m; q++) this.J[row + q] = (this.dcalc[row + q] as number) / dissolved;
        if (this.ionActive) this.J[row + dim - 1] = (this.dcalc[row + dim - 1] as number) / dissolved;
        for (let r = 0; r < p; r++) this.J[row + m + r] = (this.bu[r * m + k] as number) / rhs;
      } else {
        const d = this.rowDiv[k] as number;
        for (let q = 0; q < dim; q++) this.J[row + q] = (this.dcalc[row + q] as number) / d;
      }
    }
    for (let r = 0; r < p; r++) {
      const row = (m + r) * dim;
      for (let q = 0; q < m; q++) this.J[row + q] = this.bu[r * m + q] as number;
      for (let q = m; q < dim; q++) this.J[row + q] = 0;
      if (this.ionActive) this.J[row + dim - 1] = this.dF[r] as number;
    }
    if (this.ionActive) {
      const row = (dim - 1) * dim;
      const d = Math.max(this.s * this.s, this.ionCalc, 1e-20);
      for (let q = 0; q < dim; q++) this.J[row + q] = -(this.dIon[q] as number) / d;
      for (let q = m; q < m + p; q++) this.J[row + q] = 0;
      this.J[row + dim - 1] = (2 * this.s - (this.dIon[dim - 1] as number)) / d;
    }
  }

  /** How far the balances are from their totals: max |ln(calc/T)|, or the relative misfit. */
  private distance(): number {
    let worst = 0;
    for (let k = 0; k < this.m; k++) {
      const t = this.T[k] as number;
      const calc = this.calc[k] as number;
      const log = this.logMisfit(k, false);
      // No log form: because a solid takes part (judge linearly), or because nothing is dissolved
      // or the solids claim the whole total (far from the answer).
      const far = this.allPos[k] && t > 0 && (!this.hasSolid[k] || this.solidLogForm);
      const d = !Number.isNaN(log) ? Math.abs(log) : far ? Infinity : Math.abs(calc - t) / Math.max(t, this.absSum[k] as number, 1e-300);
      if (!(d <= worst)) worst = d;
    }
    return worst;
  }

  /**
   * Picks, for the present solids, one unknown each whose ln x their solubility products will set
   * (the limiting component: smallest total per formula unit), keeping the p-by-p block of
   * coefficients independent. Returns false when no such choice exists.
   */
  private choosePivots(): boolean {
    const { m, p, bu, pivot } = this;
    const taken = this.pivotTaken;
    taken.fill(0);
    for (let r = 0; r < p; r++) {
      let best = -1;
      let bestLimit = Infinity;
      for (let k = 0; k < m; k++) {
        const b = bu[r * m + k] as number;
        if (b <= 0 || taken[k]) continue;
        const limit = (this.T[k] as number) / b;
        if (limit < bestLimit) {
          best = k;
          bestLimit = limit;
        }
      }
      if (best < 0) return false;
      pivot[r] = best;
      taken[best] = 1;
    }
    // The block must be solvable: check with a throwaway copy.
    for (let r = 0; r < p; r++) for (let q = 0; q < p; q++) this.pm[r * p + q] = bu[r * m + (pivot[q] as number)] as number;
    for (let r = 0; r < p; r++) this.prhs[r] = 1;
    return solveInPlace(this.pm, this.prhs, p, 1e-9);
  }

  /**
   * Sets the pivot unknowns so that every present solid sits exactly at its solubility product
   * (log IAP = log Ksp is linear in ln x). Far from the answer this spares Newton the crawl of a
   * nearly exhausted component down many e-folds; at the answer it changes nothing.
   */
  private projectSolids(): void {
    const { m, p, bu, pivot, lnx } = this;
    if (p === 0) return;
    if (!this.pivotsReady) {
      this.pivotsReady = true;
      if (!this.choosePivots()) pivot[0] = -1;
    }
    if (pivot[0] === -1) return;
    const phi = this.mode !== 'ideal' ? phiAt(this.s, this.tab.daviesA) : 0;
    for (let r = 0; r < p; r++) {
      let rhs = -((this.sbase0[r] as number) + phi * (this.qB[r] as number));
      for (let k = 0; k < m; k++) {
        const b = bu[r * m + k] as number;
        if (b === 0) continue;
        let isPivot = false;
        for (let q = 0; q < p; q++) if (pivot[q] === k) isPivot = true;
        if (!isPivot) rhs -= b * (lnx[k] as number);
      }
      this.prhs[r] = rhs;
      for (let q = 0; q < p; q++) this.pm[r * p + q] = bu[r * m + (pivot[q] as number)] as number;
    }
    if (!solveInPlace(this.pm, this.prhs, p, 1e-9)) return;
    for (let q = 0; q < p; q++) {
      const v = this.prhs[q] as number;
      if (Number.isFinite(v)) lnx[pivot[q] as number] = Math.max(-3 * MAX_LN, Math.min(MAX_LN, v));
    }
  }

  /**
   * Start-up relaxation: Gauss-Seidel sweeps of a one-unknown Newton step on each balance (in
   * log form where all terms are positive). Far from the answer one complex often dominates
   * several balances at once and the full Jacobian is then nearly singular; these sweeps walk
   * into the region where full Newton converges fast. Expects a current evaluation.
   */
  relax(maxSweeps: number, target: number): void {
    let previous = Infinity;
    for (let sweep = 0; sweep < maxSweeps; sweep++) {
      const now = this.distance();
      if (!(now > target)) break;
      // Without solids, a sweep that gains little means coupled balances (a metal and its ligand
      // both mostly in complexes) zigzagging: Newton moves along them at once and does better.
      // With solids the sweeps are kept to the target: Newton starts worse there.
      if (this.p === 0 && now > RELAX_SLOW * previous) break;
      previous = now;
      let moved = false;
      for (let k = 0; k < this.m; k++) {
        const t = this.T[k] as number;
        const calc = this.calc[k] as number;
        const d = this.diag[k] as number;
        if (!(d > 0)) continue;
        const log = this.logMisfit(k, false);
        const dissolved = calc - (this.solidPart[k] as number);
        let delta = !Number.isNaN(log) ? -log / (d / dissolved) : -(calc - t) / d;
        const cap = Number.isNaN(log) ? 2.3 : 100;
        delta = Math.max(-cap, Math.min(cap, delta));
        if (!Number.isFinite(delta)) continue;
        const next = (this.lnx[k] as number) + delta;
        // An unchanged unknown leaves the evaluation as it is.
        if (next === this.lnx[k]) continue;
        this.lnx[k] = next;
        this.evaluate();
        moved = true;
      }
      // A sweep that moved nothing is a fixed point: the sweeps left would repeat it.
      if (!moved) break;
    }
  }

  /** Damped Newton from the current state. */
  newton(maxIterations: number, tolerance: number): NewtonOutcome {
    const { m } = this;
    if (this.projection) this.projectSolids();
    this.evaluate();
    if (this.distance() > 1) this.relax(40, 0.5);
    if (this.maybeActivateIon()) this.evaluate();
    let best = Infinity;
    let stalled = 0;
    let uphill = 0;
    // Round-off can stop progress just short of the tolerance; accept ten times it then.
    const loose = 10 * tolerance;
    for (let it = 0; it <= maxIterations; it++) {
      if (this.maybeActivateIon()) this.evaluate();
      const res = this.massResidual();
      const sat = this.saturationResidual();
      const ion = this.ionResidual();
      const satOk = sat <= SATURATION_TOLERANCE;
      // Within ten times the tolerances: accepted when round-off stops progress short of them.
      const nearly = res <= loose && ion <= loose && sat <= SATURATION_TOLERANCE * 100;
      if (res <= tolerance && satOk && ion <= tolerance) return { converged: true, singular: false, iterations: it, residual: res };
      const score = Math.max(res, ion, sat * 1e-2);
      if (score < best * 0.5) {
        best = score;
        stalled = 0;
      } else if (++stalled >= 4 && nearly) {
        return { converged: true, singular: false, iterations: it, residual: res };
      }
      if (it === maxIterations) return { converged: false, singular: false, iterations: it, residual: res };
      const dim = this.dim;
      this.chooseForms();
      const merit = this.residualVector();
      this.buildJacobian();
      for (let q = 0; q < dim; q++) this.step[q] = -(this.G[q] as number);
      if (!this.solidsIndependent) return { converged: false, singular: true, iterations: it, residual: res };
      // Independent solids leave the system solvable however ill-conditioned (at an equivalence
      // point free concentrations are ~1e-14 of the totals); only an exact breakdown counts.
      if (!solveInPlace(this.J, this.step, dim, 1e-300)) return { converged: false, singular: true, iterations: it, residual: res };
      let biggest = 0;
      for (let k = 0; k < m; k++) biggest = Math.max(biggest, Math.abs(this.step[k] as number));
      if (!Number.isFinite(biggest)) return { converged: false, singular: true, iterations: it, residual: res };
      let lambda = biggest > MAX_LN_STEP ? MAX_LN_STEP / biggest : 1;
      for (let k = 0; k < m; k++) this.saveLnx[k] = this.lnx[k] as number;
      for (let r = 0; r < this.p; r++) this.saveN[r] = this.n[r] as number;
      const s0 = this.s;
      // Near the answer F changes by less than its round-off; the residual norm judges steps there.
      const convex = this.linearOnly && this.p === 0 && !this.ionActive && res > 1e-6;
      const f0 = convex ? this.potential() : 0;
      let slope = 0;
      if (convex) for (let k = 0; k < m; k++) slope += ((this.calc[k] as number) - (this.T[k] as number)) * (this.step[k] as number);
      let accepted = false;
      for (let bt = 0; bt <= (convex ? 40 : MAX_BACKTRACKS); bt++) {
        for (let k = 0; k < m; k++) this.lnx[k] = (this.saveLnx[k] as number) + lambda * (this.step[k] as number);
        for (let r = 0; r < this.p; r++) this.n[r] = (this.saveN[r] as number) + lambda * (this.step[m + r] as number);
        if (this.ionActive) this.s = Math.max(0.5 * s0, s0 + lambda * (this.step[dim - 1] as number));
        if (this.projection) this.projectSolids();
        this.evaluate();
        const better = convex ? this.potential() <= f0 + 1e-4 * lambda * slope : this.residualVector() < merit;
        if (better) {
          accepted = true;
          break;
        }
        lambda *= 0.5;
      }
      if (accepted) uphill = 0;
      else if (!convex && ++uphill <= 3 && Number.isFinite(this.residualVector())) accepted = true;
      if (!accepted) {
        // No step along the Newton direction reduces the residual, a few times running: go back
        // and let a fallback try. (A single uphill step is allowed: it often leaves a bad start.)
        for (let k = 0; k < m; k++) this.lnx[k] = this.saveLnx[k] as number;
        for (let r = 0; r < this.p; r++) this.n[r] = this.saveN[r] as number;
        this.s = s0;
        this.evaluate();
        // Back at this iteration's start: round-off may have left no descent just short of the tolerance.
        return { converged: nearly, singular: false, iterations: it + 1, residual: res };
      }
      this.trace?.push({ iteration: this.trace.length + 1, residual: res, step: lambda * biggest, solids: this.presentList().map((s) => this.tab.solidNames[s] as string) });
    }
    return { converged: false, singular: false, iterations: maxIterations, residual: Infinity };
  }

  /** True when the ionic strength is an unknown (Davies, not held by the problem). */
  get ionFree(): boolean {
    return this.mode === 'free';
  }

  /** Misfit of s^2 against the ionic strength of the concentrations at s, after solving at s. */
  private ionMisfitAt(s: number, maxIterations: number, tolerance: number, count: { iterations: number }): number {
    this.s = s;
    let out = this.newton(maxIterations, tolerance);
    count.iterations += out.iterations;
    if (!out.converged) {
      this.bracketSweeps(FALLBACK_SWEEPS);
      out = this.newton(maxIterations, tolerance);
      count.iterations += out.iterations;
    }
    if (!out.converged) return NaN;
    return (s * s - this.ionCalc) / Math.max(s * s, this.ionCalc, 1e-20);
  }

  /**
   * Ionic-strength fallback for Davies at high ionic strength, where the coupled Newton can wander:
   * hold s = sqrt(I), solve everything else, and bracket the root of s^2 - I(s) (negative at
   * s = 0, positive for large s) with the Illinois method.
   */
  ionicStrengthFallback(maxIterations: number, tolerance: number): NewtonOutcome {
    const count = { iterations: 0 };
    const fail = (): NewtonOutcome => {
      this.ionHeld = false;
      return { converged: false, singular: false, iterations: count.iterations, residual: this.massResidual() };
    };
    this.ionHeld = true;
    this.ionActive = false;
    this.dim = this.m + this.p;
    let lo = 0;
    let flo = this.ionMisfitAt(0, maxIterations, tolerance, count);
    if (!(flo <= 0)) return flo === 0 ? { ...fail(), converged: true } : fail();
    let hi = Math.max(1.5 * Math.sqrt(this.ionCalc), 1e-3);
    let fhi = this.ionMisfitAt(hi, maxIterations, tolerance, count);
    for (let n = 0; fhi < 0 && n < 40; n++) {
      lo = hi;
      flo = fhi;
      hi *= 2;
      fhi = this.ionMisfitAt(hi, maxIterations, tolerance, count);
    }
    if (!(fhi >= 0)) return fail();
    const found = illinois(
      (v) => this.ionMisfitAt(v, maxIterations, tolerance, count),
      { a: lo, fa: flo, b: hi, fb: fhi },
      (_v, fv, a, b) => Math.abs(fv) <= tolerance || Math.abs(b - a) <= 1e-15 * Math.max(Math.abs(a), Math.abs(b)),
    );
    if (Number.isNaN(found.fx)) return fail();
    const fm = found.fx;
    this.ionHeld = false;
    const converged = Math.abs(fm) <= DEFAULTS.looseTolerance && this.massResidual() <= DEFAULTS.looseTolerance;
    return { converged, singular: false, iterations: count.iterations, residual: this.massResidual() };
  }

  /**
   * Bracketing fallback: Gauss-Seidel sweeps, each solving one mass balance for its own
   * ln(free concentration) by bracketing and the Illinois false-position method, with the other
   * unknowns, the solid amounts and the ionic strength held. Each balance is monotone in its own
   * unknown, so a bracket always exists.
   */
  bracketSweeps(sweeps: number): void {
    for (let r = 0; r < this.p; r++) this.n[r] = Math.max(0, this.n[r] as number);
    for (let sweep = 0; sweep < sweeps; sweep++) {
      let moved = 0;
      for (let k = 0; k < this.m; k++) {
        const before = this.lnx[k] as number;
        this.solveOne(k);
        moved = Math.max(moved, Math.abs((this.lnx[k] as number) - before));
      }
      if (this.mode === 'free') this.s = Math.sqrt(this.ionCalc);
      if (moved < 1e-9) break;
    }
  }

  private balanceAt(k: number, v: number): number {
    this.lnx[k] = v;
    this.evaluate();
    const t = this.T[k] as number;
    const calc = this.calc[k] as number;
    if (this.allPos[k] && t > 0) {
      const log = this.logMisfit(k, false);
      if (!Number.isNaN(log)) return log;
      // Solids claim the whole total (too much) or nothing is dissolved yet (too little).
      return (this.T[k] as number) - (this.solidPart[k] as number) <= 0 ? 1 : -Infinity;
    }
    return (calc - t) / Math.max(t, this.absSum[k] as number, 1e-300);
  }

  private solveOne(k: number): void {
    const floor = -3 * MAX_LN;
    const start = this.lnx[k] as number;
    let a = start;
    let fa = this.balanceAt(k, a);
    if (fa === 0) return;
    let b = a;
    let fb = fa;
    const dir = fa > 0 ? -1 : 1;
    for (let width = 1, n = 0; Math.sign(fb) === Math.sign(fa) && n < 60; width *= 2, n++) {
      a = b;
      fa = fb;
      b = Math.min(MAX_LN, Math.max(floor, b + dir * width));
      fb = this.balanceAt(k, b);
      if (b === MAX_LN || b === floor) break;
    }
    if (Math.sign(fb) === Math.sign(fa)) {
      // No sign change within reach (solids held at amounts the totals cannot supply): leave it.
      this.lnx[k] = start;
      this.evaluate();
      return;
    }
    const found = illinois(
      (v) => this.balanceAt(k, v),
      { a, fa, b, fb },
      (_v, fv, lo, hi) => fv === 0 || Math.abs(hi - lo) <= 1e-13 * Math.max(1, Math.abs(hi)),
    );
    // balanceAt left the state at the point tried last; a root hit exactly is kept as it is.
    if (found.fx === 0) return;
    ({ a, fa, b, fb } = found);
    this.lnx[k] = Math.abs(fa) < Math.abs(fb) ? a : b;
    this.evaluate();
  }
}

const pool = new Map<string, Assemblage>();
/** The space handed out last and its sizes. */
let last: Assemblage | null = null;
let lastNc = -1;
let lastNs = -1;
let lastNsol = -1;

/**
 * A work space configured for this tableau and set of solids. Spaces are pooled by size and
 * reused (solves are synchronous, so one at a time): only the most recently configured space of
 * a size is valid, and callers copy what they keep.
 */
export function assemblageFor(tab: Tableau, absent: ArrayLike<number>, present: readonly number[]): Assemblage {
  // The phase loop asks for the same size many times running: check the last one before keying the pool.
  let space = last !== null && lastNc === tab.nc && lastNs === tab.ns && lastNsol === tab.nsol ? last : undefined;
  if (!space) {
    const key = `${tab.nc},${tab.ns},${tab.nsol}`;
    space = pool.get(key);
    if (!space) {
      if (pool.size >= 32) pool.clear();
      space = new Assemblage(tab.nc, tab.ns, tab.nsol);
      pool.set(key, space);
    }
    last = space;
    lastNc = tab.nc;
    lastNs = tab.ns;
    lastNsol = tab.nsol;
  }
  return space.configure(tab, absent, present);
}
