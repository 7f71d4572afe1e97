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
