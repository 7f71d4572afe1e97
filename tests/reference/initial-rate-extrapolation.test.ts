/**
 * Simulated initial rates and orders are read at zero conversion (extrapolated from readings at
 * 1–4 % of the extent), not at the 1 % reading, where a rate that changes with conversion gives
 * other values. Each case has an initial-rate answer worked here by hand from mass action, and a
 * value at 1 % conversion that differs from it by far more than the tolerance checked.
 */
import { describe, expect, it } from 'vitest';
import { deriveYaml } from '../helpers/derive-yaml.ts';

const header = (system: string) =>
  `title: Initial-rate reference\nsystem: ${system}\nstatus: proposed\nnotation: labels\n`;

describe('autocatalysis, one step A + P → 2P', () => {
  // r = k[A][P] by mass action (the autocatalytic step of the textbooks, e.g. P. Atkins & J. de Paula,
  // Physical Chemistry, the section on autocatalysis; from memory). At zero conversion r₀ = k[A]₀[P]₀,
  // first order in each. Read at 1 % conversion of A instead, r = k(0.99[A]₀)([P]₀ + 0.01[A]₀): with
  // [P]₀ = 1e-3 [A]₀ the order in [A]₀ there is 1 + 0.01/0.011 ≈ 1.91 and in [P]₀ 0.001/0.011 ≈ 0.09.
  const k = 0.5;
  const [A0, P0] = [1, 1e-3];
  const d = deriveYaml(`${header('autocatalysis')}steps:
  - { equation: A + P -> 2 P, k: ${k} M^-1 s^-1 }
observations:
  - id: initial-rates
    concentrations: { A: ${A0} M, P: ${P0} M }
    orders: { A: 1 ± 0.1, P: 1 ± 0.1 }
`);
  const check = d.simulation?.[0];

  it('gives the initial rate k[A]₀[P]₀, not the eleven-times larger rate at 1 % conversion', () => {
    expect(check?.status).toBe('ok');
    // r is quadratic in the extent, so the extrapolation is exact to the integration's accuracy.
    expect(Math.abs(check!.initialRate! / (k * A0 * P0) - 1)).toBeLessThan(1e-6);
  });

  it('gives initial-rate orders 1 in A and 1 in P', () => {
    expect(Math.abs(check!.orders.A! - 1)).toBeLessThan(1e-3);
    expect(Math.abs(check!.orders.P! - 1)).toBeLessThan(1e-3);
  });
});

describe('competitive inhibition by the product, E + S ⇌ ES → E + P, E + P ⇌ EP', () => {
  // With the enzyme dilute, v = k₂[E]_T[S] / (K_M(1 + [P]/K_P) + [S]), K_M = (k₋₁ + k₂)/k₁ and
  // K_P = k₋₃/k₃ (the Michaelis–Menten law with competitive inhibition by the product; A.
  // Cornish-Bowden, Fundamentals of Enzyme Kinetics, product inhibition; from memory). At zero
  // conversion [P] = 0: v₀ = k₂[E]_T[S]₀/(K_M + [S]₀), order K_M/(K_M + [S]₀) = 1.1/2.1 ≈ 0.524 in S.
  // At 1 % conversion ([S] = 0.99[S]₀, [P] = 0.01[S]₀, both proportional to [S]₀) the order is
  // K_M/(K_M(1 + 0.01[S]₀/K_P) + 0.99[S]₀) = 0.5 exactly here, and v is 5.5 % below v₀.
  const [k1, kMinus1, k2, k3, kMinus3] = [1e6, 1e3, 1e2, 1e6, 1e2];
  const KM = (kMinus1 + k2) / k1;
  const [ET, S0] = [1e-9, 1e-3];
  const d = deriveYaml(`${header('product-inhibition')}species:
  E: { role: catalyst }
steps:
  - { equation: E + S <=> ES, k: ${k1} M^-1 s^-1, k_rev: ${kMinus1} s^-1 }
  - { equation: ES -> E + P, k: ${k2} s^-1 }
  - { equation: E + P <=> EP, k: ${k3} M^-1 s^-1, k_rev: ${kMinus3} s^-1 }
approximation: steady_state
observations:
  - id: initial-rates
    concentrations: { E: ${ET} M, S: ${S0} M }
    orders: { S: 0.52 ± 0.05, E: 1 ± 0.1 }
`);
  const check = d.simulation?.[0];

  it('gives the uninhibited initial rate k₂[E]_T[S]₀/(K_M + [S]₀) to 0.05 %', () => {
    expect(check?.status).toBe('ok');
    const v0 = (k2 * ET * S0) / (KM + S0);
    expect(Math.abs(check!.initialRate! / v0 - 1)).toBeLessThan(5e-4);
  });

  it('gives the initial-rate order K_M/(K_M + [S]₀) in S, not the 0.5 read at 1 % conversion', () => {
    expect(Math.abs(check!.orders.S! - KM / (KM + S0))).toBeLessThan(1e-3);
    expect(Math.abs(check!.orders.E! - 1)).toBeLessThan(1e-3);
  });
});

describe('a dimer in fast equilibrium with its monomer, Z₂ ⇌ 2Z, then Z + B → P', () => {
  // At zero conversion the dimer has dissociated to equilibrium, x²/([Z₂]₀ − x/2) = K with x = [Z]
  // (mass balance of zinc), so x² + (K/2)x − K[Z₂]₀ = 0 and r ∝ x[B]₀. Differentiating,
  // (2x + K/2) dx = K d[Z₂]₀: the order in Z₂ is K[Z₂]₀ / (x(2x + K/2)), which tends to the
  // textbook one half only as x ≪ [Z₂]₀ (the pre-equilibrium treatment of aggregates; from memory).
  const K = 2e-4;
  const Z0 = 0.05;
  const d = deriveYaml(`${header('dimer-monomer')}steps:
  - { equation: Z2 <=> 2 Z, k: 50 s^-1, K: ${K} M }
  - { equation: Z + B -> P, k: 3.5 M^-1 s^-1, rds: true }
approximation: rds
observations:
  - id: initial-rates
    concentrations: { Z2: ${Z0} M, B: 0.1 M }
    orders: { Z2: 0.5 ± 0.05, B: 1 ± 0.1 }
`);
  const check = d.simulation?.[0];
  const x = (-K / 2 + Math.sqrt((K / 2) ** 2 + 4 * K * Z0)) / 2;

  it('gives the order in Z₂ of the exact dissociation equilibrium at zero conversion', () => {
    expect(check?.status).toBe('ok');
    const order = (K * Z0) / (x * (2 * x + K / 2));
    expect(Math.abs(check!.orders.Z2! - order)).toBeLessThan(1e-3);
    expect(Math.abs(check!.orders.B! - 1)).toBeLessThan(1e-3);
  });
});
