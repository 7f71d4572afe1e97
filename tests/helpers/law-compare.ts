/**
 * Test helper: compares a derived rate law with a law written by hand, as functions, whatever the
 * order of terms or the way radicals are grouped. The expected law is text in plain names
 * (`k2*H2*Br2^(1/2)*(k1/k5)^(1/2)/(1 + k4*HBr/(k3*Br2))`) with a map from those names to the
 * engine's symbols. Three checks:
 * - the law depends on exactly the mapped symbols;
 * - exactly, where the expected law is a product of powers of rational functions: with N the
 *   common denominator of the exponents, both laws raised to the N-th power are rational
 *   functions (a binomial root ρ^m = ratio is eliminated by its own relation), compared by
 *   cross-multiplication; both are positive, so equal N-th powers mean equal laws;
 * - numerically, at random positive points (relative 1e-12), always.
 */
import { expect } from 'vitest';
import { AlgebraicFunction, Polynomial, RationalFunction, coefficientsIn } from '../../src/engine/exact/index.ts';
import { Rational, lcm } from '../../src/engine/exact/rational.ts';
import type { DerivedRateLaw } from '../../src/engine/rate-law/derive-rate-laws.ts';
import { parse, type Node } from '../unit/algebra/helpers.ts';
import { lookupIn, randomPoint, relativelyClose, seededRandom } from './rate-law-check.ts';

/** What the comparison could establish: `exact` is false where only the numeric check applied. */
export interface LawComparison {
  exact: boolean;
}

/** Expects the derived law (rational or with radicals) to equal the expected text; see the file comment. */
export function expectLaw(
  derived: DerivedRateLaw | undefined,
  expected: string,
  names: Record<string, string>,
  { points = 12, seed = 7, requireExact = true } = {},
): LawComparison {
  const law = derived?.algebraic?.expression ?? derived?.law.expression;
  expect(law, `no exact law: ${JSON.stringify(derived?.law.trace.map((t) => t.text))}`).toBeDefined();
  const tree = parse(expected);
  const used = [...new Set(symbolsOf(tree))].map((n) => {
    const s = names[n];
    if (s === undefined) throw new Error(`the expected law uses ${n}, which the map does not name`);
    return s;
  });
  expect([...law!.symbols()].sort()).toEqual(used.sort());
  const random = seededRandom(seed);
  for (let i = 0; i < points; i++) {
    const point = randomPoint(used, random);
    const ours = law!.evaluate(point);
    const theirs = evaluate(tree, (n) => lookupIn(point)(names[n]!));
    expect(
      relativelyClose(ours, theirs, 1e-12),
      `at ${JSON.stringify(Object.fromEntries(point))}: ${ours} vs ${theirs}`,
    ).toBe(true);
  }
  const powers = powerProduct(tree, names);
  const exact = powers !== undefined && exactlyEqual(law!, powers);
  if (requireExact) expect(exact, 'the laws could not be compared exactly, or differ').toBe(true);
  return { exact };
}

/** The expected law as Π base^exponent, or undefined where a sum holds a radical. */
function powerProduct(n: Node, names: Record<string, string>): [RationalFunction, Rational][] | undefined {
  if ('num' in n) return [[RationalFunction.of(Polynomial.constant(n.num)), Rational.ONE]];
  if ('sym' in n) return [[RationalFunction.of(Polynomial.symbol(names[n.sym]!)), Rational.ONE]];
  const [a, b] = n.args;
  if (n.op === '*' || n.op === '/') {
    const x = powerProduct(a!, names);
    const y = powerProduct(b!, names);
    if (!x || !y) return undefined;
    return [...x, ...(n.op === '*' ? y : y.map(([f, e]): [RationalFunction, Rational] => [f, e.neg()]))];
  }
  if (n.op === '^') {
    const e = constant(b!);
    const x = powerProduct(a!, names);
    return x && e && x.map(([f, k]) => [f, k.mul(e)]);
  }
  const whole = rational(n, names);
  return whole ? [[whole, Rational.ONE]] : undefined;
}

/** A node without radicals as a rational function (integer powers only). */
function rational(n: Node, names: Record<string, string>): RationalFunction | undefined {
  if ('num' in n) return RationalFunction.of(Polynomial.constant(n.num));
  if ('sym' in n) return RationalFunction.of(Polynomial.symbol(names[n.sym]!));
  const [a, b] = n.args.map((x) => rational(x, names));
  if (n.op === 'neg') return a?.neg();
  if (n.op === '^') {
    const e = constant(n.args[1]!);
    return a && e?.isInteger() ? power(a, Number(e.num)) : undefined;
  }
  if (!a || !b) return undefined;
  return n.op === '+' ? a.add(b) : n.op === '-' ? a.sub(b) : n.op === '*' ? a.mul(b) : a.div(b);
}

function exactlyEqual(law: RationalFunction | AlgebraicFunction, factors: [RationalFunction, Rational][]): boolean {
  const n = Number(factors.reduce((d, [, e]) => lcm(d, e.den), lawDenominator(law)));
  const expected = factors.reduce(
    (acc, [f, e]) => acc.mul(power(f, Number(e.num * BigInt(n)) / Number(e.den))),
    RationalFunction.ONE,
  );
  const ours = nthPower(law, n);
  return ours !== undefined && ours.equals(expected);
}

/** The common denominator of the exponents in the law and of its roots' degrees. */
function lawDenominator(law: RationalFunction | AlgebraicFunction): bigint {
  const f = law instanceof AlgebraicFunction ? law.outer : law;
  const exps = [...f.numerator.terms, ...f.denominator.terms].flatMap((t) => t.monomial.factors.map(([, e]) => e.den));
  const degrees =
    law instanceof AlgebraicFunction ? law.roots.map((r) => BigInt(r.polynomial.degreeIn(r.symbol).toNumber())) : [];
  return [...exps, ...degrees].reduce((d, x) => lcm(d, x), 1n);
}

/** law^n as a rational function: a binomial root's powers reduced by ρ^m = −c_0/c_m; undefined where a root stays. */
function nthPower(law: RationalFunction | AlgebraicFunction, n: number): RationalFunction | undefined {
  if (!(law instanceof AlgebraicFunction)) return power(law, n);
  let out = power(law.outer, n);
  for (const root of law.roots) {
    const c = coefficientsIn(root.polynomial, root.symbol)!;
    if (c.size !== 2 || !c.has(0)) return undefined;
    const m = Math.max(...c.keys());
    const ratio = RationalFunction.of(c.get(0)!.neg(), c.get(m)!);
    const reduce = (p: Polynomial): RationalFunction | undefined => {
      let sum = RationalFunction.ZERO;
      for (const t of p.terms) {
        const k = Number(t.monomial.exponent(root.symbol).num);
        if (k % m !== 0) return undefined;
        const rest = RationalFunction.of(Polynomial.term(t.coefficient, t.monomial.without(root.symbol)));
        sum = sum.add(rest.mul(power(ratio, k / m)));
      }
      return sum;
    };
    const [num, den] = [reduce(out.numerator), reduce(out.denominator)];
    if (!num || !den) return undefined;
    out = num.div(den);
  }
  return out;
}

function power(f: RationalFunction, n: number): RationalFunction {
  let out = RationalFunction.ONE;
  for (let i = 0; i < Math.abs(n); i++) out = out.mul(f);
  return n < 0 ? out.inverse() : out;
}

function constant(n: Node): Rational | undefined {
  if ('num' in n) return n.num;
  if ('sym' in n) return undefined;
  const [a, b] = n.args.map(constant);
  if (n.op === 'neg') return a?.neg();
  if (!a || !b) return undefined;
  return n.op === '/'
    ? a.div(b)
    : n.op === '*'
      ? a.mul(b)
      : n.op === '+'
        ? a.add(b)
        : n.op === '-'
          ? a.sub(b)
          : undefined;
}

function evaluate(n: Node, value: (name: string) => number): number {
  if ('num' in n) return n.num.toNumber();
  if ('sym' in n) return value(n.sym);
  const [a, b] = n.args.map((x) => evaluate(x, value));
  if (n.op === 'neg') return -a!;
  if (n.op === '+') return a! + b!;
  if (n.op === '-') return a! - b!;
  if (n.op === '*') return a! * b!;
  if (n.op === '/') return a! / b!;
  return Math.pow(a!, b!);
}

function symbolsOf(n: Node): string[] {
  if ('num' in n) return [];
  if ('sym' in n) return [n.sym];
  return n.args.flatMap(symbolsOf);
}
