/**
 * Dense LU factorisation with partial pivoting, in place, for the small iteration matrices of
 * the stiff integrator (a few to a few dozen species). Row-major storage, n × n. The solve with
 * iterative refinement is what the integrator uses: species twenty decades apart need it.
 */

/** The row at or below k with the largest entry in column k (partial pivoting). */
export function pivotRow(a: Float64Array, n: number, k: number): number {
  // The largest pivot in the column keeps the multipliers at most 1 in size.
  let p = k;
  let max = Math.abs(a[k * n + k]!);
  for (let i = k + 1; i < n; i++) {
    const v = Math.abs(a[i * n + k]!);
    if (v > max) {
      max = v;
      p = i;
    }
  }
  return p;
}

/**
 * Factors `a` in place into unit-lower L and upper U with row swaps recorded in `pivots`;
 * returns false when a pivot is exactly zero or not finite (the caller shrinks the step).
 */
export function luFactor(a: Float64Array, n: number, pivots: Int32Array): boolean {
  for (let k = 0; k < n; k++) {
    const p = pivotRow(a, n, k);
    pivots[k] = p;
    const max = Math.abs(a[p * n + k]!);
    if (max === 0 || !Number.isFinite(max)) return false;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        const tmp = a[k * n + j]!;
        a[k * n + j] = a[p * n + j]!;
        a[p * n + j] = tmp;
      }
    }
    const inv = 1 / a[k * n + k]!;
    for (let i = k + 1; i < n; i++) {
      const factor = a[i * n + k]! * inv;
      a[i * n + k] = factor;
      if (factor === 0) continue;
      for (let j = k + 1; j < n; j++) a[i * n + j] = a[i * n + j]! - factor * a[k * n + j]!;
    }
  }
  return true;
}

/** Solves A x = b in place in `b`, given the factors and pivots from `luFactor`. */
export function luSolve(lu: Float64Array, n: number, pivots: Int32Array, b: Float64Array): void {
  // luFactor swaps whole rows, multipliers included, so the stored L belongs to the final row
  // order: apply every swap, in the order made, before any elimination.
  for (let k = 0; k < n; k++) {
    const p = pivots[k]!;
    if (p !== k) {
      const tmp = b[k]!;
      b[k] = b[p]!;
      b[p] = tmp;
    }
  }
  for (let k = 0; k < n; k++) {
    const bk = b[k]!;
    if (bk === 0) continue;
    for (let i = k + 1; i < n; i++) b[i] = b[i]! - lu[i * n + k]! * bk;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = b[i]!;
    for (let j = i + 1; j < n; j++) s -= lu[i * n + j]! * b[j]!;
    b[i] = s / lu[i * n + i]!;
  }
}

/** At most this many refinement sweeps; each must halve the backward error to earn the next (common practice). */
const MAX_REFINEMENTS = 4;

/**
 * Solves A x = b into x by the factors of A (`lu`, `pivots`) and iterative refinement against A
 * itself (`a`), until the componentwise backward error max_i |b − Ax|_i / (|A||x| + |b|)_i is at
 * rounding level or stops halving. `residual` is scratch of length n; b is left as it was.
 */
export function luSolveRefined(
  a: Float64Array,
  lu: Float64Array,
  n: number,
  pivots: Int32Array,
  b: Float64Array,
  x: Float64Array,
  residual: Float64Array,
): void {
  // Partial pivoting is backward stable only normwise: an equation whose terms are twenty decades
  // below another's (a radical at 1e-15 M beside a reactant at 1e-3 M) can come back as pure
  // rounding of the larger one. Refinement from residuals computed in working precision makes the
  // solution componentwise backward stable, as exact as A and b themselves (R. D. Skeel, Math.
  // Comp. 35, 1980; the stopping rule as in LAPACK's xGERFS; both from memory).
  x.set(b);
  luSolve(lu, n, pivots, x);
  let previous = Infinity;
  for (let sweep = 0; sweep < MAX_REFINEMENTS; sweep++) {
    let backwardError = 0;
    for (let i = 0; i < n; i++) {
      let r = b[i]!;
      let size = Math.abs(r);
      for (let j = 0; j < n; j++) {
        const term = a[i * n + j]! * x[j]!;
        r -= term;
        size += Math.abs(term);
      }
      residual[i] = r;
      if (r !== 0) backwardError = Math.max(backwardError, Math.abs(r) / size);
    }
    if (!(backwardError > Number.EPSILON && backwardError <= previous / 2)) return;
    previous = backwardError;
    luSolve(lu, n, pivots, residual);
    for (let i = 0; i < n; i++) x[i] = x[i]! + residual[i]!;
  }
}
