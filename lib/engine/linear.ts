// Dense linear solve for the small Newton systems (a handful of unknowns): Gaussian elimination
// with partial pivoting, in place, no allocation.

/**
 * Solves M x = rhs for an n-by-n row-major matrix; overwrites M and leaves x in rhs.
 * Returns false when a pivot is negligible against its column (singular or nearly so).
 */
export function solveInPlace(m: Float64Array, rhs: Float64Array, n: number): boolean {
  for (let col = 0; col < n; col++) {
    let pivotRow = col;
    let best = Math.abs(m[col * n + col] as number);
    let colNorm = best;
    for (let r = col + 1; r < n; r++) {
      const v = Math.abs(m[r * n + col] as number);
      colNorm = Math.max(colNorm, v);
      if (v > best) {
        best = v;
        pivotRow = r;
      }
    }
    if (!(best > 1e-300) || !Number.isFinite(best)) return false;
    if (pivotRow !== col) {
      for (let k = col; k < n; k++) {
        const t = m[col * n + k] as number;
        m[col * n + k] = m[pivotRow * n + k] as number;
        m[pivotRow * n + k] = t;
      }
      const t = rhs[col] as number;
      rhs[col] = rhs[pivotRow] as number;
      rhs[pivotRow] = t;
    }
    const pivot = m[col * n + col] as number;
    for (let r = col + 1; r < n; r++) {
      const f = (m[r * n + col] as number) / pivot;
      if (f === 0) continue;
      for (let k = col + 1; k < n; k++) m[r * n + k] = (m[r * n + k] as number) - f * (m[col * n + k] as number);
      rhs[r] = (rhs[r] as number) - f * (rhs[col] as number);
    }
  }
  for (let r = n - 1; r >= 0; r--) {
    let s = rhs[r] as number;
    for (let k = r + 1; k < n; k++) s -= (m[r * n + k] as number) * (rhs[k] as number);
    const d = m[r * n + r] as number;
    if (Math.abs(d) < 1e-14 * rowScale(m, r, n)) return false;
    rhs[r] = s / d;
  }
  return true;
}

function rowScale(m: Float64Array, r: number, n: number): number {
  let s = 0;
  for (let k = r; k < n; k++) s = Math.max(s, Math.abs(m[r * n + k] as number));
  return s;
}
