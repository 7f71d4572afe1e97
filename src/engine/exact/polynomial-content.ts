import { gcd, lcm, Rational } from './rational.ts';
import { Monomial } from './monomial.ts';
import { Polynomial } from './polynomial.ts';

/**
 * Contents: the constant and the monomial that divide every term. Dividing them out leaves the
 * primitive part, which is what rational functions compare and cancel.
 */

/**
 * The positive rational c such that p / c has coprime integer coefficients: the gcd of the
 * numerators over the lcm of the denominators. Zero for the zero polynomial.
 */
export function content(p: Polynomial): Rational {
  if (p.isZero()) return Rational.ZERO;
  let num = 0n;
  let den = 1n;
  for (const t of p.terms) {
    num = num === 0n ? abs(t.coefficient.num) : gcd(num, t.coefficient.num);
    den = lcm(den, t.coefficient.den);
  }
  return Rational.of(num, den);
}

/** The gcd of all monomials of p (smallest exponent of each symbol, absent counting as 0); 1 for zero. */
export function monomialContent(p: Polynomial): Monomial {
  const [first, ...rest] = p.terms;
  if (first === undefined) return Monomial.ONE;
  return rest.reduce((g, t) => g.gcd(t.monomial), first.monomial);
}

/**
 * p divided by its content and its monomial content: coprime integer coefficients, no monomial
 * factor, every exponent non-negative, and the sign of p kept. Zero stays zero.
 */
export function primitivePart(p: Polynomial): Polynomial {
  if (p.isZero()) return p;
  return p.mulTerm(content(p).inverse(), Monomial.ONE.div(monomialContent(p)));
}

function abs(n: bigint): bigint {
  return n < 0n ? -n : n;
}
