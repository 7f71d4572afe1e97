/**
 * Test helper: a small dense linear solve in floating point (Gaussian elimination with partial
 * pivoting), written for the tests so that they do not lean on the engine's own solvers.
 */

/** Solves A x = b; undefined when A is singular to working precision. */
export function gaussianSolve(matrix: readonly (readonly number[])[], rhs: readonly number[]): number[] | undefined {
  const n = rhs.length;
  const a = matrix.map((row, i) => [...row, rhs[i]!]);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(a[r]![col]!) > Math.abs(a[pivot]![col]!)) pivot = r;
    if (a[pivot]![col] === 0) return undefined;
    [a[col], a[pivot]] = [a[pivot]!, a[col]!];
    const p = a[col]!;
    for (let r = col + 1; r < n; r++) {
      const row = a[r]!;
      const factor = row[col]! / p[col]!;
      for (let c = col; c <= n; c++) row[c] = row[c]! - factor * p[c]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    const row = a[r]!;
    let sum = row[n]!;
    for (let c = r + 1; c < n; c++) sum -= row[c]! * x[c]!;
    x[r] = sum / row[r]!;
  }
  return x;
}
