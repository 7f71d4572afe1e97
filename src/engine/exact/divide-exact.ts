import { Rational } from './rational.ts';
import { Monomial } from './monomial.ts';
import { MonomialHeap } from './monomial-heap.ts';
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
  const dividend = p.mulTerm(Rational.ONE, Monomial.ONE.div(mp));
  const divisor = q.mulTerm(Rational.ONE, Monomial.ONE.div(mq));
  const bounds = quotientDegreeBounds(dividend, divisor);
  if (bounds === undefined) return undefined;
  const lead = divisor.leadingTerm()!;
  // The remainder lives in a map keyed by monomial, with a heap to find its leading term, so a
  // step costs O(|q| log) rather than a pass over the whole remainder.
  const remainder = new Map(dividend.terms.map((t) => [t.monomial.key, t]));
  const heap = new MonomialHeap();
  for (const t of dividend.terms) heap.push(t.monomial);
  const quotient: Term[] = [];
  for (let top = heap.pop(); top !== undefined; top = heap.pop()) {
    const t = remainder.get(top.key);
    if (t === undefined) continue; // cancelled, or already seen through a duplicate heap entry
    const monomial = t.monomial.div(lead.monomial);
    if (!withinBounds(monomial, bounds)) return undefined;
    const coefficient = t.coefficient.div(lead.coefficient);
    quotient.push({ coefficient, monomial });
    for (const d of divisor.terms) {
      const m = d.monomial.mul(monomial);
      const old = remainder.get(m.key);
      const c = (old?.coefficient ?? Rational.ZERO).sub(d.coefficient.mul(coefficient));
      if (c.isZero()) remainder.delete(m.key);
      else remainder.set(m.key, { coefficient: c, monomial: m });
      if (old === undefined && !c.isZero()) heap.push(m);
    }
  }
  return Polynomial.fromTerms(quotient).mulTerm(Rational.ONE, mp.div(mq));
}

interface DegreeBounds {
  readonly total: Rational;
  readonly bySymbol: ReadonlyMap<string, Rational>;
}

/**
 * Degrees add under multiplication (in each symbol and in total), so every term of an exact
 * quotient has exponents between 0 and deg(p) − deg(q). Undefined when q's degree is already larger.
 */
function quotientDegreeBounds(p: Polynomial, q: Polynomial): DegreeBounds | undefined {
  const total = p.totalDegree().sub(q.totalDegree());
  const [dp, dq] = [maxDegrees(p), maxDegrees(q)];
  const bySymbol = new Map([...dp].map(([s, d]) => [s, d.sub(dq.get(s) ?? Rational.ZERO)]));
  if (total.sign() < 0 || [...dq.keys()].some((s) => !bySymbol.has(s))) return undefined;
  return [...bySymbol.values()].some((b) => b.sign() < 0) ? undefined : { total, bySymbol };
}

/** Highest exponent of each symbol, in one pass (exponents here are non-negative). */
function maxDegrees(p: Polynomial): Map<string, Rational> {
  const degrees = new Map<string, Rational>();
  for (const t of p.terms) {
    for (const [s, e] of t.monomial.factors) {
      const d = degrees.get(s);
      if (d === undefined || e.compare(d) > 0) degrees.set(s, e);
    }
  }
  return degrees;
}

function withinBounds(m: Monomial, bounds: DegreeBounds): boolean {
  if (m.totalDegree.compare(bounds.total) > 0) return false;
  return m.factors.every(([s, e]) => e.sign() > 0 && e.compare(bounds.bySymbol.get(s) ?? Rational.ZERO) <= 0);
}
