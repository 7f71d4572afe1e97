/**
 * The public face of units: dimensions, unit symbols and the unit parser, each in its own module,
 * re-exported here by name so importers need only './units.ts'.
 */
export {
  AMOUNT,
  BASE_DIMENSIONS,
  CONCENTRATION,
  DIMENSIONLESS,
  ENERGY,
  LENGTH,
  MOLAR_ENERGY,
  MOLAR_ENTROPY,
  PRESSURE,
  TEMPERATURE,
  TIME,
  dimensionOf,
  formatDimension,
  multiplyDimensions,
  powerDimension,
  rateConstantDimension,
  sameDimension,
  type BaseDimension,
  type Dimension,
} from './dimension.ts';
export { PREFIXES, UNIT_SYMBOLS, lookUpSymbol, type UnitSymbol } from './unit-symbols.ts';
export { parseUnit, superscriptToAscii, type Unit } from './parse-unit.ts';
