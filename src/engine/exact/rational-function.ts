import { Rational } from './rational.ts';
import { divideExact } from './divide-exact.ts';
import { compareSymbols, Monomial } from './monomial.ts';
import { content, monomialContent } from './polynomial-content.ts';
import { Polynomial } from './polynomial.ts';

/**
 * A quotient of polynomials, kept in a normal form that cancels, in this order:
 * 1. a common polynomial factor where one side divides the other exactly (so (x²−1)/(x+1) becomes
 *    x−1); factors that divide neither side whole, as in (x+1)(y+1)/((x+1)(z+1)), are NOT
 *    cancelled — that would need a full multivariate gcd, which the rate laws have not needed;
 * 2. the common monomial factor, which also moves negative exponents to the other side, so both
 *    sides end with non-negative exponents;
 * 3. the constant factors, leaving coprime integer coefficients on both sides together;
 * and finally makes the leading coefficient of the denominator positive.
 * Because step 1 is partial, equal functions may have different forms: compare with `equals`.
 */
export class RationalFunction {
  static readonly ZERO = new RationalFunction(Polynomial.ZERO, Polynomial.ONE);
  static readonly ONE = new RationalFunction(Polynomial.ONE, Polynomial.ONE);

  private constructor(
    readonly numerator: Polynomial,
    readonly denominator: Polynomial,
  ) {}

  /** numerator / denominator in normal form; throws on a zero denominator (a programmer mistake). */
  static of(numerator: Polynomial, denominator: Polynomial = Polynomial.ONE): RationalFunction {
    if (denominator.isZero()) throw new RangeError('RationalFunction with a zero denominator');
    if (numerator.isZero()) return RationalFunction.ZERO;
    let [n, d] = cancelDividingFactor(numerator, denominator);
    const common = monomialContent(n).gcd(monomialContent(d));
    const shift = Monomial.ONE.div(common);
    // n = cN·pN and d = cD·pD with primitive pN, pD; write cN/cD = a/b in lowest terms.
    const ratio = content(n).div(content(d));
    n = n.mulTerm(Rational.of(ratio.num).div(content(n)), shift);
    d = d.mulTerm(Rational.of(ratio.den).div(content(d)), shift);
    if (d.leadingTerm()!.coefficient.sign() < 0) [n, d] = [n.neg(), d.neg()];
    return new RationalFunction(n, d);
  }

  /** A polynomial as a rational function over 1. */
  static fromPolynomial(p: Polynomial): RationalFunction {
    return RationalFunction.of(p);
  }

  /** True for the zero function. */
  isZero(): boolean {
    return this.numerator.isZero();
  }

  /** True when the normal form has a constant denominator (a partial cancellation may miss some). */
  isPolynomial(): boolean {
    return this.denominator.isConstant();
  }

  /** The polynomial this equals when the denominator is constant; otherwise undefined. */
  toPolynomial(): Polynomial | undefined {
    const d = this.denominator.constantValue();
    return d === undefined ? undefined : this.numerator.scale(d.inverse());
  }

  /** Mathematical equality, by cross-multiplication (normal forms need not be unique). */
  equals(other: RationalFunction): boolean {
    return this.numerator.mul(other.denominator).equals(other.numerator.mul(this.denominator));
  }

  /** All symbols of numerator and denominator, sorted. */
  symbols(): string[] {
    return [...new Set([...this.numerator.symbols(), ...this.denominator.symbols()])].sort(compareSymbols);
  }

  /** Sum, over the smaller common denominator where one denominator divides the other. */
  add(other: RationalFunction): RationalFunction {
    const [a, b, c, d] = [this.numerator, this.denominator, other.numerator, other.denominator];
    if (b.equals(d)) return RationalFunction.of(a.add(c), b);
    // A denominator that is a multiple of the other is already a common denominator.
    const e = divideExact(b, d);
    if (e) return RationalFunction.of(a.add(c.mul(e)), b);
    const f = divideExact(d, b);
    if (f) return RationalFunction.of(a.mul(f).add(c), d);
    return RationalFunction.of(a.mul(d).add(c.mul(b)), b.mul(d));
  }

  /** Difference. */
  sub(other: RationalFunction): RationalFunction {
    return this.add(other.neg());
  }

  /** Negation. */
  neg(): RationalFunction {
    return new RationalFunction(this.numerator.neg(), this.denominator);
  }

  /** Product. */
  mul(other: RationalFunction): RationalFunction {
    // Cancelling across first keeps the intermediate products small.
    const x = RationalFunction.of(this.numerator, other.denominator);
    const y = RationalFunction.of(other.numerator, this.denominator);
    return RationalFunction.of(x.numerator.mul(y.numerator), x.denominator.mul(y.denominator));
  }

  /** Division; throws when dividing by zero (a programmer mistake: check isZero first). */
  div(other: RationalFunction): RationalFunction {
    return this.mul(other.inverse());
  }

  /** 1 / this; throws for zero (a programmer mistake). */
  inverse(): RationalFunction {
    return RationalFunction.of(this.denominator, this.numerator);
  }

  /** Floating-point value (±Infinity or NaN where the denominator vanishes). */
  evaluate(values: ReadonlyMap<string, number>): number {
    return this.numerator.evaluate(values) / this.denominator.evaluate(values);
  }

  /** Exact value, or undefined where the denominator vanishes or a fractional power is irrational. */
  evaluateExact(values: ReadonlyMap<string, Rational>): Rational | undefined {
    const n = this.numerator.evaluateExact(values);
    const d = this.denominator.evaluateExact(values);
    return n === undefined || d === undefined || d.isZero() ? undefined : n.div(d);
  }

  /** ∂/∂symbol by the quotient rule. */
  derivative(symbol: string): RationalFunction {
    const [a, b] = [this.numerator, this.denominator];
    return RationalFunction.of(
      a
        .derivative(symbol)
        .mul(b)
        .sub(a.mul(b.derivative(symbol))),
      b.mul(b),
    );
  }

  /**
   * ∂ln f/∂ln x = x·f′/f = x·(a′b − ab′)/(ab) for f = a/b: the apparent order in x.
   * Undefined for the zero function, whose logarithm does not exist.
   */
  logDerivative(symbol: string): RationalFunction | undefined {
    if (this.isZero()) return undefined;
    const [a, b] = [this.numerator, this.denominator];
    const slope = a
      .derivative(symbol)
      .mul(b)
      .sub(a.mul(b.derivative(symbol)));
    return RationalFunction.of(slope.mulTerm(Rational.ONE, Monomial.of(symbol)), a.mul(b));
  }
}

/** Step 1 of the normal form; only multi-term sides can have a multi-term common factor. */
function cancelDividingFactor(n: Polynomial, d: Polynomial): [Polynomial, Polynomial] {
  if (n.terms.length < 2 || d.terms.length < 2) return [n, d];
  const q = divideExact(n, d);
  if (q) return [q, Polynomial.ONE];
  const r = divideExact(d, n);
  return r ? [Polynomial.ONE, r] : [n, d];
}
