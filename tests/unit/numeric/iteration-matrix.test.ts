/**
 * The iteration matrix d·I − J solved in refined doubles, falling back to double-double only where
 * refinement does not converge. Expected solutions are worked by hand or follow from the structure
 * (conservation laws are left null vectors of J), never from the solver's own output.
 */
import { describe, expect, it } from 'vitest';
import {
  createIterationMatrix,
  factorIterationMatrix,
  solveIterationMatrix,
} from '../../../src/engine/numeric/iteration-matrix.ts';

const solve = (d: number, jacobian: number[][], b: number[]) => {
  const m = createIterationMatrix(jacobian.length);
  if (!factorIterationMatrix(m, d, Float64Array.from(jacobian.flat()))) return undefined;
  const x = Float64Array.from(b);
  solveIterationMatrix(m, x, x);
  return { x: Array.from(x), counts: { ...m.counts }, extended: m.extended };
};

describe('iteration matrix: refined doubles first', () => {
  it('solves a well-conditioned system in doubles, to rounding in every component', () => {
    // −J = [[2, 1, 1], [4, −6, 0], [−2, 7, 2]], x = (1, 1, 2): b = (5, −2, 9) by hand.
    const r = solve(
      0,
      [
        [-2, -1, -1],
        [-4, 6, 0],
        [2, -7, -2],
      ],
      [5, -2, 9],
    )!;
    expect(r.counts).toEqual({ refined: 1, extended: 0 });
    r.x.forEach((v, i) => expect(Math.abs(v - [1, 1, 2][i]!)).toBeLessThanOrEqual(2 * Number.EPSILON * 2));
  });

  it('keeps a radical equation twenty decades below a reactant equation, in doubles', () => {
    // x_S = 1e-20 beside 2 x_S + x_B = 1 (partial pivoting alone returns x_S = 0).
    const r = solve(
      0,
      [
        [-1, 0],
        [-2, -1],
      ],
      [1e-20, 1],
    )!;
    expect(r.counts.extended).toBe(0);
    expect(Math.abs(r.x[0]! / 1e-20 - 1)).toBeLessThan(4 * Number.EPSILON);
    expect(r.x[1]).toBe(1);
  });

  it('falls back to double-double where the matrix is near-singular along the conservation laws', () => {
    // E + S ⇌ ES (1e9 M^-1 s^-1, 1e9 s^-1), ES → E + P (1 s^-1) at [E] = [ES] = 5e-10 M, [S] = 1 M,
    // d = 1/(hγ) = 2e-6 s^-1: condition about 1e21. Rows E and ES of J sum to zero, as do rows S, ES
    // and P, so for b with those sums zero, x_E + x_ES = 0 and x_S + x_ES + x_P = 0 exactly. The
    // residual of a double solve that misses them is still at rounding beside |A||x|: only
    // corrections that do not shrink show it.
    const [E, S] = [5e-10, 1];
    const r = solve(
      2e-6,
      [
        [-1e9 * S, -1e9 * E, 1e9 + 1, 0],
        [-1e9 * S, -1e9 * E, 1e9, 0],
        [1e9 * S, 1e9 * E, -1e9 - 1, 0],
        [0, 0, 1, 0],
      ],
      [6e-12, 6e-12, -6e-12, 0],
    )!;
    expect(r.extended).toBe(true);
    expect(r.counts).toEqual({ refined: 0, extended: 1 });
    expect(Math.abs(r.x[0]! / 3e-21 - 1)).toBeLessThan(1e-3);
    expect(Math.abs(r.x[0]! + r.x[2]!)).toBeLessThan(1e-12 * E);
    expect(Math.abs(r.x[1]! + r.x[2]! + r.x[3]!)).toBeLessThan(1e-12 * E);
  });

  it('reports a matrix singular in double-double too', () => {
    expect(
      solve(
        0,
        [
          [1, 2],
          [2, 4],
        ],
        [1, 2],
      ),
    ).toBeUndefined();
  });
});
