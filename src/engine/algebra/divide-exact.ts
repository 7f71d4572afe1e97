import { Rational } from '../rational.ts';
import { Monomial } from './monomial.ts';
import { monomialContent } from './polynomial-content.ts';
import { Polynomial, type Term } from './polynomial.ts';

/**
 * Exact multivariate division: the r with p = q·r, or undefined when there is none.
 *
 * Monomials may have rational or negative exponents, so "exact" is meant in that ring: the two
 * monomial contents are divided out first (that leaves non-negative exponents), so x / x² = x⁻¹.
 * For ordinary polynomials where q divides p in the usual sense, r is the usual quotient; use
 * `hasNaturalExponents()` on the result to ask for divisibility in the ordinary polynomial ring.
 *
 * The method is leading-term elimination in the graded lexicographic order, which is compatible
 * with multiplication: if p = q·r then lt(p) = lt(q)·lt(r), so each step either removes the
 * leading term of the remainder or proves that q does not divide p. The leading monomials
 * strictly decrease in a well-order (exponents stay in a fixed lattice (1/D)ℕⁿ), so it terminates.
 * Throws on division by the zero polynomial (a programmer mistake).
 */
export function divideExact(p: Polynomial, q: Polynomial): Polynomial | undefined {
  if (q.isZero()) throw new RangeError('divideExact by the zero polynomial');
  if (p.isZero()) return Polynomial.ZERO;
  const mp = monomialContent(p);
  const mq = monomialContent(q);
  let remainder = p.mulTerm(Rational.ONE, Monomial.ONE.div(mp));
  const divisor = q.mulTerm(Rational.ONE, Monomial.ONE.div(mq));
  if (!degreesAllow(remainder, divisor)) return undefined;
  const lead = divisor.leadingTerm()!;
  const quotient: Term[] = [];
  for (let t = remainder.leadingTerm(); t !== undefined; t = remainder.leadingTerm()) {
    const monomial = t.monomial.div(lead.monomial);
    if (!monomial.hasNonNegativeExponents()) return undefined;
    const coefficient = t.coefficient.div(lead.coefficient);
    quotient.push({ coefficient, monomial });
    remainder = remainder.sub(divisor.mulTerm(coefficient, monomial));
  }
  return Polynomial.fromTerms(quotient).mulTerm(Rational.ONE, mp.div(mq));
}

/** A cheap necessary condition: the divisor's degree in each symbol cannot exceed the dividend's. */
function degreesAllow(p: Polynomial, q: Polynomial): boolean {
  if (q.totalDegree().compare(p.totalDegree()) > 0) return false;
  return q.symbols().every((s) => q.degreeIn(s).compare(p.degreeIn(s)) <= 0);
}
