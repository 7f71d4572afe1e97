/**
 * Three-valued verdicts on observed orders: pass and fail only where the law fixes the order (at
 * the conditions, or whatever the constants); not excluded where unknown constants leave it open;
 * unknown without a prediction. The bounds are checked against the apparent order computed at
 * random positive values, independently of the bounds' own derivation.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Polynomial, RationalFunction } from '../../src/engine/exact/index.ts';
import { Rational } from '../../src/engine/exact/rational.ts';
import { judgeOrder } from '../../src/engine/observations/judge-order.ts';
import { orderBounds } from '../../src/engine/observations/order-bounds.ts';

const x = (e = 1) => Polynomial.symbol('x', e);
const y = (e = 1) => Polynomial.symbol('y', e);
const c = (n: number) => Polynomial.constant(n);
const r = (n: number, d = 1) => Rational.of(n, d);
const judge = (observed: number, prediction: Parameters<typeof judgeOrder>[5]) =>
  judgeOrder('o', 'X', 'steady_state', observed, 0.1, prediction);

describe('orderBounds', () => {
  it('Michaelis–Menten x/(1 + x): orders from 0 to 1', () => {
    expect(orderBounds(RationalFunction.of(x(), c(1).add(x())), 'x')).toEqual([r(0), r(1)]);
  });

  it('two paths in the numerator widen the bound beyond the limits: (x + 100 x²)/(1 + x) allows 0 to 2', () => {
    // Limits: 1 − 0 = 1 at low x, 2 − 1 = 1 at high x; yet at x = 0.1 the order is
    // (1 + 20)/(1 + 10) − 0.1/1.1 ≈ 1.82, well above both.
    const law = RationalFunction.of(x().add(x(2).mul(c(100))), c(1).add(x()));
    expect(orderBounds(law, 'x')).toEqual([r(0), r(2)]);
    expect(law.logDerivative('x')!.evaluate(new Map([['x', 0.1]]))).toBeCloseTo(21 / 11 - 0.1 / 1.1, 12);
  });

  it('a law with terms of both signs bounds nothing', () => {
    expect(orderBounds(RationalFunction.of(x().sub(y()), c(1).add(x())), 'x')).toBe('unbounded');
  });

  it('the apparent order at any positive values lies within the bound', () => {
    // N = a x + b x² y, D = 1 + d x y + e x³: bound [1 − 3, 2 − 0] = [−2, 2].
    const law = (a: number, b: number, d: number, e: number) =>
      RationalFunction.of(
        x()
          .mul(c(a))
          .add(x(2).mul(y()).mul(c(b))),
        c(1)
          .add(x().mul(y()).mul(c(d)))
          .add(x(3).mul(c(e))),
      );
    const [lo, hi] = orderBounds(law(1, 1, 1, 1), 'x') as [Rational, Rational];
    expect([lo.toNumber(), hi.toNumber()]).toEqual([-2, 2]);
    const positive = fc.double({ min: 1e-3, max: 1e3, noNaN: true });
    fc.assert(
      fc.property(positive, positive, positive, positive, positive, positive, (a, b, d, e, xv, yv) => {
        const f = law(a, b, d, e);
        const order = f.logDerivative('x')!.evaluate(
          new Map([
            ['x', xv],
            ['y', yv],
          ]),
        );
        expect(order).toBeGreaterThanOrEqual(-2 - 1e-9);
        expect(order).toBeLessThanOrEqual(2 + 1e-9);
      }),
      { numRuns: 60 },
    );
  });
});

describe('judgeOrder', () => {
  const limits = { low: r(1), high: r(0) };

  it('passes or fails only on an order the law fixes', () => {
    expect(judge(0.52, { atConditions: 0.5 })).toMatchObject({ status: 'pass', basis: 'conditions', predicted: 0.5 });
    expect(judge(0.8, { atConditions: 0.5 })).toMatchObject({ status: 'fail', basis: 'conditions' });
    expect(judge(1, { bounds: [r(1), r(1)], limits: { low: r(1), high: r(1) } })).toMatchObject({
      status: 'pass',
      basis: 'limits',
      predicted: 1,
    });
  });

  it('is not excluded where unknown constants allow the order, and fails outside every allowed order', () => {
    expect(judge(0.5, { bounds: [r(0), r(1)], limits })).toMatchObject({
      status: 'not_excluded',
      range: [0, 1],
      limits: [1, 0],
    });
    expect(judge(1.5, { bounds: [r(0), r(1)], limits })).toMatchObject({ status: 'fail', range: [0, 1] });
  });

  it('with terms of both signs and no constants it is never a pass', () => {
    expect(judge(1, { bounds: 'unbounded', limits }).status).toBe('not_excluded');
  });

  it('with no prediction, or a non-finite one, it is unknown and says why — never a pass', () => {
    const none = judge(1, { missing: 'no closed form' });
    expect(none).toMatchObject({ status: 'unknown', basis: 'none', reason: 'no closed form' });
    expect(none.predicted).toBeUndefined();
    expect(judge(1, { atConditions: Number.NaN }).status).toBe('unknown');
    expect(judge(1, { atConditions: Number.POSITIVE_INFINITY }).status).toBe('unknown');
  });
});
