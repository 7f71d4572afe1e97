/**
 * Names for the apparent constants of a normalised law, as the trade writes them: k_obs for the
 * one coefficient of the numerator (k_f and k_r for a forward and a reverse term), K_X for the
 * weight of the [X] term of a denominator (K_(A,B) for an [A][B] term, K_(O3/O2) for [O3]/[O2]). A half power of one species
 * is written as the trade does for dissociative adsorption, (K_H2[H2])^½, where the coefficient
 * has an exact root; otherwise the K multiplies the power as it stands.
 */
import { Monomial, Polynomial, RationalFunction, rationalPower } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import { speciesLatex } from '../notation/species-latex.ts';
import type { Collected } from './collect-terms.ts';
import { symbolMeaning } from './symbols.ts';

/** A name in text and LaTeX, with what it means. */
export interface ConstantName {
  name: string;
  latex: string;
  meaning: string;
}

/** Names of the numerator coefficients, in the order of the groups. */
export function numeratorNames(groups: readonly Collected[]): ConstantName[] {
  if (groups.length === 1)
    return [{ name: 'k_obs', latex: 'k_\\mathrm{obs}', meaning: 'observed rate constant of the normalised law' }];
  if (groups.length === 2 && groups[0]!.sign !== groups[1]!.sign)
    return groups.map((g) =>
      g.sign > 0
        ? { name: 'k_f', latex: 'k_\\mathrm{f}', meaning: 'coefficient of the forward term' }
        : { name: 'k_r', latex: 'k_\\mathrm{r}', meaning: 'coefficient of the reverse term' },
    );
  return groups.map((_, i) => ({
    name: `k_obs,${i + 1}`,
    latex: `k_{\\mathrm{obs},${i + 1}}`,
    meaning: `observed rate constant of numerator term ${i + 1}`,
  }));
}

/**
 * The K of a denominator term with concentrations m and coefficient `ratio` (relative to the
 * factor's leading term): its name, the power it is written to, and its definition.
 */
export function bindingName(
  m: Monomial,
  used: ReadonlySet<string>,
  stepLabels: readonly string[],
  ratio: RationalFunction,
  compare?: (a: string, b: string) => number,
): { name: string; latex: string; power: Rational; definition: RationalFunction } {
  const parts = [...m.factors]
    .sort(([a], [b]) => (compare ? compare(a, b) : 0))
    .map(([symbol, e]) => ({ species: speciesOf(symbol), e }));
  const single = parts.length === 1 ? parts[0]! : undefined;
  // A fractional power of one species reads (K_X[X])^q where the coefficient has an exact root.
  const root = single && single.e.sign() > 0 && !single.e.isInteger() ? rootOf(ratio, single.e) : undefined;
  const named = root ? [{ species: single!.species, e: Rational.ONE }] : parts;
  let name =
    named.length === 1 && named[0]!.e.equals(Rational.ONE) ? `K_${named[0]!.species}` : `K_(${monomialName(named)})`;
  let latex = `K_{${subscriptLatex(named)}}`;
  // Never a name a step's own constant has, nor one already given.
  const taken = (n: string) => used.has(n) || stepLabels.some((l) => n === `K_${l}`);
  while (taken(name)) {
    name += "'";
    latex += "'";
  }
  return root
    ? { name, latex, power: single!.e, definition: root }
    : { name, latex, power: Rational.ONE, definition: ratio };
}

/** f^(1/q) where numerator and denominator are single terms with exact roots of their coefficients. */
function rootOf(f: RationalFunction, q: Rational): RationalFunction | undefined {
  const root = (p: Polynomial) => {
    const [t] = p.terms;
    if (p.terms.length !== 1 || !t) return undefined;
    const c = rationalPower(t.coefficient, q.inverse());
    return c === undefined ? undefined : Polynomial.term(c, t.monomial.pow(q.inverse()));
  };
  const [n, d] = [root(f.numerator), root(f.denominator)];
  return n && d ? RationalFunction.of(n, d) : undefined;
}

/** `A,B`, `S^2`, `H2^(1/2)`, `O3/O2`: the monomial a K weighs, spelt out in its name. */
function monomialName(parts: { species: string; e: Rational }[]): string {
  const one = (p: { species: string }, e: Rational) =>
    e.equals(Rational.ONE) ? p.species : e.isInteger() ? `${p.species}^${e}` : `${p.species}^(${e})`;
  const up = parts.filter((p) => p.e.sign() > 0).map((p) => one(p, p.e));
  const down = parts.filter((p) => p.e.sign() < 0).map((p) => one(p, p.e.neg()));
  return `${up.length > 0 ? up.join(',') : '1'}${down.length > 0 ? `/${down.join(',')}` : ''}`;
}

function speciesOf(symbol: string): string {
  const meaning = symbolMeaning(symbol);
  if (meaning?.kind === 'concentration') return meaning.species;
  if (meaning?.kind === 'total') return `${meaning.species}_T`;
  return symbol;
}

/** `\mathrm{A},{\mathrm{B}}^{2}`, with negative powers after a slash: `\mathrm{O_{3}}/\mathrm{O_{2}}`. */
function subscriptLatex(parts: { species: string; e: Rational }[]): string {
  const one = (p: { species: string; e: Rational }, e: Rational) => {
    const body = p.species.endsWith('_T')
      ? `${speciesLatex(p.species.slice(0, -2))}_\\mathrm{T}`
      : speciesLatex(p.species);
    return e.equals(Rational.ONE) ? body : `{${body}}^{${e}}`;
  };
  const up = parts.filter((p) => p.e.sign() > 0).map((p) => one(p, p.e));
  const down = parts.filter((p) => p.e.sign() < 0).map((p) => one(p, p.e.neg()));
  const top = up.length > 0 ? up.join(',') : '1';
  return down.length > 0 ? `${top}/${down.join(',')}` : top;
}
