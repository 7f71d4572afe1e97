/** A law with radicals as people read it: the closed forms of its roots written inline. */
import type { AlgebraicFunction } from '../exact/index.ts';
import type { Formatter } from './formatter.ts';

export interface PresentedAlgebraicLaw {
  expression: AlgebraicFunction;
  text: string;
  latex: string;
  /** each root's symbol, the polynomial it is the positive root of, and its closed form */
  roots: { symbol: string; text: string; latex: string }[];
}

/** Writes out a law with radicals. */
export function presentAlgebraicLaw(expression: AlgebraicFunction, fmt: Formatter): PresentedAlgebraicLaw {
  return {
    expression,
    text: fmt.algebraicText(expression),
    latex: fmt.algebraicLatex(expression),
    roots: expression.roots.map((root) => {
      const closed = fmt.radical(root.closedForm());
      return { symbol: root.symbol, text: closed.text, latex: closed.latex };
    }),
  };
}
