/**
 * What a normalised rate law is: a numerator over a product of factors (1 + Σ K m)^power in named
 * apparent constants, and, for a standard shape, the trade's own form. Types only, shared by the
 * normaliser, its writers and the Michaelis–Menten reader.
 */
import type { Monomial, Polynomial } from '../exact/index.ts';
import type { Rational } from '../exact/rational.ts';
import type { ApparentConstant } from './apparent-constant.ts';

/** One term of a normalised law: ± (constant)^power × concentrations. */
export interface NormalisedTerm {
  /** the apparent constant's name; absent for the leading 1 of a factor */
  constant?: string;
  /** the power the constant is written to: ½ in (K_H2[H2])^½ */
  power: Rational;
  sign: 1 | -1;
  concentrations: Monomial;
  /** the collected coefficient in elementary constants before division (sign taken out) */
  coefficient: Polynomial;
}

/** A law as numerator / Π (1 + Σ K m)^power, in named apparent constants. */
export interface NormalisedLaw {
  numerator: NormalisedTerm[];
  /** each factor with the coefficient of its leading term, which the factor was divided by */
  factors: { terms: NormalisedTerm[]; power: number; reference: Polynomial }[];
  constants: ApparentConstant[];
  text: string;
  latex: string;
  /** the trade's own form and constants where the shape is a standard one (Michaelis–Menten and its inhibitions) */
  trade?: TradeForm;
}

/** The law in the trade's constants for a standard shape. */
export interface TradeForm {
  /** michaelis_menten, competitive_inhibition, uncompetitive_inhibition, mixed_inhibition, noncompetitive_inhibition, substrate_inhibition or reversible_michaelis_menten */
  shape: string;
  substrate: string;
  /** the species whose terms below lower the rate (the product, for the reversible law) */
  inhibitors: string[];
  text: string;
  latex: string;
  constants: ApparentConstant[];
}
