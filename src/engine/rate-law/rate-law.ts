/** What a rate-law derivation produces, whichever method made it. */
import type { AlgebraicFunction, Polynomial, RationalFunction } from '../exact/index.ts';
import type { Rational } from '../exact/rational.ts';

/** `long_chain`: the steady state of a chain under the long-chain approximation (long-chain.ts). */
export type RateLawMethod = 'rds' | 'steady_state' | 'long_chain';

/** One line of a derivation, in words and in LaTeX. */
export interface TraceLine {
  /** what this line does: "rate of the rate-determining step", "step 1 at equilibrium" … */
  say: string;
  text: string;
  latex: string;
}

/** The forms of a conserved catalyst that share its total; the largest fraction is the resting state. */
export interface CatalystBalance {
  catalyst: string;
  /** the symbol of the total, e.g. `[E]_T` */
  total: string;
  /** each form's share of the total, [form]/[E]_T, as an exact function of the conditions */
  forms: { species: string; fraction: RationalFunction; text: string; latex: string }[];
}

/** The steady-state equations kept for a numeric solution where they are not linear. */
export interface NonlinearSystem {
  /** concentration symbols of the internal species, in order */
  unknowns: string[];
  /** d[X]/dt = 0, or a conservation relation minus its total, for each unknown in turn */
  equations: Polynomial[];
  /** the rate of the overall reaction as a polynomial in constants and concentrations */
  rate: Polynomial;
}

export interface RateLaw {
  method: RateLawMethod;
  /** the exact rate of the overall reaction; absent when only a numeric solution exists */
  expression?: RationalFunction;
  /** the exact rate where it has radicals (a nonlinear steady state); `expression` is then absent */
  algebraic?: AlgebraicFunction;
  nonlinear?: NonlinearSystem;
  /** solvent concentrations that stay constant and are absorbed into the constants */
  absorbed: string[];
  /** a named product of constants, k_obs, that multiplies the concentration part */
  grouped?: { name: string; value: Polynomial; law: RationalFunction };
  catalystBalances: CatalystBalance[];
  /**
   * The law kept in factors where a balance made it a product of powers (a site balance squared):
   * expression = numerator / Π base^power. The normalised form keeps (1 + K_A[A] + K_B[B])² whole.
   */
  factored?: FactoredLaw;
  /** the conserved pools whose totals the law uses: total symbol, member species, weights */
  pools?: { total: string; species: string[]; weights: number[] }[];
  trace: TraceLine[];
}

/** A rate law as a numerator over a product of powers of polynomials. */
export interface FactoredLaw {
  numerator: Polynomial;
  factors: { base: Polynomial; power: number }[];
}

/** Limits of the apparent order ∂ln r/∂ln[X] as [X] → 0 and [X] → ∞. */
export interface OrderRange {
  low: Rational;
  high: Rational;
}
