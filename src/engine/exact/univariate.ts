import { Monomial } from './monomial.ts';
import { Polynomial, type Term } from './polynomial.ts';
import { Rational } from './rational.ts';

/**
 * A multivariate polynomial read as a polynomial in one symbol, Σ c_k x^k, with coefficients in
 * the other symbols: what elimination and root-finding work on.
 */

/**
 * The coefficient of each power of x that occurs, by power; undefined when x has a negative or
 * fractional exponent somewhere (not a polynomial in x).
 */
export function coefficientsIn(p: Polynomial, x: string): Map<number, Polynomial> | undefined {
  const groups = new Map<number, Term[]>();
  for (const t of p.terms) {
    const e = t.monomial.exponent(x);
    if (!e.isInteger() || e.sign() < 0) return undefined;
    const k = Number(e.num);
    const rest = e.isZero() ? t : { coefficient: t.coefficient, monomial: t.monomial.without(x) };
    const group = groups.get(k);
    if (group) group.push(rest);
    else groups.set(k, [rest]);
  }
  return new Map([...groups].map(([k, terms]) => [k, Polynomial.fromTerms(terms)]));
}

/** The natural degree of p in x (0 when absent); undefined when x has a negative or fractional exponent. */
export function naturalDegreeIn(p: Polynomial, x: string): number | undefined {
  let degree = 0;
  for (const t of p.terms) {
    const e = t.monomial.exponent(x);
    if (!e.isInteger() || e.sign() < 0) return undefined;
    degree = Math.max(degree, Number(e.num));
  }
  return degree;
}

/**
 * The sign p takes wherever all its symbols are positive, when its terms settle it: 1 or −1 when
 * every coefficient has that sign, 0 when they differ (or p is zero) and the sign is not known.
 */
export function definiteSign(p: Polynomial): -1 | 0 | 1 {
  const first = p.terms[0]?.coefficient.sign() ?? 0;
  return first !== 0 && p.terms.every((t) => t.coefficient.sign() === first) ? first : 0;
}

/** True when p contains any of the symbols. */
export function involves(p: Polynomial, symbols: ReadonlySet<string>): boolean {
  return p.terms.some((t) => t.monomial.factors.some(([s]) => symbols.has(s)));
}

/** The total degree of p in the given symbols alone (0 when none occurs). */
export function degreeInSymbols(p: Polynomial, symbols: ReadonlySet<string>): Rational {
  let best = Rational.ZERO;
  for (const t of p.terms) {
    const d = t.monomial.factors.reduce((sum, [s, e]) => (symbols.has(s) ? sum.add(e) : sum), Rational.ZERO);
    if (d.compare(best) > 0) best = d;
  }
  return best;
}

/** The largest monomial in the given symbols that divides every term of p (1 for zero). */
export function monomialContentIn(p: Polynomial, symbols: ReadonlySet<string>): Monomial {
  const [first, ...rest] = p.terms;
  if (!first) return Monomial.ONE;
  const only = (m: Monomial) => Monomial.fromFactors(m.factors.filter(([s]) => symbols.has(s)));
  return rest.reduce((g, t) => g.gcd(only(t.monomial)), only(first.monomial));
}

/** Σ c_k x^k from coefficients by power. */
export function fromCoefficients(x: string, coefficients: ReadonlyMap<number, Polynomial>): Polynomial {
  return Polynomial.sum([...coefficients].map(([k, c]) => c.mulTerm(Rational.ONE, Monomial.of(x, k))));
}

/**
 * The pseudo-remainder of p by f in x: r with lc(f)^k·p = q·f + r and deg_x r < deg_x f, so that
 * p ≡ r / lc(f)^k wherever f = 0. Undefined when x is not a polynomial variable of both.
 */
export function pseudoRemainder(
  p: Polynomial,
  f: Polynomial,
  x: string,
): { remainder: Polynomial; power: number } | undefined {
  const df = naturalDegreeIn(f, x);
  if (df === undefined || df === 0) return undefined;
  const lead = f.coefficientIn(x, df);
  let r = p;
  let power = 0;
  for (let dr = naturalDegreeIn(r, x); dr !== undefined && dr >= df && !r.isZero(); dr = naturalDegreeIn(r, x)) {
    const top = r.coefficientIn(x, dr).mulTerm(Rational.ONE, Monomial.of(x, dr - df));
    r = r.mul(lead).sub(top.mul(f));
    power++;
  }
  return naturalDegreeIn(r, x) === undefined ? undefined : { remainder: r, power };
}
