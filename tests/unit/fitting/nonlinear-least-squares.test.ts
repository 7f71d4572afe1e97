/** The Levenberg–Marquardt wrapper's own duties: log parameters, flags for what the data do not determine, no throwing. */
import { describe, expect, it } from 'vitest';
import { fitNonlinear } from '../../../src/engine/fitting/index.ts';

// Michaelis–Menten rates v = V S/(K + S), noiseless apart from a fixed small pattern.
const wiggle = [0.01, -0.012, 0.008, -0.01, 0.011, -0.009, 0.012, -0.01];
const rates = (S: readonly number[], V: number, K: number) => S.map((s, i) => ((V * s) / (K + s)) * (1 + wiggle[i]!));
const michaelis =
  (S: readonly number[]) =>
  ([V, K]: readonly number[]) =>
    S.map((s) => (V! * s) / (K! + s));

describe('fitNonlinear', () => {
  it('fits positive parameters as logarithms: intervals are exp(ln p ± t SE) and stay positive', () => {
    const S = [0.1, 0.2, 0.5, 1, 2, 5, 10, 20];
    const fit = fitNonlinear({
      parameters: [
        { name: 'V', initial: 1, positive: true },
        { name: 'K', initial: 1, positive: true },
      ],
      y: rates(S, 3, 1.5),
      model: michaelis(S),
    });
    expect(fit.converged).toBe(true);
    const K = fit.parameters[1]!;
    expect(K.scale).toBe('log');
    expect(K.value).toBeCloseTo(1.5, 1);
    expect(K.interval[0]).toBeGreaterThan(0);
    // Asymmetric about the value, symmetric about its logarithm.
    expect(Math.log(K.interval[1]) - Math.log(K.value)).toBeCloseTo(Math.log(K.value) - Math.log(K.interval[0]), 10);
    // The delta method: SE(K) = K SE(ln K).
    expect(K.standardError).toBeCloseTo(K.value * K.logStandardError!, 12);
    expect(fit.correlation[0]![1]).toBeGreaterThan(0);
  });

  it('flags K_M as not identifiable when every substrate concentration is far above it', () => {
    const S = [50, 60, 80, 100, 120, 150, 200, 250];
    const fit = fitNonlinear({
      parameters: [
        { name: 'V', initial: 2, positive: true },
        { name: 'K', initial: 0.5, positive: true },
      ],
      y: rates(S, 3, 0.01),
      model: michaelis(S),
    });
    expect(fit.parameters[0]!.identifiable).toBe(true);
    expect(fit.parameters[1]!.identifiable).toBe(false);
    expect(fit.issues.some((i) => i.kind === 'not-identifiable' && i.parameter === 'K')).toBe(true);
  });

  it('flags two parameters that only enter as a product (singular covariance)', () => {
    const x = [1, 2, 3, 4, 5, 6];
    const fit = fitNonlinear({
      parameters: [
        { name: 'a', initial: 1, positive: true },
        { name: 'b', initial: 2, positive: true },
      ],
      y: x.map((v, i) => 6 * v * (1 + wiggle[i]!)),
      model: ([a, b]) => x.map((v) => a! * b! * v),
    });
    expect(fit.parameters.every((p) => !p.identifiable)).toBe(true);
    expect(fit.parameters[0]!.value * fit.parameters[1]!.value).toBeCloseTo(6, 1);
  });

  it('says when it has not converged within its budget', () => {
    const S = [0.1, 0.2, 0.5, 1, 2, 5, 10, 20];
    const fit = fitNonlinear(
      {
        parameters: [
          { name: 'V', initial: 100, positive: true },
          { name: 'K', initial: 1e-4, positive: true },
        ],
        y: rates(S, 3, 1.5),
        model: michaelis(S),
      },
      { maxIterations: 2 },
    );
    expect(fit.converged).toBe(false);
    expect(fit.issues.map((i) => i.kind)).toContain('not-converged');
  });

  it('returns a diagnosis, not an exception, when the model cannot be evaluated at the start', () => {
    const fit = fitNonlinear({
      parameters: [{ name: 'a', initial: 1 }],
      y: [1, 2, 3],
      model: () => [NaN, NaN, NaN],
    });
    expect(fit.converged).toBe(false);
    expect(fit.issues.map((i) => i.kind)).toContain('model-failed');
  });
});
