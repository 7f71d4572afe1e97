/**
 * Test helpers: build polynomials and rational functions from readable text. The little parser
 * below only reads the text; the arithmetic is ours, so the tables compare our results in two
 * different shapes. (mathjs is kept for the cross-check file: importing it costs most of a second.)
 */
import fc from 'fast-check';
import { Monomial, Polynomial, RationalFunction } from '../../../src/engine/exact/index.ts';
import { Rational } from '../../../src/engine/exact/rational.ts';

/** A parsed expression: a number, a symbol, or an operator (+ - * / ^ neg) with its arguments. */
export type Node = { num: Rational } | { sym: string } | { op: string; args: Node[] };

/** A polynomial from text such as `2*x^2*y - 3/2*z + k^(1/2)/S`; division only by a single term. */
export function poly(text: string): Polynomial {
  return toPolynomial(parse(text));
}

/** A rational function from text such as `k1*S/(km1 + k2 + k1*S)`. */
export function rf(text: string): RationalFunction {
  return toRationalFunction(parse(text));
}

/** Shorthand for Rational.of(num, den). */
export function q(num: number, den = 1): Rational {
  return Rational.of(num, den);
}

/** Recursive descent over + - * / ^ and parentheses; ^ binds tighter than unary minus on its left. */
export function parse(text: string): Node {
  const tokens = text.match(/\d+|[A-Za-z_][A-Za-z0-9_]*|[-+*/^()]/g) ?? [];
  let at = 0;
  const peek = () => tokens[at];
  const take = (t?: string) => {
    if (t !== undefined && tokens[at] !== t) throw new Error(`expected ${t} in ${text}`);
    return tokens[at++]!;
  };
  const expr = (): Node => {
    let n = term();
    while (peek() === '+' || peek() === '-') n = { op: take(), args: [n, term()] };
    return n;
  };
  const term = (): Node => {
    let n = unary();
    while (peek() === '*' || peek() === '/') n = { op: take(), args: [n, unary()] };
    return n;
  };
  const unary = (): Node => (peek() === '-' ? (take(), { op: 'neg', args: [unary()] }) : power());
  const power = (): Node => {
    const base = atom();
    return peek() === '^' ? (take(), { op: '^', args: [base, unary()] }) : base;
  };
  const atom = (): Node => {
    const t = take();
    if (t === '(') return ((n) => (take(')'), n))(expr());
    return /^\d/.test(t) ? { num: Rational.of(BigInt(t)) } : { sym: t };
  };
  const n = expr();
  if (at !== tokens.length) throw new Error(`unread text in ${text}`);
  return n;
}

function toPolynomial(n: Node): Polynomial {
  if ('num' in n) return Polynomial.constant(n.num);
  if ('sym' in n) return Polynomial.symbol(n.sym);
  const [a, b] = n.args.map(toPolynomial);
  if (n.op === 'neg') return a!.neg();
  if (n.op === '+') return a!.add(b!);
  if (n.op === '-') return a!.sub(b!);
  if (n.op === '*') return a!.mul(b!);
  if (n.op === '/' && b!.terms.length === 1) {
    const t = b!.terms[0]!;
    return a!.mulTerm(t.coefficient.inverse(), Monomial.ONE.div(t.monomial));
  }
  if (n.op === '^') {
    const e = b!.constantValue()!;
    const t = a!.terms.length === 1 ? a!.terms[0]! : undefined;
    if (e.isInteger() && e.sign() >= 0) return a!.pow(Number(e.num));
    if (t && t.coefficient.equals(Rational.ONE)) return Polynomial.term(Rational.ONE, t.monomial.pow(e));
  }
  throw new Error(`test helper cannot read ${JSON.stringify(n)} as a polynomial`);
}

function toRationalFunction(n: Node): RationalFunction {
  if (!('op' in n) || n.op === '^') return RationalFunction.of(toPolynomial(n));
  const [a, b] = n.args.map(toRationalFunction);
  if (n.op === 'neg') return a!.neg();
  if (n.op === '+') return a!.add(b!);
  if (n.op === '-') return a!.sub(b!);
  if (n.op === '*') return a!.mul(b!);
  return a!.div(b!);
}

export const SYMBOLS = ['x', 'y', 'z'] as const;

/** Small rational coefficients, zero included. */
export const arbCoefficient = fc
  .tuple(fc.integer({ min: -6, max: 6 }), fc.integer({ min: 1, max: 3 }))
  .map(([n, d]) => Rational.of(n, d));

/** Ordinary monomials in x, y, z of degree at most 2 in each. */
export const arbMonomial = fc.tuple(fc.nat(2), fc.nat(2), fc.nat(2)).map(([a, b, c]) =>
  Monomial.fromFactors([
    ['x', a],
    ['y', b],
    ['z', c],
  ]),
);

/** Monomials with negative and fractional exponents, for the generalised (Laurent–Puiseux) ring. */
export const arbGeneralMonomial = fc
  .array(fc.constantFrom(q(-1), q(1, 2), q(1), q(2), q(-1, 2)), { minLength: 3, maxLength: 3 })
  .map((es) => Monomial.fromFactors(SYMBOLS.map((s, i) => [s, es[i]!])));

/** Ordinary polynomials with up to four terms. */
export const arbPolynomial = fc
  .array(fc.record({ coefficient: arbCoefficient, monomial: arbMonomial }), { maxLength: 4 })
  .map((terms) => Polynomial.fromTerms(terms));

/** Polynomials whose monomials may have negative or fractional exponents. */
export const arbGeneralPolynomial = fc
  .array(fc.record({ coefficient: arbCoefficient, monomial: arbGeneralMonomial }), { maxLength: 3 })
  .map((terms) => Polynomial.fromTerms(terms));

export const arbNonZeroPolynomial = arbPolynomial.filter((p) => !p.isZero());

/** A point with positive coordinates (concentrations and constants are positive). */
export const arbPoint = fc
  .tuple(...SYMBOLS.map(() => fc.double({ min: 0.25, max: 4, noNaN: true })))
  .map((vs) => new Map(SYMBOLS.map((s, i) => [s, vs[i]!] as const)));

/** An exact positive rational point. */
export const arbExactPoint = fc
  .tuple(...SYMBOLS.map(() => fc.tuple(fc.integer({ min: 1, max: 9 }), fc.integer({ min: 1, max: 5 }))))
  .map((vs) => new Map(SYMBOLS.map((s, i) => [s, Rational.of(vs[i]![0], vs[i]![1])] as const)));

/** Relative closeness for floating-point cross-checks. */
export function close(a: number, b: number, tolerance = 1e-9): boolean {
  return Math.abs(a - b) <= tolerance * Math.max(1, Math.abs(a), Math.abs(b));
}
