import type { AlgebraicFunction } from './algebraic-function.ts';
import { defaultSymbolStyle, formatLatex, formatText, type SymbolStyle } from './format.ts';
import { radicalLatex, radicalText, type Radical } from './radical.ts';

/**
 * A law with radicals written out in one piece: the outer rational function with each root
 * symbol replaced by its closed form, e.g. `k_2*[CH3CHO]^(3/2)*(k_1/(2*k_4))^(1/2)`.
 */
export function formatAlgebraicText(f: AlgebraicFunction, style: SymbolStyle = defaultSymbolStyle): string {
  const forms = new Map(f.roots.map((r) => [r.symbol, r.closedForm()]));
  const inline: SymbolStyle = {
    ...style,
    text: (s) => {
      const form = forms.get(s);
      if (!form) return style.text(s);
      const text = radicalText(form, style);
      return atomic(form) ? text : `(${text})`;
    },
  };
  return formatText(f.outer, inline);
}

/** LaTeX of a law with radicals, the closed forms inline (`\sqrt{…}`, `\frac{…}{…}`). */
export function formatAlgebraicLatex(f: AlgebraicFunction, style: SymbolStyle = defaultSymbolStyle): string {
  const forms = new Map(f.roots.map((r) => [r.symbol, r.closedForm()]));
  const inline: SymbolStyle = {
    ...style,
    latex: (s) => {
      const form = forms.get(s);
      if (!form) return style.latex(s);
      const latex = radicalLatex(form, style);
      return atomic(form) || form.kind !== 'sum' ? latex : `\\left(${latex}\\right)`;
    },
  };
  return formatLatex(f.outer, inline);
}

/** A root or a single monomial reads as one factor without brackets. */
function atomic(form: Radical): boolean {
  if (form.kind === 'root') return true;
  return form.kind === 'rational' && form.value.isPolynomial() && form.value.numerator.terms.length === 1;
}
