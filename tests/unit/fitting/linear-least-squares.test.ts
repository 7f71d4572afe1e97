/** Weighted linear least squares: exact recovery, weights, absolute uncertainties and rank deficiency. */
import { describe, expect, it } from 'vitest';
import { linearLeastSquares, studentTQuantile } from '../../../src/engine/fitting/index.ts';

describe('linearLeastSquares', () => {
  it('recovers the coefficients of noiseless data exactly, with zero residuals', () => {
    const x = [0, 1, 2, 3, 4, 5];
    const fit = linearLeastSquares({ design: x.map((v) => [1, v, v * v]), y: x.map((v) => 2 - 3 * v + 0.5 * v * v) });
    expect(fit.parameters.map((p) => p.value)).toEqual([
      expect.closeTo(2, 12),
      expect.closeTo(-3, 12),
      expect.closeTo(0.5, 12),
    ]);
    expect(fit.rss).toBeLessThan(1e-24);
    expect(fit.dof).toBe(3);
    expect(fit.rank).toBe(3);
  });

  it('a weight of 2 counts like the same point entered twice', () => {
    const design = [
      [1, 0],
      [1, 1],
      [1, 2],
      [1, 3],
    ];
    const y = [0.1, 1.3, 1.9, 3.2];
    const weighted = linearLeastSquares({ design, y, weights: [1, 2, 1, 1] });
    const repeated = linearLeastSquares({ design: [...design, design[1]!], y: [...y, y[1]!] });
    weighted.parameters.forEach((p, j) => expect(p.value).toBeCloseTo(repeated.parameters[j]!.value, 12));
    expect(weighted.rss).toBeCloseTo(repeated.rss, 12);
  });

  it('with absolute weights the covariance is (XᵀWX)⁻¹, not scaled by the residual variance', () => {
    // A straight line through three points with σ = 0.5 each: var(slope) = σ²/Σ(x − x̄)² = 0.25/2.
    const fit = linearLeastSquares({
      design: [
        [1, -1],
        [1, 0],
        [1, 1],
      ],
      y: [0, 3, 1],
      weights: [4, 4, 4],
      weighting: 'absolute',
    });
    expect(fit.parameters[1]!.standardError).toBeCloseTo(Math.sqrt(0.125), 12);
    expect(fit.parameters[0]!.standardError).toBeCloseTo(Math.sqrt(0.25 / 3), 12);
  });

  it('gives intervals of ± t(0.975, dof) standard errors', () => {
    const x = [1, 2, 3, 4, 5, 6, 7];
    const fit = linearLeastSquares({ design: x.map((v) => [1, v]), y: [2.1, 3.9, 6.2, 7.8, 10.1, 12.2, 13.8] });
    const slope = fit.parameters[1]!;
    expect((slope.interval[1] - slope.value) / slope.standardError).toBeCloseTo(studentTQuantile(0.975, 5), 12);
  });

  it('flags the coefficients that a rank-deficient design cannot separate, without throwing', () => {
    // The second and third columns are the same: only their sum is determined.
    const fit = linearLeastSquares({
      design: [
        [1, 1, 1],
        [1, 2, 2],
        [1, 3, 3],
        [1, 4, 4],
      ],
      y: [1, 2, 3, 4.1],
    });
    expect(fit.rank).toBe(2);
    expect(fit.parameters[0]!.identifiable).toBe(true);
    expect(fit.parameters[1]!.identifiable).toBe(false);
    expect(fit.parameters[2]!.identifiable).toBe(false);
    expect(fit.parameters[1]!.value + fit.parameters[2]!.value).toBeCloseTo(1.01, 1);
  });
});
