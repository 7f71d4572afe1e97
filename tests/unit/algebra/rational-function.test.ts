import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { formatText, Polynomial, RationalFunction } from '../../../src/engine/exact/index.ts';
import { arbGeneralPolynomial, arbNonZeroPolynomial, arbExactPoint, arbPolynomial, poly, q, rf } from './helpers.ts';

const parts = (f: RationalFunction) => [formatText(f.numerator), formatText(f.denominator)];
const arbRationalFunction = fc.tuple(arbPolynomial, arbNonZeroPolynomial).map(([n, d]) => RationalFunction.of(n, d));
const arbNonZeroRationalFunction = fc
  .tuple(arbNonZeroPolynomial, arbNonZeroPolynomial)
  .map(([n, d]) => RationalFunction.of(n, d));

describe('RationalFunction normal form', () => {
  it.each([
    ['(2*x)/(4*y)', 'x', '2*y'],
    ['(x/2)/(y/3)', '3*x', '2*y'],
    ['(x^2 - 1)/(x + 1)', 'x - 1', '1'],
    ['(x + 1)/(x^2 - 1)', '1', 'x - 1'],
    ['x/(x^2 + x)', '1', 'x + 1'],
    ['1/(-x - 1)', '-1', 'x + 1'],
    ['(3*x + 3)/(6*x + 6)', '1', '2'],
    ['k*O2^(1/2)/NO', 'O2^(1/2)*k', 'NO'],
    ['(k*O2^(1/2)/NO)/(1 + K*O2^(1/2)/NO)', 'O2^(1/2)*k', 'K*O2^(1/2) + NO'],
    // No full gcd: a factor that divides neither side whole stays (documented).
    ['((x + 1)*(y + 1))/((x + 1)*(z + 1))', 'x*y + x + y + 1', 'x*z + x + z + 1'],
  ])('%s → (%s)/(%s)', (text, num, den) => {
    expect(parts(rf(text))).toEqual([num, den]);
  });

  it('treats a constant denominator as a polynomial', () => {
    const f = rf('x/2 + y');
    expect(f.isPolynomial()).toBe(true);
    expect(f.toPolynomial()?.equals(poly('x/2 + y'))).toBe(true);
    expect(rf('x/y').toPolynomial()).toBeUndefined();
  });

  it('throws on a zero denominator, a programmer mistake', () => {
    expect(() => RationalFunction.of(poly('x'), Polynomial.ZERO)).toThrow(RangeError);
    expect(() => rf('x').div(RationalFunction.ZERO)).toThrow(RangeError);
  });
});

describe('RationalFunction arithmetic', () => {
  it.each([
    // Identities worked by hand.
    ['1/x + 1/y', '(x + y)/(x*y)'],
    ['1/(x + 1) - 1/(x - 1)', '-2/(x^2 - 1)'],
    ['(x/(x + 1))*((x + 1)/y)', 'x/y'],
    ['(x/(x + 1))/(y/(x + 1))', 'x/y'],
    ['x/(x + 1) + 1/(x + 1)', '1'],
  ])('%s = %s', (lhs, rhs) => {
    expect(rf(lhs).equals(rf(rhs))).toBe(true);
    expect(parts(rf(lhs))).toEqual(parts(rf(rhs)));
  });

  it('differentiates by the quotient rule', () => {
    expect(rf('1/(1 + x)').derivative('x').equals(rf('-1/(1 + x)^2'))).toBe(true);
    expect(rf('x/(K + x)').derivative('x').equals(rf('K/(K + x)^2'))).toBe(true);
  });

  it('gives the apparent order of a Michaelis–Menten rate as K/(K + S)', () => {
    // d ln(V S/(K + S)) / d ln S = 1 − S/(K + S) = K/(K + S), worked by hand.
    expect(rf('V*S/(K + S)').logDerivative('S')?.equals(rf('K/(K + S)'))).toBe(true);
    expect(rf('k*O2^(1/2)*NO^2').logDerivative('O2')?.equals(rf('1/2'))).toBe(true);
    expect(RationalFunction.ZERO.logDerivative('x')).toBeUndefined();
  });

  it('evaluates', () => {
    const f = rf('V*S/(K + S)');
    expect(
      f.evaluate(
        new Map([
          ['V', 2],
          ['S', 3],
          ['K', 1],
        ]),
      ),
    ).toBeCloseTo(1.5, 12);
    expect(
      f
        .evaluateExact(
          new Map([
            ['V', q(2)],
            ['S', q(3)],
            ['K', q(1)],
          ]),
        )
        ?.toString(),
    ).toBe('3/2');
    expect(rf('1/(x - 1)').evaluateExact(new Map([['x', q(1)]]))).toBeUndefined();
  });
});

describe('RationalFunction field properties', () => {
  const runs = { numRuns: 40 };

  it('(f + g) − g = f and (f·g)/g = f', () => {
    fc.assert(
      fc.property(arbRationalFunction, arbNonZeroRationalFunction, (f, g) => {
        expect(f.add(g).sub(g).equals(f)).toBe(true);
        expect(f.mul(g).div(g).equals(f)).toBe(true);
      }),
      runs,
    );
  });

  it('exact evaluation agrees with the arithmetic', () => {
    // Exact points, because floating point near a pole of f or g is too ill-conditioned to compare.
    fc.assert(
      fc.property(arbRationalFunction, arbRationalFunction, arbExactPoint, (f, g, at) => {
        const [fv, gv] = [f.evaluateExact(at), g.evaluateExact(at)];
        fc.pre(fv !== undefined && gv !== undefined);
        expect(f.add(g).evaluateExact(at)?.equals(fv.add(gv))).toBe(true);
        expect(f.mul(g).evaluateExact(at)?.equals(fv.mul(gv))).toBe(true);
      }),
      runs,
    );
  });

  it('the log derivative of a product is the sum of the log derivatives', () => {
    fc.assert(
      fc.property(arbNonZeroRationalFunction, arbNonZeroRationalFunction, (f, g) => {
        const sum = f.logDerivative('x')!.add(g.logDerivative('x')!);
        expect(f.mul(g).logDerivative('x')!.equals(sum)).toBe(true);
      }),
      runs,
    );
  });

  it('normal form has non-negative exponents and a positive leading denominator coefficient', () => {
    fc.assert(
      fc.property(
        arbGeneralPolynomial,
        arbGeneralPolynomial.filter((p) => !p.isZero()),
        (n, d) => {
          const f = RationalFunction.of(n, d);
          expect(f.numerator.terms.every((t) => t.monomial.hasNonNegativeExponents())).toBe(true);
          expect(f.denominator.terms.every((t) => t.monomial.hasNonNegativeExponents())).toBe(true);
          expect(f.denominator.leadingTerm()!.coefficient.sign()).toBe(1);
          expect(f.equals(RationalFunction.of(n).div(RationalFunction.of(d)))).toBe(true);
        },
      ),
      runs,
    );
  });
});
