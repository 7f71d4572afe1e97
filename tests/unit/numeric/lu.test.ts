import { describe, expect, it } from 'vitest';
import { luFactor, luSolve } from '../../../src/engine/numeric/lu.ts';

const solve = (rows: number[][], b: number[]) => {
  const n = rows.length;
  const a = Float64Array.from(rows.flat());
  const pivots = new Int32Array(n);
  if (!luFactor(a, n, pivots)) return undefined;
  const x = Float64Array.from(b);
  luSolve(a, n, pivots, x);
  return Array.from(x);
};

describe('LU with partial pivoting', () => {
  it.each([
    ['1×1', [[4]], [2], [0.5]],
    ['zero leading pivot needs a row swap', [[0, 1], [1, 0]], [3, 5], [5, 3]],
    ['3×3', [[2, 1, 1], [4, -6, 0], [-2, 7, 2]], [5, -2, 9], [1, 1, 2]],
    // Without pivoting the 1e-20 pivot would wipe out the second equation.
    ['tiny pivot', [[1e-20, 1], [1, 1]], [1, 2], [1, 1]],
  ])('%s', (_, rows, b, expected) => {
    const x = solve(rows, b)!;
    x.forEach((v, i) => expect(v).toBeCloseTo(expected[i]!, 12));
  });

  it('reports a singular matrix instead of dividing by zero', () => {
    expect(solve([[1, 2], [2, 4]], [1, 2])).toBeUndefined();
    expect(solve([[0, 0], [0, 0]], [0, 0])).toBeUndefined();
  });
});
