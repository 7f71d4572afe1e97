/** Orders from initial-rate tables: all varied species at once, held species, collinear designs, weights. */
import { describe, expect, it } from 'vitest';
import { fitInitialRateOrders } from '../../../src/engine/fitting/index.ts';

const law = (c: readonly number[]) => 0.3 * c[0]! ** 1 * c[1]! ** 0.5 * c[2]! ** -1;

describe('fitInitialRateOrders', () => {
  it('finds exact orders (1, ½, −1) of noiseless rates, and k_app', () => {
    const concentrations = [
      [0.1, 0.1, 0.01],
      [0.2, 0.1, 0.01],
      [0.1, 0.4, 0.01],
      [0.1, 0.1, 0.04],
      [0.3, 0.2, 0.02],
    ];
    const fit = fitInitialRateOrders({ species: ['A', 'B', 'L'], concentrations, rates: concentrations.map(law) });
    expect(fit.orders.map((o) => o.name)).toEqual(['A', 'B', 'L']);
    expect(fit.orders.map((o) => o.value)).toEqual([
      expect.closeTo(1, 10),
      expect.closeTo(0.5, 10),
      expect.closeTo(-1, 10),
    ]);
    expect(Math.exp(fit.lnApparentConstant.value)).toBeCloseTo(0.3, 10);
    expect(fit.held).toEqual([]);
    expect(fit.issues).toEqual([]);
  });

  it('reports a species held at one concentration instead of fitting it', () => {
    const concentrations = [0.1, 0.2, 0.4, 0.8].map((a) => [a, 0.05, 0.01]);
    const fit = fitInitialRateOrders({ species: ['A', 'B', 'L'], concentrations, rates: concentrations.map(law) });
    expect(fit.orders.map((o) => o.name)).toEqual(['A']);
    expect(fit.held).toEqual([
      { species: 'B', concentration: 0.05 },
      { species: 'L', concentration: 0.01 },
    ]);
  });

  it('flags orders that cannot be told apart when two species are always varied together', () => {
    const concentrations = [0.1, 0.2, 0.4, 0.8].map((a) => [a, a, 0.01]);
    const fit = fitInitialRateOrders({ species: ['A', 'B', 'L'], concentrations, rates: concentrations.map(law) });
    expect(fit.issues.map((i) => i.kind)).toContain('not-identifiable');
    expect(fit.orders.every((o) => !o.identifiable)).toBe(true);
  });

  it('weights each ln r by (r/u)²: a point with a large uncertainty barely moves the orders', () => {
    const concentrations = [0.1, 0.2, 0.4, 0.8, 1.6].map((a) => [a, 0.1, 0.01]);
    const rates = concentrations.map(law);
    rates[4] = rates[4]! * 3; // one bad point
    const trusting = fitInitialRateOrders({ species: ['A', 'B', 'L'], concentrations, rates });
    const weighted = fitInitialRateOrders({
      species: ['A', 'B', 'L'],
      concentrations,
      rates,
      rateUncertainties: rates.map((r, i) => (i === 4 ? 10 * r : 0.01 * r)),
    });
    expect(Math.abs(weighted.orders[0]!.value - 1)).toBeLessThan(0.01);
    expect(Math.abs(trusting.orders[0]!.value - 1)).toBeGreaterThan(0.1);
  });
});
