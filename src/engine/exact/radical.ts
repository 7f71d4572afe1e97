import { formatLatex, formatText, type SymbolStyle } from './format.ts';
import { RationalFunction } from './rational-function.ts';

/**
 * A closed form with radicals: rational functions combined by sums, products, quotients and
 * n-th roots, as the positive root of a binomial or quadratic comes out. Values are positive where
 * every symbol is (roots are taken of positive radicands), so the n-th root is the real one.
 */
export type Radical =
  | { kind: 'rational'; value: RationalFunction }
  | { kind: 'root'; radicand: Radical; index: number }
  | { kind: 'sum'; terms: Radical[] }
  | { kind: 'product'; factors: Radical[] }
  | { kind: 'quotient'; numerator: Radical; denominator: Radical };

/** The floating-point value of a closed form (NaN where a radicand is negative). */
export function evaluateRadical(r: Radical, values: ReadonlyMap<string, number>): number {
  switch (r.kind) {
    case 'rational':
      return r.value.evaluate(values);
    case 'root': {
      const x = evaluateRadical(r.radicand, values);
      return r.index === 2 ? Math.sqrt(x) : Math.pow(x, 1 / r.index);
    }
    case 'sum':
      return r.terms.reduce((s, t) => s + evaluateRadical(t, values), 0);
    case 'product':
      return r.factors.reduce((s, t) => s * evaluateRadical(t, values), 1);
    case 'quotient':
      return evaluateRadical(r.numerator, values) / evaluateRadical(r.denominator, values);
  }
}

/** The symbols a closed form depends on, sorted. */
export function radicalSymbols(r: Radical): string[] {
  const out = new Set<string>();
  const walk = (x: Radical): void => {
    if (x.kind === 'rational') x.value.symbols().forEach((s) => out.add(s));
    else if (x.kind === 'root') walk(x.radicand);
    else if (x.kind === 'sum') x.terms.forEach(walk);
    else if (x.kind === 'product') x.factors.forEach(walk);
    else [x.numerator, x.denominator].forEach(walk);
  };
  walk(r);
  return [...out].sort();
}

/** Plain text, e.g. `(k_1*[Br2]/k_5)^(1/2)`; a sum or fraction inside a product is parenthesised. */
export function radicalText(r: Radical, style: SymbolStyle): string {
  switch (r.kind) {
    case 'rational':
      return formatText(r.value, style);
    case 'root': {
      const inner = radicalText(r.radicand, style);
      return `${/^[\w[\]•.]+$/.test(inner) ? inner : `(${inner})`}^(1/${r.index})`;
    }
    case 'sum':
      return r.terms.map((t, i) => signed(radicalText(t, style), i)).join('');
    case 'product':
      return r.factors.map((f) => (compound(f) ? `(${radicalText(f, style)})` : radicalText(f, style))).join('*');
    case 'quotient': {
      const [n, d] = [radicalText(r.numerator, style), radicalText(r.denominator, style)];
      return `${compound(r.numerator) ? `(${n})` : n} / ${compound(r.denominator) || /[*/]/.test(d) ? `(${d})` : d}`;
    }
  }
}

/** LaTeX for KaTeX: `\sqrt{…}`, `\sqrt[3]{…}`, `\frac{…}{…}`. */
export function radicalLatex(r: Radical, style: SymbolStyle): string {
  switch (r.kind) {
    case 'rational':
      return formatLatex(r.value, style);
    case 'root': {
      const inner = radicalLatex(r.radicand, style);
      return r.index === 2 ? `\\sqrt{${inner}}` : `\\sqrt[${r.index}]{${inner}}`;
    }
    case 'sum':
      return r.terms.map((t, i) => signed(radicalLatex(t, style), i)).join('');
    case 'product':
      return r.factors
        .map((f) => (compound(f) ? `\\left(${radicalLatex(f, style)}\\right)` : radicalLatex(f, style)))
        .join(' ');
    case 'quotient':
      return `\\frac{${radicalLatex(r.numerator, style)}}{${radicalLatex(r.denominator, style)}}`;
  }
}

/** A sum, or a rational leaf with several terms or a fraction bar: needs brackets inside a product. */
function compound(r: Radical): boolean {
  if (r.kind === 'sum') return r.terms.length > 1;
  if (r.kind === 'rational') return r.value.numerator.terms.length > 1 || !r.value.isPolynomial();
  return false;
}

function signed(text: string, index: number): string {
  if (index === 0) return text;
  return text.startsWith('-') ? ` - ${text.slice(1)}` : ` + ${text}`;
}
