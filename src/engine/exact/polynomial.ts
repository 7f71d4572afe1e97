import { Rational } from './rational.ts';
import { compareSymbols, Monomial } from './monomial.ts';
import { rationalPower } from './rational-power.ts';

/** A coefficient times a monomial. */
export interface Term {
  readonly coefficient: Rational;
  readonly monomial: Monomial;
}

/**
 * Multivariate polynomials with exact rational coefficients. Monomials may carry rational (even
 * negative) exponents, so monomial rate laws such as k [O2]^(1/2) are polynomials too; ring
 * arithmetic, degrees, evaluation and derivatives work for any exponents. Immutable and canonical:
 * no zero terms, one term per monomial, terms in descending graded-lexicographic order, so two equal
 * polynomials have identical term lists.
 */
export class Polynomial {
  static readonly ZERO = new Polynomial([]);
  static readonly ONE = new Polynomial([{ coefficient: Rational.ONE, monomial: Monomial.ONE }]);

  private constructor(readonly terms: readonly Term[]) {}

  /** A constant polynomial (a number is read exactly as a double). */
  static constant(c: Rational | bigint | number): Polynomial {
    return Polynomial.term(toRational(c), Monomial.ONE);
  }

  /** The polynomial symbol^exponent. */
  static symbol(name: string, exponent: Rational | number = 1): Polynomial {
    return Polynomial.term(Rational.ONE, Monomial.of(name, exponent));
  }

  /** coefficient × monomial. */
  static term(coefficient: Rational, monomial: Monomial): Polynomial {
    return coefficient.isZero() ? Polynomial.ZERO : new Polynomial([{ coefficient, monomial }]);
  }

  /** Collects like terms, drops zero ones and sorts: the one normalising constructor. */
  static fromTerms(terms: Iterable<Term>): Polynomial {
    const byKey = new Map<string, Term>();
    for (const t of terms) {
      const seen = byKey.get(t.monomial.key);
      byKey.set(t.monomial.key, seen ? { coefficient: seen.coefficient.add(t.coefficient), monomial: t.monomial } : t);
    }
    const kept = [...byKey.values()].filter((t) => !t.coefficient.isZero());
    return new Polynomial(kept.sort((a, b) => Monomial.compare(b.monomial, a.monomial)));
  }

  /** Sum of several polynomials. */
  static sum(ps: Iterable<Polynomial>): Polynomial {
    let s = Polynomial.ZERO;
    for (const p of ps) s = s.add(p);
    return s;
  }

  /** Product of several polynomials. */
  static product(ps: Iterable<Polynomial>): Polynomial {
    let s = Polynomial.ONE;
    for (const p of ps) s = s.mul(p);
    return s;
  }

  /** True for the zero polynomial (no terms). */
  isZero(): boolean {
    return this.terms.length === 0;
  }

  /** True for the zero polynomial and for non-zero constants. */
  isConstant(): boolean {
    return this.terms.every((t) => t.monomial.isOne());
  }

  /** The value of a constant polynomial, or undefined when it has a symbol. */
  constantValue(): Rational | undefined {
    if (!this.isConstant()) return undefined;
    return this.terms[0]?.coefficient ?? Rational.ZERO;
  }

  /** The first term in the canonical (graded lexicographic) order; undefined for zero. */
  leadingTerm(): Term | undefined {
    return this.terms[0];
  }

  /** All symbols that occur, sorted. */
  symbols(): string[] {
    return [...new Set(this.terms.flatMap((t) => t.monomial.symbols()))].sort(compareSymbols);
  }

  /** True when every exponent is a non-negative integer: an ordinary polynomial. */
  hasNaturalExponents(): boolean {
    return this.terms.every((t) => t.monomial.hasNaturalExponents());
  }

  /** Exact equality (canonical forms make it a term-by-term comparison). */
  equals(other: Polynomial): boolean {
    if (this.terms.length !== other.terms.length) return false;
    return this.terms.every((t, i) => {
      const o = other.terms[i];
      return o !== undefined && t.monomial.equals(o.monomial) && t.coefficient.equals(o.coefficient);
    });
  }

  /** Sum. */
  add(other: Polynomial): Polynomial {
    if (other.isZero()) return this;
    if (this.isZero()) return other;
    return Polynomial.mergeSorted(this.terms, other.terms);
  }

  /** Difference. */
  sub(other: Polynomial): Polynomial {
    return this.add(other.neg());
  }

  /** Negation. */
  neg(): Polynomial {
    return new Polynomial(this.terms.map((t) => ({ coefficient: t.coefficient.neg(), monomial: t.monomial })));
  }

  /** Multiplies every coefficient by a constant. */
  scale(c: Rational): Polynomial {
    if (c.isZero()) return Polynomial.ZERO;
    return new Polynomial(this.terms.map((t) => ({ coefficient: t.coefficient.mul(c), monomial: t.monomial })));
  }

  /** Multiplies by coefficient × monomial; the order of terms is kept, since the order is monomial-compatible. */
  mulTerm(coefficient: Rational, monomial: Monomial): Polynomial {
    if (coefficient.isZero()) return Polynomial.ZERO;
    return new Polynomial(
      this.terms.map((t) => ({ coefficient: t.coefficient.mul(coefficient), monomial: t.monomial.mul(monomial) })),
    );
  }

  /** Product. */
  mul(other: Polynomial): Polynomial {
    if (this.isZero() || other.isZero()) return Polynomial.ZERO;
    const products: Term[] = [];
    for (const a of this.terms) {
      for (const b of other.terms) {
        products.push({ coefficient: a.coefficient.mul(b.coefficient), monomial: a.monomial.mul(b.monomial) });
      }
    }
    return Polynomial.fromTerms(products);
  }

  /** this^n for a non-negative integer n (0^0 = 1); throws on any other n (a programmer mistake). */
  pow(n: number): Polynomial {
    if (!Number.isSafeInteger(n) || n < 0) throw new RangeError(`pow needs a non-negative integer, got ${n}`);
    let result = Polynomial.ONE;
    let base: Polynomial = this;
    for (let k = n; k > 0; k = Math.floor(k / 2)) {
      if (k % 2 === 1) result = result.mul(base);
      if (k > 1) base = base.mul(base);
    }
    return result;
  }

  /** The largest exponent of the symbol over all terms (absent counts as 0; the zero polynomial gives 0). */
  degreeIn(symbol: string): Rational {
    return this.extremeExponent(symbol, 1);
  }

  /** The smallest exponent of the symbol over all terms (absent counts as 0; the zero polynomial gives 0). */
  lowDegreeIn(symbol: string): Rational {
    return this.extremeExponent(symbol, -1);
  }

  /** The largest total degree of a term (0 for the zero polynomial). */
  totalDegree(): Rational {
    return this.terms[0]?.monomial.totalDegree ?? Rational.ZERO;
  }

  /** The coefficient of symbol^degree, as a polynomial in the other symbols. */
  coefficientIn(symbol: string, degree: Rational | number): Polynomial {
    const d = toRational(degree);
    return Polynomial.fromTerms(
      this.terms
        .filter((t) => t.monomial.exponent(symbol).equals(d))
        .map((t) => ({ coefficient: t.coefficient, monomial: t.monomial.without(symbol) })),
    );
  }

  /**
   * Replaces a symbol by a polynomial. Where the symbol has a non-negative integer exponent any
   * replacement works; a negative or fractional exponent needs a single-term replacement whose
   * coefficient has a rational root. Anything else has no polynomial result, and throws.
   */
  substitute(symbol: string, replacement: Polynomial): Polynomial {
    const parts = this.terms.map((t) => {
      const e = t.monomial.exponent(symbol);
      const rest = Polynomial.term(t.coefficient, t.monomial.without(symbol));
      return e.isZero() ? rest : rest.mul(powerOf(replacement, e, symbol));
    });
    return Polynomial.sum(parts);
  }

  /** Floating-point value; throws when a symbol has no value (the caller must supply them all). */
  evaluate(values: ReadonlyMap<string, number>): number {
    return this.terms.reduce((sum, t) => sum + t.coefficient.toNumber() * t.monomial.evaluate(values), 0);
  }

  /** Exact value, or undefined when a fractional power is irrational or 0 meets a negative power. */
  evaluateExact(values: ReadonlyMap<string, Rational>): Rational | undefined {
    let sum = Rational.ZERO;
    for (const t of this.terms) {
      const m = t.monomial.evaluateExact(values);
      if (m === undefined) return undefined;
      sum = sum.add(t.coefficient.mul(m));
    }
    return sum;
  }

  /** ∂/∂symbol, term by term (c x^e → c e x^(e−1), for rational e too). */
  derivative(symbol: string): Polynomial {
    return Polynomial.fromTerms(
      this.terms.map((t) => {
        const e = t.monomial.exponent(symbol);
        return { coefficient: t.coefficient.mul(e), monomial: t.monomial.div(Monomial.of(symbol)) };
      }),
    );
  }

  /** Adds two canonical term lists in one pass, as in the merge step of merge sort. */
  private static mergeSorted(a: readonly Term[], b: readonly Term[]): Polynomial {
    const out: Term[] = [];
    let i = 0;
    let j = 0;
    while (i < a.length && j < b.length) {
      const ta = a[i]!;
      const tb = b[j]!;
      const c = Monomial.compare(ta.monomial, tb.monomial);
      if (c >= 0) i++;
      if (c <= 0) j++;
      if (c > 0) out.push(ta);
      else if (c < 0) out.push(tb);
      else {
        const coefficient = ta.coefficient.add(tb.coefficient);
        if (!coefficient.isZero()) out.push({ coefficient, monomial: ta.monomial });
      }
    }
    return new Polynomial([...out, ...a.slice(i), ...b.slice(j)]);
  }

  private extremeExponent(symbol: string, direction: 1 | -1): Rational {
    let best: Rational | undefined;
    for (const t of this.terms) {
      const e = t.monomial.exponent(symbol);
      if (best === undefined || e.compare(best) === direction) best = e;
    }
    return best ?? Rational.ZERO;
  }
}

function powerOf(p: Polynomial, e: Rational, symbol: string): Polynomial {
  if (e.isInteger() && e.sign() > 0) return p.pow(Number(e.num));
  const only = p.terms.length === 1 ? p.terms[0] : undefined;
  const c = only && rationalPower(only.coefficient, e);
  if (!only || !c) throw new RangeError(`cannot substitute for ${symbol}^${e}: no polynomial result`);
  return Polynomial.term(c, only.monomial.pow(e));
}

function toRational(c: Rational | bigint | number): Rational {
  return c instanceof Rational ? c : typeof c === 'bigint' ? Rational.of(c) : Rational.fromNumber(c);
}
