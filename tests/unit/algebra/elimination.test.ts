/**
 * Exact elimination: one fraction-free solve with a work budget, substitution of fractions,
 * pseudo-remainders, resultants, and triangulation of polynomial systems in positive unknowns.
 */
import { describe, expect, it } from 'vitest';
import {
  RationalFunction,
  WorkBudget,
  pseudoRemainder,
  resultant,
  solveShared,
  substituteFraction,
  triangulate,
  type Triangulation,
} from '../../../src/engine/exact/index.ts';
import { poly, rf } from './helpers.ts';

describe('solveShared: one elimination of the augmented matrix', () => {
  it('gives every unknown over the common denominator ±det(A)', () => {
    // x + y = a, x − y = b: x = (a + b)/2, y = (a − b)/2.
    const solved = solveShared(
      [
        [poly('1'), poly('1')],
        [poly('1'), poly('-1')],
      ],
      [poly('a'), poly('b')],
    );
    expect(typeof solved).toBe('object');
    const { numerators, denominator } = solved as Exclude<typeof solved, string>;
    expect(RationalFunction.of(numerators[0]!, denominator).equals(rf('(a + b)/2'))).toBe(true);
    expect(RationalFunction.of(numerators[1]!, denominator).equals(rf('(a - b)/2'))).toBe(true);
  });

  it('says singular, and says budget when the work runs out', () => {
    const a = [
      [poly('x'), poly('y')],
      [poly('2*x'), poly('2*y')],
    ];
    expect(solveShared(a, [poly('1'), poly('2')])).toBe('singular');
    const big = [
      [poly('a + b + c'), poly('d + e')],
      [poly('f + g'), poly('h + i + j')],
    ];
    expect(solveShared(big, [poly('k'), poly('l')], new WorkBudget(3))).toBe('budget');
    expect(typeof solveShared(big, [poly('k'), poly('l')], new WorkBudget(1e6))).toBe('object');
  });
});

describe('substitution, pseudo-remainder, resultant', () => {
  it('substituteFraction clears the denominator: D^d · p(N/D)', () => {
    // p = x² + a x + 1 at x = N/D: N² + a N D + D².
    const out = substituteFraction(poly('x^2 + a*x + 1'), 'x', poly('n'), poly('d'))!;
    expect(out.degree).toBe(2);
    expect(out.polynomial.equals(poly('n^2 + a*n*d + d^2'))).toBe(true);
  });

  it('pseudoRemainder: lc(f)^k p = q f + r with deg r < deg f', () => {
    // p = x², f = a x − b: a² x² = (a x + b)(a x − b) + b², so r = b² with k = 2.
    const r = pseudoRemainder(poly('x^2'), poly('a*x - b'), 'x')!;
    expect(r.power).toBe(2);
    expect(r.remainder.equals(poly('b^2'))).toBe(true);
  });

  it('resultant of x − a and x − b is a − b up to sign; of two with a common root, zero', () => {
    const r = resultant(poly('x - a'), poly('x - b'), 'x')!;
    expect(r.equals(poly('a - b')) || r.equals(poly('b - a'))).toBe(true);
    expect(resultant(poly('x^2 - 1'), poly('x^2 + 2*x + 1'), 'x')!.isZero()).toBe(true);
  });

  it('the resultant of a line and a circle vanishes exactly at their intersections', () => {
    // y = x + c meets x² + y² = 1 where 2x² + 2cx + c² − 1 = 0 (eliminating y).
    const r = resultant(poly('y - x - c'), poly('x^2 + y^2 - 1'), 'y')!;
    const expected = poly('2*x^2 + 2*c*x + c^2 - 1');
    expect(r.equals(expected) || r.equals(expected.neg())).toBe(true);
  });
});

describe('triangulate: elimination in positive unknowns', () => {
  const done = (t: ReturnType<typeof triangulate>) => {
    if ('kind' in t) throw new Error(`elimination failed: ${t.kind}`);
    return t as Triangulation;
  };

  it("divides out a common factor of unknowns (Ogg's ratio) and solves linearly", () => {
    // y(a − b x) = 0 and c − y(d + x) = 0 in x, y > 0: x = a/b, then y = c/(d + a/b).
    const t = done(triangulate([poly('a*y - b*x*y'), poly('c - d*y - x*y')], ['x', 'y']));
    expect(t.steps.some((s) => s.kind === 'ratio' && s.factor.symbols().join() === 'y')).toBe(true);
    expect(t.finals).toEqual([]);
    expect(t.resultants).toBe(false);
  });

  it('leaves the binomial of a recombination for the last unknown', () => {
    // H2–Br2 shape: 2k1 − k2 x + k3 y − 2k5 x² = 0 and k2 x − k3 y = 0.
    const t = done(triangulate([poly('2*k1 - k2*x + k3*y - 2*k5*x^2'), poly('k2*x - k3*y')], ['x', 'y']));
    expect(t.finals).toHaveLength(1);
    expect(t.finals[0]!.symbol).toBe('x');
    const p = t.finals[0]!.polynomial;
    expect(p.equals(poly('k5*x^2 - k1')) || p.equals(poly('k1 - k5*x^2'))).toBe(true);
  });

  it('says when an unknown would have to be zero, or the equations do not fix the unknowns', () => {
    expect(triangulate([poly('-k*x*e')], ['x'])).toMatchObject({ kind: 'zero', symbols: ['x'] });
    expect(triangulate([poly('x - y'), poly('2*x - 2*y')], ['x', 'y'])).toMatchObject({ kind: 'underdetermined' });
  });

  it('falls back to a resultant where no unknown enters linearly, and says so', () => {
    const t = done(triangulate([poly('x^2 + y^2 - a'), poly('x^2 - y^2 - b')], ['x', 'y']));
    expect(t.resultants).toBe(true);
  });

  it('stops with a budget failure', () => {
    const eqs = [poly('a*x^2 + b*x*y + c*y^2 - d'), poly('e*x^2 + f*x*y + g*y^2 - h')];
    expect(triangulate(eqs, ['x', 'y'], new WorkBudget(10))).toEqual({ kind: 'budget' });
  });
});
