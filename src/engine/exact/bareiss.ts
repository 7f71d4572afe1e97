import { divideExact } from './divide-exact.ts';
import { Polynomial } from './polynomial.ts';
import { RationalFunction } from './rational-function.ts';
import { WorkBudget } from './work-budget.ts';

/** A matrix as rows of polynomials. */
export type PolynomialMatrix = readonly (readonly Polynomial[])[];

/**
 * The solution of A x = b over one common denominator: x_i = numerators[i] / denominator, where
 * the denominator is ±det(A) and each numerator the matching Cramer determinant.
 */
export interface SharedSolution {
  numerators: Polynomial[];
  denominator: Polynomial;
}

/** Why a fraction-free solve gave no solution: a singular matrix, or the work budget ran out. */
export type SolveFailure = 'singular' | 'budget';

/**
 * Determinant by fraction-free Gaussian elimination (Bareiss 1968): after step k every entry is a
 * (k+1)×(k+1) minor of the original matrix, so the division by the previous pivot is exact by
 * Sylvester's identity and no fractions ever appear. A zero pivot is replaced by swapping in a
 * lower row (the sparsest candidate, to keep the entries small), each swap flipping the sign.
 * Throws when the matrix is not square (a programmer mistake).
 */
export function determinant(matrix: PolynomialMatrix): Polynomial {
  return determinantWithin(matrix, WorkBudget.unlimited()) as Polynomial;
}

/** The determinant as `determinant` computes it, its work charged to the budget; 'budget' once spent. */
export function determinantWithin(matrix: PolynomialMatrix, budget: WorkBudget): Polynomial | 'budget' {
  const n = matrix.length;
  if (matrix.some((row) => row.length !== n)) throw new RangeError('determinant of a non-square matrix');
  const m = matrix.map((row) => [...row]);
  const eliminated = eliminate(m, n, n - 1, budget);
  if (eliminated === 'budget') return 'budget';
  if (eliminated === 'singular') return Polynomial.ZERO;
  const last = n === 0 ? Polynomial.ONE : m[n - 1]![n - 1]!;
  return eliminated.swaps % 2 === 1 ? last.neg() : last;
}

/**
 * Solves A x = b with one fraction-free elimination of the augmented matrix [A | b] followed by
 * fraction-free back substitution (Nakos, Turner & Williams 1997): with d the last pivot (±det A),
 * X_i = d·x_i is a polynomial (Cramer's numerator), found from the triangular system as
 * X_i = (d·c_i − Σ_{j>i} U_ij X_j) / U_ii, each division exact. One elimination instead of the
 * n + 1 determinants of Cramer's rule. The work is charged to `budget`; a singular matrix or a
 * spent budget is returned as a failure, never thrown. Throws on mismatched sizes (a programmer mistake).
 */
export function solveShared(
  a: PolynomialMatrix,
  b: readonly Polynomial[],
  budget: WorkBudget = WorkBudget.unlimited(),
): SharedSolution | SolveFailure {
  const n = a.length;
  if (b.length !== n || a.some((row) => row.length !== n))
    throw new RangeError('solveShared: A must be square with as many rows as b');
  if (n === 0) return { numerators: [], denominator: Polynomial.ONE };
  const m = a.map((row, i) => [...row, b[i]!]);
  const eliminated = eliminate(m, n + 1, n, budget);
  if (typeof eliminated === 'string') return eliminated;
  const d = m[n - 1]![n - 1]!;
  const numerators: Polynomial[] = Array(n);
  numerators[n - 1] = m[n - 1]![n]!;
  for (let i = n - 2; i >= 0; i--) {
    const row = m[i]!;
    let sum = multiply(d, row[n]!, budget);
    for (let j = i + 1; j < n && sum !== undefined; j++) {
      const product = row[j]!.isZero() ? Polynomial.ZERO : multiply(row[j]!, numerators[j]!, budget);
      sum = product && sum.sub(product);
    }
    if (sum === undefined) return 'budget';
    const quotient = quotientBy(sum, row[i]!, budget);
    if (quotient === undefined) return 'budget';
    numerators[i] = quotient;
  }
  return { numerators, denominator: d };
}

/**
 * Solves A x = b exactly: each x_i a rational function in normal form. Undefined when det(A) is
 * identically zero (the system has no unique solution). Throws on mismatched sizes (a programmer mistake).
 */
export function solveLinear(a: PolynomialMatrix, b: readonly Polynomial[]): RationalFunction[] | undefined {
  if (b.length !== a.length) throw new RangeError('solveLinear: b and A have different numbers of rows');
  const solved = solveShared(a, b);
  if (typeof solved === 'string') return undefined;
  return solved.numerators.map((x) => RationalFunction.of(x, solved.denominator));
}

/**
 * Forward Bareiss elimination in place: pivots in the first `pivots` columns (n − 1 for a
 * determinant, n for an augmented matrix, whose last pivot must also be non-zero), updating
 * `width` columns; returns the number of row swaps.
 */
function eliminate(
  m: Polynomial[][],
  width: number,
  pivots: number,
  budget: WorkBudget,
): { swaps: number } | SolveFailure {
  const n = m.length;
  let previous = Polynomial.ONE;
  let swaps = 0;
  for (let k = 0; k < pivots; k++) {
    const p = pivotRow(m, k);
    if (p === undefined) return 'singular';
    if (p !== k) {
      [m[k], m[p]] = [m[p]!, m[k]!];
      swaps++;
    }
    const rowK = m[k]!;
    const pivot = rowK[k]!;
    for (let i = k + 1; i < n; i++) {
      const rowI = m[i]!;
      const factor = rowI[k]!;
      for (let j = k + 1; j < width; j++) {
        // With a zero factor the update is rowI[j]·pivot / previous: often a plain rescaling.
        const kept = multiply(rowI[j]!, pivot, budget);
        const crossed = factor.isZero() || rowK[j]!.isZero() ? Polynomial.ZERO : multiply(factor, rowK[j]!, budget);
        if (kept === undefined || crossed === undefined) return 'budget';
        const q = quotientBy(kept.sub(crossed), previous, budget);
        if (q === undefined) return 'budget';
        rowI[j] = q;
      }
      rowI[k] = Polynomial.ZERO;
    }
    previous = pivot;
  }
  return { swaps };
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

/** p·q, charged to the budget; undefined once it is spent. */
function multiply(p: Polynomial, q: Polynomial, budget: WorkBudget): Polynomial | undefined {
  if (p.isZero() || q.isZero()) return Polynomial.ZERO;
  if (!budget.chargeProduct(p, q)) return undefined;
  return p.mul(q);
}

/** The exact quotient p/q, charged to the budget beforehand (about |p|·|q| weighted term products); undefined once spent. */
function quotientBy(p: Polynomial, q: Polynomial, budget: WorkBudget): Polynomial | undefined {
  if (q.equals(Polynomial.ONE) || p.isZero()) return p;
  if (!budget.chargeProduct(p, q)) return undefined;
  const r = divideExact(p, q);
  // Sylvester's identity guarantees this; failing here means a bug in the algebra, not bad data.
  if (r === undefined) throw new Error('Bareiss step: division by the previous pivot was not exact');
  return r;
}
