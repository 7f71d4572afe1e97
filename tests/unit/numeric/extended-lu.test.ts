import { describe, expect, it } from 'vitest';
import {
  createExtendedLuWorkspace,
  extendedLuFactor,
  extendedLuSolve,
  setShiftedNegative,
} from '../../../src/engine/numeric/extended-lu.ts';

/** Solves (d·I − J) x = b in double-double; undefined when the factorisation fails. */
const solveShifted = (d: number, jacobian: number[][], b: number[]) => {
  const n = jacobian.length;
  const ws = createExtendedLuWorkspace(n);
  setShiftedNegative(ws, d, Float64Array.from(jacobian.flat()));
  if (!extendedLuFactor(ws)) return undefined;
  const x = Float64Array.from(b);
  extendedLuSolve(ws, x, x);
  return Array.from(x);
};

describe('LU in double-double', () => {
  it.each([
    ['1×1', [[-4]], [2], [0.5]],
    [
      'zero leading pivot needs a row swap',
      [
        [0, -1],
        [-1, 0],
      ],
      [3, 5],
      [5, 3],
    ],
    [
      '3×3',
      [
        [-2, -1, -1],
        [-4, 6, 0],
        [2, -7, -2],
      ],
      [5, -2, 9],
      [1, 1, 2],
    ],
    // x_S = 1e-20 beside 2 x_S + x_B = 1: the small equation must survive elimination by the large one.
    [
      'a radical beside a reactant',
      [
        [-1, 0],
        [-2, -1],
      ],
      [1e-20, 1],
      [1e-20, 1],
    ],
    // Column 1 swaps rows 1 and 2, whose column-0 multipliers differ.
    [
      'a later row swap carries its multipliers',
      [
        [-4, -1, -1],
        [-2, -0.5, -3],
        [-1, -5, -1],
      ],
      [6, 5.5, 7],
      [1, 1, 1],
    ],
  ])('%s (d = 0)', (_, jacobian, b, expected) => {
    const x = solveShifted(0, jacobian, b)!;
    x.forEach((v, i) =>
      expect(Math.abs(v - expected[i]!)).toBeLessThanOrEqual(Number.EPSILON * Math.abs(expected[i]!)),
    );
  });

  it('reports a singular matrix instead of dividing by zero', () => {
    expect(
      solveShifted(
        0,
        [
          [1, 2],
          [2, 4],
        ],
        [1, 2],
      ),
    ).toBeUndefined();
    expect(
      solveShifted(
        0,
        [
          [0, 0],
          [0, 0],
        ],
        [0, 0],
      ),
    ).toBeUndefined();
  });

  it('keeps the conservation laws of a fast pre-equilibrium however long the step (E + S ⇌ ES → E + P)', () => {
    // J of E + S ⇌ ES (1e9 M^-1 s^-1, 1e9 s^-1), ES → E + P (1 s^-1) at [E] = [ES] = 5e-10 M, [S] = 1 M.
    // Rows E and ES sum to zero, as do rows S, ES and P, so for b with those sums zero the solution
    // keeps x_E + x_ES = 0 and x_S + x_ES + x_P = 0. With 1/(hγ) = 2e-6 s^-1 the condition number
    // is about 1e21: a double-precision solve, even refined, misses x_E + x_ES by 4.5e-8 M, 45 times
    // [E]_T itself (seen while diagnosing a rapid-equilibrium run that needed 50 000 steps).
    const [E, S] = [5e-10, 1];
    const jacobian = [
      [-1e9 * S, -1e9 * E, 1e9 + 1, 0],
      [-1e9 * S, -1e9 * E, 1e9, 0],
      [1e9 * S, 1e9 * E, -1e9 - 1, 0],
      [0, 0, 1, 0],
    ];
    const x = solveShifted(2e-6, jacobian, [6e-12, 6e-12, -6e-12, 0])!;
    // The fast part relaxes at k1[S] + k−1 ≈ 2e9 s^-1.
    expect(Math.abs(x[0]! / 3e-21 - 1)).toBeLessThan(1e-3);
    expect(Math.abs(x[0]! + x[2]!)).toBeLessThan(1e-12 * E);
    expect(Math.abs(x[1]! + x[2]! + x[3]!)).toBeLessThan(1e-12 * E);
  });
});
