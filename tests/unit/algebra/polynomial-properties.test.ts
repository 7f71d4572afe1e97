import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { divideExact, Polynomial } from '../../../src/engine/exact/index.ts';
import {
  arbExactPoint,
  arbGeneralPolynomial,
  arbNonZeroPolynomial,
  arbPoint,
  arbPolynomial,
  close,
} from './helpers.ts';

const runs = { numRuns: 60 };

describe('polynomial ring axioms (random small polynomials)', () => {
  it('addition and multiplication are commutative and associative', () => {
    fc.assert(
      fc.property(arbGeneralPolynomial, arbGeneralPolynomial, arbGeneralPolynomial, (p, q, r) => {
        expect(p.add(q).equals(q.add(p))).toBe(true);
        expect(p.mul(q).equals(q.mul(p))).toBe(true);
        expect(
          p
            .add(q)
            .add(r)
            .equals(p.add(q.add(r))),
        ).toBe(true);
        expect(
          p
            .mul(q)
            .mul(r)
            .equals(p.mul(q.mul(r))),
        ).toBe(true);
      }),
      runs,
    );
  });

  it('multiplication distributes over addition', () => {
    fc.assert(
      fc.property(arbGeneralPolynomial, arbGeneralPolynomial, arbGeneralPolynomial, (p, q, r) => {
        expect(p.mul(q.add(r)).equals(p.mul(q).add(p.mul(r)))).toBe(true);
      }),
      runs,
    );
  });

  it('has identities and inverses', () => {
    fc.assert(
      fc.property(arbGeneralPolynomial, (p) => {
        expect(p.add(Polynomial.ZERO).equals(p)).toBe(true);
        expect(p.mul(Polynomial.ONE).equals(p)).toBe(true);
        expect(p.sub(p).isZero()).toBe(true);
        expect(p.pow(3).equals(p.mul(p).mul(p))).toBe(true);
      }),
      runs,
    );
  });

  it('(p*q)/q = p by exact division, for ordinary and generalised exponents', () => {
    fc.assert(
      fc.property(arbPolynomial, arbNonZeroPolynomial, (p, q) => {
        expect(divideExact(p.mul(q), q)?.equals(p)).toBe(true);
      }),
      runs,
    );
    fc.assert(
      fc.property(
        arbGeneralPolynomial,
        arbGeneralPolynomial.filter((q) => !q.isZero()),
        (p, q) => {
          expect(divideExact(p.mul(q), q)?.equals(p)).toBe(true);
        },
      ),
      runs,
    );
  });

  it('a non-exact division is reported as undefined, never as a wrong quotient', () => {
    fc.assert(
      fc.property(arbPolynomial, arbNonZeroPolynomial, (p, q) => {
        const r = divideExact(p, q);
        if (r !== undefined) expect(r.mul(q).equals(p)).toBe(true);
      }),
      runs,
    );
  });

  it('evaluation is a ring homomorphism (floating point and exact)', () => {
    fc.assert(
      fc.property(arbGeneralPolynomial, arbGeneralPolynomial, arbPoint, (p, q, at) => {
        expect(close(p.mul(q).evaluate(at), p.evaluate(at) * q.evaluate(at))).toBe(true);
        expect(close(p.add(q).evaluate(at), p.evaluate(at) + q.evaluate(at))).toBe(true);
      }),
      runs,
    );
    fc.assert(
      fc.property(arbPolynomial, arbPolynomial, arbExactPoint, (p, q, at) => {
        expect(
          p
            .mul(q)
            .evaluateExact(at)!
            .equals(p.evaluateExact(at)!.mul(q.evaluateExact(at)!)),
        ).toBe(true);
      }),
      runs,
    );
  });

  it('the derivative obeys the product rule', () => {
    fc.assert(
      fc.property(arbGeneralPolynomial, arbGeneralPolynomial, (p, q) => {
        const lhs = p.mul(q).derivative('x');
        expect(
          lhs.equals(
            p
              .derivative('x')
              .mul(q)
              .add(p.mul(q.derivative('x'))),
          ),
        ).toBe(true);
      }),
      runs,
    );
  });

  it('substitution agrees with evaluating at the substituted value', () => {
    fc.assert(
      fc.property(arbPolynomial, arbPolynomial, arbExactPoint, (p, r, at) => {
        const inner = r.evaluateExact(at)!;
        const direct = p.evaluateExact(new Map([...at, ['x', inner]]))!;
        expect(p.substitute('x', r).evaluateExact(at)!.equals(direct)).toBe(true);
      }),
      runs,
    );
  });
});
