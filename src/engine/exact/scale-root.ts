import { Monomial } from './monomial.ts';
import { Polynomial } from './polynomial.ts';
import { Rational } from './rational.ts';
import { coefficientsIn, fromCoefficients } from './univariate.ts';

/**
 * Draws the dependence on some symbols (the concentrations) out of a root: where each coefficient
 * c_k of p = Σ c_k x^k is one monomial m_k in those symbols times a factor free of them, and
 * m_k M^k is the same for every k, then x = M·ρ with ρ the root of Σ (c_k/m_k) ρ^k, which does
 * not depend on them at all. So the acetaldehyde chain's 2k_4[CH3]² = k_1[CH3CHO] gives
 * [CH3] = [CH3CHO]^(1/2) ρ with 2k_4 ρ² = k_1, and a homogeneous quadratic gives a root
 * proportional to a concentration. Undefined when the coefficients do not allow it.
 */
export function scaleRoot(
  p: Polynomial,
  x: string,
  rho: string,
  isVariable: (symbol: string) => boolean,
): { scale: Monomial; polynomial: Polynomial } | undefined {
  const coefficients = coefficientsIn(p, x);
  if (!coefficients || coefficients.size < 2) return undefined;
  const parts = new Map<number, { m: Monomial; rest: Polynomial }>();
  for (const [k, c] of coefficients) {
    const variable = (m: Monomial) => Monomial.fromFactors(m.factors.filter(([s]) => isVariable(s)));
    const m = variable(c.terms[0]!.monomial);
    if (!c.terms.every((t) => variable(t.monomial).equals(m))) return undefined;
    parts.set(k, { m, rest: c.mulTerm(Rational.ONE, Monomial.ONE.div(m)) });
  }
  const sorted = [...parts].sort(([a], [b]) => a - b);
  const [k0, first] = sorted[0]!;
  const [k1, second] = sorted[1]!;
  const scale = first.m.div(second.m).pow(Rational.of(1, k1 - k0));
  const common = first.m.mul(scale.pow(k0));
  if (![...parts].every(([k, { m }]) => m.mul(scale.pow(k)).equals(common))) return undefined;
  if (scale.isOne()) return undefined;
  return { scale, polynomial: fromCoefficients(rho, new Map([...parts].map(([k, { rest }]) => [k, rest]))) };
}
