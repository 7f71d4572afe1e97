/**
 * Non-negative solutions of a homogeneous linear system: the cone { x ≥ 0 : M x = 0 }.
 * Its extreme rays are the elementary routes (minimal supports) among a set of steps.
 */
import { nullSpace, primitiveIntegerVector, rowEchelon, type Matrix } from './linear-algebra.ts';
import { Rational } from './rational.ts';

export type PositiveKernel =
  | { kind: 'none' }
  /** exactly one direction, strictly positive on every column */
  | { kind: 'ray'; vector: bigint[] }
  /** several independent non-negative directions whose sum is strictly positive */
  | { kind: 'family'; rays: bigint[][] };

/**
 * Classifies the strictly positive solutions of M x = 0 (every column used).
 * Extreme rays of a d-dimensional kernel have d − 1 zero coordinates, so they are
 * found by fixing d − 1 coordinates at zero; the kernels here are a few dimensions at most.
 */
export function positiveKernel(matrix: Matrix, columns: number): PositiveKernel {
  const basis = nullSpace(matrix, columns);
  if (basis.length === 0) return { kind: 'none' };
  if (basis.length === 1) {
    const v = orientPositive(primitiveIntegerVector(basis[0]!));
    return v && v.every((x) => x > 0n) ? { kind: 'ray', vector: v } : { kind: 'none' };
  }
  const rays = extremeRays(basis, columns);
  const covered = new Set<number>();
  for (const ray of rays) ray.forEach((x, i) => x > 0n && covered.add(i));
  return covered.size === columns ? { kind: 'family', rays } : { kind: 'none' };
}

/** True when some x ≥ 0, not all zero, solves M x = 0 (a set of steps that together change nothing). */
export function hasNonNegativeKernel(matrix: Matrix, columns: number): boolean {
  const basis = nullSpace(matrix, columns);
  if (basis.length === 0) return false;
  if (basis.length === 1) return orientPositive(primitiveIntegerVector(basis[0]!)) !== undefined;
  return extremeRays(basis, columns).length > 0;
}

/** All non-negative extreme rays of the span of a kernel basis (in coordinates of the columns). */
export function extremeRays(basis: readonly Rational[][], columns: number): bigint[][] {
  const d = basis.length;
  const rays: bigint[][] = [];
  const seen = new Set<string>();
  for (const zeros of combinations(columns, d - 1)) {
    // Coefficients c with (Σ c_j basis_j)[z] = 0 for each fixed-zero coordinate z.
    const rows = zeros.map((z) => basis.map((b) => b[z]!));
    const { pivots } = rowEchelon(rows, d);
    if (pivots.length !== d - 1) continue;
    const [c] = nullSpace(rows, d);
    if (!c) continue;
    const x = Array.from({ length: columns }, (_, i) =>
      basis.reduce((acc, b, j) => acc.add(b[i]!.mul(c[j]!)), Rational.ZERO),
    );
    const v = orientPositive(primitiveIntegerVector(x));
    if (!v) continue;
    const key = v.join(',');
    if (!seen.has(key)) {
      seen.add(key);
      rays.push(v);
    }
  }
  return rays;
}

/** Returns v or −v when all entries are ≥ 0 (and not all zero); otherwise undefined. */
function orientPositive(v: bigint[]): bigint[] | undefined {
  if (v.every((x) => x === 0n)) return undefined;
  if (v.every((x) => x >= 0n)) return v;
  if (v.every((x) => x <= 0n)) return v.map((x) => -x);
  return undefined;
}

function* combinations(n: number, k: number): Generator<number[]> {
  const pick: number[] = [];
  function* go(start: number): Generator<number[]> {
    if (pick.length === k) {
      yield [...pick];
      return;
    }
    for (let i = start; i < n; i++) {
      pick.push(i);
      yield* go(i + 1);
      pick.pop();
    }
  }
  yield* go(0);
}
