/**
 * Physical dimensions as exponents of five base dimensions, with the named dimensions the engine
 * checks against. Kept apart from unit symbols and parsing because step checks need only this.
 */
import { Rational } from '../exact/rational.ts';

export type BaseDimension = 'amount' | 'length' | 'time' | 'energy' | 'temperature';
/** Exponents of the base dimensions. */
export type Dimension = Readonly<Record<BaseDimension, Rational>>;

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
  return {
    amount: f('amount'),
    length: f('length'),
    time: f('time'),
    energy: f('energy'),
    temperature: f('temperature'),
  };
}
