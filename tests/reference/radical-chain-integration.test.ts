/**
 * A gas-phase radical chain (fluoroform chlorination, terminated by Cl recombination), integrated
 * to 42 000 s, with the chain carriers twelve and fifteen decades below the reactants:
 *   Cl2 + M → 2 Cl + M (k1),  Cl + CHF3 → HCl + CF3 (k2),  CF3 + Cl2 → CF3Cl + Cl (k3),
 *   2 Cl + M → Cl2 + M (k4);  y = [Cl2, M, Cl, CHF3, HCl, CF3, CF3Cl] in M, M a constant third body.
 * The checks are the steady-state treatment of chain carriers (Bodenstein's approximation, as in
 * K. J. Laidler, Chemical Kinetics, 3rd ed., the chapter on chain reactions; from memory):
 *   [CF3] = k2[Cl][CHF3]/(k3[Cl2]), and [Cl] = Q = √(k1[Cl2]/k4) from initiation = termination.
 * Two refinements of it are derived here, first order in small quantities:
 * - the transient: CF3 holds ρ = k2[CHF3]/(k3[Cl2]) ≈ 1.5e-4 of the carriers, and their sum obeys
 *   d([Cl] + [CF3])/dt = 2k1[M][Cl2] − 2k4[M][Cl]², a Riccati equation whose solution at constant
 *   [Cl2] is [Cl] = Q0 tanh(2k4[M]Q0 t/(1 + ρ));
 * - the drift: [Cl2] falls at k2[Cl][CHF3], and [Cl] lags behind the falling Q by the relative
 *   amount δ = k2[CHF3]/(8k4[M][Cl2]) ≈ 1.2e-4, so [Cl] = Q(1 + δ) once the transient is over.
 * Regression: the integrator's linear solves once returned the radicals' equations as rounding of
 * the reactants' (partial pivoting without refinement). It then took 134 828 steps at rtol 1e-6,
 * ran out of 200 000 at rtol 1e-8, and with rtol 1e-8, atol 1e-14 finished with [Cl] 8 % low.
 */
import { describe, expect, it } from 'vitest';
import { integrateStiff, type OdeSystem } from '../../src/engine/numeric/stiff-integrator.ts';

const k1 = 6.02214076e-10;
const k2 = 18066.42228;
const k3 = 301107038;
const k4 = 2901294346.66;
const [CL2, M, CL, CHF3, HCL, CF3, CF3CL] = [0, 1, 2, 3, 4, 5, 6] as const;

// Reaction by reaction, so that each rate leaves one species exactly as it enters another.
const stoichiometry = [
  [-1, 0, 2, 0, 0, 0, 0],
  [0, 0, -1, -1, 1, 1, 0],
  [-1, 0, 1, 0, 0, -1, 1],
  [1, 0, -2, 0, 0, 0, 0],
];
const rates = (y: Float64Array) => [
  k1 * y[CL2]! * y[M]!,
  k2 * y[CL]! * y[CHF3]!,
  k3 * y[CF3]! * y[CL2]!,
  k4 * y[CL]! * y[CL]! * y[M]!,
];
// ∂r/∂y as (species, derivative) pairs for each reaction.
const rateDerivatives = (y: Float64Array): [number, number][][] => [
  [
    [CL2, k1 * y[M]!],
    [M, k1 * y[CL2]!],
  ],
  [
    [CL, k2 * y[CHF3]!],
    [CHF3, k2 * y[CL]!],
  ],
  [
    [CF3, k3 * y[CL2]!],
    [CL2, k3 * y[CF3]!],
  ],
  [
    [CL, 2 * k4 * y[CL]! * y[M]!],
    [M, k4 * y[CL]! * y[CL]!],
  ],
];
const chain: OdeSystem = {
  size: 7,
  rhs(_t, y, dydt) {
    dydt.fill(0);
    rates(y).forEach((r, j) => stoichiometry[j]!.forEach((nu, i) => (dydt[i] = dydt[i]! + nu * r)));
  },
  jacobian(_t, y, J) {
    J.fill(0);
    rateDerivatives(y).forEach((derivatives, j) => {
      stoichiometry[j]!.forEach((nu, i) => {
        for (const [s, d] of derivatives) J[i * 7 + s] = J[i * 7 + s]! + nu * d;
      });
    });
  },
};
const y0 = Float64Array.of(3.3210781e-4, 1.6605391e-2, 0, 8.3026953e-4, 0, 0, 0);
// Each species' own scale, so that atol resolves the radicals as finely as the reactants.
const SPECIES_SCALE = [1e-6, 1e-6, 1e-14, 1e-6, 1e-10, 1e-17, 1e-10];
const ownScale = (rtol: number) => Float64Array.from(SPECIES_SCALE, (s) => rtol * s);

const transient = [10, 100, 300, 1000];
const settled = [10_000, 20_000, 30_000, 42_000];
// Pairs around settled times, for d[HCl]/dt by central differences (HCl's time scale is 3e6 s).
const around = [10_000, 20_000, 30_000, 41_000];
const outputTimes = [...transient, ...settled, ...around.flatMap((t) => [t - 50, t, t + 50])];
const run = (rtol: number, atol: number | Float64Array) =>
  integrateStiff(chain, y0, { tEnd: 42_000, outputTimes, rtol, atol, nonNegative: true, maxSteps: 200_000 });
const at = (result: ReturnType<typeof run>, t: number) => result.y[result.t.indexOf(t)]!;
const relative = (x: number, ref: number) => Math.abs(x / ref - 1);
const quasiSteadyCl = (y: Float64Array) => Math.sqrt((k1 * y[CL2]!) / k4);
const drift = (y: Float64Array) => (k2 * y[CHF3]!) / (8 * k4 * y[M]! * y[CL2]!);

describe('radical chain Cl2 + CHF3 → HCl + CF3Cl, carriers at 1e-11 and 1e-15 M, to 42 000 s', () => {
  const main = run(1e-8, ownScale(1e-8));
  // Independent check: the same problem with a thousand times tighter tolerance.
  const reference = run(1e-11, ownScale(1e-11));

  it('finishes at rtol 1e-8 with own-scale atol in under 2 000 steps (seen: about 660)', () => {
    expect(main.status).toBe('ok');
    expect(main.steps).toBeLessThan(2_000);
    expect(main.rejected).toBeLessThan(50);
    expect(reference.status).toBe('ok');
  });

  it('agrees with the tight run to 1e-7 in every species at every output', () => {
    for (const t of outputTimes)
      at(main, t).forEach((v, i) => expect(relative(v, at(reference, t)[i]!) || 0).toBeLessThan(1e-7));
  });

  it('with a single atol of 1e-14 (above the radicals), still agrees with the tight run to 1e-6', () => {
    const coarse = run(1e-8, 1e-14);
    expect(coarse.status).toBe('ok');
    expect(coarse.steps).toBeLessThan(1_000);
    for (const t of [...transient, ...settled]) {
      at(coarse, t).forEach((v, i) => expect(relative(v, at(reference, t)[i]!) || 0).toBeLessThan(1e-6));
    }
  });

  it('rises as [Cl] = Q0 tanh(2k4[M]Q0 t/(1 + ρ)): 1e-5 to 300 s, 1e-4 at 1 000 s as Cl2 starts to fall', () => {
    const q0 = quasiSteadyCl(y0);
    const rho = (k2 * y0[CHF3]!) / (k3 * y0[CL2]!);
    for (const t of transient) {
      const expected = q0 * Math.tanh((2 * k4 * y0[M]! * q0 * t) / (1 + rho));
      expect(relative(at(main, t)[CL]!, expected)).toBeLessThan(t <= 300 ? 1e-5 : 1e-4);
    }
  });

  it('holds [Cl] = √(k1[Cl2]/k4)(1 + δ) to 1e-6 from 10 000 s, δ ≈ 1.2e-4 being the whole gap to the bare formula', () => {
    for (const t of settled) {
      const y = at(main, t);
      expect(relative(y[CL]!, quasiSteadyCl(y) * (1 + drift(y)))).toBeLessThan(1e-6);
      expect(drift(y)).toBeGreaterThan(1.1e-4);
      expect(relative(y[CL]!, quasiSteadyCl(y))).toBeLessThan(2e-4);
    }
  });

  it('holds [CF3] = k2[Cl][CHF3]/(k3[Cl2]) to 1e-9 from 10 000 s', () => {
    for (const t of settled) {
      const y = at(main, t);
      expect(relative(y[CF3]!, (k2 * y[CL]! * y[CHF3]!) / (k3 * y[CL2]!))).toBeLessThan(1e-9);
    }
  });

  it('makes HCl at k2[CHF3] √(k1[Cl2]/k4)(1 + δ) to 1e-6 from 10 000 s', () => {
    for (const t of around) {
      const y = at(main, t);
      const slope = (at(main, t + 50)[HCL]! - at(main, t - 50)[HCL]!) / 100;
      expect(relative(slope, k2 * y[CHF3]! * quasiSteadyCl(y) * (1 + drift(y)))).toBeLessThan(1e-6);
    }
  });

  it('conserves Cl, C and H atoms to 1e-16 M at every output', () => {
    for (const y of main.y) {
      expect(Math.abs(2 * y[CL2]! + y[CL]! + y[HCL]! + y[CF3CL]! - 2 * y0[CL2]!)).toBeLessThan(1e-16);
      expect(Math.abs(y[CHF3]! + y[CF3]! + y[CF3CL]! - y0[CHF3]!)).toBeLessThan(1e-16);
      expect(Math.abs(y[CHF3]! + y[HCL]! - y0[CHF3]!)).toBeLessThan(1e-16);
    }
  });
});
