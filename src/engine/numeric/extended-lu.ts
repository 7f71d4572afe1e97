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
 * Li & Bailey for double-double libraries (all from memory). Every operation returns the high
 * word and leaves the low word in a module variable, so the loops allocate nothing (a pair array
 * per operation was 4–7 % of a check in garbage collection alone).
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
  };
}

/** Sets the matrix to diag(d) − J, exactly (each diagonal entry as an unrounded double-double sum). */
export function setShiftedNegative(ws: ExtendedLuWorkspace, d: number, jacobian: Float64Array): void {
  const { n, matrixHi, matrixLo } = ws;
  for (let k = 0; k < n * n; k++) {
    matrixHi[k] = -jacobian[k]!;
    matrixLo[k] = 0;
  }
  for (let i = 0; i < n; i++) {
    matrixHi[i * n + i] = twoSum(d, -jacobian[i * n + i]!);
    matrixLo[i * n + i] = low;
  }
}

/** Factors the matrix into the workspace with partial pivoting; false when a pivot is zero or not finite. */
export function extendedLuFactor(ws: ExtendedLuWorkspace): boolean {
  const { n, factorsHi: hi, factorsLo: lo, pivots } = ws;
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
      const fHi = divide(hi[i * n + k]!, lo[i * n + k]!, hi[k * n + k]!, lo[k * n + k]!);
      const fLo = low;
      hi[i * n + k] = fHi;
      lo[i * n + k] = fLo;
      for (let j = k + 1; j < n; j++) {
        hi[i * n + j] = subtractProduct(hi[i * n + j]!, lo[i * n + j]!, fHi, fLo, hi[k * n + j]!, lo[k * n + j]!);
        lo[i * n + j] = low;
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
  const { n, matrixHi, matrixLo, xHi, xLo, rHi, rLo } = ws;
  xHi.set(b);
  xLo.fill(0);
  substitute(ws, xHi, xLo);
  for (let i = 0; i < n; i++) {
    let sHi = b[i]!;
    let sLo = 0;
    for (let j = 0; j < n; j++) {
      sHi = subtractProduct(sHi, sLo, matrixHi[i * n + j]!, matrixLo[i * n + j]!, xHi[j]!, xLo[j]!);
      sLo = low;
    }
    rHi[i] = sHi;
    rLo[i] = sLo;
  }
  substitute(ws, rHi, rLo);
  for (let i = 0; i < n; i++) {
    const sum = add(xHi[i]!, xLo[i]!, rHi[i]!, rLo[i]!);
    x[i] = sum + low;
  }
}

/**
 * The residual r = b − A x of a solution in doubles against the double-double matrix, rounded once
 * at the end: each product exact by two-product, the sum by two-sum with the errors gathered
 * apart (Ogita, Rump & Oishi's Dot2, SIAM J. Sci. Comput. 26, 2005; from memory), which is as
 * accurate as summing in twice the working precision. Only the diagonal has low words (the shift
 * 1/(hγ) − J_ii); they enter the gathered errors. This is the correction an iterative refinement
 * needs to reach full accuracy where A is given to more digits than a double holds.
 */
export function extendedResidual(ws: ExtendedLuWorkspace, b: Float64Array, x: Float64Array, r: Float64Array): void {
  const { n, matrixHi, matrixLo } = ws;
  for (let i = 0; i < n; i++) {
    let sum = b[i]!;
    let errors = -matrixLo[i * n + i]! * x[i]!;
    for (let j = 0; j < n; j++) {
      const xj = x[j]!;
      const a = matrixHi[i * n + j]!;
      if (xj === 0 || a === 0) continue;
      const product = twoProduct(a, -xj);
      const productError = low;
      sum = twoSum(sum, product);
      errors += low + productError;
    }
    r[i] = sum + errors;
  }
}

/** Forward and back substitution in place on the double-double vector (vHi, vLo). */
function substitute(ws: ExtendedLuWorkspace, vHi: Float64Array, vLo: Float64Array): void {
  const { n, factorsHi: hi, factorsLo: lo, pivots } = ws;
  // The factorisation swaps whole rows, multipliers included: every swap comes before elimination.
  for (let k = 0; k < n; k++) {
    const p = pivots[k]!;
    if (p !== k) {
      swap(vHi, k, p);
      swap(vLo, k, p);
    }
  }
  for (let k = 0; k < n; k++) {
    const vkHi = vHi[k]!;
    if (vkHi === 0) continue;
    const vkLo = vLo[k]!;
    for (let i = k + 1; i < n; i++) {
      vHi[i] = subtractProduct(vHi[i]!, vLo[i]!, hi[i * n + k]!, lo[i * n + k]!, vkHi, vkLo);
      vLo[i] = low;
    }
  }
  for (let i = n - 1; i >= 0; i--) {
    let sHi = vHi[i]!;
    let sLo = vLo[i]!;
    for (let j = i + 1; j < n; j++) {
      sHi = subtractProduct(sHi, sLo, hi[i * n + j]!, lo[i * n + j]!, vHi[j]!, vLo[j]!);
      sLo = low;
    }
    vHi[i] = divide(sHi, sLo, hi[i * n + i]!, lo[i * n + i]!);
    vLo[i] = low;
  }
}

function swap(v: Float64Array, i: number, j: number): void {
  const tmp = v[i]!;
  v[i] = v[j]!;
  v[j] = tmp;
}

/** The low word of the last double-double result; each operation below returns the high word. */
let low = 0;

/** a + b exactly, as the returned sum and the error in `low` (Knuth's two-sum). */
function twoSum(a: number, b: number): number {
  const s = a + b;
  const bb = s - a;
  low = a - (s - bb) + (b - bb);
  return s;
}

/** a × b exactly, as the returned product and the error in `low`, by Dekker's splitting into 26-bit halves (no fused multiply-add in JavaScript). */
function twoProduct(a: number, b: number): number {
  const p = a * b;
  const ca = SPLITTER * a;
  const aHi = ca - (ca - a);
  const aLo = a - aHi;
  const cb = SPLITTER * b;
  const bHi = cb - (cb - b);
  const bLo = b - bHi;
  low = aHi * bHi - p + aHi * bLo + aLo * bHi + aLo * bLo;
  return p;
}
const SPLITTER = 134217729; // 2^27 + 1

/** Renormalises s + e with |e| ≤ ulp(s)/2 assumed (fast two-sum). */
function normalise(s: number, e: number): number {
  const hi = s + e;
  low = e - (hi - s);
  return hi;
}

function add(aHi: number, aLo: number, bHi: number, bLo: number): number {
  const s = twoSum(aHi, bHi);
  const e = low;
  const t = twoSum(aLo, bLo);
  const f = low;
  const hi = normalise(s, e + t);
  return normalise(hi, low + f);
}

function multiply(aHi: number, aLo: number, bHi: number, bLo: number): number {
  const p = twoProduct(aHi, bHi);
  return normalise(p, low + (aHi * bLo + aLo * bHi));
}

/** a − b × c, each rounded to double-double as `add(a, −multiply(b, c))` is. */
function subtractProduct(aHi: number, aLo: number, bHi: number, bLo: number, cHi: number, cLo: number): number {
  const pHi = multiply(bHi, bLo, cHi, cLo);
  return add(aHi, aLo, -pHi, -low);
}

function divide(aHi: number, aLo: number, bHi: number, bLo: number): number {
  // Long division: a quotient digit, the remainder in double-double, a second digit from it.
  const q1 = aHi / bHi;
  const pHi = multiply(bHi, bLo, q1, 0);
  const rHi = add(aHi, aLo, -pHi, -low);
  return normalise(q1, rHi / bHi);
}
