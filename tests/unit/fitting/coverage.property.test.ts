/**
 * Coverage: data generated from a known law with known constants plus normal noise, fitted back
 * many times; the 95 % intervals must contain the true values about 95 % of the time. fast-check
 * (fixed seed) draws the true constants and a seed per data set; the noise and the design come
 * from a small generator on that seed, because fast-check's doubles lean towards edge cases on
 * purpose and are not a sample of a distribution. With 200 data sets the share of hits has a
 * binomial standard deviation of about 1.5 %, so 95 % ± 4.5 % is a three-sigma band.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { fitInitialRateOrders, fitNonlinear } from '../../../src/engine/fitting/index.ts';

const SEED = 13;

/** mulberry32 uniforms on [0, 1) and Box–Muller normal deviates from one 32-bit seed. */
function stream(seed: number): { uniform: () => number; normal: () => number } {
  let a = seed >>> 0;
  const uniform = () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  const normal = () => Math.sqrt(-2 * Math.log(1 - uniform())) * Math.cos(2 * Math.PI * uniform());
  return { uniform, normal };
}
const seeds = fc.integer({ min: 0, max: 2 ** 31 - 1 });

describe('coverage of the 95 % intervals', () => {
  it('orders from initial-rate tables: r = k [A]^a [B]^b with 5 % noise, 12 runs each', () => {
    const dataSet = fc.record({
      a: fc.double({ min: 0.3, max: 2, noNaN: true }),
      b: fc.double({ min: -1, max: 1.5, noNaN: true }),
      seed: seeds,
    });
    const sets = fc.sample(dataSet, { seed: SEED, numRuns: 200 });
    let hits = 0;
    for (const s of sets) {
      const { uniform, normal } = stream(s.seed);
      // Concentrations log-uniform between 1 mM and 1 M.
      const concentrations = Array.from({ length: 12 }, () => [1e-3 * 1e3 ** uniform(), 1e-3 * 1e3 ** uniform()]);
      const rates = concentrations.map(([A, B]) => 0.7 * A! ** s.a * B! ** s.b * Math.exp(0.05 * normal()));
      const [a] = fitInitialRateOrders({ species: ['A', 'B'], concentrations, rates }).orders;
      if (a!.interval[0] <= s.a && s.a <= a!.interval[1]) hits++;
    }
    expect(hits / sets.length).toBeGreaterThan(0.905);
    expect(hits / sets.length).toBeLessThan(0.995);
  });

  it('a saturation constant fitted on the log scale: v = V S/(K + S) with 3 % noise, 10 points each', () => {
    const S = [0.05, 0.1, 0.2, 0.4, 0.8, 1.6, 3.2, 6.4, 12.8, 25.6];
    const dataSet = fc.record({ K: fc.double({ min: 0.3, max: 3, noNaN: true }), seed: seeds });
    const sets = fc.sample(dataSet, { seed: SEED, numRuns: 200 });
    let hits = 0;
    for (const s of sets) {
      const { normal } = stream(s.seed);
      const y = S.map((x) => ((2 * x) / (s.K + x)) * (1 + 0.03 * normal()));
      // Relative noise: weights 1/v² make the residuals comparable, as a chemist would weight them.
      const fit = fitNonlinear({
        parameters: [
          { name: 'V', initial: 1, positive: true },
          { name: 'K', initial: 1, positive: true },
        ],
        y,
        weights: y.map((v) => 1 / (v * v)),
        model: ([V, K]) => S.map((x) => (V! * x) / (K! + x)),
      });
      const K = fit.parameters[1]!;
      if (fit.converged && K.interval[0] <= s.K && s.K <= K.interval[1]) hits++;
    }
    // The interval of a nonlinear fit is a linear approximation: close to, not exactly, 95 %.
    expect(hits / sets.length).toBeGreaterThan(0.88);
    expect(hits / sets.length).toBeLessThan(0.995);
  });
});
