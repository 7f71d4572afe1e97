/**
 * A fast reversible equilibrium next to a slow step, A ⇌ B (k_f, k_r) then B → C (k3), with
 * k_f/k3 = 1e12. After the transient (≈ 1/(k_f + k_r)) the exact solution is one slow mode, on
 * which [B]/[A] = (k_f + λ_slow)/k_r = K − 1.7e-13 relative: the pre-equilibrium holds (the
 * textbook pre-equilibrium treatment, e.g. Atkins & de Paula, Physical Chemistry, from memory).
 */
import { describe, expect, it } from 'vitest';
import { integrateStiff, type OdeSystem } from '../../../src/engine/numeric/stiff-integrator.ts';

const kf = 1e6;
const kr = 2e6;
const k3 = 1e-6;
const K = kf / kr;
// Written reaction by reaction, as mass action is: each net rate is computed once and added to
// every species it changes, so the fast forward and reverse rates cancel exactly between A and B.
// (Summing a row −kf[A] + kr[B] and another kf[A] − (kr + k3)[B] instead loses k3 to rounding.)
const system: OdeSystem = {
  size: 3,
  rhs(_t, y, dydt) {
    const fast = kf * y[0]! - kr * y[1]!;
    const slowStep = k3 * y[1]!;
    dydt[0] = -fast;
    dydt[1] = fast - slowStep;
    dydt[2] = slowStep;
  },
  jacobian(_t, _y, J) {
    J.set([-kf, kr, 0, kf, -kr - k3, 0, 0, k3, 0]);
  },
};
// Eigenvalues of the (A, B) block; the slow one as det/λ_fast, which avoids cancellation.
const trace = -(kf + kr + k3);
const fast = (trace - Math.sqrt(trace * trace - 4 * kf * k3)) / 2;
const slow = (kf * k3) / fast;
// From [A]0 = 1, [B]0 = 0: the slow mode's amplitude in [A].
const slowA = (-(kf + fast) / (kr * (slow - fast))) * kr;

describe('fast pre-equilibrium beside a slow step (rate-constant ratio 1e12)', () => {
  const slowPhase = [1e-3, 1e-1, 10, 1e3, 1e5, 1e6, 3e6, 1e7, 3e7];
  const result = integrateStiff(system, Float64Array.of(1, 0, 0), {
    tEnd: 1e9,
    outputTimes: [0, 1e-8, 1e-6, ...slowPhase],
    rtol: 1e-8,
    atol: 1e-16,
    nonNegative: true,
  });

  it('finishes without max-steps, in few steps, with every concentration non-negative', () => {
    expect(result.status).toBe('ok');
    expect(result.steps).toBeLessThan(6000);
    for (const y of result.y) for (const v of y) expect(v).toBeGreaterThanOrEqual(0);
  });

  it('holds [B]/[A] = K to 1e-6 throughout the slow phase', () => {
    result.t.forEach((t, i) => {
      if (t < slowPhase[0]!) return;
      const y = result.y[i]!;
      expect(Math.abs(y[1]! / y[0]! - K) / K).toBeLessThan(1e-6);
    });
  });

  it('follows the exact slow decay to 1e-6 and conserves A + B + C to 1e-7', () => {
    result.t.forEach((t, i) => {
      const y = result.y[i]!;
      // Not to rounding level: each linear solve with h‖J‖ ≈ 1e10 is backward stable only, which
      // leaves about h‖J‖ε ≈ 1e-6 of each step's change out of balance (seen: ≈ 1e-8 in total).
      expect(Math.abs(y[0]! + y[1]! + y[2]! - 1)).toBeLessThan(1e-7);
      if (t >= slowPhase[0]!) expect(Math.abs(y[0]! / (slowA * Math.exp(slow * t)) - 1)).toBeLessThan(1e-6);
    });
  });
});
