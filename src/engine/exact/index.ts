/** Exact algebra for rate laws: monomials, polynomials, rational functions, Bareiss elimination, output. */
export { Monomial, compareSymbols, type Factor } from './monomial.ts';
export { Polynomial, type Term } from './polynomial.ts';
export { content, monomialContent, primitivePart } from './polynomial-content.ts';
export { divideExact } from './divide-exact.ts';
export { RationalFunction } from './rational-function.ts';
export { orderLimits, type OrderLimits } from './order-limits.ts';
export {
  determinant,
  solveLinear,
  solveShared,
  type PolynomialMatrix,
  type SharedSolution,
  type SolveFailure,
} from './bareiss.ts';
export { WorkBudget, STEADY_STATE_WORK } from './work-budget.ts';
export { formatText, formatLatex, defaultSymbolStyle, type SymbolStyle, type Expression } from './format.ts';
export { rationalPower, integerRoot } from './rational-power.ts';
export { coefficientsIn, definiteSign, pseudoRemainder } from './univariate.ts';
export { substituteFraction, substituteRational } from './substitute-fraction.ts';
export { resultant } from './resultant.ts';
export { triangulate, type EliminationStep, type Triangulation, type TriangulationFailure } from './triangulate.ts';
export { PositiveRoot, type RootProblem } from './positive-root.ts';
export { scaleRoot } from './scale-root.ts';
export { evaluateRadical, radicalLatex, radicalText, type Radical } from './radical.ts';
export { AlgebraicFunction } from './algebraic-function.ts';
export { algebraicOrderLimits } from './algebraic-orders.ts';
export { formatAlgebraicLatex, formatAlgebraicText } from './format-algebraic.ts';
