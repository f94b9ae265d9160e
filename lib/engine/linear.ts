// Dense linear solve for the small Newton systems (a handful of unknowns): Gaussian elimination
// with partial pivoting after column equilibration, in place, no allocation beyond a scratch row.

let colScale = new Float64Array(16);

/**
 * Solves M x = rhs for an n-by-n row-major matrix; overwrites M and leaves x in rhs.
 * Columns are first scaled to a largest entry of 1 (solid amounts and ln concentrations have very
 * different scales), so that a pivot can be judged negligible relative to its column.
 * Returns false when a pivot is at or below minPivot (relative to its column): singular or nearly so.
 */
export function solveInPlace(m: Float64Array, rhs: Float64Array, n: number, minPivot = 1e-13): boolean {
  if (colScale.length < n) colScale = new Float64Array(2 * n);
  for (let col = 0; col < n; col++) {
    let big = 0;
    for (let r = 0; r < n; r++) big = Math.max(big, Math.abs(m[r * n + col] as number));
    if (!(big > 0) || !Number.isFinite(big)) return false;
    colScale[col] = big;
    for (let r = 0; r < n; r++) m[r * n + col] = (m[r * n + col] as number) / big;
  }
  for (let col = 0; col < n; col++) {
    let pivotRow = col;
    let best = Math.abs(m[col * n + col] as number);
    for (let r = col + 1; r < n; r++) {
      const v = Math.abs(m[r * n + col] as number);
      if (v > best) {
        best = v;
        pivotRow = r;
      }
    }
    if (!(best > minPivot)) return false;
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
    rhs[r] = s / (m[r * n + r] as number);
  }
  for (let col = 0; col < n; col++) rhs[col] = (rhs[col] as number) / (colScale[col] as number);
  return true;
}

/** Whether the rows of a p-by-m row-major matrix (small integers, typically) are linearly independent. */
export function rowsIndependent(a: Float64Array, p: number, m: number, work: Float64Array): boolean {
  if (p > m) return false;
  for (let q = 0; q < p * m; q++) work[q] = a[q] as number;
  let row = 0;
  for (let col = 0; col < m && row < p; col++) {
    let pivot = row;
    for (let r = row + 1; r < p; r++) if (Math.abs(work[r * m + col] as number) > Math.abs(work[pivot * m + col] as number)) pivot = r;
    if (Math.abs(work[pivot * m + col] as number) < 1e-9) continue;
    for (let k = 0; k < m; k++) {
      const t = work[row * m + k] as number;
      work[row * m + k] = work[pivot * m + k] as number;
      work[pivot * m + k] = t;
    }
    for (let r = row + 1; r < p; r++) {
      const f = (work[r * m + col] as number) / (work[row * m + col] as number);
      for (let k = col; k < m; k++) work[r * m + k] = (work[r * m + k] as number) - f * (work[row * m + k] as number);
    }
    row++;
  }
  return row === p;
}
