/**
 * Units as chemists write them in records: a product of symbols with exponents, each symbol
 * optionally prefixed. Factors are built as exact rationals (every unit here is an exact multiple
 * of the canonical units) and rounded only at the end, so long products do not drift.
 */
import { DIMENSIONLESS, multiplyDimensions, powerDimension, type Dimension } from './dimension.ts';
import { Rational } from '../exact/rational.ts';
import { lookUpSymbol } from './unit-symbols.ts';

/** `factor` turns a value in this unit into canonical units: mol, dm, s, J, K (so M has factor 1). */
export interface Unit {
  text: string;
  factor: number;
  dimension: Dimension;
}

/** Reads a unit such as `M^-1 s^-1`, `kJ/mol`, `J/(mol K)`, `dm³`, `s-1`; '' is dimensionless. */
export function parseUnit(text: string): { unit: Unit } | { error: string } {
  const trimmed = text.trim();
  const tokens = tokenize(trimmed);
  if ('error' in tokens) return tokens;
  const product = parseProduct(tokens, 0, 0);
  if ('error' in product) return product;
  if (product.next < tokens.length) return { error: `unmatched ')' in unit '${trimmed}'` };
  const { dimension, exact, approx } = product.scaled;
  const factor = (Number(exact.num) / Number(exact.den)) * approx;
  if (!Number.isFinite(factor) || factor <= 0) return { error: `unit '${trimmed}' is too large or too small to use` };
  return { unit: { text: trimmed, factor, dimension } };
}

// A factor is kept exact until a fractional power forces a floating-point part.
interface Scaled {
  dimension: Dimension;
  exact: Rational;
  approx: number;
}

type Token =
  | { kind: 'term'; scaled: Scaled; exponent: Rational }
  | { kind: 'divide' }
  | { kind: 'open' }
  | { kind: 'close'; exponent: Rational };

const MAX_EXPONENT = 12;
const MAX_DEPTH = 3;
const SUPERSCRIPTS: Readonly<Record<string, string>> = {
  '⁰': '0',
  '¹': '1',
  '²': '2',
  '³': '3',
  '⁴': '4',
  '⁵': '5',
  '⁶': '6',
  '⁷': '7',
  '⁸': '8',
  '⁹': '9',
  '⁻': '-',
  '⁺': '+',
};
const NUMBER = String.raw`[+-]?\d+(?:\.\d+)?(?:/\d+)?`;
const EXPONENT = String.raw`(?:\^\((${NUMBER})\)|\^(${NUMBER})|([+-]?\d+)|([⁺⁻]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+))?`;
const TERM = new RegExp(String.raw`([A-Za-zµμ°℃]+)${EXPONENT}`, 'y');
const CLOSE = new RegExp(String.raw`\)${EXPONENT}`, 'y');
const SEPARATOR = /[\s*·⋅]+/y;
const UNIT_ONE = /1(?=\s*\/)/y;
const CELSIUS = new Set(['°C', '℃', 'degC', 'oC']);

function tokenize(text: string): Token[] | { error: string } {
  // '**' is the programmer's power sign and U+2212 the typographer's minus.
  const t = text.replaceAll('**', '^').replaceAll('\u2212', '-');
  const tokens: Token[] = [];
  let i = 0;
  while (i < t.length) {
    const c = t[i]!;
    SEPARATOR.lastIndex = UNIT_ONE.lastIndex = TERM.lastIndex = CLOSE.lastIndex = i;
    if (SEPARATOR.test(t)) {
      i = SEPARATOR.lastIndex;
    } else if (UNIT_ONE.test(t)) {
      // `1/s`: a numeral one is allowed only as the numerator of a reciprocal.
      i = UNIT_ONE.lastIndex;
    } else if (c === '/' || c === '(') {
      tokens.push({ kind: c === '/' ? 'divide' : 'open' });
      i++;
    } else if (c === ')') {
      const m = CLOSE.exec(t)!;
      const exponent = readExponent(m, t);
      if ('error' in exponent) return exponent;
      tokens.push({ kind: 'close', exponent: exponent.value });
      i = CLOSE.lastIndex;
    } else {
      const m = TERM.exec(t);
      if (!m)
        return {
          error:
            c === '^' ? `'^' must be followed by an exponent in unit '${text}'` : `unexpected '${c}' in unit '${text}'`,
        };
      const name = m[1]!;
      if (CELSIUS.has(name))
        return { error: `°C is an offset scale, not a unit factor: give temperatures in kelvin (add 273.15)` };
      const symbol = lookUpSymbol(name);
      if (!symbol) return { error: `unknown unit '${name}'` };
      const exponent = readExponent(m, t);
      if ('error' in exponent) return exponent;
      tokens.push({
        kind: 'term',
        scaled: { dimension: symbol.dimension, exact: symbol.factor, approx: 1 },
        exponent: exponent.value,
      });
      i = TERM.lastIndex;
    }
  }
  return tokens;
}

/** Unicode superscript digits and signs (`⁻¹²`) as ASCII (`-12`); other characters are dropped. */
export function superscriptToAscii(text: string): string {
  return [...text].map((c) => SUPERSCRIPTS[c] ?? '').join('');
}

function readExponent(m: RegExpExecArray, text: string): { value: Rational } | { error: string } {
  const raw = m[2] ?? m[3] ?? m[4] ?? (m[5] === undefined ? undefined : superscriptToAscii(m[5]));
  if (raw === undefined) return { value: Rational.ONE };
  const value = Rational.parse(raw);
  if (!value) return { error: `'${raw}' is not an exponent in unit '${text}'` };
  if (value.abs().compare(Rational.of(MAX_EXPONENT)) > 0)
    return { error: `exponent ${raw} is too large in unit '${text}'` };
  return { value };
}

type Parsed = { scaled: Scaled; next: number } | { error: string };

// `/` divides by the one item after it, so `mol/L/s` is mol L^-1 s^-1 and `J/(mol K)` works.
function parseProduct(tokens: readonly Token[], start: number, depth: number): Parsed {
  let acc: Scaled = { dimension: DIMENSIONLESS, exact: Rational.ONE, approx: 1 };
  let i = start;
  while (i < tokens.length && tokens[i]!.kind !== 'close') {
    const divide = tokens[i]!.kind === 'divide';
    if (divide) i++;
    const item = parseItem(tokens, i, depth);
    if ('error' in item) return item;
    acc = times(acc, divide ? power(item.scaled, Rational.of(-1)) : item.scaled);
    i = item.next;
  }
  return { scaled: acc, next: i };
}

function parseItem(tokens: readonly Token[], i: number, depth: number): Parsed {
  const t = tokens[i];
  if (!t || t.kind === 'divide' || t.kind === 'close') return { error: `'/' must be followed by a unit` };
  if (t.kind === 'term') return { scaled: power(t.scaled, t.exponent), next: i + 1 };
  if (depth >= MAX_DEPTH) return { error: 'too many nested parentheses in unit' };
  const inner = parseProduct(tokens, i + 1, depth + 1);
  if ('error' in inner) return inner;
  const close = tokens[inner.next];
  if (close?.kind !== 'close') return { error: `missing ')' in unit` };
  if (inner.next === i + 1) return { error: 'empty parentheses in unit' };
  return { scaled: power(inner.scaled, close.exponent), next: inner.next + 1 };
}

function times(a: Scaled, b: Scaled): Scaled {
  return {
    dimension: multiplyDimensions(a.dimension, b.dimension),
    exact: a.exact.mul(b.exact),
    approx: a.approx * b.approx,
  };
}

function power(a: Scaled, p: Rational): Scaled {
  const dimension = powerDimension(a.dimension, p);
  if (p.isInteger()) {
    const n = p.abs().num;
    const up = Rational.of(a.exact.num ** n, a.exact.den ** n);
    return { dimension, exact: p.sign() < 0 ? up.inverse() : up, approx: a.approx ** p.toNumber() };
  }
  const x = p.toNumber();
  return { dimension, exact: Rational.ONE, approx: (Number(a.exact.num) / Number(a.exact.den)) ** x * a.approx ** x };
}
