import { Rational } from './rational.ts';
import { rationalPower } from './rational-power.ts';

/** One factor of a monomial: a symbol and its (non-zero, rational) exponent. */
export type Factor = readonly [symbol: string, exponent: Rational];

/**
 * A power product Π symbol^exponent with rational exponents, so that monomial rate laws such as
 * k [O2]^(1/2) [NO]^-1 are monomials too. Immutable; factors sorted by symbol (code-unit order,
 * not locale order, so keys and output do not depend on the machine), zero exponents dropped.
 */
export class Monomial {
  static readonly ONE = new Monomial([]);

  // Worked out on first use: most intermediate products of an elimination never need them.
  private cachedKey: string | undefined;
  private cachedDegree: Rational | undefined;

  private constructor(readonly factors: readonly Factor[]) {}

  /** Canonical text of the factors: equal monomials, and only they, have equal keys. */
  get key(): string {
    // JSON quoting keeps the key unambiguous whatever characters a symbol holds.
    this.cachedKey ??= this.factors.map(([s, e]) => `${JSON.stringify(s)}^${e.toString()}`).join('*');
    return this.cachedKey;
  }

  /** Sum of the exponents. */
  get totalDegree(): Rational {
    this.cachedDegree ??= this.factors.reduce((sum, [, e]) => sum.add(e), Rational.ZERO);
    return this.cachedDegree;
  }

  /** symbol^exponent, exponent 1 by default (a number is read exactly as a double: pass 1/3 as a Rational). */
  static of(symbol: string, exponent: Rational | number = 1): Monomial {
    return Monomial.fromFactors([[symbol, toRational(exponent)]]);
  }

  /** Builds a monomial from factors in any order; repeated symbols have their exponents added. */
  static fromFactors(factors: Iterable<readonly [string, Rational | number]>): Monomial {
    const exponents = new Map<string, Rational>();
    for (const [s, e] of factors) exponents.set(s, (exponents.get(s) ?? Rational.ZERO).add(toRational(e)));
    const sorted = [...exponents].filter(([, e]) => !e.isZero()).sort(([a], [b]) => compareSymbols(a, b));
    return sorted.length === 0 ? Monomial.ONE : new Monomial(sorted);
  }

  /** The exponent of a symbol (zero when absent): the degree of the monomial in that symbol. */
  exponent(symbol: string): Rational {
    return this.factors.find(([s]) => s === symbol)?.[1] ?? Rational.ZERO;
  }

  /** The symbols with a non-zero exponent, sorted. */
  symbols(): string[] {
    return this.factors.map(([s]) => s);
  }

  /** True for the empty product 1. */
  isOne(): boolean {
    return this.factors.length === 0;
  }

  /** Same symbols with the same exponents. */
  equals(other: Monomial): boolean {
    return this.key === other.key;
  }

  /** True when every exponent is a non-negative integer: an ordinary polynomial monomial. */
  hasNaturalExponents(): boolean {
    return this.factors.every(([, e]) => e.isInteger() && e.sign() > 0);
  }

  /** True when no exponent is negative. */
  hasNonNegativeExponents(): boolean {
    return this.factors.every(([, e]) => e.sign() > 0);
  }

  /** Product: exponents added. */
  mul(other: Monomial): Monomial {
    if (other.isOne()) return this;
    if (this.isOne()) return other;
    return this.combine(other, (a, b) => a.add(b));
  }

  /** Quotient: exponents subtracted (they may become negative). */
  div(other: Monomial): Monomial {
    return other.isOne() ? this : this.combine(other, (a, b) => a.sub(b));
  }

  /** Greatest common divisor: the smaller exponent of each symbol, an absent symbol counting as 0. */
  gcd(other: Monomial): Monomial {
    return this.combine(other, (a, b) => (a.compare(b) <= 0 ? a : b));
  }

  /** Every exponent multiplied by a rational power. */
  pow(power: Rational | number): Monomial {
    const p = toRational(power);
    return Monomial.fromFactors(this.factors.map(([s, e]) => [s, e.mul(p)]));
  }

  /** True when this monomial divides the other with a non-negative-exponent quotient. */
  divides(other: Monomial): boolean {
    return other.div(this).hasNonNegativeExponents();
  }

  /** The monomial without one symbol. */
  without(symbol: string): Monomial {
    return Monomial.fromFactors(this.factors.filter(([s]) => s !== symbol));
  }

  /** Floating-point value; throws when a symbol has no value (the caller must supply them all). */
  evaluate(values: ReadonlyMap<string, number>): number {
    let product = 1;
    for (const [s, e] of this.factors) product *= Math.pow(valueOf(values, s), e.toNumber());
    return product;
  }

  /** Exact value, or undefined when a fractional power is irrational or 0 meets a negative power. */
  evaluateExact(values: ReadonlyMap<string, Rational>): Rational | undefined {
    let product = Rational.ONE;
    for (const [s, e] of this.factors) {
      const power = rationalPower(valueOf(values, s), e);
      if (power === undefined) return undefined;
      product = product.mul(power);
    }
    return product;
  }

  /**
   * Graded lexicographic order: higher total degree first, then the larger exponent of the
   * alphabetically first symbol where they differ. It is compatible with multiplication
   * (the leading term of a product is the product of the leading terms), which exact division needs.
   */
  static compare(a: Monomial, b: Monomial): -1 | 0 | 1 {
    const byDegree = a.totalDegree.compare(b.totalDegree);
    if (byDegree !== 0) return byDegree;
    // Walk both sorted factor lists; a symbol missing from one side has exponent 0 there.
    let i = 0;
    let j = 0;
    while (i < a.factors.length || j < b.factors.length) {
      const fa = a.factors[i];
      const fb = b.factors[j];
      const order = fa === undefined ? 1 : fb === undefined ? -1 : compareSymbols(fa[0], fb[0]);
      const ea = order <= 0 && fa ? fa[1] : Rational.ZERO;
      const eb = order >= 0 && fb ? fb[1] : Rational.ZERO;
      const c = ea.compare(eb);
      if (c !== 0) return c;
      if (order <= 0) i++;
      if (order >= 0) j++;
    }
    return 0;
  }

  /** Applies op to the exponents of each symbol of either side (absent = 0), merging the sorted lists. */
  private combine(other: Monomial, op: (a: Rational, b: Rational) => Rational): Monomial {
    const [a, b] = [this.factors, other.factors];
    const out: Factor[] = [];
    let i = 0;
    let j = 0;
    while (i < a.length || j < b.length) {
      const fa = a[i];
      const fb = b[j];
      const order = fa === undefined ? 1 : fb === undefined ? -1 : compareSymbols(fa[0], fb[0]);
      const symbol = order <= 0 ? fa![0] : fb![0];
      const e = op(order <= 0 ? fa![1] : Rational.ZERO, order >= 0 ? fb![1] : Rational.ZERO);
      if (!e.isZero()) out.push([symbol, e]);
      if (order <= 0) i++;
      if (order >= 0) j++;
    }
    return out.length === 0 ? Monomial.ONE : new Monomial(out);
  }
}

/** Code-unit order of symbols, independent of locale. */
export function compareSymbols(a: string, b: string): -1 | 0 | 1 {
  return a < b ? -1 : a > b ? 1 : 0;
}

function valueOf<T>(values: ReadonlyMap<string, T>, symbol: string): T {
  const v = values.get(symbol);
  if (v === undefined) throw new RangeError(`no value given for symbol ${JSON.stringify(symbol)}`);
  return v;
}

function toRational(x: Rational | number): Rational {
  return typeof x === 'number' ? Rational.fromNumber(x) : x;
}
