/**
 * Units as chemists write them in records: a product of symbols with exponents, each symbol
 * optionally prefixed. Factors are built as exact rationals (every unit here is an exact multiple
 * of the canonical units) and rounded only at the end, so long products do not drift.
 */
import { ATMOSPHERE_EXACT, AVOGADRO_EXACT, CALORIE_EXACT, FARADAY_EXACT, TORR_EXACT } from './constants.ts';
import { Rational } from './rational.ts';

export type BaseDimension = 'amount' | 'length' | 'time' | 'energy' | 'temperature';
/** Exponents of the base dimensions. */
export type Dimension = Readonly<Record<BaseDimension, Rational>>;

/** `factor` turns a value in this unit into canonical units: mol, dm, s, J, K (so M has factor 1). */
export interface Unit {
  text: string;
  factor: number;
  dimension: Dimension;
}

export const BASE_DIMENSIONS: readonly BaseDimension[] = ['amount', 'length', 'time', 'energy', 'temperature'];

/** A dimension from numeric exponents; missing (or non-finite) ones are zero. */
export function dimensionOf(exponents: Partial<Record<BaseDimension, number>>): Dimension {
  const r = (x: number | undefined) => (x !== undefined && Number.isFinite(x) ? Rational.fromNumber(x) : Rational.ZERO);
  const { amount, length, time, energy, temperature } = exponents;
  return { amount: r(amount), length: r(length), time: r(time), energy: r(energy), temperature: r(temperature) };
}

export const DIMENSIONLESS = dimensionOf({});
export const AMOUNT = dimensionOf({ amount: 1 });
export const LENGTH = dimensionOf({ length: 1 });
export const TIME = dimensionOf({ time: 1 });
export const ENERGY = dimensionOf({ energy: 1 });
export const TEMPERATURE = dimensionOf({ temperature: 1 });
export const CONCENTRATION = dimensionOf({ amount: 1, length: -3 });
export const MOLAR_ENERGY = dimensionOf({ energy: 1, amount: -1 });
export const MOLAR_ENTROPY = dimensionOf({ energy: 1, amount: -1, temperature: -1 });
// Pressure is energy per volume; keeping it so avoids a mass dimension nobody else needs.
export const PRESSURE = dimensionOf({ energy: 1, length: -3 });

/** The product of two dimensions (exponents add). */
export function multiplyDimensions(a: Dimension, b: Dimension): Dimension {
  return mapBases((k) => a[k].add(b[k]));
}

/** A dimension raised to a rational power. */
export function powerDimension(a: Dimension, p: Rational): Dimension {
  return mapBases((k) => a[k].mul(p));
}

/** Whether two dimensions have equal exponents on every base. */
export function sameDimension(a: Dimension, b: Dimension): boolean {
  return BASE_DIMENSIONS.every((k) => a[k].equals(b[k]));
}

/**
 * The dimension of a rate constant of order n: concentration^(1-n) time^-1. A non-finite n is a
 * caller's mistake; it gives time^-1 rather than throwing.
 */
export function rateConstantDimension(molecularity: number | Rational): Dimension {
  const n =
    molecularity instanceof Rational
      ? molecularity
      : Number.isFinite(molecularity)
        ? Rational.fromNumber(molecularity)
        : Rational.ONE;
  return multiplyDimensions(powerDimension(CONCENTRATION, Rational.ONE.sub(n)), powerDimension(TIME, Rational.of(-1)));
}

/**
 * Trade units for a message: "M^-1 s^-1", "kJ/mol", "Pa". Concentration is folded out of amount
 * and length first, because that is how rate constants are quoted. The text parses back.
 */
export function formatDimension(d: Dimension): string {
  if (sameDimension(d, DIMENSIONLESS)) return 'dimensionless';
  if (sameDimension(d, MOLAR_ENERGY)) return 'kJ/mol';
  if (sameDimension(d, PRESSURE)) return 'Pa';
  const molar = d.length.div(Rational.of(-3));
  const m =
    molar.sign() !== 0 && molar.sign() === d.amount.sign()
      ? molar.abs().compare(d.amount.abs()) <= 0
        ? molar
        : d.amount
      : Rational.ZERO;
  const terms: [string, Rational][] = [
    ['M', m],
    ['J', d.energy],
    ['mol', d.amount.sub(m)],
    ['dm', d.length.add(m.mul(Rational.of(3)))],
    ['K', d.temperature],
    ['s', d.time],
  ];
  return terms
    .filter(([, e]) => !e.isZero())
    .map(([s, e]) => s + formatExponent(e))
    .join(' ');
}

function formatExponent(e: Rational): string {
  if (e.equals(Rational.ONE)) return '';
  return e.isInteger() ? `^${e}` : `^(${e})`;
}

function mapBases(f: (k: BaseDimension) => Rational): Dimension {
  return { amount: f('amount'), length: f('length'), time: f('time'), energy: f('energy'), temperature: f('temperature') };
}

/** A symbol's meaning: its dimension, its exact factor, and whether SI prefixes apply. */
export interface UnitSymbol {
  dimension: Dimension;
  factor: Rational;
  prefixable: boolean;
}

const sym = (dimension: Dimension, factor: Rational, prefixable = true): UnitSymbol => ({ dimension, factor, prefixable });
const tenTo = (n: number) => Rational.of(10n ** BigInt(Math.max(n, 0)), 10n ** BigInt(Math.max(-n, 0)));
const molecule = sym(AMOUNT, AVOGADRO_EXACT.inverse(), false);

/** Every symbol the parser knows, before prefixes. */
export const UNIT_SYMBOLS: ReadonlyMap<string, UnitSymbol> = new Map([
  ['mol', sym(AMOUNT, Rational.ONE)],
  ['molecule', molecule],
  ['molecules', molecule],
  ['molec', molecule],
  ['M', sym(CONCENTRATION, Rational.ONE)],
  ['m', sym(LENGTH, tenTo(1))],
  ['L', sym(powerDimension(LENGTH, Rational.of(3)), Rational.ONE)],
  ['l', sym(powerDimension(LENGTH, Rational.of(3)), Rational.ONE)],
  ['s', sym(TIME, Rational.ONE)],
  ['sec', sym(TIME, Rational.ONE, false)],
  ['min', sym(TIME, Rational.of(60), false)],
  ['h', sym(TIME, Rational.of(3600), false)],
  ['hr', sym(TIME, Rational.of(3600), false)],
  ['J', sym(ENERGY, Rational.ONE)],
  ['cal', sym(ENERGY, CALORIE_EXACT)],
  // A bare eV in a mechanism is an energy per particle, so it is read as a molar energy.
  ['eV', sym(MOLAR_ENERGY, FARADAY_EXACT)],
  ['K', sym(TEMPERATURE, Rational.ONE)],
  // 1 Pa = 1 J m^-3 = 1e-3 J dm^-3.
  ['Pa', sym(PRESSURE, tenTo(-3))],
  ['bar', sym(PRESSURE, tenTo(2))],
  ['atm', sym(PRESSURE, ATMOSPHERE_EXACT.mul(tenTo(-3)), false)],
  ['Torr', sym(PRESSURE, TORR_EXACT.mul(tenTo(-3)))],
  ['dimensionless', sym(DIMENSIONLESS, Rational.ONE, false)],
]);

/** SI prefixes by power of ten; µ (micro sign), μ (Greek mu) and u all mean micro. */
export const PREFIXES: ReadonlyMap<string, number> = new Map([
  ['f', -15], ['p', -12], ['n', -9], ['µ', -6], ['μ', -6], ['u', -6], ['m', -3],
  ['c', -2], ['d', -1], ['h', 2], ['k', 3], ['M', 6], ['G', 9],
]);

/** A symbol such as `kJ` or `µM`, unprefixed names first; undefined if unknown. */
export function lookUpSymbol(name: string): UnitSymbol | undefined {
  const plain = UNIT_SYMBOLS.get(name);
  if (plain) return plain;
  for (const [prefix, power] of PREFIXES) {
    const base = name.startsWith(prefix) ? UNIT_SYMBOLS.get(name.slice(prefix.length)) : undefined;
    if (base?.prefixable) return { ...base, factor: base.factor.mul(tenTo(power)), prefixable: false };
  }
  return undefined;
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
  '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '⁻': '-', '⁺': '+',
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
      if (!m) return { error: c === '^' ? `'^' must be followed by an exponent in unit '${text}'` : `unexpected '${c}' in unit '${text}'` };
      const name = m[1]!;
      if (CELSIUS.has(name)) return { error: `°C is an offset scale, not a unit factor: give temperatures in kelvin (add 273.15)` };
      const symbol = lookUpSymbol(name);
      if (!symbol) return { error: `unknown unit '${name}'` };
      const exponent = readExponent(m, t);
      if ('error' in exponent) return exponent;
      tokens.push({ kind: 'term', scaled: { dimension: symbol.dimension, exact: symbol.factor, approx: 1 }, exponent: exponent.value });
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
  if (value.abs().compare(Rational.of(MAX_EXPONENT)) > 0) return { error: `exponent ${raw} is too large in unit '${text}'` };
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
  return { dimension: multiplyDimensions(a.dimension, b.dimension), exact: a.exact.mul(b.exact), approx: a.approx * b.approx };
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
