/**
 * The classes whose instances a derivation holds (exact values: rationals, monomials,
 * polynomials, rational functions, laws with radicals and their roots). Code that stores a
 * derivation or sends it to another thread keeps their prototypes by this list; a class added to
 * a derivation's values belongs here too (a value of a class not listed is never stored).
 */
import { AlgebraicFunction, Monomial, Polynomial, PositiveRoot, RationalFunction } from './exact/index.ts';
import { Rational } from './exact/rational.ts';

/** Each class's prototype by a stable name (the name is part of the stored form; add, never rename). */
export const DERIVATION_CLASSES: Readonly<Record<string, { prototype: object }>> = {
  Rational,
  Monomial,
  Polynomial,
  RationalFunction,
  AlgebraicFunction,
  PositiveRoot,
};
