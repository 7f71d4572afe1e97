/** Writes expressions of one mechanism's rate laws consistently, in text and LaTeX. */
import {
  formatAlgebraicLatex,
  formatAlgebraicText,
  formatLatex,
  formatText,
  radicalLatex,
  radicalText,
  type AlgebraicFunction,
  type Radical,
  type Expression,
  type SymbolStyle,
} from '../exact/index.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import type { TraceLine } from './rate-law.ts';
import { rateLawStyle } from './symbols.ts';

export interface Formatter {
  style: SymbolStyle;
  text(e: Expression): string;
  latex(e: Expression): string;
  /** a law with radicals, the closed forms of its roots inline */
  algebraicText(f: AlgebraicFunction): string;
  algebraicLatex(f: AlgebraicFunction): string;
  /** a closed form with radicals */
  radical(r: Radical): { text: string; latex: string };
  /** a trace line "left = right" */
  line(say: string, left: [string, string], right: Expression): TraceLine;
}

/** The formatter for a mechanism: constants in step order, species in order of appearance. */
export function formatterFor(mechanism: Mechanism): Formatter {
  const style = rateLawStyle(
    mechanism.steps.map((s) => s.label),
    [...mechanism.species.keys()],
  );
  const text = (e: Expression) => formatText(e, style);
  const latex = (e: Expression) => formatLatex(e, style);
  return {
    style,
    text,
    latex,
    algebraicText: (f) => formatAlgebraicText(f, style),
    algebraicLatex: (f) => formatAlgebraicLatex(f, style),
    radical: (r) => ({ text: radicalText(r, style), latex: radicalLatex(r, style) }),
    line: (say, [leftText, leftLatex], right) => ({
      say,
      text: `${leftText} = ${text(right)}`,
      latex: `${leftLatex} = ${latex(right)}`,
    }),
  };
}
