import { Polynomial } from './polynomial.ts';
import { coefficientsIn, definiteSign, degreeInSymbols, naturalDegreeIn } from './univariate.ts';

/** The choices of an elimination (triangulate.ts): which unknown to solve for, from which equation. */

/** An equation still in play, and the original equation it descends from. */
export interface Live {
  polynomial: Polynomial;
  origin: number;
}

/** Solving `equation` = a·symbol + b for symbol. */
export interface Pivot {
  equation: Live;
  symbol: string;
  a: Polynomial;
  b: Polynomial;
}

/**
 * The linear pivot that keeps the other equations smallest: the unknown x and equation a·x + b,
 * scored by how much substituting x = −b/a raises the degrees of the others, a coefficient a of
 * fixed sign first; an unknown the rate uses is kept for last on a tie.
 */
export function linearPivot(
  live: readonly Live[],
  open: ReadonlySet<string>,
  preferLast: ReadonlySet<string>,
): Pivot | undefined {
  let best: { pivot: Pivot; cost: number } | undefined;
  for (const equation of live) {
    for (const symbol of unknownsOf(equation.polynomial, open)) {
      const c = coefficientsIn(equation.polynomial, symbol);
      if (!c || Math.max(...c.keys()) !== 1) continue;
      const a = c.get(1)!;
      const b = c.get(0) ?? Polynomial.ZERO;
      const growth = degreeInSymbols(a, open).add(degreeInSymbols(b, open)).toNumber() + 1;
      // A coefficient of unknown sign is non-zero only generically: the last choice before a resultant.
      let cost = (preferLast.has(symbol) ? 0.5 : 0) + (definiteSign(a) === 0 ? 1000 : 0);
      for (const other of live) {
        if (other !== equation) cost += (naturalDegreeIn(other.polynomial, symbol) ?? 0) * growth;
      }
      cost += (a.terms.length + b.terms.length) * 1e-3;
      if (!best || cost < best.cost) best = { pivot: { equation, symbol, a, b }, cost };
    }
  }
  return best?.pivot;
}

/** Two equations sharing an unknown, of the lowest degrees in it: the cheapest resultant. */
export function resultantPair(
  live: readonly Live[],
  open: ReadonlySet<string>,
): { f: Live; g: Live; symbol: string } | undefined {
  let best: { f: Live; g: Live; symbol: string; cost: number } | undefined;
  for (const symbol of open) {
    const holding = live
      .map((e) => ({ e, d: naturalDegreeIn(e.polynomial, symbol) ?? 0 }))
      .filter((x) => x.d > 0)
      .sort((x, y) => x.d - y.d);
    if (holding.length < 2) continue;
    const cost = holding[0]!.d * holding[1]!.d;
    if (!best || cost < best.cost) best = { f: holding[0]!.e, g: holding[1]!.e, symbol, cost };
  }
  return best && { f: best.f, g: best.g, symbol: best.symbol };
}

/** The open unknowns an equation contains, in a fixed order. */
export function unknownsOf(p: Polynomial, open: ReadonlySet<string>): string[] {
  return [...open].filter((x) => p.terms.some((t) => !t.monomial.exponent(x).isZero()));
}
