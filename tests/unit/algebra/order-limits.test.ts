import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { orderLimits, RationalFunction } from '../../../src/engine/exact/index.ts';
import { arbNonZeroPolynomial, rf } from './helpers.ts';

const limits = (text: string, symbol: string) => {
  const o = orderLimits(rf(text), symbol);
  return o && [o.low.toString(), o.high.toString()];
};

describe('orderLimits', () => {
  it.each([
    // Michaelis–Menten saturation: first order at low [S], zero order at high [S] (textbook result).
    ['V*S/(K + S)', 'S', ['1', '0']],
    ['V*S/(K + S)', 'V', ['1', '1']],
    ['V*S/(K + S)', 'K', ['0', '-1']],
    // A symbol absent from both sides: order 0 at both ends, not ±∞ from an empty minimum.
    ['V*S/(K + S)', 'I', ['0', '0']],
    // Competitive inhibition: order in inhibitor 0 → −1.
    ['k*S/(1 + K*I)', 'I', ['0', '-1']],
    // Half order from a dissociative pre-equilibrium, negative order from its product.
    ['k*O2^(1/2)*NO^2', 'O2', ['1/2', '1/2']],
    ['k*A^2/B', 'B', ['-1', '-1']],
    ['k*S^2/(1 + a*S + b*S^2)', 'S', ['2', '0']],
    // Terms of the numerator without the symbol make the low limit 0.
    ['(k1 + k2*S)/(1 + K*S^2)', 'S', ['0', '-1']],
  ])('%s in %s: [low, high] = %j', (text, symbol, expected) => {
    expect(limits(text, symbol)).toEqual(expected);
  });

  it('has no order for the zero function', () => {
    expect(orderLimits(RationalFunction.ZERO, 'x')).toBeUndefined();
  });

  it('the apparent order tends to the limits at extreme concentrations', () => {
    const order = rf('V*S/(K + S)').logDerivative('S')!;
    const at = (s: number) =>
      order.evaluate(
        new Map([
          ['V', 2],
          ['K', 0.5],
          ['S', s],
        ]),
      );
    expect(at(1e-9)).toBeCloseTo(1, 6);
    expect(at(1e9)).toBeCloseTo(0, 6);
  });

  it('orders add over products', () => {
    fc.assert(
      fc.property(arbNonZeroPolynomial, arbNonZeroPolynomial, arbNonZeroPolynomial, (a, b, c) => {
        const f = RationalFunction.of(a, b);
        const g = RationalFunction.of(c, a.add(b).isZero() ? b : a.add(b));
        const [of, og, ofg] = [orderLimits(f, 'x')!, orderLimits(g, 'x')!, orderLimits(f.mul(g), 'x')!];
        expect(ofg.low.equals(of.low.add(og.low))).toBe(true);
        expect(ofg.high.equals(of.high.add(og.high))).toBe(true);
      }),
      { numRuns: 40 },
    );
  });
});
