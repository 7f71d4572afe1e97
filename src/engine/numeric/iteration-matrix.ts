/**
 * The stiff integrator's iteration matrix I/(hγ) − J, factored once per step and solved once per
 * stage: in doubles first, with iterative refinement whose residual is formed against the matrix in
 * double-double (extended-lu.ts); in double-double only where that refinement does not converge.
 *
 * Refinement with an exact residual and double-precision factors converges, each sweep multiplying
 * the error by about cond(A)·ε, to a solution correct to working precision in every component
 * (mixed-precision iterative refinement: C. B. Moler, J. ACM 14, 1967; the componentwise form after
 * R. D. Skeel, Math. Comp. 35, 1980; both from memory). The test is the size of the corrections, not
 * the backward error: for a fast pre-equilibrium beside a long step the matrix is near-singular
 * along the conservation laws (cond·ε > 1), a solution whose conservation is lost still has a
 * residual at rounding level beside |A||x| (the lost direction is the one A nearly annihilates),
 * and only corrections that do not shrink reveal it. There, and only there, the factorisation is
 * carried in double-double.
 */
import {
  createExtendedLuWorkspace,
  extendedLuFactor,
  extendedLuSolve,
  extendedResidual,
  setShiftedNegative,
  type ExtendedLuWorkspace,
} from './extended-lu.ts';
import { luFactor, luSolve } from './lu.ts';

/** Refinement sweeps at most; each must at least halve the correction to earn the next (common practice). */
const MAX_SWEEPS = 4;

/** The matrix, its factors in doubles and (when needed) in double-double, and solve scratch. */
export interface IterationMatrix {
  n: number;
  /** The matrix in double-double (always set) and its double-double factors (when `extended`). */
  wide: ExtendedLuWorkspace;
  factors: Float64Array;
  pivots: Int32Array;
  /** whether the current matrix is solved in double-double */
  extended: boolean;
  rhs: Float64Array;
  correction: Float64Array;
  /** solves by refined doubles, and solves that fell back to (or went straight to) double-double */
  counts: { refined: number; extended: number };
}

/** Scratch space for n equations. */
export function createIterationMatrix(n: number): IterationMatrix {
  return {
    n,
    wide: createExtendedLuWorkspace(n),
    factors: new Float64Array(n * n),
    pivots: new Int32Array(n),
    extended: false,
    rhs: new Float64Array(n),
    correction: new Float64Array(n),
    counts: { refined: 0, extended: 0 },
  };
}

/** Sets the matrix to diag(d) − J and factors it; false when it is singular even in double-double. */
export function factorIterationMatrix(m: IterationMatrix, d: number, jacobian: Float64Array): boolean {
  setShiftedNegative(m.wide, d, jacobian);
  // The high words are the matrix rounded to doubles.
  m.factors.set(m.wide.matrixHi);
  m.extended = false;
  return luFactor(m.factors, m.n, m.pivots) || factorExtended(m);
}

/** Solves A x = b into x (b and x may be one array). */
export function solveIterationMatrix(m: IterationMatrix, b: Float64Array, x: Float64Array): void {
  if (m.extended) {
    m.counts.extended++;
    extendedLuSolve(m.wide, b, x);
    return;
  }
  const { n, factors, pivots, rhs, correction } = m;
  rhs.set(b);
  x.set(rhs);
  luSolve(factors, n, pivots, x);
  let previous = Infinity;
  for (let sweep = 1; sweep <= MAX_SWEEPS; sweep++) {
    extendedResidual(m.wide, rhs, x, correction);
    luSolve(factors, n, pivots, correction);
    let size = 0;
    for (let i = 0; i < n; i++) {
      const c = correction[i]!;
      const updated = x[i]! + c;
      x[i] = updated;
      if (c !== 0) size = Math.max(size, Math.abs(c) / Math.abs(updated));
    }
    // The error left after a sweep is about the correction times the contraction: after the first,
    // both are about cond·ε when the first solve was merely rounded (a correction below √ε ends it);
    // a component the first solve lost outright (a radical's equation eliminated by a reactant's)
    // comes back whole in one sweep, so only from the second on does the ratio of corrections
    // measure the contraction, and refinement that does not halve them is given up.
    const contraction = sweep === 1 ? size : size / previous;
    if (size === 0 || (contraction <= 0.5 && size * contraction <= Number.EPSILON)) {
      m.counts.refined++;
      return;
    }
    if (sweep > 1 && !(contraction <= 0.5)) break;
    if (!Number.isFinite(size)) break;
    previous = size;
  }
  // Not converging (or not finite): the matrix is too near singular for double factors.
  if (factorExtended(m)) {
    m.counts.extended++;
    extendedLuSolve(m.wide, rhs, x);
  }
}

function factorExtended(m: IterationMatrix): boolean {
  m.extended = extendedLuFactor(m.wide);
  return m.extended;
}
