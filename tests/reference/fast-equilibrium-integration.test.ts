/**
 * A rapid pre-equilibrium beside a slow step: E + S ⇌ ES (k₁ = 1e9 M^-1 s^-1, k₋₁ = 1e9 s^-1),
 * ES → E + P (k₂ = 1 s^-1), [E]₀ = 1 nM, [S]₀ = 1 M, integrated to 1 % conversion (t ≈ 2e7 s) with
 * the settings of the initial-rate simulation. The binding equilibrates in nanoseconds and then
 * holds for 2e7 s, so the fast terms k₁[E][S] and k₋₁[ES], each 0.5 M s^-1, cancel to 5e-10 M s^-1
 * for 28 decades of time. Michaelis & Menten's rapid-equilibrium treatment (Biochem. Z. 49, 1913;
 * from memory) gives, with K = k₁/k₋₁ = 1 M^-1:
 *   [ES]/[E] = K[S],   d[P]/dt = k₂ [E]_T K[S]/(1 + K[S]),
 * and integrated, with [S] + [ES] + [P] = [S]₀:  k₂ [E]_T t = ln([S]₀/[S])/K + [S]₀ − [S]
 * (the integrated Michaelis–Menten equation; from memory). The exact quasi-steady ratio is
 * k₁/(k₋₁ + k₂) = K/(1 + 1e-9), inside the 1e-6 checked here.
 *
 * This run once exceeded 50 000 steps. Two faults in the linear algebra of the Rosenbrock stages:
 * the LU solve applied a late row swap between eliminations although the factorisation had moved
 * the multipliers with the rows (a wrong stage whenever such a swap occurred), and in doubles the
 * iteration matrix I/(hγ) − J, near-singular along the two conservation laws once h ≫ 1/k₋₁, let
 * [E]_T drift (by 4e-6 at 1e7 s with the swap mended, by per cents a step without). Now the
 * factorisation is carried in double-double (src/engine/numeric/extended-lu.ts).
 */
import { describe, expect, it } from 'vitest';
import { integrateStiff, type OdeSystem } from '../../src/engine/numeric/stiff-integrator.ts';

const k1 = 1e9;
const kMinus1 = 1e9;
const k2 = 1;
const K = k1 / kMinus1;
const [E, S, ES, P] = [0, 1, 2, 3] as const;
const ET = 1e-9;
const S0 = 1;

// Reaction by reaction, so that each rate leaves one species exactly as it enters another.
const michaelisMenten: OdeSystem = {
  size: 4,
  rhs(_t, y, dydt) {
    const binding = k1 * y[E]! * y[S]! - kMinus1 * y[ES]!;
    const turnover = k2 * y[ES]!;
    dydt[E] = -binding + turnover;
    dydt[S] = -binding;
    dydt[ES] = binding - turnover;
    dydt[P] = turnover;
  },
  jacobian(_t, y, J) {
    J.set(
      [
        [-k1 * y[S]!, -k1 * y[E]!, kMinus1 + k2, 0],
        [-k1 * y[S]!, -k1 * y[E]!, kMinus1, 0],
        [k1 * y[S]!, k1 * y[E]!, -kMinus1 - k2, 0],
        [0, 0, k2, 0],
      ].flat(),
    );
  },
};

// As src/engine/simulation/initial-rate.ts integrates: 8 outputs a decade from 1e-9 s, rtol 1e-7, atol 1e-14.
const outputTimes = Array.from({ length: 16 * 8 + 6 }, (_, i) => 1e-9 * 10 ** (i / 8)).filter((t) => t <= 2.2e7);
const result = integrateStiff(michaelisMenten, Float64Array.of(ET, S0, 0, 0), {
  tEnd: 2.2e7,
  outputTimes,
  rtol: 1e-7,
  atol: 1e-14,
  nonNegative: true,
  maxSteps: 50_000,
});
const relative = (x: number, ref: number) => Math.abs(x / ref - 1);
// Binding relaxes at k₁[S] + k₋₁ = 2e9 s^-1; a microsecond is two thousand relaxation times.
const slowPhase = result.t.map((t, i) => ({ t, y: result.y[i]! })).filter(({ t }) => t >= 1e-6);

describe('rapid equilibrium E + S ⇌ ES (1e9) → E + P (1 s^-1), to 1 % conversion at 2e7 s', () => {
  it('finishes with the initial-rate settings in a few hundred steps (seen: 165, 3 rejected)', () => {
    expect(result.status).toBe('ok');
    expect(result.t.at(-1)).toBe(outputTimes.at(-1));
    expect(result.steps).toBeLessThan(500);
    expect(result.rejected).toBeLessThan(20);
    // Long steps beside the 1e9 s^-1 binding make the iteration matrix near-singular: those solves
    // must have gone to double-double (src/engine/numeric/iteration-matrix.ts).
    expect(result.solves.extended).toBeGreaterThan(0);
  });

  it('reaches 1 % conversion near 2e7 s', () => {
    const last = result.y.at(-1)!;
    expect(last[P]! / S0).toBeGreaterThan(0.0088);
    expect(slowPhase.find(({ y }) => y[P]! >= 0.01 * S0)).toBeUndefined();
  });

  it('holds the binding equilibrium [ES]/[E] = K[S] to 1e-6 throughout the slow phase', () => {
    expect(slowPhase.length).toBeGreaterThan(100);
    for (const { y } of slowPhase) expect(relative(y[ES]! / y[E]!, K * y[S]!)).toBeLessThan(1e-6);
  });

  it('follows the rapid-equilibrium rate law d[P]/dt = k₂[E]_T K[S]/(1 + K[S]) to 1e-6', () => {
    const dydt = new Float64Array(4);
    for (const { t, y } of slowPhase) {
      michaelisMenten.rhs(t, y, dydt);
      expect(relative(dydt[P]!, (k2 * ET * K * y[S]!) / (1 + K * y[S]!))).toBeLessThan(1e-6);
    }
  });

  it('follows the integrated Michaelis–Menten equation to 1e-6 once [P] is measurable', () => {
    // Binding takes [ES] ≈ 5e-10 M out of the substrate at once; integrate from what is left.
    const S1 = S0 - slowPhase[0]!.y[ES]!;
    for (const { t, y } of slowPhase.filter(({ t }) => t >= 1e3)) {
      const s = y[S]!;
      // ln(S1/[S]) by log1p, since [S] stays within 1 % of S1.
      const integrated = -Math.log1p((s - S1) / S1) / K + S1 - s;
      expect(relative(integrated, k2 * ET * t)).toBeLessThan(1e-6);
    }
  });

  it('conserves [E]_T and [S] + [ES] + [P]', () => {
    for (const y of result.y) {
      expect(relative(y[E]! + y[ES]!, ET)).toBeLessThan(1e-12);
      expect(Math.abs(y[S]! + y[ES]! + y[P]! - S0)).toBeLessThan(1e-15);
    }
  });
});
