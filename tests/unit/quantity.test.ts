import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  canonicalUncertainty,
  convertTo,
  formatQuantity,
  parseQuantity,
  toCanonical,
  type Quantity,
} from '../../src/engine/units/quantity.ts';
import { parseUnit, sameDimension } from '../../src/engine/units/units.ts';

// CODATA 2018 exact defining constant, stated rather than imported (independent of the engine).
const N_A = 6.02214076e23;

function quantityOf(text: string | number): Quantity {
  const r = parseQuantity(text);
  if ('error' in r) throw new Error(`'${text}': ${r.error}`);
  return r.quantity;
}

function expectClose(actual: number | undefined, expected: number): void {
  expect(actual).toBeDefined();
  expect(Math.abs((actual ?? NaN) / expected - 1)).toBeLessThan(1e-15);
}

describe('parseQuantity', () => {
  // Expected numbers are JavaScript literals of the same decimal: the language's own correctly
  // rounded parser is the independent reference.
  const cases: [string | number, number, number | undefined, string][] = [
    ['1.1e-2 M^-1 s^-1', 1.1e-2, undefined, 'M^-1 s^-1'],
    ['1.1E-2', 1.1e-2, undefined, ''],
    ['-3', -3, undefined, ''],
    ['.5', 0.5, undefined, ''],
    ['+2.5 mM', 2.5, undefined, 'mM'],
    ['1.1×10^-2', 1.1e-2, undefined, ''],
    ['1.1 x 10^-2 s^-1', 1.1e-2, undefined, 's^-1'],
    ['1.1·10⁻²', 1.1e-2, undefined, ''],
    ['1.1 * 10^(-2) M', 1.1e-2, undefined, 'M'],
    ['2.0e-3 × 10^3', 2.0, undefined, ''],
    ['0.98 ± 0.05', 0.98, 0.05, ''],
    ['0.98 +/- 0.05', 0.98, 0.05, ''],
    ['1.2 ± 0.1 M^-1 s^-1', 1.2, 0.1, 'M^-1 s^-1'],
    ['(1.2 ± 0.1) M^-1 s^-1', 1.2, 0.1, 'M^-1 s^-1'],
    ['(1.2 ± 0.1) × 10^-2 M', 1.2e-2, 0.1e-2, 'M'],
    ['0.10M', 0.1, undefined, 'M'],
    ['56 kJ/mol', 56, undefined, 'kJ/mol'],
    // The typographic minus U+2212 is read as '-', in the number and in the unit text kept.
    ['−40 kJ mol−1', -40, undefined, 'kJ mol-1'],
    ['298.15 K', 298.15, undefined, 'K'],
    [0.98, 0.98, undefined, ''],
  ];
  it.each(cases)('%s', (text, value, uncertainty, unitText) => {
    const q = quantityOf(text);
    expect(q.value).toBe(value);
    expect(q.uncertainty).toBe(uncertainty);
    expect(q.unit.text).toBe(unitText);
  });

  const errors: [string | number, RegExp][] = [
    ['', /no value/],
    ['   ', /no value/],
    ['1.2 foo', /unknown unit 'foo'/],
    ['1.2 mols', /unknown unit 'mols'/],
    ['abc', /'abc' is not a number followed by a unit/],
    ['M^-1 s', /'M\^-1 s' is not a number followed by a unit/],
    ['1.2 ± ', /must be followed by an uncertainty/],
    ['1e999', /out of range/],
    ['1e-999', /out of range/],
    ['1.2 ± -0.1', /negative/],
    ['(1.2 ± 0.1 M', /missing '\)'/],
    ['1.2.3', /not a number followed by a unit/],
    ['1.2 3 M', /not a number followed by a unit/],
    ['1,2 M', /decimal point/],
    ['1.2 M ± 0.1', /uncertainty before the unit/],
    ['25 °C', /kelvin/],
    [Number.NaN, /not a finite number/],
    [Number.POSITIVE_INFINITY, /not a finite number/],
  ];
  it.each(errors)('%s is rejected', (text, message) => {
    const r = parseQuantity(text);
    expect('error' in r ? r.error : undefined).toMatch(message);
  });
});

describe('conversion', () => {
  it('converts to canonical units', () => {
    // 56 kJ/mol = 56000 J/mol (kilo = 1e3).
    expect(toCanonical(quantityOf('56 kJ/mol'))).toBe(56000);
    // 2 kcal/mol = 2 × 4184 J/mol (thermochemical calorie, 4.184 J exactly; NIST SP 811, from memory).
    expect(toCanonical(quantityOf('2 kcal/mol'))).toBe(8368);
    // 1 h^-1 = 1/3600 s^-1.
    expectClose(toCanonical(quantityOf('1 h^-1')), 1 / 3600);
    // 5 µM ± 0.5 µM in M.
    expectClose(canonicalUncertainty(quantityOf('5 ± 0.5 µM')), 0.5e-6);
    expect(canonicalUncertainty(quantityOf('5 µM'))).toBeUndefined();
  });

  it('converts between units of one dimension', () => {
    // 1 eV per particle = e N_A = 96.4853321233100184 kJ/mol (CODATA 2018 F, exact; from memory).
    expectClose(convertTo(quantityOf('1 eV'), 'kJ/mol'), 96.4853321233100184);
    // 1 atm = 760 Torr by the definition of the torr.
    expectClose(convertTo(quantityOf('1 atm'), 'Torr'), 760);
    // 1 atm = 1.01325 bar (101325 Pa over 1e5 Pa).
    expectClose(convertTo(quantityOf('1 atm'), 'bar'), 1.01325);
    // 1 M = N_A × 1e-3 molecule cm^-3 (1 dm^3 = 1000 cm^3).
    expectClose(convertTo(quantityOf('1 M'), 'molecule cm^-3'), N_A * 1e-3);
    // A gas-phase 1e-12 cm^3 molecule^-1 s^-1 is 1e-12 × N_A × 1e-3 M^-1 s^-1.
    expectClose(convertTo(quantityOf('1e-12 cm^3 molecule^-1 s^-1'), 'M^-1 s^-1'), 1e-12 * N_A * 1e-3);
    // 10 kcal/mol = 41.84 kJ/mol.
    expectClose(convertTo(quantityOf('10 kcal/mol'), 'kJ/mol'), 41.84);
    expect(convertTo(quantityOf('3.7 M^-1 s^-1'), 'L mol^-1 s^-1')).toBe(3.7);
  });

  it('refuses conversions between dimensions and to unreadable units', () => {
    expect(convertTo(quantityOf('1 M^-1 s^-1'), 's^-1')).toBeUndefined();
    expect(convertTo(quantityOf('1 kJ/mol'), 'kJ')).toBeUndefined();
    expect(convertTo(quantityOf('1 M'), 'mols')).toBeUndefined();
  });
});

describe('properties', () => {
  const units = [
    '',
    'M',
    'µM',
    's^-1',
    'M^-1 s^-1',
    'cm^3 molecule^-1 s^-1',
    'kJ/mol',
    'kcal/mol',
    'eV',
    'K',
    'atm',
    'Torr',
  ];
  // -0 prints as 0; adding 0 turns it into +0 so that the comparison is about parsing.
  const finite = fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e200, max: 1e200 }).map((x) => x + 0);
  const nonNegative = fc.double({ noNaN: true, noDefaultInfinity: true, min: 0, max: 1e200 }).map((x) => x + 0);

  it('reads back what formatQuantity writes, exactly', () => {
    fc.assert(
      fc.property(
        finite,
        fc.option(nonNegative, { nil: undefined }),
        fc.constantFrom(...units),
        (value, uncertainty, unitText) => {
          const r = parseUnit(unitText);
          if ('error' in r) return false;
          const q: Quantity =
            uncertainty === undefined ? { value, unit: r.unit } : { value, uncertainty, unit: r.unit };
          const back = parseQuantity(formatQuantity(q));
          return (
            'quantity' in back &&
            back.quantity.value === value &&
            back.quantity.uncertainty === uncertainty &&
            back.quantity.unit.text === unitText
          );
        },
      ),
    );
  });

  it('converts there and back to the same value', () => {
    const pairs = [
      ['M', 'molecule cm^-3'],
      ['M^-1 s^-1', 'cm^3 molecule^-1 s^-1'],
      ['kcal/mol', 'eV'],
      ['Torr', 'kPa'],
      ['min^-1', 'h^-1'],
    ] as const;
    const moderate = fc.double({ noNaN: true, min: 1e-100, max: 1e100 });
    fc.assert(
      fc.property(moderate, fc.constantFrom(...pairs), (value, [a, b]) => {
        const there = convertTo(quantityOf(`${value} ${a}`), b);
        if (there === undefined) return false;
        const back = convertTo(quantityOf(`${there} ${b}`), a);
        return back !== undefined && Math.abs(back / value - 1) < 1e-14;
      }),
    );
  });

  it('scales conversions linearly', () => {
    const scale = fc.double({ noNaN: true, min: 1e-6, max: 1e6 });
    fc.assert(
      fc.property(scale, fc.constantFrom('M', 'eV', 'atm', 'cm^6 molecule^-2 s^-1'), (s, unitText) => {
        const one = quantityOf(`1 ${unitText}`);
        const scaled = quantityOf(`${s} ${unitText}`);
        expect(sameDimension(one.unit.dimension, scaled.unit.dimension)).toBe(true);
        return Math.abs(toCanonical(scaled) / (s * toCanonical(one)) - 1) < 1e-15;
      }),
    );
  });
});
