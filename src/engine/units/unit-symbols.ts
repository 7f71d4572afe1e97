/**
 * The unit symbols the parser knows and the SI prefixes it accepts on them. A table of its own so
 * that adding a unit touches one short file and never the grammar.
 */
import { ATMOSPHERE_EXACT, AVOGADRO_EXACT, CALORIE_EXACT, FARADAY_EXACT, TORR_EXACT } from './physical-constants.ts';
import {
  AMOUNT,
  CONCENTRATION,
  DIMENSIONLESS,
  ENERGY,
  LENGTH,
  MOLAR_ENERGY,
  PRESSURE,
  TEMPERATURE,
  TIME,
  powerDimension,
  type Dimension,
} from './dimension.ts';
import { Rational } from '../exact/rational.ts';

/** A symbol's meaning: its dimension, its exact factor, and whether SI prefixes apply. */
export interface UnitSymbol {
  dimension: Dimension;
  factor: Rational;
  prefixable: boolean;
}

const sym = (dimension: Dimension, factor: Rational, prefixable = true): UnitSymbol => ({
  dimension,
  factor,
  prefixable,
});
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
  ['f', -15],
  ['p', -12],
  ['n', -9],
  ['µ', -6],
  ['μ', -6],
  ['u', -6],
  ['m', -3],
  ['c', -2],
  ['d', -1],
  ['h', 2],
  ['k', 3],
  ['M', 6],
  ['G', 9],
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
