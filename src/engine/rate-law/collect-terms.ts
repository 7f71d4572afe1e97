/**
 * Terms of a rate-law polynomial collected by concentration monomial: k_-1 + k_2 + k_1[S] is the
 * group 1 (coefficient k_-1 + k_2) and the group [S] (coefficient k_1). Constants are the rate and
 * equilibrium constants and any concentration held constant (a solvent); everything else — a
 * concentration, a catalyst total — is a concentration.
 */
import { Monomial, Polynomial } from '../exact/index.ts';
import { symbolMeaning } from './symbols.ts';

/** The terms of one concentration monomial: ± coefficient × concentrations. */
export interface Collected {
  concentrations: Monomial;
  /** a polynomial in the constants; positive terms where the sign could be taken out */
  coefficient: Polynomial;
  sign: 1 | -1;
}

/**
 * Groups a polynomial's terms by their concentrations: lowest degree first, then in the order of
 * the species (`compare`, the formatter's order of symbols), so 1 + K_A[A] + K_B[B] follows the record.
 */
export function byConcentration(
  p: Polynomial,
  constantSymbols: ReadonlySet<string>,
  compare: (a: string, b: string) => number = (a, b) => (a < b ? -1 : a > b ? 1 : 0),
): Collected[] {
  const isConstant = (symbol: string) => symbolMeaning(symbol)?.kind === 'constant' || constantSymbols.has(symbol);
  const groups = new Map<string, { concentrations: Monomial; terms: Polynomial[] }>();
  for (const t of p.terms) {
    const concentrations = Monomial.fromFactors(t.monomial.factors.filter(([s]) => !isConstant(s)));
    const constants = Monomial.fromFactors(t.monomial.factors.filter(([s]) => isConstant(s)));
    const group = groups.get(concentrations.key) ?? { concentrations, terms: [] };
    group.terms.push(Polynomial.term(t.coefficient, constants));
    groups.set(concentrations.key, group);
  }
  return [...groups.values()]
    .sort((a, b) => compareMonomials(a.concentrations, b.concentrations, compare))
    .map(({ concentrations, terms }) => {
      const coefficient = Polynomial.sum(terms);
      const negative = coefficient.terms.every((t) => t.coefficient.sign() < 0);
      return { concentrations, coefficient: negative ? coefficient.neg() : coefficient, sign: negative ? -1 : 1 };
    });
}

/** Lower total degree first; then the earlier species first, a higher power of it first. */
function compareMonomials(a: Monomial, b: Monomial, compare: (a: string, b: string) => number): number {
  const byDegree = a.totalDegree.compare(b.totalDegree);
  if (byDegree !== 0) return byDegree;
  const [fa, fb] = [a, b].map((m) => [...m.factors].sort(([x], [y]) => compare(x, y)));
  for (let i = 0; i < Math.min(fa!.length, fb!.length); i++) {
    const c = compare(fa![i]![0], fb![i]![0]) || fb![i]![1].compare(fa![i]![1]);
    if (c !== 0) return c;
  }
  return fa!.length - fb!.length;
}
