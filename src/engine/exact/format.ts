import { Rational } from './rational.ts';
import { monomialContent } from './polynomial-content.ts';
import { compareSymbols, Monomial, type Factor } from './monomial.ts';
import { Polynomial } from './polynomial.ts';
import { RationalFunction } from './rational-function.ts';

/** How the caller wants each symbol written (e.g. `K1` → `K_{1}`, `S` → `[\mathrm{S}]`). */
export interface SymbolStyle {
  text(symbol: string): string;
  latex(symbol: string): string;
  /** Order of symbols within a term and between terms of equal degree (default: code-unit order). */
  compare?(a: string, b: string): number;
  /**
   * Where given, terms are written in ascending order of this weight (e.g. their degree in the
   * concentrations, so a saturation denominator reads 1 + K[S]); otherwise by descending total degree.
   */
  termWeight?(m: Monomial): number;
}

/** Prints every symbol as it is, in text and in LaTeX alike. */
export const defaultSymbolStyle: SymbolStyle = { text: (s) => s, latex: (s) => s };

/** Anything this module can print. */
export type Expression = Monomial | Polynomial | RationalFunction;

/**
 * The two outputs differ only in these few choices. Shared rules: terms by descending total degree,
 * then by their symbols in the style's order (a higher power first); factors within a term in the
 * style's order, so output is deterministic for a given style. Negative exponents and coefficient
 * denominators go below a fraction bar; a fractional exponent is written with a slash
 * (`x^(1/2)`, `x^{1/2}`).
 */
interface Notation {
  /** written sums, by polynomial, shared by every call with the same style (see `writtenSums`) */
  written: Map<string, string>;
  order(a: string, b: string): number;
  weight?: ((m: Monomial) => number) | undefined;
  symbol(s: string): string;
  power(base: string, exponent: Rational): string;
  product(factors: string[]): string;
  /** a sum in brackets, as one factor of a product */
  group(sum: string): string;
  quotient(num: string, den: string, denFactors: number): string;
  /** Top-level fraction of two polynomials, each with its number of terms. */
  fraction(num: string, numTerms: number, den: string, denTerms: number): string;
}

const text = (style: SymbolStyle): Notation => ({
  written: writtenSums(style, 'text'),
  order: (a, b) => style.compare?.(a, b) ?? compareSymbols(a, b),
  weight: style.termWeight?.bind(style),
  symbol: (s) => style.text(s),
  power: (base, e) => {
    // `k_-1^2` would misread; `[I-]^2` would not, since the brackets already group it.
    const b = /[\s^*/+-]/.test(base.replace(/\[[^\]]*\]|\([^)]*\)/g, '')) ? `(${base})` : base;
    return e.isInteger() ? `${b}^${e}` : `${b}^(${e})`;
  },
  product: (factors) => factors.join('*'),
  group: (sum) => `(${sum})`,
  quotient: (num, den, denFactors) => `${num}/${denFactors > 1 ? `(${den})` : den}`,
  fraction: (num, numTerms, den, denTerms) =>
    `${numTerms > 1 || num.includes('/') ? `(${num})` : num} / ${denTerms > 1 || /[*/]/.test(den) ? `(${den})` : den}`,
});

const latex = (style: SymbolStyle): Notation => ({
  written: writtenSums(style, 'latex'),
  order: (a, b) => style.compare?.(a, b) ?? compareSymbols(a, b),
  weight: style.termWeight?.bind(style),
  symbol: (s) => style.latex(s),
  // A base that already has a superscript (a charge, say) is braced to avoid a double superscript.
  power: (base, e) => `${base.includes('^') ? `{${base}}` : base}^{${e}}`,
  product: (factors) => factors.join(' '),
  group: (sum) => `\\left(${sum}\\right)`,
  quotient: (num, den) => `\\frac{${num}}{${den}}`,
  fraction: (num, numTerms, den) =>
    numTerms === 1 && num.startsWith('-') ? `-\\frac{${num.slice(1)}}{${den}}` : `\\frac{${num}}{${den}}`,
});

/** Plain text, e.g. `k1*k2*[E]_T*[S] / (k1*[S] + k2 + k_-1)`. */
export function formatText(value: Expression, style: SymbolStyle = defaultSymbolStyle): string {
  return formatWith(value, text(style));
}

/** LaTeX for KaTeX, e.g. `\frac{k_{1} k_{2} [\mathrm{S}]}{k_{-1} + k_{2} + k_{1} [\mathrm{S}]}`. */
export function formatLatex(value: Expression, style: SymbolStyle = defaultSymbolStyle): string {
  return formatWith(value, latex(style));
}

function formatWith(value: Expression, notation: Notation): string {
  if (value instanceof Monomial) return magnitude(sortFactors(value, notation), 1n, 1n, notation);
  if (value instanceof Polynomial) return polynomial(value, notation);
  const whole = value.toPolynomial();
  if (whole) return polynomial(whole, notation);
  const num = side(value.numerator, notation);
  const den = side(value.denominator, notation);
  return notation.fraction(num, value.numerator.terms.length, den, value.denominator.terms.length);
}

/**
 * One side of a fraction. A fractional power common to every term (k_5^(1/2) from a radical) is
 * written once in front, `k_5^(1/2)*(k_3*[Br2] + k_4*[HBr])`, as a kineticist would factor it.
 */
function side(p: Polynomial, notation: Notation): string {
  const common = p.terms.length > 1 ? monomialContent(p) : Monomial.ONE;
  const fractional = Monomial.fromFactors(common.factors.filter(([, e]) => !e.isInteger()));
  if (fractional.isOne()) return polynomial(p, notation);
  const rest = polynomial(p.mulTerm(Rational.ONE, Monomial.ONE.div(fractional)), notation);
  return notation.product([magnitude(sortFactors(fractional, notation), 1n, 1n, notation), notation.group(rest)]);
}

/**
 * Sums already written with a style, by polynomial. A derivation writes the same large sums many
 * times (the King–Altman denominator under every catalyst form's fraction); the memo lives as long
 * as the style object, and a style is made per mechanism, so nothing is kept between records.
 */
const memos = new WeakMap<SymbolStyle, { text: Map<string, string>; latex: Map<string, string> }>();

function writtenSums(style: SymbolStyle, mode: 'text' | 'latex'): Map<string, string> {
  let memo = memos.get(style);
  if (!memo) {
    memo = { text: new Map(), latex: new Map() };
    memos.set(style, memo);
  }
  return memo[mode];
}

function polynomial(p: Polynomial, notation: Notation): string {
  if (p.terms.length < 8) return writeSum(p, notation);
  const key = p.terms.map((t) => `${t.coefficient.toString()}${t.monomial.key}`).join('+');
  let written = notation.written.get(key);
  if (written === undefined) {
    written = writeSum(p, notation);
    notation.written.set(key, written);
  }
  return written;
}

function writeSum(p: Polynomial, notation: Notation): string {
  if (p.isZero()) return '0';
  // Sort keys are worked out once per term, not inside the comparator (which runs n log n times).
  const weight = notation.weight;
  const ordered = p.terms.map((t) => ({
    t,
    factors: sortFactors(t.monomial, notation),
    weight: weight ? weight(t.monomial) : 0,
  }));
  ordered.sort(
    (a, b) =>
      (weight ? a.weight - b.weight : b.t.monomial.totalDegree.compare(a.t.monomial.totalDegree)) ||
      compareFactors(a.factors, b.factors, notation),
  );
  return ordered
    .map(({ t, factors }, i) => {
      const sign = t.coefficient.sign() < 0 ? '-' : '+';
      const c = t.coefficient.abs();
      const body = magnitude(factors, c.num, c.den, notation);
      return i === 0 ? (sign === '-' ? `-${body}` : body) : ` ${sign} ${body}`;
    })
    .join('');
}

/** (num/den)·monomial without its sign: positive powers above the bar, negative ones below. */
function magnitude(factors: readonly Factor[], num: bigint, den: bigint, notation: Notation): string {
  const factor = (s: string, e: Rational): string =>
    e.isInteger() && e.num === 1n ? notation.symbol(s) : notation.power(notation.symbol(s), e);
  const above = factors.filter(([, e]) => e.sign() > 0).map(([s, e]) => factor(s, e));
  const below = factors.filter(([, e]) => e.sign() < 0).map(([s, e]) => factor(s, e.neg()));
  if (num !== 1n || above.length === 0) above.unshift(num.toString());
  if (den !== 1n) below.unshift(den.toString());
  const top = notation.product(above);
  return below.length === 0 ? top : notation.quotient(top, notation.product(below), below.length);
}

function sortFactors(m: Monomial, notation: Notation): Factor[] {
  return [...m.factors].sort(([a], [b]) => notation.order(a, b));
}

/** Earlier symbol first, then the higher power of it, then the term that has more factors. */
function compareFactors(a: readonly Factor[], b: readonly Factor[], notation: Notation): number {
  for (let i = 0; i < Math.min(a.length, b.length); i++) {
    const [sa, ea] = a[i]!;
    const [sb, eb] = b[i]!;
    const c = notation.order(sa, sb) || eb.compare(ea);
    if (c !== 0) return c;
  }
  return b.length - a.length;
}
