/**
 * The coefficients of the stiff integrator: a four-stage Rosenbrock method of order 3 with an
 * embedded order-2 formula, both stiffly accurate, hence L-stable.
 *
 * Form and order conditions: E. Hairer & G. Wanner, Solving Ordinary Differential Equations II,
 * 2nd ed., section IV.7 (Rosenbrock methods, order conditions of Table 7.1, and the stiffly
 * accurate construction used there for RODAS: β_sj = b_j and α_sj = β_{s−1,j}, so that the last
 * stage's argument is the embedded solution). Written from memory; the coefficients below were
 * derived for this project from those conditions, with these free choices:
 *   γ = 1/2            — the stability function is then (1 − z + z³/6)/(1 − z/2)⁴, A-stable;
 *   α₂ = 0, α₃ = α₄ = 1 — stage 2 reuses f(y₀), and c₃ = c₄ = 1 keeps the stiff (DAE) order;
 *   β₂₁ = 1, α₃₂ β₂₁ = 1/4 — the latter cancels the order-4 residual Σ bᵢ αᵢ αᵢⱼ βⱼ′ − (1/8 − γ/3).
 * tests/unit/numeric/rosenbrock-method.test.ts checks the order conditions and the observed
 * orders (3 and 2) on linear and nonlinear problems.
 */

/** A Rosenbrock method in Hairer & Wanner's form: (I − hγJ)k_i = h f(y₀ + Σα_ij k_j) + hJ Σγ_ij k_j. */
export interface RosenbrockTableau {
  order: number;
  embeddedOrder: number;
  gamma: number;
  /** α_ij, strictly lower triangular. */
  alpha: readonly (readonly number[])[];
  /** γ_ij below the diagonal (the diagonal is γ). */
  gammaBelow: readonly (readonly number[])[];
  /** y₁ = y₀ + Σ b_i k_i. */
  b: readonly number[];
  /** The embedded solution ŷ₁ = y₀ + Σ b̂_i k_i. */
  bEmbedded: readonly number[];
}

/** The integrator's method, order 3(2), in Hairer & Wanner's form. */
export const ROSENBROCK_TABLEAU: RosenbrockTableau = {
  order: 3,
  embeddedOrder: 2,
  gamma: 1 / 2,
  alpha: [
    [0, 0, 0, 0],
    [0, 0, 0, 0],
    [3 / 4, 1 / 4, 0, 0],
    [3 / 4, -1 / 4, 1 / 2, 0],
  ],
  gammaBelow: [
    [0, 0, 0, 0],
    [1, 0, 0, 0],
    [0, -1 / 2, 0, 0],
    [1 / 12, 1 / 12, -2 / 3, 0],
  ],
  b: [5 / 6, -1 / 6, -1 / 6, 1 / 2],
  bEmbedded: [3 / 4, -1 / 4, 1 / 2, 0],
};

/** The same method with u = Γk as unknowns, which needs no Jacobian–vector products. */
export interface TransformedMethod {
  stages: number;
  gamma: number;
  /** Stage arguments y₀ + Σ a_ij u_j. */
  a: number[][];
  /** (I/(hγ) − J) u_i = f(Y_i) + Σ (c_ij / h) u_j. */
  c: number[][];
  /** Stage times t + α_i h. */
  stageTimes: number[];
  /** y₁ = y₀ + Σ m_j u_j, and the error estimate Σ (m_j − m̂_j) u_j. */
  m: number[];
  errorWeights: number[];
}

/** Transforms the tableau: with Γ = (γ_ij) lower triangular, A = αΓ⁻¹, C = −Γ⁻¹ below the diagonal, m = bΓ⁻¹. */
export function transformTableau(tableau: RosenbrockTableau): TransformedMethod {
  const s = tableau.b.length;
  const gam = (i: number, j: number) => (i === j ? tableau.gamma : j < i ? tableau.gammaBelow[i]![j]! : 0);
  // Γ⁻¹ by forward substitution, column by column.
  const inv = Array.from({ length: s }, () => Array<number>(s).fill(0));
  for (let j = 0; j < s; j++) {
    for (let i = j; i < s; i++) {
      let sum = i === j ? 1 : 0;
      for (let k = j; k < i; k++) sum -= gam(i, k) * inv[k]![j]!;
      inv[i]![j] = sum / tableau.gamma;
    }
  }
  const times = (row: readonly number[], j: number) => row.reduce((acc, v, k) => acc + v * inv[k]![j]!, 0);
  const a = tableau.alpha.map((row) => row.map((_, j) => times(row, j)));
  const c = inv.map((row, i) => row.map((v, j) => (j < i ? -v : 0)));
  const m = tableau.b.map((_, j) => times(tableau.b, j));
  const mHat = tableau.bEmbedded.map((_, j) => times(tableau.bEmbedded, j));
  return {
    stages: s,
    gamma: tableau.gamma,
    a,
    c,
    stageTimes: tableau.alpha.map((row) => row.reduce((acc, v) => acc + v, 0)),
    m,
    errorWeights: m.map((v, j) => v - mHat[j]!),
  };
}

/** The integrator's method in transformed form, computed once. */
export const ROSENBROCK_METHOD: TransformedMethod = transformTableau(ROSENBROCK_TABLEAU);
