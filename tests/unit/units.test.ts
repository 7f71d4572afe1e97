import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as constants from '../../src/engine/units/physical-constants.ts';
import { Rational } from '../../src/engine/exact/rational.ts';
import {
  BASE_DIMENSIONS,
  CONCENTRATION,
  DIMENSIONLESS,
  MOLAR_ENERGY,
  MOLAR_ENTROPY,
  PRESSURE,
  TEMPERATURE,
  TIME,
  dimensionOf,
  formatDimension,
  parseUnit,
  rateConstantDimension,
  sameDimension,
  type Dimension,
} from '../../src/engine/units/units.ts';

// CODATA 2018 exact defining constants, stated here rather than imported so the tests do not
// check the engine against itself.
const N_A = 6.02214076e23;
const E = 1.602176634e-19;

/** Agreement to a few units in the last place: factors are exact rationals rounded once. */
function expectClose(actual: number | undefined, expected: number): void {
  expect(actual).toBeDefined();
  expect(Math.abs((actual ?? NaN) / expected - 1)).toBeLessThan(1e-15);
}

function unitOf(text: string) {
  const r = parseUnit(text);
  if ('error' in r) throw new Error(`'${text}': ${r.error}`);
  return r.unit;
}

describe('parseUnit factors (canonical: mol, dm, s, J, K)', () => {
  // [text, expected factor, expected dimension, source of the factor]
  const cases: [string, number, Dimension, string][] = [
    ['', 1, DIMENSIONLESS, 'empty text is a pure number (brief)'],
    ['M', 1, CONCENTRATION, 'M = mol dm^-3 (IUPAC Green Book, from memory)'],
    ['mM', 1e-3, CONCENTRATION, 'SI prefix milli = 1e-3 (SI Brochure 9th ed., from memory)'],
    ['µM', 1e-6, CONCENTRATION, 'micro = 1e-6, micro sign U+00B5'],
    ['μM', 1e-6, CONCENTRATION, 'micro = 1e-6, Greek mu U+03BC'],
    ['uM', 1e-6, CONCENTRATION, 'micro = 1e-6, ASCII stand-in'],
    ['nM', 1e-9, CONCENTRATION, 'nano = 1e-9'],
    ['pM', 1e-12, CONCENTRATION, 'pico = 1e-12'],
    ['mol/L', 1, CONCENTRATION, 'L = dm^3 (SI Brochure, from memory)'],
    ['mol L^-1', 1, CONCENTRATION, 'L = dm^3'],
    ['mol dm^-3', 1, CONCENTRATION, 'canonical'],
    ['mol/dm3', 1, CONCENTRATION, 'canonical'],
    // 1 molecule = 1/N_A mol and 1 cm^-3 = 1e3 dm^-3, so the factor is 1e3 / N_A.
    ['molecule cm^-3', 1e3 / N_A, CONCENTRATION, 'N_A exact, CODATA 2018'],
    ['s', 1, TIME, 'canonical'],
    ['ms', 1e-3, TIME, 'milli'],
    ['µs', 1e-6, TIME, 'micro'],
    ['ns', 1e-9, TIME, 'nano'],
    ['min', 60, TIME, '1 min = 60 s (SI Brochure Table 8, from memory)'],
    ['h', 3600, TIME, '1 h = 3600 s (SI Brochure Table 8, from memory)'],
    ['s^-1', 1, rateConstantDimension(1), 'canonical'],
    ['min^-1', 1 / 60, rateConstantDimension(1), '1 min = 60 s'],
    ['h^-1', 1 / 3600, rateConstantDimension(1), '1 h = 3600 s'],
    ['s⁻¹', 1, rateConstantDimension(1), 'Unicode superscripts'],
    ['s-1', 1, rateConstantDimension(1), 'bare trailing exponent'],
    ['M^-1 s^-1', 1, rateConstantDimension(2), 'canonical'],
    ['L mol^-1 s^-1', 1, rateConstantDimension(2), 'L = dm^3'],
    ['dm^3 mol^-1 s^-1', 1, rateConstantDimension(2), 'canonical'],
    ['dm³ mol⁻¹ s⁻¹', 1, rateConstantDimension(2), 'Unicode superscripts'],
    ['M^-2 s^-1', 1, rateConstantDimension(3), 'canonical'],
    ['mol L^-1 s^-1', 1, rateConstantDimension(0), 'L = dm^3'],
    ['M s^-1', 1, rateConstantDimension(0), 'canonical'],
    // cm^3 = 1e-3 dm^3 and molecule^-1 = N_A mol^-1, so the factor is N_A × 1e-3.
    ['cm^3 molecule^-1 s^-1', N_A * 1e-3, rateConstantDimension(2), 'N_A exact, CODATA 2018'],
    ['cm³ molecule⁻¹ s⁻¹', N_A * 1e-3, rateConstantDimension(2), 'N_A exact, CODATA 2018'],
    // cm^6 = 1e-6 dm^6 and molecule^-2 = N_A^2 mol^-2.
    ['cm^6 molecule^-2 s^-1', N_A * N_A * 1e-6, rateConstantDimension(3), 'N_A exact, CODATA 2018'],
    ['J/mol', 1, MOLAR_ENERGY, 'canonical'],
    ['kJ/mol', 1e3, MOLAR_ENERGY, 'kilo = 1e3'],
    ['kJ mol^-1', 1e3, MOLAR_ENERGY, 'kilo = 1e3'],
    ['cal/mol', 4.184, MOLAR_ENERGY, 'thermochemical calorie = 4.184 J exactly (NIST SP 811, from memory)'],
    ['kcal/mol', 4184, MOLAR_ENERGY, 'thermochemical calorie = 4.184 J exactly (NIST SP 811, from memory)'],
    // eV per particle × N_A = e N_A J/mol = 96485.3321233100184 J/mol (CODATA 2018 F, exact).
    ['eV', 96485.3321233100184, MOLAR_ENERGY, 'CODATA 2018 Faraday constant, from memory'],
    ['eV', E * N_A, MOLAR_ENERGY, 'e and N_A exact, CODATA 2018'],
    ['J/(mol K)', 1, MOLAR_ENTROPY, 'canonical'],
    ['J mol^-1 K^-1', 1, MOLAR_ENTROPY, 'canonical'],
    ['K', 1, TEMPERATURE, 'canonical'],
    // Pressure is energy per volume: 1 Pa = 1 J m^-3 = 1e-3 J dm^-3.
    ['Pa', 1e-3, PRESSURE, 'Pa = J m^-3 (SI Brochure, from memory)'],
    ['kPa', 1, PRESSURE, 'kilo = 1e3'],
    ['bar', 1e5 * 1e-3, PRESSURE, '1 bar = 1e5 Pa (SI Brochure Table 8, from memory)'],
    ['atm', 101325 * 1e-3, PRESSURE, '1 atm = 101325 Pa exactly (10th CGPM 1954, from memory)'],
    ['Torr', (101325 / 760) * 1e-3, PRESSURE, '1 Torr = 101325/760 Pa exactly (from memory)'],
  ];
  it.each(cases)('%s has factor %d', (text, factor, dimension) => {
    const unit = unitOf(text);
    expectClose(unit.factor, factor);
    expect(sameDimension(unit.dimension, dimension)).toBe(true);
  });

  it('reads the same unit through every grammar form', () => {
    // All of these spell M^-1 s^-1, by the grammar in the brief.
    for (const text of [
      'M^-1 s^-1',
      'M^-1*s^-1',
      'M^-1·s^-1',
      'M-1 s-1',
      'M^(-1) s^(-1)',
      'M−1 s−1',
      '1/(M s)',
      'L/mol/s',
    ]) {
      expect(sameDimension(unitOf(text).dimension, rateConstantDimension(2)), text).toBe(true);
      expect(unitOf(text).factor, text).toBe(1);
    }
  });
});

describe('dimensions', () => {
  it('matches rate constant dimensions to molecularity', () => {
    // k of order n has units concentration^(1-n) time^-1 (IUPAC Gold Book, "rate constant", from memory).
    expect(sameDimension(unitOf('M^-1 s^-1').dimension, rateConstantDimension(2))).toBe(true);
    expect(sameDimension(unitOf('cm^3 molecule^-1 s^-1').dimension, rateConstantDimension(2))).toBe(true);
    expect(sameDimension(unitOf('s^-1').dimension, rateConstantDimension(1))).toBe(true);
    expect(sameDimension(unitOf('M s^-1').dimension, rateConstantDimension(0))).toBe(true);
    expect(sameDimension(unitOf('M^-2 s^-1').dimension, rateConstantDimension(3))).toBe(true);
    expect(sameDimension(unitOf('M^-1/2 s^-1').dimension, rateConstantDimension(1.5))).toBe(true);
    expect(sameDimension(unitOf('M^-1 s^-1').dimension, rateConstantDimension(1))).toBe(false);
  });

  it('formats dimensions in trade units', () => {
    // The spellings the brief asks for ("M^-1 s^-1", "s^-1", "M", "kJ/mol").
    expect(formatDimension(rateConstantDimension(2))).toBe('M^-1 s^-1');
    expect(formatDimension(rateConstantDimension(1))).toBe('s^-1');
    expect(formatDimension(rateConstantDimension(0))).toBe('M s^-1');
    expect(formatDimension(rateConstantDimension(3))).toBe('M^-2 s^-1');
    expect(formatDimension(CONCENTRATION)).toBe('M');
    expect(formatDimension(MOLAR_ENERGY)).toBe('kJ/mol');
    expect(formatDimension(MOLAR_ENTROPY)).toBe('J mol^-1 K^-1');
    expect(formatDimension(PRESSURE)).toBe('Pa');
    expect(formatDimension(DIMENSIONLESS)).toBe('dimensionless');
    expect(formatDimension(rateConstantDimension(1.5))).toBe('M^(-1/2) s^-1');
  });

  it('formats every dimension as text that parses back to it (property)', () => {
    const exponent = fc.integer({ min: -4, max: 4 });
    const dimension = fc
      .record({ amount: exponent, length: exponent, time: exponent, energy: exponent, temperature: exponent })
      .map(dimensionOf);
    fc.assert(
      fc.property(dimension, (d) => {
        const r = parseUnit(formatDimension(d));
        return 'unit' in r && sameDimension(r.unit.dimension, d);
      }),
    );
  });

  it('multiplies factors and adds dimensions when units are juxtaposed (property)', () => {
    const texts = [
      'M',
      'mM',
      'µM',
      's^-1',
      'min',
      'h^-1',
      'cm^3',
      'molecule^-1',
      'kJ/mol',
      'kcal',
      'eV',
      'K^-1',
      'atm',
      'Torr',
      'L',
    ];
    fc.assert(
      fc.property(fc.constantFrom(...texts), fc.constantFrom(...texts), (a, b) => {
        const ua = unitOf(a);
        const ub = unitOf(b);
        const both = unitOf(`${a} ${b}`);
        const dimensionsAdd = BASE_DIMENSIONS.every((k) =>
          both.dimension[k].equals(ua.dimension[k].add(ub.dimension[k])),
        );
        return dimensionsAdd && Math.abs(both.factor / (ua.factor * ub.factor) - 1) < 1e-15;
      }),
    );
  });
});

describe('parseUnit errors', () => {
  const cases: [string, RegExp][] = [
    ['mols', /unknown unit 'mols'/],
    ['foo', /unknown unit 'foo'/],
    ['°C', /kelvin/],
    ['M/', /'\/' must be followed by a unit/],
    ['M //s', /'\/' must be followed by a unit/],
    ['(mol K', /missing '\)'/],
    ['mol K)', /unmatched '\)'/],
    ['()', /empty parentheses/],
    ['s^', /exponent/],
    ['s^99', /too large/],
    ['M#', /unexpected '#'/],
    ['10^-3 M', /unexpected '1'/],
  ];
  it.each(cases)('%s is rejected', (text, message) => {
    const r = parseUnit(text);
    expect('error' in r ? r.error : undefined).toMatch(message);
  });
});

describe('constants', () => {
  it('keeps the doubles equal to the exact values', () => {
    // CODATA 2018: R = N_A k_B = 8.31446261815324 J mol^-1 K^-1 and F = e N_A, both exact products.
    expect(constants.GAS_CONSTANT).toBe(6.02214076e23 * 1.380649e-23);
    expect(constants.GAS_CONSTANT_EXACT.equals(Rational.of(831446261815324n, 10n ** 14n))).toBe(true);
    expect(constants.FARADAY_EXACT.equals(Rational.of(964853321233100184n, 10n ** 13n))).toBe(true);
    expect(constants.AVOGADRO).toBe(N_A);
    expect(constants.ELEMENTARY_CHARGE).toBe(E);
    expect(constants.BOLTZMANN).toBe(1.380649e-23);
    expect(constants.PLANCK).toBe(6.62607015e-34);
    expect(constants.CALORIE).toBe(4.184);
    for (const [double, exact] of [
      [constants.AVOGADRO, constants.AVOGADRO_EXACT],
      [constants.BOLTZMANN, constants.BOLTZMANN_EXACT],
      [constants.PLANCK, constants.PLANCK_EXACT],
      [constants.ELEMENTARY_CHARGE, constants.ELEMENTARY_CHARGE_EXACT],
      [constants.FARADAY, constants.FARADAY_EXACT],
      [constants.CALORIE, constants.CALORIE_EXACT],
      [constants.ATMOSPHERE, constants.ATMOSPHERE_EXACT],
    ] as const) {
      expectClose(exact.toNumber(), double);
    }
  });
});
