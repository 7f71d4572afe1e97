/**
 * A data column's unit read and checked against what the column holds, giving the factor (and,
 * for °C, the offset) to canonical units. Temperatures may be given in K or °C (also written degC),
 * the way laboratory notebooks record them.
 */
import {
  CONCENTRATION,
  TEMPERATURE,
  TIME,
  formatDimension,
  multiplyDimensions,
  parseUnit,
  powerDimension,
  sameDimension,
  type Dimension,
} from '../units/units.ts';
import { Rational } from '../exact/rational.ts';

/** What a column holds, for its unit. */
export type ColumnQuantity = 'concentration' | 'rate' | 'time' | 'temperature' | 'rate constant';

/** A unit read: canonical value = value × factor + offset; for a rate constant also its order n. */
export type ColumnUnit = { factor: number; offset: number; order?: number } | { problem: string };

const RATE = multiplyDimensions(CONCENTRATION, powerDimension(TIME, Rational.of(-1)));
const EXPECTED: Record<Exclude<ColumnQuantity, 'rate constant'>, { dimension: Dimension; words: string }> = {
  concentration: { dimension: CONCENTRATION, words: 'a concentration such as M or mM' },
  rate: { dimension: RATE, words: 'a concentration per time such as M s^-1 or µM/min' },
  time: { dimension: TIME, words: 'a time such as s, min or h' },
  temperature: { dimension: TEMPERATURE, words: 'a temperature: K or °C' },
};

/** Reads `unit` for a column holding `quantity`; `difference` for an uncertainty (no °C offset). */
export function readColumnUnit(unit: string, quantity: ColumnQuantity, difference = false): ColumnUnit {
  if (quantity === 'temperature' && /^(°C|℃|degC)$/.test(unit.trim()))
    return { factor: 1, offset: difference ? 0 : 273.15 };
  const parsed = parseUnit(unit);
  if ('error' in parsed) return { problem: `the unit '${unit}' cannot be read: ${parsed.error}` };
  const { dimension, factor } = parsed.unit;
  if (quantity === 'rate constant') {
    const d = dimension;
    const isRateConstant =
      d.time.equals(Rational.of(-1)) &&
      d.energy.isZero() &&
      d.temperature.isZero() &&
      d.length.equals(d.amount.mul(Rational.of(-3)));
    if (!isRateConstant)
      return { problem: `'${unit}' is not the unit of a rate constant (M^(1-n) s^-1, e.g. s^-1 or M^-1 s^-1)` };
    return { factor, offset: 0, order: 1 - d.amount.toNumber() };
  }
  const expected = EXPECTED[quantity];
  if (!sameDimension(dimension, expected.dimension))
    return { problem: `'${unit}' (${formatDimension(dimension)}) is not ${expected.words}` };
  return { factor, offset: 0 };
}
