/**
 * Exact linear algebra over the rationals for the small matrices of stoichiometry
 * (tens of species, a handful of steps): reduced row echelon form and null spaces.
 */
import { Rational } from './rational.ts';

export type Matrix = readonly (readonly Rational[])[];

/** Reduced row echelon form; returns the rows and the pivot column of each non-zero row. */
export function rowEchelon(matrix: Matrix, columns: number): { rows: Rational[][]; pivots: number[] } {
  const rows = matrix.map((row) => [...row]);
  const pivots: number[] = [];
  let r = 0;
  for (let c = 0; c < columns && r < rows.length; c++) {
    const p = rows.findIndex((row, i) => i >= r && !row[c]!.isZero());
    if (p < 0) continue;
    [rows[r], rows[p]] = [rows[p]!, rows[r]!];
    const pivotRow = rows[r]!;
    const inv = pivotRow[c]!.inverse();
    for (let j = 0; j < columns; j++) pivotRow[j] = pivotRow[j]!.mul(inv);
    for (let i = 0; i < rows.length; i++) {
      const factor = rows[i]![c]!;
      if (i === r || factor.isZero()) continue;
      const row = rows[i]!;
      for (let j = 0; j < columns; j++) row[j] = row[j]!.sub(factor.mul(pivotRow[j]!));
    }
    pivots.push(c);
    r++;
  }
  return { rows: rows.slice(0, r), pivots };
}

/** A basis of { x : M x = 0 } for an m × columns matrix. */
export function nullSpace(matrix: Matrix, columns: number): Rational[][] {
  const { rows, pivots } = rowEchelon(matrix, columns);
  const free = [...Array(columns).keys()].filter((c) => !pivots.includes(c));
  return free.map((f) => {
    const x = Array<Rational>(columns).fill(Rational.ZERO);
    x[f] = Rational.ONE;
    pivots.forEach((pc, i) => {
      x[pc] = rows[i]![f]!.neg();
    });
    return x;
  });
}

/** The rank of a matrix. */
export function rank(matrix: Matrix, columns: number): number {
  return rowEchelon(matrix, columns).pivots.length;
}

/** Scales a rational vector to the smallest whole numbers with the same direction. */
export function primitiveIntegerVector(v: readonly Rational[]): bigint[] {
  let denominators = 1n;
  for (const x of v) denominators = (denominators / gcdBig(denominators, x.den)) * x.den;
  const ints = v.map((x) => (x.num * denominators) / x.den);
  const g = ints.reduce((acc, x) => gcdBig(acc, x), 0n) || 1n;
  return ints.map((x) => x / g);
}

function gcdBig(a: bigint, b: bigint): bigint {
  let x = a < 0n ? -a : a;
  let y = b < 0n ? -b : b;
  while (y !== 0n) [x, y] = [y, x % y];
  return x;
}
