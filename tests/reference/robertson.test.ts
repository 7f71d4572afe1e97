/**
 * Robertson's chemical kinetics problem (H. H. Robertson, "The solution of a set of reaction rate
 * equations", 1966): A → B (0.04), B + C → A + C (1e4), 2 B → B + C (3e7), i.e.
 *   y1' = −0.04 y1 + 1e4 y2 y3,  y2' = 0.04 y1 − 1e4 y2 y3 − 3e7 y2²,  y3' = 3e7 y2²,  y(0) = (1, 0, 0).
 * The classic stiff kinetics test: rate constants 9 orders apart, integrated to t = 1e11.
 */
import { describe, expect, it } from 'vitest';
import { integrateStiff, type IntegrateOptions, type OdeSystem } from '../../src/engine/numeric/stiff-integrator.ts';

// Reaction by reaction, so that each rate leaves one species exactly as it enters another.
const robertson: OdeSystem = {
  size: 3,
  rhs(_t, y, dydt) {
    const r1 = 0.04 * y[0]!;
    const r2 = 1e4 * y[1]! * y[2]!;
    const r3 = 3e7 * y[1]! * y[1]!;
    dydt[0] = -r1 + r2;
    dydt[1] = r1 - r2 - r3;
    dydt[2] = r3;
  },
  jacobian(_t, y, J) {
    const [y2, y3] = [y[1]!, y[2]!];
    J.set([-0.04, 1e4 * y3, 1e4 * y2, 0.04, -1e4 * y3 - 6e7 * y2, -1e4 * y2, 0, 6e7 * y2, 0]);
  },
};

// Hairer & Wanner, Solving ODEs II, the Robertson example of chapter IV (from memory, 10 digits).
const PUBLISHED_AT_40 = [0.7158270687, 9.185534765e-6, 0.2841637457];
// Mazzia & Magherini, Test Set for IVP Solvers (release 2.4), problem ROBER, reference solution at
// t = 1e11 (from memory; the same 16 digits are widely quoted as that test set's reference).
const PUBLISHED_AT_1E11 = [0.2083340149701255e-7, 0.8333360770334713e-13, 0.999999979166505];

const outputTimes = [0.4, 4, 40, 400, 4e3, 4e4, 4e5, 4e6, 4e7, 4e8, 4e9, 4e10, 1e11];
const relative = (y: Float64Array, ref: readonly number[]) =>
  Math.max(...ref.map((r, i) => Math.abs(y[i]! - r) / Math.abs(r)));
// y2 peaks at 3.6e-5 and falls to 8e-14, so its absolute tolerance must sit far below the others'.
const run = (rtol: number, extra: Partial<IntegrateOptions> = {}) =>
  integrateStiff(robertson, Float64Array.of(1, 0, 0), {
    tEnd: 1e11,
    rtol,
    atol: Float64Array.of(1e-6 * rtol, 1e-12 * rtol, 1e-6 * rtol),
    maxSteps: 1_000_000,
    ...extra,
  });
const at = (result: ReturnType<typeof run>, t: number) => result.y[result.t.indexOf(t)]!;

describe('Robertson (1966) to t = 1e11', () => {
  const main = run(1e-8, { outputTimes });
  // Independent check: the same problem with a thousand times tighter tolerance.
  const reference = run(1e-11, { outputTimes });

  it('agrees with the published values: 1e-6 at t = 40, 1e-5 at t = 1e11 (rtol 1e-8)', () => {
    expect(main.status).toBe('ok');
    expect(relative(at(main, 40), PUBLISHED_AT_40)).toBeLessThan(1e-6);
    expect(relative(at(main, 1e11), PUBLISHED_AT_1E11)).toBeLessThan(1e-5);
  });

  it('has a tight-tolerance run that reproduces the published values far more closely', () => {
    expect(reference.status).toBe('ok');
    expect(relative(at(reference, 40), PUBLISHED_AT_40)).toBeLessThan(1e-9);
    expect(relative(at(reference, 1e11), PUBLISHED_AT_1E11)).toBeLessThan(1e-7);
  });

  it('agrees with the tight run to 1e-5 at every output, and converges as the tolerance shrinks', () => {
    const error = (r: ReturnType<typeof run>) =>
      Math.max(...outputTimes.map((t) => relative(at(r, t), Array.from(at(reference, t)))));
    expect(error(main)).toBeLessThan(1e-5);
    const loose = error(run(1e-6, { outputTimes }));
    const tight = error(run(1e-10, { outputTimes }));
    // An order-3 method under error-per-step control: about 100^(3/4) ≈ 30 per factor 100 in rtol.
    expect(loose / error(main)).toBeGreaterThan(10);
    expect(error(main) / tight).toBeGreaterThan(10);
  });

  it('conserves y1 + y2 + y3 = 1 to 1e-10 at every step and output', () => {
    const everyStep = run(1e-8);
    for (const result of [main, reference, everyStep]) {
      for (const y of result.y) expect(Math.abs(y[0]! + y[1]! + y[2]! - 1)).toBeLessThan(1e-10);
    }
  });

  it('lets the step grow past 1e9 and finishes in a few thousand steps', () => {
    const everyStep = run(1e-8);
    const largest = Math.max(...everyStep.t.slice(1).map((t, i) => t - everyStep.t[i]!));
    expect(largest).toBeGreaterThan(1e9);
    expect(everyStep.steps).toBeLessThan(10_000);
    expect(everyStep.t.at(-1)).toBe(1e11);
  });

  it('with nonNegative, survives a loose tolerance that otherwise drives y2 negative and away', () => {
    const loose = integrateStiff(robertson, Float64Array.of(1, 0, 0), {
      tEnd: 1e11,
      rtol: 1e-2,
      atol: 1e-2,
      nonNegative: true,
    });
    expect(loose.status).toBe('ok');
    for (const y of loose.y) for (const v of y) expect(v).toBeGreaterThanOrEqual(0);
    expect(loose.y.at(-1)![2]).toBeCloseTo(1, 1);
  });
});
