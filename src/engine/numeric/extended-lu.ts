/**
 * LU factorisation and solve carried in double-double arithmetic (a value is an unevaluated sum
 * hi + lo of two doubles, about 32 significant digits), for the stiff integrator's iteration
 * matrix I/(hγ) − J. A mechanism's conservation laws (total enzyme, total substrate) are left null
 * vectors w of J, so w·(I/(hγ) − J) = w/(hγ): when a fast step has J ~ 1e9 s^-1 and a long step
 * makes 1/(hγ) ~ 1e-5 s^-1, the matrix is near-singular in exactly the directions that must be
 * kept, with a condition number (about ‖J‖·k_slow·(hγ)²) beyond 1/ε of double precision. In
 * doubles, elimination rounds those directions away and refinement cannot bring them back (it
 * needs cond·ε < 1): the total enzyme of a 1e9 s^-1 pre-equilibrium drifted by 4e-6 over 2e7 s
 * (tests/reference/fast-equilibrium-integration.test.ts). Twice the digits hold it to rounding.
 * The arithmetic is Dekker's (Numer. Math. 18, 1971) with Knuth's two-sum, as described by Hida,
 * Li & Bailey for double-double libraries (all from memory).
 */
import { pivotRow } from './lu.ts';

/** Double-double scratch: the iteration matrix and its factors as hi and lo parts, row-major n × n. */
export interface ExtendedLuWorkspace {
  n: number;
  matrixHi: Float64Array;
  matrixLo: Float64Array;
  factorsHi: Float64Array;
  factorsLo: Float64Array;
  pivots: Int32Array;
  /** The solution and the residual, as hi and lo parts. */
  xHi: Float64Array;
  xLo: Float64Array;
  rHi: Float64Array;
  rLo: Float64Array;
  /** The result of the last arithmetic operation: [hi, lo]. */
  out: Float64Array;
}

/** Scratch space for n equations. */
export function createExtendedLuWorkspace(n: number): ExtendedLuWorkspace {
  const square = () => new Float64Array(n * n);
  const vector = () => new Float64Array(n);
  return {
    n,
    matrixHi: square(),
    matrixLo: square(),
    factorsHi: square(),
    factorsLo: square(),
    pivots: new Int32Array(n),
    xHi: vector(),
    xLo: vector(),
    rHi: vector(),
    rLo: vector(),
    out: new Float64Array(2),
  };
}

/** Sets the matrix to diag(d) − J, exactly (each diagonal entry as an unrounded double-double sum). */
export function setShiftedNegative(ws: ExtendedLuWorkspace, d: number, jacobian: Float64Array): void {
  const { n, matrixHi, matrixLo, out } = ws;
  for (let k = 0; k < n * n; k++) {
    matrixHi[k] = -jacobian[k]!;
    matrixLo[k] = 0;
  }
  for (let i = 0; i < n; i++) {
    twoSum(d, -jacobian[i * n + i]!, out);
    matrixHi[i * n + i] = out[0]!;
    matrixLo[i * n + i] = out[1]!;
  }
}

/** Factors the matrix into the workspace with partial pivoting; false when a pivot is zero or not finite. */
export function extendedLuFactor(ws: ExtendedLuWorkspace): boolean {
  const { n, factorsHi: hi, factorsLo: lo, pivots, out } = ws;
  hi.set(ws.matrixHi);
  lo.set(ws.matrixLo);
  for (let k = 0; k < n; k++) {
    // The high words order the candidates as the full values do, to within rounding.
    const p = pivotRow(hi, n, k);
    pivots[k] = p;
    const max = Math.abs(hi[p * n + k]!);
    if (max === 0 || !Number.isFinite(max)) return false;
    if (p !== k) {
      for (let j = 0; j < n; j++) {
        swap(hi, k * n + j, p * n + j);
        swap(lo, k * n + j, p * n + j);
      }
    }
    for (let i = k + 1; i < n; i++) {
      if (hi[i * n + k] === 0) continue;
      divide(hi[i * n + k]!, lo[i * n + k]!, hi[k * n + k]!, lo[k * n + k]!, out);
      const [fHi, fLo] = [out[0]!, out[1]!];
      hi[i * n + k] = fHi;
      lo[i * n + k] = fLo;
      for (let j = k + 1; j < n; j++) {
        multiply(fHi, fLo, hi[k * n + j]!, lo[k * n + j]!, out);
        add(hi[i * n + j]!, lo[i * n + j]!, -out[0]!, -out[1]!, out);
        hi[i * n + j] = out[0]!;
        lo[i * n + j] = out[1]!;
      }
    }
  }
  return true;
}

/**
 * Solves A x = b into x (doubles; b and x may be one array) with the factors, then one refinement sweep whose residual
 * b − A x is formed in double-double against A itself, so that x comes back correctly rounded
 * to within a unit or two in every component, however small it is beside the others.
 */
export function extendedLuSolve(ws: ExtendedLuWorkspace, b: Float64Array, x: Float64Array): void {
  const { n, matrixHi, matrixLo, xHi, xLo, rHi, rLo, out } = ws;
  xHi.set(b);
  xLo.fill(0);
  substitute(ws, xHi, xLo);
  for (let i = 0; i < n; i++) {
    rHi[i] = b[i]!;
    rLo[i] = 0;
    for (let j = 0; j < n; j++) {
      multiply(matrixHi[i * n + j]!, matrixLo[i * n + j]!, xHi[j]!, xLo[j]!, out);
      add(rHi[i]!, rLo[i]!, -out[0]!, -out[1]!, out);
      rHi[i] = out[0]!;
      rLo[i] = out[1]!;
    }
  }
  substitute(ws, rHi, rLo);
  for (let i = 0; i < n; i++) {
    add(xHi[i]!, xLo[i]!, rHi[i]!, rLo[i]!, out);
    x[i] = out[0]! + out[1]!;
  }
}

/** Forward and back substitution in place on the double-double vector (vHi, vLo). */
function substitute(ws: ExtendedLuWorkspace, vHi: Float64Array, vLo: Float64Array): void {
  const { n, factorsHi: hi, factorsLo: lo, pivots, out } = ws;
  // The factorisation swaps whole rows, multipliers included: every swap comes before elimination.
  for (let k = 0; k < n; k++) {
    const p = pivots[k]!;
    if (p !== k) {
      swap(vHi, k, p);
      swap(vLo, k, p);
    }
  }
  for (let k = 0; k < n; k++) {
    if (vHi[k] === 0) continue;
    for (let i = k + 1; i < n; i++) {
      multiply(hi[i * n + k]!, lo[i * n + k]!, vHi[k]!, vLo[k]!, out);
      add(vHi[i]!, vLo[i]!, -out[0]!, -out[1]!, out);
      vHi[i] = out[0]!;
      vLo[i] = out[1]!;
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let [sHi, sLo] = [vHi[i]!, vLo[i]!];
    for (let j = i + 1; j < n; j++) {
      multiply(hi[i * n + j]!, lo[i * n + j]!, vHi[j]!, vLo[j]!, out);
      add(sHi, sLo, -out[0]!, -out[1]!, out);
      [sHi, sLo] = [out[0]!, out[1]!];
    }
    divide(sHi, sLo, hi[i * n + i]!, lo[i * n + i]!, out);
    vHi[i] = out[0]!;
    vLo[i] = out[1]!;
  }
}

function swap(v: Float64Array, i: number, j: number): void {
  const tmp = v[i]!;
  v[i] = v[j]!;
  v[j] = tmp;
}

/** a + b = out[0] + out[1] exactly (Knuth's two-sum). */
function twoSum(a: number, b: number, out: Float64Array): void {
  const s = a + b;
  const bb = s - a;
  out[0] = s;
  out[1] = a - (s - bb) + (b - bb);
}

/** a × b = out[0] + out[1] exactly, by Dekker's splitting into 26-bit halves (no fused multiply-add in JavaScript). */
function twoProduct(a: number, b: number, out: Float64Array): void {
  const p = a * b;
  const ca = SPLITTER * a;
  const aHi = ca - (ca - a);
  const aLo = a - aHi;
  const cb = SPLITTER * b;
  const bHi = cb - (cb - b);
  const bLo = b - bHi;
  out[0] = p;
  out[1] = aHi * bHi - p + aHi * bLo + aLo * bHi + aLo * bLo;
}
const SPLITTER = 134217729; // 2^27 + 1

/** Renormalises s + e with |e| ≤ ulp(s)/2 assumed (fast two-sum). */
function normalise(s: number, e: number, out: Float64Array): void {
  const hi = s + e;
  out[0] = hi;
  out[1] = e - (hi - s);
}

function add(aHi: number, aLo: number, bHi: number, bLo: number, out: Float64Array): void {
  twoSum(aHi, bHi, out);
  const [s, e] = [out[0]!, out[1]!];
  twoSum(aLo, bLo, out);
  const [t, f] = [out[0]!, out[1]!];
  normalise(s, e + t, out);
  normalise(out[0]!, out[1]! + f, out);
}

function multiply(aHi: number, aLo: number, bHi: number, bLo: number, out: Float64Array): void {
  twoProduct(aHi, bHi, out);
  normalise(out[0]!, out[1]! + (aHi * bLo + aLo * bHi), out);
}

function divide(aHi: number, aLo: number, bHi: number, bLo: number, out: Float64Array): void {
  // Long division: a quotient digit, the remainder in double-double, a second digit from it.
  const q1 = aHi / bHi;
  multiply(bHi, bLo, q1, 0, out);
  add(aHi, aLo, -out[0]!, -out[1]!, out);
  const q2 = out[0]! / bHi;
  normalise(q1, q2, out);
}
