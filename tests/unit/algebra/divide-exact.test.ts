import { describe, expect, it } from 'vitest';
import { divideExact, formatText, Polynomial } from '../../../src/engine/exact/index.ts';
import { poly } from './helpers.ts';

describe('divideExact', () => {
  it.each([
    // Quotients worked by hand: factor theorem and difference of powers.
    ['x^2 - 1', 'x + 1', 'x - 1'],
    ['x^3 - y^3', 'x - y', 'x^2 + x*y + y^2'],
    ['2*k1*S + 2*k2*S', 'k1 + k2', '2*S'],
    ['(a + b)*(c + d)*(e + 1)', '(c + d)*(e + 1)', 'a + b'],
    ['x - 1', 'x^(1/2) + 1', 'x^(1/2) - 1'],
    ['x', 'x^2', '1/x'],
    ['0', 'x + y', '0'],
    ['3*x + 3', '3/2', '2*x + 2'],
  ])('(%s) / (%s) = %s', (p, q, expected) => {
    const r = divideExact(poly(p), poly(q));
    expect(r && formatText(r)).toBe(formatText(poly(expected)));
  });

  it.each([
    ['x^2 + 1', 'x + 1'],
    ['x + y', 'x + z'],
    ['x', 'x + 1'],
    ['x^2*y + 1', 'x*y^2 + 1'],
  ])('(%s) / (%s) is not exact', (p, q) => {
    expect(divideExact(poly(p), poly(q))).toBeUndefined();
  });

  it('throws on division by zero, a programmer mistake', () => {
    expect(() => divideExact(poly('x'), Polynomial.ZERO)).toThrow(RangeError);
  });
});
