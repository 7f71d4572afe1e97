/**
 * Recognises the Michaelis–Menten family in a normalised law: k_obs[E]_T[S] / (1 + Σ K m) with one
 * catalyst total and one substrate to the first power, and every denominator term one of the
 * textbook kinds — [S] (saturation), [I] (competitive), [S][I] (uncompetitive), [S]² (substrate
 * inhibition). Any other term, or any other numerator, is not this family.
 */
import type { Polynomial } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import type { NormalisedLaw } from './normalised-law.ts';
import { symbolMeaning } from './symbols.ts';

/**
 * The parts of a Michaelis–Menten-shaped law, each term's coefficient as a polynomial in the
 * elementary constants before any division, so every trade constant is one quotient of two of them.
 */
export interface EnzymeShape {
  /** concentration symbols of the substrate and of the catalyst total */
  substrate: string;
  total: string;
  /** the numerator's coefficient, and the denominator's constant term */
  numerator: Polynomial;
  constant: Polynomial;
  /** the coefficient of the [S] term and, where present, of the [S]² term */
  saturating: Polynomial;
  squared?: Polynomial;
  /** the coefficients of [X] and of [S][X] terms, by the concentration symbol of X */
  competitive: Map<string, Polynomial>;
  uncompetitive: Map<string, Polynomial>;
}

/** The Michaelis–Menten parts of a normalised law, or undefined for any other shape. */
export function enzymeShape(law: NormalisedLaw): EnzymeShape | undefined {
  const [top] = law.numerator;
  const [factor] = law.factors;
  if (law.numerator.length !== 1 || law.factors.length !== 1 || !top || top.sign < 0) return undefined;
  if (!factor || factor.power !== 1) return undefined;
  const parts = top.concentrations.factors.map(([s, e]) => ({ kind: symbolMeaning(s)?.kind, symbol: s, e }));
  const total = parts.find((p) => p.kind === 'total');
  const substrate = parts.find((p) => p.kind === 'concentration');
  if (parts.length !== 2 || !total || !substrate || !parts.every((p) => p.e.equals(Rational.ONE))) return undefined;
  const S = substrate.symbol;
  let saturating: Polynomial | undefined;
  let squared: Polynomial | undefined;
  const competitive = new Map<string, Polynomial>();
  const uncompetitive = new Map<string, Polynomial>();
  for (const t of factor.terms.slice(1)) {
    if (t.sign < 0 || !t.power.equals(Rational.ONE) || !t.concentrations.hasNaturalExponents()) return undefined;
    const s = t.concentrations.exponent(S).toNumber();
    const rest = t.concentrations.without(S);
    const [other] = rest.factors;
    const c = t.coefficient;
    const modifier =
      rest.factors.length === 1 && other![1].equals(Rational.ONE) && symbolMeaning(other![0])?.kind === 'concentration';
    if (rest.isOne() && s === 1) saturating = c;
    else if (rest.isOne() && s === 2) squared = c;
    else if (modifier && s === 0) competitive.set(other![0], c);
    else if (modifier && s === 1) uncompetitive.set(other![0], c);
    else return undefined;
  }
  if (!saturating) return undefined;
  const shape: EnzymeShape = {
    substrate: S,
    total: total.symbol,
    numerator: top.coefficient,
    constant: factor.reference,
    saturating,
    competitive,
    uncompetitive,
  };
  return squared ? { ...shape, squared } : shape;
}

/** The trade's name for the shape: which inhibition the denominator terms describe. */
export function shapeName(shape: EnzymeShape, sameConstants: (x: string) => boolean): string {
  const modifiers = [...new Set([...shape.competitive.keys(), ...shape.uncompetitive.keys()])];
  const kind = (x: string) => (shape.competitive.has(x) ? 1 : 0) + (shape.uncompetitive.has(x) ? 2 : 0);
  if (shape.squared) return 'substrate_inhibition';
  if (modifiers.length === 0) return 'michaelis_menten';
  if (modifiers.every((x) => kind(x) === 1)) return 'competitive_inhibition';
  if (modifiers.every((x) => kind(x) === 2)) return 'uncompetitive_inhibition';
  if (modifiers.every((x) => kind(x) === 3 && sameConstants(x))) return 'noncompetitive_inhibition';
  return 'mixed_inhibition';
}
