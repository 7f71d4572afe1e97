/** Neville's extrapolation to zero extent, checked on polynomials and a rational rate worked by hand. */
import { describe, expect, it } from 'vitest';
import { extrapolateToZero } from '../../../src/engine/simulation/extrapolate.ts';

const at = (extents: number[], rate: (x: number) => number) =>
  extents.map((extent) => ({ extent, rate: rate(extent) }));

describe('rate extrapolated to zero conversion', () => {
  it('is exact for a cubic through four readings, at any extents', () => {
    const cubic = (x: number) => 2 - 3 * x + 5 * x ** 2 - 7 * x ** 3;
    expect(extrapolateToZero(at([0.01, 0.02, 0.03, 0.04], cubic))).toBeCloseTo(2, 13);
    expect(extrapolateToZero(at([0.013, 0.021, 0.037, 0.052], cubic))).toBeCloseTo(2, 12);
  });

  it('is the line through two readings (2r(h) − r(2h), Richardson at halving steps)', () => {
    expect(
      extrapolateToZero([
        { extent: 1, rate: 5 },
        { extent: 2, rate: 7 },
      ]),
    ).toBe(3);
  });

  it('leaves an error of the size of the first term the cubic misses', () => {
    // r = 1/(1 + 4.5u): the quartic term is 4.5⁴u⁴; Lagrange's remainder at 0 through u = 0.01 … 0.04 is
    // about 4.5⁴ × 0.01 × 0.02 × 0.03 × 0.04 ≈ 1e-4 (the cubic's weights 4, −6, 4, −1 by hand).
    const r = (u: number) => 1 / (1 + 4.5 * u);
    const error = Math.abs(extrapolateToZero(at([0.01, 0.02, 0.03, 0.04], r)) - 1);
    expect(error).toBeLessThan(1.5e-4);
    expect(error).toBeGreaterThan(1e-6);
  });
});
