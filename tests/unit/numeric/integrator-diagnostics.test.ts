/** Statuses instead of throws: the step budget, non-finite values, edge cases of the span. */
import { describe, expect, it } from 'vitest';
import { integrateStiff, type OdeSystem } from '../../../src/engine/numeric/stiff-integrator.ts';
import { linearSystem } from './test-systems.ts';

const stiffPair = linearSystem([
  [-1e6, 2e6, 0],
  [1e6, -2e6 - 1e-6, 0],
  [0, 1e-6, 0],
]);
const constant = (value: number, jacobianValue = 0): OdeSystem => ({
  size: 1,
  rhs: (_t, _y, d) => void (d[0] = value),
  jacobian: (_t, _y, J) => void (J[0] = jacobianValue),
});

describe('integrateStiff diagnostics', () => {
  it("stops with 'max-steps' and says where, keeping the solution reached", () => {
    const r = integrateStiff(stiffPair, Float64Array.of(1, 0, 0), { tEnd: 1e9, maxSteps: 5 });
    expect(r).toMatchObject({ status: 'max-steps' });
    expect(r.steps + r.rejected).toBe(5);
    expect(r.message).toMatch(/needed more than 5 steps before t = 1e\+9/);
    expect(r.t.length).toBe(r.steps + 1);
    expect(r.t.at(-1)!).toBeLessThan(1e9);
  });

  it("reports a right-hand side that is not finite from the start as 'non-finite'", () => {
    const r = integrateStiff(constant(Number.NaN), Float64Array.of(1), { tEnd: 1 });
    expect(r).toMatchObject({ status: 'non-finite', steps: 0 });
    expect(r.message).toMatch(/component 0/);
  });

  it("reports a right-hand side that turns non-finite later as 'non-finite', near where it does", () => {
    const system: OdeSystem = {
      size: 1,
      rhs: (t, y, d) => void (d[0] = t < 0.5 ? -y[0]! : Number.NaN),
      jacobian: (_t, _y, J) => void (J[0] = -1),
    };
    const r = integrateStiff(system, Float64Array.of(1), { tEnd: 2 });
    expect(r.status).toBe('non-finite');
    expect(r.t.at(-1)!).toBeCloseTo(0.5, 6);
  });

  it("reports a non-finite Jacobian or initial value as 'non-finite'", () => {
    expect(integrateStiff(constant(0, Number.POSITIVE_INFINITY), Float64Array.of(1), { tEnd: 1 }).status).toBe(
      'non-finite',
    );
    expect(integrateStiff(constant(0), Float64Array.of(Number.NaN), { tEnd: 1 }).status).toBe('non-finite');
  });

  it('starts from zero concentrations (nothing present, then a source)', () => {
    const none = integrateStiff(stiffPair, new Float64Array(3), { tEnd: 1e9 });
    expect(none.status).toBe('ok');
    expect(Array.from(none.y.at(-1)!)).toEqual([0, 0, 0]);
    const source = integrateStiff(constant(2e-3), Float64Array.of(0), { tEnd: 1e3, outputTimes: [1e3] });
    expect(source.status).toBe('ok');
    expect(source.y[0]![0]).toBeCloseTo(2, 12);
  });

  it('returns exactly the output times inside the span, sorted, with t0 and repeats', () => {
    const decay = linearSystem([[-1]]);
    const r = integrateStiff(decay, Float64Array.of(1), { t0: 1, tEnd: 3, outputTimes: [2.5, 1, 5, 2, 2, 0] });
    expect(r.t).toEqual([1, 2, 2, 2.5]);
    r.t.forEach((t, i) => expect(r.y[i]![0]).toBeCloseTo(Math.exp(-(t - 1)), 6));
  });

  it('stops at the first reported point where `until` holds, computing nothing past it', () => {
    // y' = −y from 1: y falls below 1/2 at ln 2 ≈ 0.693 s; the output after it is 0.75 s.
    const decay = linearSystem([[-1]]);
    const outputTimes = Array.from({ length: 40 }, (_, i) => (i + 1) / 4);
    const r = integrateStiff(decay, Float64Array.of(1), { tEnd: 10, outputTimes, until: (_t, y) => y[0]! < 0.5 });
    expect(r).toMatchObject({ status: 'ok', stopped: true });
    expect(r.t.at(-1)).toBe(0.75);
    expect(r.y.at(-2)![0]).toBeGreaterThanOrEqual(0.5);
    const free = integrateStiff(decay, Float64Array.of(1), { tEnd: 10, until: (_t, y) => y[0]! < 0.5 });
    expect(free.stopped).toBe(true);
    expect(free.t.at(-1)!).toBeGreaterThan(Math.LN2);
    expect(free.t.at(-1)!).toBeLessThan(10);
  });

  it('returns the initial state alone when the span is empty', () => {
    const r = integrateStiff(stiffPair, Float64Array.of(1, 0, 0), { tEnd: 0 });
    expect(r).toMatchObject({ status: 'ok', t: [0], steps: 0 });
  });

  it('throws only on API misuse (sizes that do not match)', () => {
    expect(() => integrateStiff(stiffPair, Float64Array.of(1), { tEnd: 1 })).toThrow(RangeError);
    expect(() => integrateStiff(stiffPair, Float64Array.of(1, 0, 0), { tEnd: 1, atol: Float64Array.of(1) })).toThrow(
      RangeError,
    );
  });
});
