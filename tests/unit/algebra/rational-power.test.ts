import { describe, expect, it } from 'vitest';
import { integerRoot, rationalPower } from '../../../src/engine/exact/index.ts';
import { q } from './helpers.ts';

describe('rationalPower', () => {
  it.each([
    [q(4, 9), q(1, 2), '2/3'],
    [q(8), q(2, 3), '4'],
    [q(-8), q(1, 3), '-2'],
    [q(2, 3), q(-2), '9/4'],
    [q(27, 8), q(-4, 3), '16/81'],
    [q(0), q(3), '0'],
    [q(5), q(0), '1'],
  ])('%s ^ %s = %s', (base, e, expected) => {
    expect(rationalPower(base, e)?.toString()).toBe(expected);
  });

  it.each([
    [q(2), q(1, 2)],
    [q(-4), q(1, 2)],
    [q(0), q(-1)],
    [q(4, 3), q(1, 2)],
  ])('%s ^ %s is not rational', (base, e) => {
    expect(rationalPower(base, e)).toBeUndefined();
  });

  it('finds exact integer roots of large numbers', () => {
    const big = 123456789012345678901234567890n;
    expect(integerRoot(big ** 3n, 3n)).toBe(big);
    expect(integerRoot(big ** 3n + 1n, 3n)).toBeUndefined();
    expect(integerRoot(1n, 5n)).toBe(1n);
  });
});
