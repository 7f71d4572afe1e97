/**
 * The symbols of rate laws and how they are written. A symbol's name is its plain-text form:
 * `k_1`, `k_-1`, `K_1` for the constants of the step labelled 1; `[S]` for a concentration;
 * `[E]_T` for the total of a conserved catalyst. LaTeX follows the trade's typography.
 */
import type { SymbolStyle } from '../exact/index.ts';
import { speciesLatex } from '../notation/species-latex.ts';

/** Forward rate constant of a step. */
export const forwardConstant = (label: string) => `k_${label}`;
/** Reverse rate constant of a step. */
export const reverseConstant = (label: string) => `k_-${label}`;
/** Equilibrium constant of a step (k_i / k_-i). */
export const equilibriumConstant = (label: string) => `K_${label}`;
/** Concentration of a species. */
export const concentration = (species: string) => `[${species}]`;
/** Total concentration of a conserved catalyst, free and bound. */
export const totalConcentration = (species: string) => `[${species}]_T`;

/** What a symbol stands for. */
export type SymbolMeaning =
  | { kind: 'constant'; which: 'k' | 'k_rev' | 'K'; label: string }
  | { kind: 'concentration'; species: string }
  | { kind: 'total'; species: string };

/** Reads a symbol name back into its meaning. */
export function symbolMeaning(symbol: string): SymbolMeaning | undefined {
  const constant = /^(k|K)_(-?)(.+)$/.exec(symbol);
  if (constant) {
    const which = constant[1] === 'K' ? 'K' : constant[2] ? 'k_rev' : 'k';
    return { kind: 'constant', which, label: constant[3]! };
  }
  if (symbol.startsWith('[') && symbol.endsWith(']_T')) return { kind: 'total', species: symbol.slice(1, -3) };
  if (symbol.startsWith('[') && symbol.endsWith(']')) return { kind: 'concentration', species: symbol.slice(1, -1) };
  return undefined;
}

/**
 * The style for rate laws: constants before concentrations, constants by step order,
 * concentrations by the order species first appear in the mechanism.
 */
export function rateLawStyle(stepLabels: readonly string[], speciesOrder: readonly string[]): SymbolStyle {
  // Comparators and term weights run many times per symbol: read each symbol's meaning once.
  const ranks = new Map<string, [number, number, number]>();
  const latex = new Map<string, string>();
  const rank = (symbol: string): [number, number, number] => {
    let r = ranks.get(symbol);
    if (r === undefined) {
      r = rankOf(symbolMeaning(symbol), stepLabels, speciesOrder);
      ranks.set(symbol, r);
    }
    return r;
  };
  return {
    text: (s) => s,
    latex: (s) => {
      let l = latex.get(s);
      if (l === undefined) latex.set(s, (l = symbolLatex(s)));
      return l;
    },
    compare: (a, b) => {
      const [x, y] = [rank(a), rank(b)];
      return x[0] - y[0] || x[1] - y[1] || x[2] - y[2] || (a < b ? -1 : a > b ? 1 : 0);
    },
    // Sums read from the constant term up: 1 + K_1[S], k_-1 + k_2 + k_1[S].
    termWeight: (m) => m.factors.reduce((n, [s, e]) => (rank(s)[0] === 0 ? n : n + e.toNumber()), 0),
  };
}

/** Constants first (by step, then k, k_rev, K), then concentrations by species (free before total). */
function rankOf(
  m: SymbolMeaning | undefined,
  stepLabels: readonly string[],
  speciesOrder: readonly string[],
): [number, number, number] {
  if (!m) return [9, 0, 0];
  if (m.kind === 'constant')
    return [0, indexOr(stepLabels, m.label), m.which === 'k' ? 0 : m.which === 'k_rev' ? 1 : 2];
  return [1, indexOr(speciesOrder, m.species), m.kind === 'total' ? 1 : 0];
}

/** LaTeX of one symbol: `k_{-1}`, `K_{\mathrm{bind}}`, `[\mathrm{H_2O_2}]`, `[\mathrm{E}]_\mathrm{T}`. */
export function symbolLatex(symbol: string): string {
  const m = symbolMeaning(symbol);
  if (!m) return `\\mathrm{${speciesLatex(symbol)}}`;
  if (m.kind === 'constant') {
    const sub = labelLatex(m.label);
    return m.which === 'K' ? `K_{${sub}}` : m.which === 'k_rev' ? `k_{-${sub}}` : `k_{${sub}}`;
  }
  const body = `[${speciesLatex(m.species)}]`;
  return m.kind === 'total' ? `${body}_\\mathrm{T}` : body;
}

function labelLatex(label: string): string {
  return /^\d+$/.test(label)
    ? label
    : `\\mathrm{${label.replace(/[^A-Za-z0-9]/g, (c) => (c === '-' ? '\\text{-}' : c === '_' ? '\\_' : ''))}}`;
}

function indexOr(list: readonly string[], item: string): number {
  const i = list.indexOf(item);
  return i < 0 ? list.length : i;
}
