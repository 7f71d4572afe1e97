import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Monomial } from '../../../src/engine/exact/index.ts';
import { MonomialHeap } from '../../../src/engine/exact/monomial-heap.ts';
import { Rational } from '../../../src/engine/exact/rational.ts';
import { arbGeneralMonomial, q } from './helpers.ts';

const m = (...factors: [string, Rational | number][]) => Monomial.fromFactors(factors);

describe('Monomial', () => {
  it('normalises: sorted symbols, repeated symbols merged, zero exponents dropped', () => {
    const a = m(['y', 2], ['x', 1], ['y', -2], ['z', q(1, 2)]);
    expect(a.factors.map(([s, e]) => [s, e.toString()])).toEqual([
      ['x', '1'],
      ['z', '1/2'],
    ]);
    expect(a.equals(m(['z', q(1, 2)], ['x', 1]))).toBe(true);
    expect(m(['x', 0]).isOne()).toBe(true);
  });

  it('has keys that tell symbols apart even when they contain operator characters', () => {
    // Without quoting, "a^1*b" with exponent 1 and "a" with exponent "1*b^1" could collide.
    expect(m(['a^1*b', 1]).key).not.toBe(m(['a', 1], ['b', 1]).key);
    expect(m(['x', 2]).key).toBe(m(['x', 1], ['x', 1]).key);
  });

  it.each([
    ['mul', m(['x', 2], ['y', 1]), m(['x', -1], ['z', q(1, 2)]), m(['x', 1], ['y', 1], ['z', q(1, 2)])],
    ['div', m(['x', 2], ['y', 1]), m(['x', 3], ['y', 1]), m(['x', -1])],
    ['gcd', m(['x', 2], ['y', 1]), m(['x', 1], ['z', 3]), m(['x', 1])],
    ['gcd', m(['x', -1]), Monomial.ONE, m(['x', -1])],
    ['gcd', m(['x', q(3, 2)]), m(['x', q(1, 2)], ['y', 1]), m(['x', q(1, 2)])],
  ] as const)('%s', (op, a, b, expected) => {
    expect(a[op](b).equals(expected)).toBe(true);
  });

  it('reports degrees', () => {
    const a = m(['x', 2], ['y', q(1, 2)], ['z', -1]);
    expect(a.exponent('x').toString()).toBe('2');
    expect(a.exponent('w').toString()).toBe('0');
    expect(a.totalDegree.toString()).toBe('3/2');
    expect(a.symbols()).toEqual(['x', 'y', 'z']);
    expect(a.hasNaturalExponents()).toBe(false);
    expect(m(['x', 2]).hasNaturalExponents()).toBe(true);
  });

  it('raises to rational powers and tests divisibility', () => {
    expect(
      m(['O2', 1], ['k', 2])
        .pow(q(1, 2))
        .equals(m(['O2', q(1, 2)], ['k', 1])),
    ).toBe(true);
    expect(m(['x', 1]).divides(m(['x', 2], ['y', 1]))).toBe(true);
    expect(m(['x', 1], ['z', 1]).divides(m(['x', 2], ['y', 1]))).toBe(false);
  });

  it('orders by total degree, then by the exponent of the alphabetically first symbol', () => {
    const sorted = [m(['y', 1]), m(), m(['x', 1], ['z', 1]), m(['y', 2]), m(['x', 1])].sort((a, b) =>
      Monomial.compare(b, a),
    );
    expect(sorted.map((a) => a.key)).toEqual([
      m(['x', 1], ['z', 1]).key,
      m(['y', 2]).key,
      m(['x', 1]).key,
      m(['y', 1]).key,
      '',
    ]);
  });

  it('evaluates numerically and exactly', () => {
    const a = m(['x', 2], ['y', q(1, 2)], ['z', -1]);
    expect(
      a.evaluate(
        new Map([
          ['x', 3],
          ['y', 4],
          ['z', 2],
        ]),
      ),
    ).toBeCloseTo(9, 12);
    const exact = new Map([
      ['x', q(3)],
      ['y', q(9, 4)],
      ['z', q(2)],
    ]);
    expect(a.evaluateExact(exact)?.toString()).toBe('27/4');
    expect(
      a.evaluateExact(
        new Map([
          ['x', q(3)],
          ['y', q(2)],
          ['z', q(2)],
        ]),
      ),
    ).toBeUndefined();
    expect(() => a.evaluate(new Map([['x', 1]]))).toThrow(/y/);
  });
});

describe('MonomialHeap', () => {
  it('pops monomials in descending graded lexicographic order, duplicates included', () => {
    fc.assert(
      fc.property(fc.array(arbGeneralMonomial, { maxLength: 30 }), (ms) => {
        const heap = new MonomialHeap();
        ms.forEach((x) => heap.push(x));
        const popped: string[] = [];
        for (let x = heap.pop(); x !== undefined; x = heap.pop()) popped.push(x.key);
        expect(popped).toEqual([...ms].sort((a, b) => Monomial.compare(b, a)).map((x) => x.key));
      }),
      { numRuns: 60 },
    );
  });
});
