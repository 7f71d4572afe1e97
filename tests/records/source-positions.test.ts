/** The position resolver: paths to lines and columns, ancestors as fallback, offsets into strings. */
import { describe, expect, it } from 'vitest';
import { Scalar } from 'yaml';
import { loadRecordSource, parseRecordYaml, sourceShift } from '../../src/records/index.ts';

const source = [
  'title: Positions', //                                  1
  'system: fixture-positions', //                         2
  'status: proposed', //                                  3
  'steps:', //                                            4
  '  - equation: H2O2 + I- -> H2O + IO-', //              5
  '    k: 1.1e-2 M^-1 s^-1', //                           6
  '  - equation: "H2O2 + IO- -> H2O + O2 + I-"', //       7
  "  - { equation: 'A''s + B -> C' }", //                 8
  '  - equation: >-', //                                  9
  '      A -> B', //                                      10
  'notes: |', //                                          11
  '  first line', //                                      12
  '  second line', //                                     13
  '',
].join('\n');

const { locator } = parseRecordYaml(source);

describe('locate', () => {
  it('finds a value by its path', () => {
    expect(locator.locate(['status'])).toEqual({ line: 3, column: 9, endLine: 3, endColumn: 17 });
    expect(locator.locate(['steps', 0, 'k'])).toMatchObject({ line: 6, column: 8, endLine: 6 });
  });

  it('accepts list indices as numbers or as numeric strings (JSON Pointer segments)', () => {
    expect(locator.locate(['steps', '1', 'equation'])).toEqual(locator.locate(['steps', 1, 'equation']));
  });

  it('falls back to the nearest ancestor that exists', () => {
    expect(locator.locate(['steps', 1, 'k'])).toMatchObject({ line: 7, column: 5 });
    expect(locator.locate(['steps', 9, 'k'])).toMatchObject({ line: 5, column: 3 });
    expect(locator.locate(['observations', 0])).toMatchObject({ line: 1, column: 1 });
  });

  it('spans a block collection without the newline that ends it', () => {
    expect(locator.locate(['steps', 0])).toEqual({ line: 5, column: 5, endLine: 6, endColumn: 24 });
  });

  it('moves into a plain one-line string by the offset', () => {
    // "I-" starts at character 7 of the equation; the value starts at column 15.
    expect(locator.locate(['steps', 0, 'equation'], 7)).toMatchObject({ line: 5, column: 22 });
  });

  it('counts the opening quote of a quoted string', () => {
    expect(locator.locate(['steps', 1, 'equation'], 7)).toMatchObject({ line: 7, column: 23 });
  });

  it("counts a doubled quote ('') inside a single-quoted string as one character", () => {
    // Value "A's + B -> C": offset 6 is "B", written after the doubled quote.
    expect(locator.locate(['steps', 2, 'equation'], 6)).toMatchObject({ line: 8, column: 25 });
  });

  it('ignores the offset in block scalars, pointing at the whole value', () => {
    expect(locator.locate(['steps', 3, 'equation'], 2)).toMatchObject({ line: 9, column: 15 });
    expect(locator.locate(['notes'], 3)).toMatchObject({ line: 11, column: 8, endLine: 13 });
  });

  it('ignores the offset when the path does not exist', () => {
    expect(locator.locate(['steps', 1, 'k'], 4)).toEqual(locator.locate(['steps', 1, 'k']));
  });
});

describe('locateKey', () => {
  it('points at the field name rather than its value', () => {
    expect(locator.locateKey(['steps', 0, 'k'])).toEqual({
      line: 6,
      column: 5,
      endLine: 6,
      endColumn: 6,
    });
  });
});

describe('sourceShift', () => {
  it.each([
    ['plain', 'A + B', Scalar.PLAIN, 4, 4],
    ['double quoted', '"A + B"', Scalar.QUOTE_DOUBLE, 4, 5],
    ['double quoted with \\" escape', '"\\"A\\" + B"', Scalar.QUOTE_DOUBLE, 6, 9],
    ['double quoted with \\u escape', '"\\u00e9 + B"', Scalar.QUOTE_DOUBLE, 4, 10],
    ['single quoted', "'it''s B'", Scalar.QUOTE_SINGLE, 5, 7],
  ] as const)('%s', (_name, raw, type, offset, shift) => {
    expect(sourceShift(raw, type, offset)).toBe(shift);
  });

  it('gives nothing for block scalars', () => {
    expect(sourceShift('|\n  A', Scalar.BLOCK_LITERAL, 1)).toBeUndefined();
  });
});

describe('LoadedRecord.locate', () => {
  it('uses the same resolver', () => {
    const loaded = loadRecordSource('positions.yaml', source);
    expect(loaded.locate(['steps', 0, 'equation'], 7)).toMatchObject({ line: 5, column: 22 });
  });

  it('resolves to line 1 in an empty file', () => {
    const loaded = loadRecordSource('empty.yaml', '');
    expect(loaded.locate(['steps', 0])).toEqual({ line: 1, column: 1, endLine: 1, endColumn: 1 });
  });
});
