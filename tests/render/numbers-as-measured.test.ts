/**
 * Numbers as a reader sees them on the pages: predicted orders to the precision of the measurement
 * they are compared with, true minus signs, and values in the record's own units.
 */
import { describe, expect, it } from 'vitest';
import {
  concentrationUnitOf,
  countWords,
  decimalPlaces,
  inRecordUnit,
  measuredOrderText,
  orderLikeMeasured,
  percentText,
  predictionText,
  quantityText,
  recordConcentrationUnit,
  survivorsText,
  trueMinusSigns,
  unitText,
} from '../../src/render/words/index.ts';

describe('rounding to the measurement', () => {
  it('counts the decimals a number is written with', () => {
    expect(decimalPlaces(0.52)).toBe(2);
    expect(decimalPlaces(1)).toBe(0);
    expect(decimalPlaces(0.1)).toBe(1);
    expect(decimalPlaces(1.5e-3)).toBe(4);
    expect(decimalPlaces(-0.95)).toBe(2);
  });

  it('rounds a prediction to the finer of the observed value and its tolerance', () => {
    // 5/9 = 0.5556 against 1.0 ± 0.1 reads 0.6; against 0.52 ± 0.08 reads 0.56.
    expect(orderLikeMeasured(5 / 9, 1.0, 0.1)).toBe('0.6');
    expect(orderLikeMeasured(5 / 9, 0.52, 0.08)).toBe('0.56');
    expect(orderLikeMeasured(1, 0.97, 0.08)).toBe('1.00');
    // An exact fraction is kept as the report writes it.
    expect(orderLikeMeasured('1/2', 0.52, 0.08)).toBe('1/2');
  });

  it('never prints −0, and writes the measurement with both numbers to one precision', () => {
    expect(orderLikeMeasured(-0.004, 0.12, 0.06)).toBe('0.00');
    expect(measuredOrderText(1, 0.1)).toBe('1.0 ± 0.1');
    expect(measuredOrderText(-0.95, 0.08)).toBe('\u22120.95 ± 0.08');
  });

  it('words a prediction to the measurement it is compared with', () => {
    const check = { id: 'o', species: 'A', method: 'rds', observed: 1, tolerance: 0.1, status: 'fail' } as const;
    expect(predictionText({ ...check, predicted: 5 / 9, basis: 'conditions' } as never)).toBe(
      '0.6 at these conditions',
    );
  });

  it('says "< 0.01 %" for a share too small to print, never "0 %"', () => {
    expect(percentText(0)).toBe('< 0.01 %');
    expect(percentText(0.00004)).toBe('< 0.01 %');
    expect(percentText(0.0025)).toBe('0.25 %');
  });
});

describe('minus signs', () => {
  it('turns a hyphen before a number into a true minus, leaving hyphens in words alone', () => {
    expect(trueMinusSigns('slope -0.98, ΔG = -6 kJ/mol')).toBe('slope \u22120.98, ΔG = \u22126 kJ/mol');
    expect(trueMinusSigns('pre-equilibrium 15-45 °C k_-1')).toBe('pre-equilibrium 15-45 °C k_-1');
  });

  it('writes quantities with true minus signs and superscript powers', () => {
    expect(quantityText('-6 kJ/mol')).toBe('\u22126 kJ/mol');
    expect(quantityText('-8.1e-4 M^-1 s^-1')).toBe('\u22128.1 × 10⁻⁴ M⁻¹ s⁻¹');
  });
});

describe('units as the record writes them', () => {
  it('typesets a unit with superscripts', () => {
    expect(unitText('molecule cm^-3')).toBe('molecule cm⁻³');
    expect(unitText('M^-1 s^(-1)')).toBe('M⁻¹ s⁻¹');
  });

  it('finds the concentration unit of a record from its quantities, M when it writes none', () => {
    expect(concentrationUnitOf('2.0e17 molecule cm^-3')?.display).toBe('molecule cm⁻³');
    expect(concentrationUnitOf('298.15 K')).toBeUndefined();
    expect(recordConcentrationUnit(['298 K', '5 mM']).text).toBe('mM');
    expect(recordConcentrationUnit([]).text).toBe('M');
  });

  it('shows a value held in M in the record unit', () => {
    // 1 M = N_A × 10⁻³ molecule cm⁻³ = 6.02214076 × 10²⁰ (N_A exact since the 2019 SI).
    const gas = concentrationUnitOf('1 molecule cm^-3')!;
    expect(inRecordUnit(1e-6, gas)).toBe('6.02 × 10¹⁴');
    expect(inRecordUnit(2.5e-3, recordConcentrationUnit(['1 mM']))).toBe('2.5');
  });
});

describe('counts in sentences', () => {
  it('counts the thing it names, and says how many of the live rivals survive', () => {
    expect(countWords(0, 'record')).toBe('no record');
    expect(countWords(1, 'error')).toBe('1 error');
    expect(countWords(3, 'approximation')).toBe('3 approximations');
    expect(survivorsText(1, 2)).toBe('1 of the 2 live rivals survives');
    expect(survivorsText(2, 2)).toBe('both live rivals survive');
    expect(survivorsText(1, 1)).toBe('the one live rival survives');
    expect(survivorsText(0, 3)).toBe('none of the 3 live rivals survives');
  });
});
