import { Monomial } from './monomial.ts';
import { content, monomialContent } from './polynomial-content.ts';
import { Polynomial } from './polynomial.ts';
import type { Radical } from './radical.ts';
import { integerRoot, rationalPower } from './rational-power.ts';
import { Rational } from './rational.ts';
import { RationalFunction } from './rational-function.ts';
import { coefficientsIn, definiteSign, fromCoefficients } from './univariate.ts';

/** How the positive root is found: x^power = ratio, or y = x^power the positive root of a y² + b y + c. */
type RootForm =
  | { kind: 'binomial'; power: number; ratio: RationalFunction }
  | { kind: 'quadratic'; power: number; a: Polynomial; b: Polynomial; c: Polynomial };

/** Why a polynomial has no closed-form positive root here. */
export type RootProblem = { kind: 'degree'; degree: number } | { kind: 'sign'; reason: string } | { kind: 'constant' };

/**
 * The one positive root of a polynomial in `symbol` whose coefficients are polynomials in
 * positive symbols (constants and concentrations). By Descartes' rule of signs a polynomial with
 * exactly one sign change among coefficients of fixed sign has exactly one positive root. Closed
 * forms are given for a binomial c_n x^n + c_m x^m (x^(n−m) = −c_m/c_n) and a quadratic in x^g;
 * higher degrees are reported, with their degree, as a `RootProblem`.
 */
export class PositiveRoot {
  private constructor(
    readonly symbol: string,
    /** the polynomial whose positive root this is, primitive, with no power of the symbol as a factor */
    readonly polynomial: Polynomial,
    private readonly form: RootForm,
  ) {}

  /** The positive root of p in `symbol`, or why there is no closed form. */
  static of(symbol: string, p: Polynomial): PositiveRoot | RootProblem {
    const coefficients = coefficientsIn(p, symbol);
    if (!coefficients || coefficients.size === 0) return { kind: 'constant' };
    const low = Math.min(...coefficients.keys());
    const shifted = new Map([...coefficients].map(([k, c]) => [k - low, c]));
    const powers = [...shifted.keys()].sort((x, y) => x - y);
    if (powers.length < 2) return { kind: 'constant' };
    const g = powers.reduce((x, y) => gcdNumber(x, y));
    const top = powers.at(-1)!;
    const signs = powers.map((k) => definiteSign(shifted.get(k)!));
    const polynomial = fromCoefficients(symbol, shifted);
    if (top / g === 1) {
      const [cm, cn] = [shifted.get(0)!, shifted.get(top)!];
      if (signs[0]! * signs[1]! !== -1)
        return { kind: 'sign', reason: `the two coefficients of ${symbol} do not have opposite fixed signs` };
      return new PositiveRoot(symbol, polynomial, {
        kind: 'binomial',
        power: top,
        ratio: RationalFunction.of(cm.neg(), cn),
      });
    }
    if (top / g === 2) {
      let [c, b, a] = [shifted.get(0)!, shifted.get(g) ?? Polynomial.ZERO, shifted.get(top)!];
      if (definiteSign(a) * definiteSign(c) !== -1)
        return { kind: 'sign', reason: `the quadratic in ${symbol} may have no or two positive roots` };
      if (definiteSign(a) < 0) [a, b, c] = [a.neg(), b.neg(), c.neg()];
      return new PositiveRoot(symbol, polynomial, { kind: 'quadratic', power: g, a, b, c });
    }
    return { kind: 'degree', degree: top };
  }

  /** 'binomial' (a radical) or 'quadratic'. */
  get kind(): 'binomial' | 'quadratic' {
    return this.form.kind;
  }

  /** The other symbols the root depends on, sorted. */
  symbols(): string[] {
    return this.polynomial.symbols().filter((s) => s !== this.symbol);
  }

  /** The root as coefficient × monomial when it is one exactly (a binomial of monomials with a rational root). */
  exactMonomial(): { coefficient: Rational; monomial: Monomial } | undefined {
    if (this.form.kind !== 'binomial') return undefined;
    const { ratio, power } = this.form;
    const [n] = ratio.numerator.terms;
    const [d] = ratio.denominator.terms;
    if (ratio.numerator.terms.length !== 1 || ratio.denominator.terms.length !== 1 || !n || !d) return undefined;
    const coefficient = rationalPower(n.coefficient.div(d.coefficient), Rational.of(1, power));
    if (!coefficient) return undefined;
    return { coefficient, monomial: n.monomial.div(d.monomial).pow(Rational.of(1, power)) };
  }

  /** The closed form, with whole powers of monomials drawn out of roots. */
  closedForm(): Radical {
    const form = this.form;
    if (form.kind === 'binomial') {
      const exact = this.exactMonomial();
      if (exact) return rational(Polynomial.term(exact.coefficient, exact.monomial));
      return { kind: 'root', radicand: { kind: 'rational', value: form.ratio }, index: form.power };
    }
    const { a, b, c } = form;
    const root = drawOut(b.mul(b).sub(a.mul(c).scale(Rational.of(4))), 2);
    const twoA = rational(a.scale(Rational.of(2)));
    // −b + √Δ cancels when b > 0; then the equal form 2(−c)/(b + √Δ) has no cancellation.
    const y: Radical =
      definiteSign(b) > 0
        ? { kind: 'quotient', numerator: rational(c.neg().scale(Rational.of(2))), denominator: sum(rational(b), root) }
        : { kind: 'quotient', numerator: sum(rational(b.neg()), root), denominator: twoA };
    return form.power === 1 ? y : { kind: 'root', radicand: y, index: form.power };
  }

  /** The root's floating-point value where every other symbol has one (NaN where there is no positive root). */
  value(values: ReadonlyMap<string, number>): number {
    const form = this.form;
    if (form.kind === 'binomial') return Math.pow(form.ratio.evaluate(values), 1 / form.power);
    const [a, b, c] = [form.a, form.b, form.c].map((p) => p.evaluate(values)) as [number, number, number];
    const disc = Math.sqrt(b * b - 4 * a * c);
    // The form without cancellation for the sign b has here.
    const y = b > 0 ? (-2 * c) / (b + disc) : (disc - b) / (2 * a);
    return form.power === 1 ? y : Math.pow(y, 1 / form.power);
  }

  /** The same root with one symbol fixed to a value (0 for an absent product), or why it has none then. */
  substitute(symbol: string, value: Polynomial): PositiveRoot | RootProblem {
    return PositiveRoot.of(this.symbol, this.polynomial.substitute(symbol, value));
  }
}

function rational(p: Polynomial): Radical {
  return { kind: 'rational', value: RationalFunction.of(p) };
}

function sum(...terms: Radical[]): Radical {
  return { kind: 'sum', terms };
}

/**
 * √p (or the n-th root) with whole powers drawn out: the monomial factor's exponents divisible by
 * n and the largest exact n-th power of the numeric content, so √(x²(…)) reads x√(…).
 */
function drawOut(p: Polynomial, index: number): Radical {
  const m = monomialContent(p);
  const outside = Monomial.fromFactors(
    m.factors.map(([s, e]) => [s, e.isInteger() ? Rational.of(e.num / BigInt(index)) : Rational.ZERO]),
  );
  const c = content(p);
  const cOut = Rational.of(perfectPart(c.num, index), perfectPart(c.den, index));
  const cPower = Rational.of(cOut.num ** BigInt(index), cOut.den ** BigInt(index));
  const inside = p.mulTerm(cPower.inverse(), outside.pow(-index));
  const root: Radical = inside.equals(Polynomial.ONE)
    ? rational(Polynomial.ONE)
    : { kind: 'root', radicand: rational(inside), index };
  if (outside.isOne() && cOut.equals(Rational.ONE)) return root;
  const factor = rational(Polynomial.term(cOut, outside));
  return inside.equals(Polynomial.ONE) ? factor : { kind: 'product', factors: [factor, root] };
}

/** The largest k with k^index dividing n (trial by the exact root first, then small factors). */
function perfectPart(n: bigint, index: number): bigint {
  const whole = integerRoot(n < 0n ? -n : n, BigInt(index));
  if (whole !== undefined) return whole;
  let out = 1n;
  let rest = n < 0n ? -n : n;
  for (let f = 2n; f < 1000n && f ** BigInt(index) <= rest; f++) {
    while (rest % f ** BigInt(index) === 0n) {
      rest /= f ** BigInt(index);
      out *= f;
    }
  }
  return out;
}

function gcdNumber(a: number, b: number): number {
  return b === 0 ? a : gcdNumber(b, a % b);
}
