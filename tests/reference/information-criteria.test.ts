/**
 * AIC, AICc and Akaike weights against a published worked example, and BIC and the least-squares
 * log-likelihood against their defining formulas (no published worked example of BIC was found;
 * those checks compute the formulas independently here, and say so).
 */
import { describe, expect, it } from 'vitest';
import {
  akaikeWeights,
  informationCriteria,
  leastSquaresCriteria,
  leastSquaresLogLikelihood,
} from '../../src/engine/fitting/index.ts';

describe('the numerical example in J. Weiss, ECOL 145 course notes on model selection (University of North Carolina, 2006)', () => {
  // "A numerical example": five models with their maximised log-likelihoods and K; the page prints
  // AIC, AICc, Δ and the Akaike weights to two or three decimals. It does not print n; n = 47 is the
  // only sample size that reproduces both AICc columns (K = 3 and K = 5) to the printed digits.
  const models = [
    { logL: 27.1381, k: 3, aic: -48.28, aicc: -47.72, delta: 3.77, weight: 0.132 },
    { logL: 31.477, k: 5, aic: -52.95, aicc: -51.49, delta: 0, weight: 0.867 },
    { logL: 24.5254, k: 5, aic: -39.05, aicc: -37.59, delta: 13.9, weight: 0.001 },
    { logL: 21.762, k: 5, aic: -33.52, aicc: -32.06, delta: 19.43, weight: 0 },
    { logL: 19.7534, k: 3, aic: -33.5, aicc: -32.95, delta: 18.54, weight: 0 },
  ];
  const criteria = models.map((m) => informationCriteria(m.logL, m.k, 47));

  it('gives the printed AIC and AICc', () => {
    criteria.forEach((c, i) => {
      // Within one unit of the last printed digit: model 5's AIC, −33.5068, is printed −33.50.
      expect(Math.abs(c.aic - models[i]!.aic)).toBeLessThanOrEqual(0.01);
      expect(c.aicc).toBeCloseTo(models[i]!.aicc, 2);
    });
  });

  it('gives the printed differences and Akaike weights from AICc', () => {
    const { deltas, weights } = akaikeWeights(criteria.map((c) => c.aicc));
    deltas.forEach((d, i) => expect(d).toBeCloseTo(models[i]!.delta, 2));
    weights.forEach((w, i) => expect(w).toBeCloseTo(models[i]!.weight, 3));
    expect(weights.reduce((a, b) => a + b, 0)).toBeCloseTo(1, 12);
  });
});

describe('defining formulas, computed independently (no published worked example used)', () => {
  it('ln L of a least-squares fit is −n/2 (ln 2π + ln(RSS/n) + 1), and K counts the variance', () => {
    const rss = 836424.055505915; // the NIST Longley residual sum of squares, as a realistic number
    const n = 16;
    const expected = -8 * (Math.log(2 * Math.PI) + Math.log(rss / 16) + 1);
    expect(leastSquaresLogLikelihood(rss, n)).toBeCloseTo(expected, 10);
    const c = leastSquaresCriteria(rss, n, 7);
    expect(c.k).toBe(8);
    expect(c.aic).toBeCloseTo(-2 * expected + 16, 10);
    expect(c.aicc).toBeCloseTo(-2 * expected + 16 + (2 * 8 * 9) / (16 - 8 - 1), 10);
    expect(c.bic).toBeCloseTo(-2 * expected + 8 * Math.log(16), 10);
  });

  it('AICc is infinite when too few points remain for the correction, and weights ignore such models', () => {
    const c = informationCriteria(-10, 4, 5);
    expect(c.aicc).toBe(Infinity);
    const { weights, deltas } = akaikeWeights([c.aicc, 30, 32]);
    expect(weights[0]).toBe(0);
    expect(deltas[0]).toBe(Infinity);
    expect(weights[1]! / weights[2]!).toBeCloseTo(Math.exp(1), 12);
  });
});
