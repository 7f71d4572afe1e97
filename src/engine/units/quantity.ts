/**
 * Quantities as written in records: `1.1e-2 M^-1 s^-1`, `0.98 ± 0.05`, `(1.2 ± 0.1) × 10^-2 M`.
 * Numbers are assembled as decimal text and converted once, so `1.1×10^-2` is the same double
 * as `1.1e-2`.
 */
import { DIMENSIONLESS, parseUnit, sameDimension, superscriptToAscii, type Unit } from './units.ts';

/** Value and uncertainty are in the unit as written; `toCanonical` converts. */
export interface Quantity {
  value: number;
  uncertainty?: number;
  unit: Unit;
}

export const DIMENSIONLESS_UNIT: Unit = { text: '', factor: 1, dimension: DIMENSIONLESS };

// A number is kept as mantissa text plus a decimal exponent until the end.
interface Decimal {
  source: string;
  mantissa: string;
  exponent: number;
}
interface Cursor {
  text: string;
  pos: number;
}

const MANTISSA = /[+-]?(?:\d+(?:\.\d*)?|\.\d+)/y;
const E_EXPONENT = /[eE]([+-]?\d+)/y;
const POWER_OF_TEN = /\s*[×xX*·⋅]\s*10(?:\^\(([+-]?\d+)\)|\^([+-]?\d+)|([⁺⁻]?[⁰¹²³⁴⁵⁶⁷⁸⁹]+))/y;
const PLUS_MINUS = /\s*(?:±|\+\/-|\+-)\s*/y;

/** Reads a number, optional `± u` or `+/- u`, and a unit; a bare number is dimensionless. */
export function parseQuantity(input: string | number): { quantity: Quantity } | { error: string } {
  if (typeof input === 'number') {
    return Number.isFinite(input)
      ? { quantity: { value: input, unit: DIMENSIONLESS_UNIT } }
      : { error: `${input} is not a finite number` };
  }
  const text = input.trim().replaceAll('\u2212', '-');
  if (text === '') return { error: 'no value given' };
  const notAQuantity = { error: `'${text}' is not a number followed by a unit` };
  const at: Cursor = { text, pos: 0 };
  const parenthesised = eat(at, /\(\s*/y);
  const value = readDecimal(at);
  if (!value) return notAQuantity;
  let uncertainty: Decimal | undefined;
  if (eat(at, PLUS_MINUS)) {
    uncertainty = readDecimal(at);
    if (!uncertainty) return { error: `'±' must be followed by an uncertainty in '${text}'` };
  }
  if (parenthesised) {
    if (!eat(at, /\s*\)/y)) return { error: `missing ')' in '${text}'` };
    // `(1.2 ± 0.1) × 10^-2` scales both numbers.
    const shift = readPowerOfTen(at);
    value.exponent += shift;
    if (uncertainty) uncertainty.exponent += shift;
  }
  const rest = text.slice(at.pos);
  const next = rest.trimStart();
  if (/^,\d/.test(rest)) return { error: `use a decimal point, not a comma, in '${text}'` };
  if (/^[\d.,^]/.test(next)) return notAQuantity;
  if (/[±]|\+\/-/.test(rest))
    return { error: `write the uncertainty before the unit, as in '1.2 ± 0.1 M', not '${text}'` };
  const unit = parseUnit(rest);
  if ('error' in unit) return unit;
  const v = toDouble(value);
  if (v === undefined) return { error: `number '${value.source}' is out of range` };
  const quantity: Quantity = { value: v, unit: unit.unit };
  if (uncertainty) {
    const u = toDouble(uncertainty);
    if (u === undefined) return { error: `uncertainty '${uncertainty.source}' is out of range` };
    if (u < 0) return { error: `uncertainty must not be negative in '${text}'` };
    quantity.uncertainty = u;
  }
  if (!Number.isFinite(toCanonical(quantity))) return { error: `'${text}' is out of range` };
  return { quantity };
}

/** The value in canonical units (mol, dm, s, J, K): value × factor. */
export function toCanonical(q: Quantity): number {
  return q.value * q.unit.factor;
}

/** The uncertainty in canonical units, if one was given. */
export function canonicalUncertainty(q: Quantity): number | undefined {
  return q.uncertainty === undefined ? undefined : q.uncertainty * q.unit.factor;
}

/** The value in another unit; undefined if that unit is unreadable, of another dimension, or out of range. */
export function convertTo(q: Quantity, unitText: string): number | undefined {
  const target = parseUnit(unitText);
  if ('error' in target || !sameDimension(q.unit.dimension, target.unit.dimension)) return undefined;
  // The ratio first, so converting to the unit already used returns the value unchanged.
  const result = q.value * (q.unit.factor / target.unit.factor);
  return Number.isFinite(result) ? result : undefined;
}

/** `1.2 ± 0.1 M^-1 s^-1`: the text `parseQuantity` reads back to the same quantity. */
export function formatQuantity(q: Quantity): string {
  const uncertainty = q.uncertainty === undefined ? '' : ` ± ${q.uncertainty}`;
  return `${q.value}${uncertainty}${q.unit.text === '' ? '' : ` ${q.unit.text}`}`;
}

function eat(at: Cursor, pattern: RegExp): boolean {
  pattern.lastIndex = at.pos;
  if (!pattern.test(at.text)) return false;
  at.pos = pattern.lastIndex;
  return true;
}

function readDecimal(at: Cursor): Decimal | undefined {
  const start = at.pos;
  MANTISSA.lastIndex = at.pos;
  const m = MANTISSA.exec(at.text);
  if (!m) return undefined;
  at.pos = MANTISSA.lastIndex;
  E_EXPONENT.lastIndex = at.pos;
  const e = E_EXPONENT.exec(at.text);
  if (e) at.pos = E_EXPONENT.lastIndex;
  const exponent = Number(e?.[1] ?? 0) + readPowerOfTen(at);
  return { source: at.text.slice(start, at.pos), mantissa: m[0], exponent };
}

function readPowerOfTen(at: Cursor): number {
  POWER_OF_TEN.lastIndex = at.pos;
  const m = POWER_OF_TEN.exec(at.text);
  if (!m) return 0;
  at.pos = POWER_OF_TEN.lastIndex;
  return Number(m[1] ?? m[2] ?? superscriptToAscii(m[3] ?? ''));
}

// One conversion from decimal text, so the double is the correctly rounded one; a nonzero
// mantissa that overflows or underflows is out of range rather than silently 0 or Infinity.
function toDouble(d: Decimal): number | undefined {
  const x = Number(`${d.mantissa}e${d.exponent}`);
  if (!Number.isFinite(x)) return undefined;
  if (x === 0 && /[1-9]/.test(d.mantissa)) return undefined;
  return x;
}
