/**
 * Cross-checks against mathjs, an independent general-purpose computer algebra library: its exact
 * Fraction determinant and its symbolic derivative, evaluated at random points.
 */
import fc from 'fast-check';
import { all, create, type Fraction } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { determinant, Polynomial, RationalFunction } from '../../../src/engine/exact/index.ts';
import { Rational } from '../../../src/engine/exact/rational.ts';
import { arbCoefficient, arbNonZeroPolynomial, arbPoint, arbPolynomial, close, SYMBOLS } from './helpers.ts';

const math = create(all!);

/** mathjs syntax for our polynomial, written term by term from its data, not by our formatter. */
function toMathjs(p: Polynomial): string {
  if (p.isZero()) return '0';
  return p.terms
    .map((t) => {
      const factors = t.monomial.factors.map(([s, e]) => `${s}^(${e.toString()})`);
      return [`(${t.coefficient.toString()})`, ...factors].join('*');
    })
    .join(' + ');
}

const scope = (at: ReadonlyMap<string, number>) => Object.fromEntries(at);

describe('cross-check with mathjs', () => {
  it('Bareiss determinants of rational matrices equal mathjs det in exact Fraction arithmetic', () => {
    const arbMatrix = fc
      .integer({ min: 1, max: 5 })
      .chain((n) => fc.array(fc.array(arbCoefficient, { minLength: n, maxLength: n }), { minLength: n, maxLength: n }));
    fc.assert(
      fc.property(arbMatrix, (rows) => {
        const ours = determinant(rows.map((r) => r.map((c) => Polynomial.constant(c)))).constantValue()!;
        const theirs = math.det(rows.map((r) => r.map((c) => math.fraction(c.toString())))) as unknown as Fraction;
        const exact = Rational.of(BigInt(theirs.s) * BigInt(theirs.n), BigInt(theirs.d));
        expect(ours.toString()).toBe(exact.toString());
      }),
      { numRuns: 60 },
    );
  });

  it('polynomial derivatives agree with mathjs derivative at random points', () => {
    fc.assert(
      fc.property(arbPolynomial, fc.constantFrom(...SYMBOLS), arbPoint, (p, s, at) => {
        const theirs = math.derivative(toMathjs(p), s, { simplify: false }).evaluate(scope(at)) as number;
        expect(close(p.derivative(s).evaluate(at), theirs, 1e-9)).toBe(true);
      }),
      { numRuns: 40 },
    );
  });

  it('rational-function derivatives and log derivatives agree with mathjs', () => {
    fc.assert(
      fc.property(arbNonZeroPolynomial, arbNonZeroPolynomial, arbPoint, (n, d, at) => {
        const f = RationalFunction.of(n, d);
        const text = `(${toMathjs(n)}) / (${toMathjs(d)})`;
        const value = math.evaluate(text, scope(at)) as number;
        fc.pre(Number.isFinite(value) && Math.abs(value) > 1e-6);
        // Near a pole both sides lose every digit to cancellation in the denominator: not a comparison.
        const size = d.terms.reduce((sum, t) => sum + Math.abs(t.coefficient.toNumber() * t.monomial.evaluate(at)), 0);
        fc.pre(Math.abs(d.evaluate(at)) > 1e-6 * size);
        const slope = math.derivative(text, 'x', { simplify: false }).evaluate(scope(at)) as number;
        fc.pre(Number.isFinite(slope));
        expect(close(f.evaluate(at), value, 1e-9)).toBe(true);
        expect(close(f.derivative('x').evaluate(at), slope, 1e-7)).toBe(true);
        expect(close(f.logDerivative('x')!.evaluate(at), (at.get('x')! * slope) / value, 1e-7)).toBe(true);
      }),
      { numRuns: 40 },
    );
  });
});
