import { divideExact } from './divide-exact.ts';
import { Polynomial } from './polynomial.ts';
import { RationalFunction } from './rational-function.ts';

/** A matrix as rows of polynomials. */
export type PolynomialMatrix = readonly (readonly Polynomial[])[];

/**
 * Determinant by fraction-free Gaussian elimination (Bareiss 1968): after step k every entry is a
 * (k+1)×(k+1) minor of the original matrix, so the division by the previous pivot is exact by
 * Sylvester's identity and no fractions ever appear. A zero pivot is replaced by swapping in a
 * lower row (the sparsest candidate, to keep the entries small), each swap flipping the sign.
 * Throws when the matrix is not square (a programmer mistake).
 */
export function determinant(matrix: PolynomialMatrix): Polynomial {
  const n = matrix.length;
  if (matrix.some((row) => row.length !== n)) throw new RangeError('determinant of a non-square matrix');
  const m = matrix.map((row) => [...row]);
  let sign = 1;
  let previous = Polynomial.ONE;
  for (let k = 0; k < n - 1; k++) {
    const p = pivotRow(m, k);
    if (p === undefined) return Polynomial.ZERO;
    if (p !== k) {
      [m[k], m[p]] = [m[p]!, m[k]!];
      sign = -sign;
    }
    const rowK = m[k]!;
    const pivot = rowK[k]!;
    for (let i = k + 1; i < n; i++) {
      const rowI = m[i]!;
      const factor = rowI[k]!;
      for (let j = k + 1; j < n; j++) {
        const cross = rowI[j]!.mul(pivot).sub(factor.mul(rowK[j]!));
        rowI[j] = exactQuotient(cross, previous);
      }
      rowI[k] = Polynomial.ZERO;
    }
    previous = pivot;
  }
  const last = n === 0 ? Polynomial.ONE : m[n - 1]![n - 1]!;
  return sign < 0 ? last.neg() : last;
}

/**
 * Solves A x = b by Cramer's rule, x_i = det(A_i)/det(A) with A_i = A with column i replaced by b,
 * each determinant by Bareiss elimination. Undefined when det(A) is identically zero (the system
 * has no unique solution). Throws on mismatched sizes (a programmer mistake).
 */
export function solveLinear(a: PolynomialMatrix, b: readonly Polynomial[]): RationalFunction[] | undefined {
  if (b.length !== a.length) throw new RangeError('solveLinear: b and A have different numbers of rows');
  const d = determinant(a);
  if (d.isZero()) return undefined;
  return a.map((_, i) => {
    const ai = a.map((row, r) => row.map((entry, c) => (c === i ? b[r]! : entry)));
    return RationalFunction.of(determinant(ai), d);
  });
}

/** The row at or below k whose entry in column k is non-zero with the fewest terms. */
function pivotRow(m: Polynomial[][], k: number): number | undefined {
  let best: number | undefined;
  for (let i = k; i < m.length; i++) {
    const entry = m[i]![k]!;
    if (entry.isZero()) continue;
    if (best === undefined || entry.terms.length < m[best]![k]!.terms.length) best = i;
  }
  return best;
}

function exactQuotient(p: Polynomial, q: Polynomial): Polynomial {
  if (q.equals(Polynomial.ONE)) return p;
  const r = divideExact(p, q);
  // Sylvester's identity guarantees this; failing here means a bug in the algebra, not bad data.
  if (r === undefined) throw new Error('Bareiss step: division by the previous pivot was not exact');
  return r;
}
