import { divideExact } from './divide-exact.ts';
import { Monomial } from './monomial.ts';
import { content } from './polynomial-content.ts';
import { Polynomial } from './polynomial.ts';
import { resultant } from './resultant.ts';
import { substituteFraction } from './substitute-fraction.ts';
import { linearPivot, resultantPair, unknownsOf, type Live } from './choose-pivot.ts';
import { monomialContentIn, naturalDegreeIn } from './univariate.ts';
import { WorkBudget } from './work-budget.ts';

/**
 * Exact elimination of a polynomial system to one polynomial per remaining unknown, for unknowns
 * that are positive (concentrations) and coefficients in positive parameters (constants).
 *
 * 1. Ratio elimination: an equation whose every term carries a power of some unknowns is divided
 *    by it, since the unknowns are not zero (Ogg's d[NO]/dt = [NO3](k2[NO2] − k3[NO]) leaves
 *    k2[NO2] = k3[NO], a ratio of intermediates).
 * 2. Linear elimination: an unknown that occurs to the first power in some equation is solved
 *    for as x = −b/a and substituted into the others (denominators cleared, the factor a divided
 *    back out where it divides); a coefficient a of fixed sign, never zero for positive values,
 *    is preferred to one that is non-zero only generically.
 * 3. An equation left in one unknown alone is that unknown's final polynomial.
 * 4. Otherwise a resultant eliminates an unknown between two equations; that unknown then follows
 *    from a nonlinear equation, so the result is marked as not back-substitutable in closed form.
 * Each substitution is recorded, so the unknowns can be recovered in reverse order.
 */

/** One step of an elimination, for the derivation trace and the back substitution. */
export type EliminationStep =
  | { kind: 'ratio'; equation: number; factor: Monomial; result: Polynomial }
  | { kind: 'linear'; symbol: string; numerator: Polynomial; denominator: Polynomial; equation: number }
  | { kind: 'resultant'; symbol: string; equations: [number, number] };

/** A finished elimination: the steps in order and the last unknowns with their polynomials. */
export interface Triangulation {
  steps: EliminationStep[];
  finals: { symbol: string; polynomial: Polynomial; equation: number }[];
  /** true when a resultant was needed: some unknowns then follow from nonlinear equations */
  resultants: boolean;
}

/** Why an elimination stopped. */
export type TriangulationFailure =
  | { kind: 'budget' }
  /** an equation holds for positive unknowns only if these are zero: no positive steady state */
  | { kind: 'zero'; equation: number; symbols: string[] }
  /** the equations do not fix these unknowns (dependent equations) */
  | { kind: 'underdetermined'; symbols: string[] }
  /** an equation in the parameters alone is left over: the system holds only for special constants */
  | { kind: 'inconsistent'; equation: number };

/** Eliminates the unknowns of `equations`; `preferLast` names unknowns best kept to the end (those the rate uses). */
export function triangulate(
  equations: readonly Polynomial[],
  unknowns: readonly string[],
  budget: WorkBudget = WorkBudget.unlimited(),
  preferLast: ReadonlySet<string> = new Set(),
): Triangulation | TriangulationFailure {
  const open = new Set(unknowns);
  const steps: EliminationStep[] = [];
  const finals: Triangulation['finals'] = [];
  let resultants = false;
  let live: Live[] = [];
  for (const [i, p] of equations.entries()) {
    const kept = normalise({ polynomial: p, origin: i }, open, steps);
    if ('kind' in kept) return kept;
    if (kept.length) live.push(...kept);
  }
  while (open.size > 0) {
    if (budget.exhausted) return { kind: 'budget' };
    const pivot = linearPivot(live, open, preferLast);
    if (pivot) {
      const { equation, symbol, a, b } = pivot;
      steps.push({ kind: 'linear', symbol, numerator: b.neg(), denominator: a, equation: equation.origin });
      open.delete(symbol);
      const next: Live[] = [];
      for (const other of live) {
        if (other === equation) continue;
        if ((naturalDegreeIn(other.polynomial, symbol) ?? 0) === 0) {
          next.push(other);
          continue;
        }
        const substituted = substituteFraction(other.polynomial, symbol, b.neg(), a, budget);
        if (!substituted) return { kind: 'budget' };
        const reduced = divideOut(substituted.polynomial, a, budget);
        if (!reduced) return { kind: 'budget' };
        const kept = normalise({ polynomial: reduced, origin: other.origin }, open, steps);
        if ('kind' in kept) return kept;
        next.push(...kept);
      }
      live = next;
      continue;
    }
    const single = live.find((e) => unknownsOf(e.polynomial, open).length === 1);
    if (single) {
      const [symbol] = unknownsOf(single.polynomial, open);
      finals.push({ symbol: symbol!, polynomial: single.polynomial, equation: single.origin });
      open.delete(symbol!);
      live = live.filter((e) => e !== single);
      continue;
    }
    const pair = resultantPair(live, open);
    if (!pair) return { kind: 'underdetermined', symbols: [...open] };
    const { f, g, symbol } = pair;
    const r = resultant(f.polynomial, g.polynomial, symbol, budget);
    if (!r) return { kind: 'budget' };
    resultants = true;
    steps.push({ kind: 'resultant', symbol, equations: [f.origin, g.origin] });
    open.delete(symbol);
    const kept = normalise({ polynomial: r, origin: g.origin }, open, steps);
    if ('kind' in kept) return kept;
    live = [...live.filter((e) => e !== f && e !== g), ...kept];
  }
  const leftover = live.find((e) => !e.polynomial.isZero());
  if (leftover) return { kind: 'inconsistent', equation: leftover.origin };
  return { steps, finals, resultants };
}

/**
 * Divides an equation by its content and by its monomial factor (all symbols are positive, so
 * neither is zero), recording a ratio elimination when that factor holds unknowns. A zero
 * equation is dropped (it was dependent); a non-zero one left without unknowns that were there
 * forces them to zero, which no positive steady state allows.
 */
function normalise(e: Live, open: ReadonlySet<string>, steps: EliminationStep[]): Live[] | TriangulationFailure {
  const p = e.polynomial;
  if (p.isZero()) return [];
  const factor = monomialContentIn(p, open);
  const all = p.terms.map((t) => t.monomial).reduce((g, m) => g.gcd(m));
  const scaled = p.mulTerm(content(p).inverse(), Monomial.ONE.div(all));
  const sign = scaled.leadingTerm()!.coefficient.sign();
  const polynomial = sign < 0 ? scaled.neg() : scaled;
  if (!factor.isOne()) steps.push({ kind: 'ratio', equation: e.origin, factor, result: polynomial });
  if (unknownsOf(polynomial, open).length === 0) {
    const symbols = factor.symbols();
    return symbols.length > 0
      ? { kind: 'zero', equation: e.origin, symbols }
      : { kind: 'inconsistent', equation: e.origin };
  }
  return [{ polynomial, origin: e.origin }];
}

/** Divides p by a as often as a divides it exactly (a is the cleared denominator of a substitution). */
function divideOut(p: Polynomial, a: Polynomial, budget: WorkBudget): Polynomial | undefined {
  if (a.isConstant() || p.isZero()) return p;
  let out = p;
  for (;;) {
    if (!budget.chargeProduct(out, a)) return undefined;
    const q = divideExact(out, a);
    if (!q || !q.hasNaturalExponents()) return out;
    out = q;
  }
}
