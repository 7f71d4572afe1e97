/**
 * Consecutive first-order reactions A → B → C against the analytic solution of Harcourt and
 * Esson (1866) and Bateman (1910), as given in P. Atkins & J. de Paula, Physical Chemistry,
 * section on consecutive elementary reactions (from memory):
 *   [A] = A0 e^{−k1 t},  [B] = A0 k1/(k2 − k1) (e^{−k1 t} − e^{−k2 t}),  [C] = A0 − [A] − [B],
 *   t_max = ln(k2/k1)/(k2 − k1),  [B]max = A0 (k1/k2)^{k2/(k2 − k1)}.
 */
import { describe, expect, it } from 'vitest';
import { integrateStiff } from '../../../src/engine/numeric/stiff-integrator.ts';
import { linearSystem } from './test-systems.ts';

const A0 = 0.1;
const analytic = (k1: number, k2: number, t: number) => {
  const a = A0 * Math.exp(-k1 * t);
  const b = ((A0 * k1) / (k2 - k1)) * (Math.exp(-k1 * t) - Math.exp(-k2 * t));
  return [a, b, A0 - a - b];
};
const relative = (x: number, ref: number) => Math.abs(x - ref) / Math.abs(ref);

describe.each([
  ['comparable constants', 1, 2.5],
  ['B faster than A (k2 < k1)', 3, 0.4],
  ['stiff: k2/k1 = 1e6', 1, 1e6],
])('A → B → C, %s (k1 = %d, k2 = %d)', (_, k1, k2) => {
  const system = linearSystem([
    [-k1, 0, 0],
    [k1, -k2, 0],
    [0, k2, 0],
  ]);
  const tMax = Math.log(k2 / k1) / (k2 - k1);
  const bMax = A0 * (k1 / k2) ** (k2 / (k2 - k1));
  const times = [0, tMax / 10, tMax, 3 * tMax, 0.3 / k1, 1 / k1, 3 / k1, 8 / Math.min(k1, k2)];
  const result = integrateStiff(system, Float64Array.of(A0, 0, 0), {
    tEnd: Math.max(...times),
    outputTimes: times,
    rtol: 1e-9,
    atol: 1e-20,
  });

  it('finishes, reporting exactly the requested times', () => {
    expect(result.status).toBe('ok');
    expect(result.t).toEqual([...times].sort((a, b) => a - b));
  });

  it('matches the analytic concentrations to 1e-6 relative (1e-16 absolute for traces)', () => {
    result.t.forEach((t, i) => {
      const exact = analytic(k1, k2, t);
      const y = result.y[i]!;
      for (let s = 0; s < 3; s++) expect(Math.abs(y[s]! - exact[s]!)).toBeLessThan(1e-6 * exact[s]! + 1e-16);
    });
  });

  it('peaks at t_max with [B]max from the textbook formula', () => {
    expect(relative(analytic(k1, k2, tMax)[1]!, bMax)).toBeLessThan(1e-12);
    const around = integrateStiff(system, Float64Array.of(A0, 0, 0), {
      tEnd: 1.01 * tMax,
      outputTimes: [0.99 * tMax, tMax, 1.01 * tMax],
      rtol: 1e-10,
      atol: 1e-20,
    });
    const [before, peak, after] = around.y.map((y) => y[1]!);
    expect(relative(peak!, bMax)).toBeLessThan(1e-7);
    expect(peak!).toBeGreaterThan(before!);
    expect(peak!).toBeGreaterThan(after!);
  });
});
