import { describe, expect, it } from 'vitest';
import { luFactor, luSolve, luSolveRefined } from '../../../src/engine/numeric/lu.ts';

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
    [
      'zero leading pivot needs a row swap',
      [
        [0, 1],
        [1, 0],
      ],
      [3, 5],
      [5, 3],
    ],
    [
      '3×3',
      [
        [2, 1, 1],
        [4, -6, 0],
        [-2, 7, 2],
      ],
      [5, -2, 9],
      [1, 1, 2],
    ],
    // Without pivoting the 1e-20 pivot would wipe out the second equation.
    [
      'tiny pivot',
      [
        [1e-20, 1],
        [1, 1],
      ],
      [1, 2],
      [1, 1],
    ],
    // Column 1 swaps rows 1 and 2, whose column-0 multipliers (0.5 and 0.25) differ: the
    // right-hand side must be permuted before any elimination, not between them.
    [
      'a later row swap carries its multipliers',
      [
        [4, 1, 1],
        [2, 0.5, 3],
        [1, 5, 1],
      ],
      [6, 5.5, 7],
      [1, 1, 1],
    ],
  ])('%s', (_, rows, b, expected) => {
    const x = solve(rows, b)!;
    x.forEach((v, i) => expect(v).toBeCloseTo(expected[i]!, 12));
  });

  it('reports a singular matrix instead of dividing by zero', () => {
    expect(
      solve(
        [
          [1, 2],
          [2, 4],
        ],
        [1, 2],
      ),
    ).toBeUndefined();
    expect(
      solve(
        [
          [0, 0],
          [0, 0],
        ],
        [0, 0],
      ),
    ).toBeUndefined();
  });
});

describe('LU with iterative refinement', () => {
  // A radical's balance beside a reactant's: x_S = 1e-20 and 2 x_S + x_B = 1. Partial pivoting
  // takes the reactant's row (|2| > |1|) and eliminates with it, which adds 1e-20 to 0.5 and
  // loses it: x_S comes back as 0, a residual of 1e-20 that is small only beside ‖b‖ = 1.
  const a = Float64Array.of(1, 0, 2, 1);
  const b = Float64Array.of(1e-20, 1);
  const factored = () => {
    const lu = Float64Array.from(a);
    const pivots = new Int32Array(2);
    expect(luFactor(lu, 2, pivots)).toBe(true);
    return { lu, pivots };
  };

  it('plain partial pivoting loses the small equation', () => {
    const { lu, pivots } = factored();
    const x = Float64Array.from(b);
    luSolve(lu, 2, pivots, x);
    expect(x[0]).toBe(0);
  });

  it('one refinement from the residual recovers every component to rounding, leaving b as it was', () => {
    const { lu, pivots } = factored();
    const x = new Float64Array(2);
    luSolveRefined(a, lu, 2, pivots, b, x, new Float64Array(2));
    expect(Math.abs(x[0]! / 1e-20 - 1)).toBeLessThan(1e-15);
    expect(x[1]).toBe(1);
    expect(Array.from(b)).toEqual([1e-20, 1]);
  });

  it.each([
    [
      '3×3',
      [
        [2, 1, 1],
        [4, -6, 0],
        [-2, 7, 2],
      ],
      [5, -2, 9],
      [1, 1, 2],
    ],
    [
      'tiny pivot',
      [
        [1e-20, 1],
        [1, 1],
      ],
      [1, 2],
      [1, 1],
    ],
    // Column 1 swaps rows 1 and 2, whose column-0 multipliers (0.5 and 0.25) differ: the
    // right-hand side must be permuted before any elimination, not between them.
    [
      'a later row swap carries its multipliers',
      [
        [4, 1, 1],
        [2, 0.5, 3],
        [1, 5, 1],
      ],
      [6, 5.5, 7],
      [1, 1, 1],
    ],
  ])('agrees with the plain solve on a well-scaled system: %s', (_, rows, rhs, expected) => {
    const n = rows.length;
    const matrix = Float64Array.from(rows.flat());
    const lu = Float64Array.from(matrix);
    const pivots = new Int32Array(n);
    luFactor(lu, n, pivots);
    const x = new Float64Array(n);
    luSolveRefined(matrix, lu, n, pivots, Float64Array.from(rhs), x, new Float64Array(n));
    x.forEach((v, i) => expect(v).toBeCloseTo(expected[i]!, 14));
  });
});
