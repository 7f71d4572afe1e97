/** Exact rationals: the normalising constructor, parsing, and the field laws (fast-check). */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Rational } from '../../src/engine/exact/rational.ts';

const rational = fc
  .tuple(fc.bigInt({ min: -(10n ** 12n), max: 10n ** 12n }), fc.bigInt({ min: 1n, max: 10n ** 9n }))
  .map(([n, d]) => Rational.of(n, d));

describe('Rational', () => {
  it.each([
    [6, 8, '3/4'],
    [-6, 8, '-3/4'],
    [6, -8, '-3/4'],
    [0, 5, '0'],
    [10, 5, '2'],
  ])('Rational.of(%s, %s) is %s', (n, d, text) => {
    expect(Rational.of(n, d).toString()).toBe(text);
  });

  it.each([
    ['0.25', '1/4'],
    ['-1.5e-3', '-3/2000'],
    ['1e3', '1000'],
    ['7/21', '1/3'],
    ['.5', '1/2'],
  ])('parses %s exactly as %s', (text, expected) => {
    expect(Rational.parse(text)!.toString()).toBe(expected);
  });

  it.each(['', 'abc', '1/0', '1e999', '--1'])('rejects %j', (text) => {
    expect(Rational.parse(text)).toBeUndefined();
  });

  it('throws only for a zero denominator, a programmer mistake', () => {
    expect(() => Rational.of(1, 0)).toThrow(RangeError);
  });

  it('keeps every value normalised: gcd 1 and a positive denominator', () => {
    fc.assert(
      fc.property(rational, (r) => {
        const g = (a: bigint, b: bigint): bigint => (b === 0n ? (a < 0n ? -a : a) : g(b, a % b));
        return r.den > 0n && g(r.num, r.den) === 1n;
      }),
    );
  });

  it('obeys the field laws', () => {
    fc.assert(
      fc.property(rational, rational, rational, (a, b, c) => {
        expect(a.add(b).equals(b.add(a))).toBe(true);
        expect(a.mul(b.add(c)).equals(a.mul(b).add(a.mul(c)))).toBe(true);
        expect(a.sub(a).isZero()).toBe(true);
        if (!b.isZero()) expect(a.div(b).mul(b).equals(a)).toBe(true);
      }),
      { numRuns: 200 },
    );
  });

  it('represents every finite double exactly', () => {
    fc.assert(
      fc.property(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e15, max: 1e15 }), (x) => {
        expect(Rational.fromNumber(x).toNumber()).toBe(x === 0 ? 0 : x);
      }),
      { numRuns: 200 },
    );
  });
});
