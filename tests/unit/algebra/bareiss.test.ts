import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  determinant,
  formatText,
  Polynomial,
  RationalFunction,
  solveLinear,
  type PolynomialMatrix,
} from '../../../src/engine/exact/index.ts';
import { arbCoefficient, arbMonomial, poly, rf } from './helpers.ts';

const matrix = (rows: string[][]): Polynomial[][] => rows.map((r) => r.map(poly));

describe('determinant (Bareiss)', () => {
  it.each([
    ['0×0', [], '1'],
    ['1×1', [['x + 1']], 'x + 1'],
    [
      '2×2 symbolic',
      [
        ['a', 'b'],
        ['c', 'd'],
      ],
      'a*d - b*c',
    ],
    [
      'zero first pivot (one swap)',
      [
        ['0', 'x'],
        ['y', '0'],
      ],
      '-x*y',
    ],
    [
      'zero pivot in the middle',
      [
        ['1', '1', '1'],
        ['1', '1', '2'],
        ['1', '2', '3'],
      ],
      '-1',
    ],
    [
      'singular',
      [
        ['x', 'y'],
        ['2*x', '2*y'],
      ],
      '0',
    ],
    [
      'zero column',
      [
        ['0', 'x'],
        ['0', 'y'],
      ],
      '0',
    ],
    // Vandermonde determinant: Π_{i<j} (x_j − x_i), a standard identity.
    ['3×3 Vandermonde', vandermondeText(['x', 'y', 'z']), '(y - x)*(z - x)*(z - y)'],
  ] as [string, string[][], string][])('%s', (_, rows, expected) => {
    expect(formatText(determinant(matrix(rows)))).toBe(formatText(poly(expected)));
  });

  it('computes the 4×4 Vandermonde determinant', () => {
    const expected = poly('(b - a)*(c - a)*(d - a)*(c - b)*(d - b)*(d - c)');
    expect(determinant(matrix(vandermondeText(['a', 'b', 'c', 'd']))).equals(expected)).toBe(true);
  });

  it('throws on a non-square matrix, a programmer mistake', () => {
    expect(() => determinant(matrix([['1', '2']]))).toThrow(RangeError);
  });
});

describe('solveLinear (Cramer with Bareiss determinants)', () => {
  it('gives the Briggs–Haldane steady state of E + S ⇌ ES → E + P', () => {
    // Unknowns [E], [ES]: d[ES]/dt = k1[S][E] − (k_-1 + k2)[ES] = 0 and [E] + [ES] = [E]_T.
    // Briggs & Haldane (1925): [ES] = k1[S][E]_T / (k_-1 + k2 + k1[S]).
    const a = matrix([
      ['k1*S', '-(km1 + k2)'],
      ['1', '1'],
    ]);
    const [e, es] = solveLinear(a, [poly('0'), poly('ET')])!;
    expect(es!.equals(rf('k1*S*ET/(km1 + k2 + k1*S)'))).toBe(true);
    expect(e!.equals(rf('(km1 + k2)*ET/(km1 + k2 + k1*S)'))).toBe(true);
  });

  it('is undefined for a singular system', () => {
    expect(
      solveLinear(
        matrix([
          ['x', 'y'],
          ['2*x', '2*y'],
        ]),
        [poly('1'), poly('2')],
      ),
    ).toBeUndefined();
  });
});

describe('Bareiss properties (random small polynomial matrices)', () => {
  const arbEntry = fc
    .array(fc.record({ coefficient: arbCoefficient, monomial: arbMonomial }), { maxLength: 2 })
    .map((terms) => Polynomial.fromTerms(terms));
  const arbMatrix = (n: number) =>
    fc.array(fc.array(arbEntry, { minLength: n, maxLength: n }), { minLength: n, maxLength: n });
  const times = (a: PolynomialMatrix, b: PolynomialMatrix) =>
    a.map((row) => b[0]!.map((_, j) => Polynomial.sum(row.map((x, k) => x.mul(b[k]![j]!)))));

  it('det(A·B) = det(A)·det(B)', () => {
    fc.assert(
      fc.property(
        fc.integer({ min: 1, max: 3 }).chain((n) => fc.tuple(arbMatrix(n), arbMatrix(n))),
        ([a, b]) => {
          expect(determinant(times(a, b)).equals(determinant(a).mul(determinant(b)))).toBe(true);
        },
      ),
      { numRuns: 25 },
    );
  });

  it('det(Aᵀ) = det(A), and swapping two rows flips the sign', () => {
    fc.assert(
      fc.property(arbMatrix(3), (a) => {
        const transposed = a.map((_, i) => a.map((row) => row[i]!));
        expect(determinant(transposed).equals(determinant(a))).toBe(true);
        expect(determinant([a[1]!, a[0]!, a[2]!]).equals(determinant(a).neg())).toBe(true);
      }),
      { numRuns: 25 },
    );
  });

  it('the Cramer solution satisfies A x = b exactly', () => {
    fc.assert(
      fc.property(arbMatrix(3), fc.array(arbEntry, { minLength: 3, maxLength: 3 }), (a, b) => {
        const x = solveLinear(a, b);
        fc.pre(x !== undefined);
        a.forEach((row, i) => {
          const lhs = row.reduce((sum, aij, j) => sum.add(RationalFunction.of(aij).mul(x[j]!)), RationalFunction.ZERO);
          expect(lhs.equals(RationalFunction.of(b[i]!))).toBe(true);
        });
      }),
      { numRuns: 25 },
    );
  });
});

function vandermondeText(xs: string[]): string[][] {
  return xs.map((x) => xs.map((_, j) => `${x}^${j}`));
}
