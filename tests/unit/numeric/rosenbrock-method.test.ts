/**
 * The Rosenbrock coefficients: order conditions, observed orders and stability.
 * Order conditions: Hairer & Wanner, Solving ODEs II, section IV.7, Table 7.1 (from memory);
 * the observed-order tests check them independently of that memory.
 */
import { describe, expect, it } from 'vitest';
import { ROSENBROCK_METHOD, ROSENBROCK_TABLEAU as T } from '../../../src/engine/numeric/rosenbrock-method.ts';
import type { OdeSystem } from '../../../src/engine/numeric/stiff-integrator.ts';
import { fixedSteps, linearSystem } from './test-systems.ts';

const s = T.b.length;
const beta = (i: number, j: number) => T.alpha[i]![j]! + T.gammaBelow[i]![j]!;
const sum = (f: (i: number) => number) => Array.from({ length: s }, (_, i) => f(i)).reduce((a, b) => a + b, 0);
const alphaI = (i: number) => sum((j) => T.alpha[i]![j]!);
const betaPrime = (i: number) => sum((j) => (j < i ? beta(i, j) : 0));
const g = T.gamma;

describe('order conditions (Hairer & Wanner II, Table IV.7.1, from memory)', () => {
  it.each([
    ['Σ bᵢ = 1', (b: readonly number[]) => sum((i) => b[i]!), 1],
    ['Σ bᵢ βᵢ′ = 1/2 − γ', (b: readonly number[]) => sum((i) => b[i]! * betaPrime(i)), 1 / 2 - g],
  ])('main and embedded formula: %s', (_, condition, expected) => {
    expect(condition(T.b)).toBeCloseTo(expected, 15);
    expect(condition(T.bEmbedded)).toBeCloseTo(expected, 15);
  });

  it('order 3 for the main formula: Σ bᵢ αᵢ² = 1/3 and Σ bᵢ βᵢⱼ βⱼ′ = 1/6 − γ + γ²', () => {
    expect(sum((i) => T.b[i]! * alphaI(i) ** 2)).toBeCloseTo(1 / 3, 15);
    expect(sum((i) => T.b[i]! * sum((j) => (j < i ? beta(i, j) * betaPrime(j) : 0)))).toBeCloseTo(
      1 / 6 - g + g * g,
      15,
    );
  });

  it('is stiffly accurate in both formulas (β_4j = b_j, α_4j = β_3j), so the error estimate is the last stage', () => {
    for (let j = 0; j < 3; j++) expect(beta(3, j)).toBeCloseTo(T.b[j]!, 15);
    for (let j = 0; j < 2; j++) expect(T.alpha[3]![j]).toBeCloseTo(beta(2, j), 15);
    expect(T.b[3]).toBe(g);
    expect(T.alpha[3]![2]).toBe(g);
    expect(T.bEmbedded).toEqual([beta(2, 0), beta(2, 1), g, 0]);
    ROSENBROCK_METHOD.errorWeights.forEach((w, j) => expect(w).toBeCloseTo(j === 3 ? 1 : 0, 14));
  });
});

/** log2 of successive error ratios when the step is halved. */
function observedOrders(error: (steps: number) => number, steps: number[]): number[] {
  const e = steps.map(error);
  return e.slice(1).map((v, i) => Math.log2(e[i]! / v));
}

describe('observed convergence order of the fixed method (halving the step)', () => {
  const decay = linearSystem([[-1]]);
  // Coarse enough that rounding (≈1e-16) stays far below the errors (≥ 6e-11), fine enough to be asymptotic.
  const steps = [40, 80, 160, 320, 640];

  it("y' = −y: order 3, embedded order 2", () => {
    const exact = Math.exp(-1);
    const main = observedOrders((n) => Math.abs(fixedSteps(decay, Float64Array.of(1), 1, n)[0]! - exact), steps);
    const embedded = observedOrders(
      (n) => Math.abs(fixedSteps(decay, Float64Array.of(1), 1, n, 'embedded')[0]! - exact),
      steps,
    );
    for (const p of main) expect(p).toBeCloseTo(3, 1);
    for (const p of embedded) expect(p).toBeCloseTo(2, 1);
  });

  it("nonlinear y' = −y² (exact 1/(1 + t)), which tests Σ bᵢ αᵢ² = 1/3 too: order 3", () => {
    const square: OdeSystem = {
      size: 1,
      rhs: (_t, y, d) => void (d[0] = -y[0]! * y[0]!),
      jacobian: (_t, y, J) => void (J[0] = -2 * y[0]!),
    };
    const orders = observedOrders((n) => Math.abs(fixedSteps(square, Float64Array.of(1), 1, n)[0]! - 1 / 2), steps);
    for (const p of orders) expect(p).toBeCloseTo(3, 1);
  });
});

describe('stability', () => {
  it('has the stability function (1 − z + z³/6)/(1 − z/2)⁴', () => {
    for (const z of [-0.5, -3, -40, 2.5]) {
      const y = fixedSteps(linearSystem([[z]]), Float64Array.of(1), 1, 1)[0]!;
      const r = (1 - z + z ** 3 / 6) / (1 - z / 2) ** 4;
      expect(Math.abs(y - r)).toBeLessThan(1e-14 * Math.max(1, Math.abs(r)));
    }
  });

  it('is A-stable: one step of a rotation never grows the norm, for hω up to 1e8', () => {
    for (let e = -2; e <= 8; e += 0.25) {
      const w = 10 ** e;
      const y = fixedSteps(
        linearSystem([
          [0, -w],
          [w, 0],
        ]),
        Float64Array.of(1, 0),
        1,
        1,
      );
      expect(Math.hypot(y[0]!, y[1]!)).toBeLessThanOrEqual(1 + 1e-14);
    }
  });

  it('is L-stable: a mode with hλ = −1e12 is damped in one step', () => {
    const y = fixedSteps(linearSystem([[-1e12]]), Float64Array.of(1), 1, 1)[0]!;
    expect(Math.abs(y)).toBeLessThan(1e-11);
  });
});
