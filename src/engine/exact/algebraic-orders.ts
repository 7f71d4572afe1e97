import type { AlgebraicFunction } from './algebraic-function.ts';
import type { OrderLimits } from './order-limits.ts';
import type { Polynomial } from './polynomial.ts';
import type { PositiveRoot } from './positive-root.ts';
import { Rational } from './rational.ts';
import { coefficientsIn, definiteSign } from './univariate.ts';

type End = 'low' | 'high';

/**
 * The limiting orders of a law with radicals in one symbol x, exactly. Each root ρ of
 * G = Σ c_k(x) ρ^k behaves as x^p at either end, with p a slope of the Newton polygon of the
 * points (k, degree of c_k in x): the upper hull as x → ∞, the lower hull as x → 0. Of its edges,
 * the positive root follows the one whose coefficients change sign (the root's uniqueness by
 * Descartes' rule leaves exactly one). Then each term of the outer rational function grows as
 * x^(its power of x + Σ p·its power of ρ), and the dominant terms give the order. Undefined where
 * the signs that decide it are not fixed (a coefficient of unknown sign, or dominant terms of
 * opposite signs that might cancel).
 */
export function algebraicOrderLimits(f: AlgebraicFunction, x: string): OrderLimits | undefined {
  const low = exponentAt(f, x, 'low');
  const high = exponentAt(f, x, 'high');
  return low && high ? { low, high } : undefined;
}

function exponentAt(f: AlgebraicFunction, x: string, end: End): Rational | undefined {
  const powers = new Map<string, Rational>();
  for (const root of f.roots) {
    const p = rootExponent(root, x, end);
    if (!p) return undefined;
    powers.set(root.symbol, p);
  }
  const num = dominantExponent(f.outer.numerator, x, powers, end);
  const den = dominantExponent(f.outer.denominator, x, powers, end);
  return num && den ? num.sub(den) : undefined;
}

/** The exponent of x that dominates a polynomial in x and the roots, if its dominant terms cannot cancel. */
function dominantExponent(
  p: Polynomial,
  x: string,
  powers: ReadonlyMap<string, Rational>,
  end: End,
): Rational | undefined {
  const scored = p.terms.map((t) => ({
    sign: t.coefficient.sign(),
    e: [...powers].reduce((sum, [rho, q]) => sum.add(q.mul(t.monomial.exponent(rho))), t.monomial.exponent(x)),
  }));
  if (scored.length === 0) return undefined;
  const best = scored.reduce(
    (b, s) => ((end === 'high' ? s.e.compare(b) > 0 : s.e.compare(b) < 0) ? s.e : b),
    scored[0]!.e,
  );
  const signs = new Set(scored.filter((s) => s.e.equals(best)).map((s) => s.sign));
  return signs.size === 1 ? best : undefined;
}

interface Point {
  k: number;
  d: Rational;
  sign: number;
}

/** The power of x the positive root behaves as at one end, from the Newton polygon. */
export function rootExponent(root: PositiveRoot, x: string, end: End): Rational | undefined {
  const coefficients = coefficientsIn(root.polynomial, root.symbol);
  if (!coefficients) return undefined;
  const points: Point[] = [];
  for (const [k, c] of [...coefficients].sort(([a], [b]) => a - b)) {
    const d = end === 'high' ? c.degreeIn(x) : c.lowDegreeIn(x);
    const sign = definiteSign(c.coefficientIn(x, d));
    if (sign === 0) return undefined;
    points.push({ k, d, sign });
  }
  const hull = convexHull(points, end);
  const slopes: Rational[] = [];
  for (let i = 0; i + 1 < hull.length; i++) {
    const [a, b] = [hull[i]!, hull[i + 1]!];
    const onEdge = points.filter((p) => p.k >= a.k && p.k <= b.k && cross(a, b, p).isZero());
    const changes = onEdge.slice(1).filter((p, j) => p.sign !== onEdge[j]!.sign).length;
    if (changes > 0) slopes.push(a.d.sub(b.d).div(Rational.of(b.k - a.k)));
  }
  return slopes.length === 1 ? slopes[0] : undefined;
}

/** The upper (x → ∞) or lower (x → 0) convex hull of points in order of k, collinear points left out. */
function convexHull(points: readonly Point[], end: End): Point[] {
  const hull: Point[] = [];
  for (const p of points) {
    while (hull.length >= 2) {
      const turn = cross(hull[hull.length - 2]!, hull[hull.length - 1]!, p).sign();
      if ((end === 'high' && turn >= 0) || (end === 'low' && turn <= 0)) hull.pop();
      else break;
    }
    hull.push(p);
  }
  return hull;
}

/** (a→b) × (a→c): positive for a left turn. */
function cross(a: Point, b: Point, c: Point): Rational {
  return Rational.of(b.k - a.k)
    .mul(c.d.sub(a.d))
    .sub(b.d.sub(a.d).mul(Rational.of(c.k - a.k)));
}
