import { describe, expect, it } from 'vitest';
import { formatText, Monomial, Polynomial } from '../../../src/engine/exact/index.ts';
import { Rational } from '../../../src/engine/exact/rational.ts';
import { poly, q } from './helpers.ts';

const same = (a: Polynomial, b: Polynomial) => expect(formatText(a)).toBe(formatText(b));

describe('Polynomial', () => {
  it('is canonical: like terms collected, zero terms dropped, one term order', () => {
    const p = Polynomial.fromTerms([
      { coefficient: q(2), monomial: Monomial.of('x') },
      { coefficient: q(0), monomial: Monomial.of('y') },
      { coefficient: q(-2), monomial: Monomial.of('x') },
      { coefficient: q(3), monomial: Monomial.ONE },
    ]);
    expect(p.terms.length).toBe(1);
    expect(poly('y + x^2 + 1').equals(poly('1 + x^2 + y'))).toBe(true);
    expect(poly('x - x').isZero()).toBe(true);
  });

  it.each([
    // Expected expansions worked by hand (binomial theorem, difference of squares).
    ['(x + 1)^3', 'x^3 + 3*x^2 + 3*x + 1'],
    ['(x + y)*(x - y)', 'x^2 - y^2'],
    ['(x + 1/2)^2', 'x^2 + x + 1/4'],
    ['(x^(1/2) + 1)*(x^(1/2) - 1)', 'x - 1'],
    ['(k/S + 1)*S', 'k + S'],
    ['(x + y)^0', '1'],
  ])('%s = %s', (product, expansion) => {
    same(poly(product), poly(expansion));
  });

  it('scales and negates', () => {
    same(poly('x + 2*y').scale(q(3, 2)), poly('3/2*x + 3*y'));
    same(poly('x - 1').neg(), poly('1 - x'));
    expect(poly('x + 1').scale(Rational.ZERO).isZero()).toBe(true);
  });

  it('answers constant questions', () => {
    expect(poly('3/4').isConstant()).toBe(true);
    expect(poly('3/4').constantValue()?.toString()).toBe('3/4');
    expect(Polynomial.ZERO.constantValue()?.toString()).toBe('0');
    expect(poly('x + 1').constantValue()).toBeUndefined();
  });

  it('reports high and low degrees, with absent symbols counting as degree 0', () => {
    const p = poly('k1*S^2 + k2*S + k3');
    expect(p.degreeIn('S').toString()).toBe('2');
    expect(p.lowDegreeIn('S').toString()).toBe('0');
    expect(poly('S^2 + S').lowDegreeIn('S').toString()).toBe('1');
    expect(p.degreeIn('I').toString()).toBe('0');
    expect(p.lowDegreeIn('I').toString()).toBe('0');
    expect(poly('k*O2^(1/2)/NO').lowDegreeIn('NO').toString()).toBe('-1');
    expect(poly('x^2*y + y^3').totalDegree().toString()).toBe('3');
    expect(p.symbols()).toEqual(['S', 'k1', 'k2', 'k3']);
  });

  it('takes coefficients in one symbol', () => {
    const p = poly('a*S^2 + b*S + c*S + d');
    same(p.coefficientIn('S', 1), poly('b + c'));
    same(p.coefficientIn('S', 0), poly('d'));
    expect(p.coefficientIn('S', 3).isZero()).toBe(true);
  });

  it('substitutes polynomials and single terms', () => {
    same(poly('x^2 + x*y').substitute('x', poly('y + 1')), poly('2*y^2 + 3*y + 1'));
    same(poly('k*x^(1/2)').substitute('x', poly('4*y^2')), poly('2*k*y'));
    same(poly('k/x').substitute('x', poly('2*y')), poly('k/(2*y)'));
    expect(() => poly('x^(1/2)').substitute('x', poly('y + 1'))).toThrow(RangeError);
    expect(() => poly('x^(1/2)').substitute('x', poly('2*y'))).toThrow(RangeError);
  });

  it('differentiates, rational exponents included', () => {
    same(poly('x^3*y + 2*x + y').derivative('x'), poly('3*x^2*y + 2'));
    same(poly('k*O2^(1/2)').derivative('O2'), poly('1/2*k/O2^(1/2)'));
    expect(poly('y + 1').derivative('x').isZero()).toBe(true);
  });

  it('evaluates numerically and exactly', () => {
    const p = poly('x^2*y - 3/2*x + 1');
    expect(
      p.evaluate(
        new Map([
          ['x', 2],
          ['y', 0.5],
        ]),
      ),
    ).toBeCloseTo(0, 12);
    expect(
      p
        .evaluateExact(
          new Map([
            ['x', q(1, 3)],
            ['y', q(9)],
          ]),
        )
        ?.toString(),
    ).toBe('3/2');
    expect(poly('x^(1/2)').evaluateExact(new Map([['x', q(2)]]))).toBeUndefined();
    expect(() => p.evaluate(new Map([['x', 1]]))).toThrow(RangeError);
  });

  it('rejects negative or fractional powers as a programmer mistake', () => {
    expect(() => poly('x + 1').pow(-1)).toThrow(RangeError);
    expect(() => poly('x + 1').pow(0.5)).toThrow(RangeError);
  });
});
