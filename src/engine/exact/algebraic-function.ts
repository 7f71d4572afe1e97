import { compareSymbols } from './monomial.ts';
import { Polynomial } from './polynomial.ts';
import { PositiveRoot } from './positive-root.ts';
import { RationalFunction } from './rational-function.ts';

/**
 * A rate law with radicals: a rational function (`outer`) of the constants, the concentrations
 * and some root symbols ρ_i, each ρ_i the positive root of its own polynomial in constants and
 * concentrations (`roots`). Laws that are rational functions stay `RationalFunction`s; this form
 * is only for laws that are not, e.g. r = k_2[CH3CHO]^(3/2)·ρ with 2k_4ρ² = k_1.
 */
export class AlgebraicFunction {
  constructor(
    readonly outer: RationalFunction,
    readonly roots: readonly PositiveRoot[],
  ) {}

  /** The constants and concentrations it depends on (not the root symbols), sorted. */
  symbols(): string[] {
    const rootSymbols = new Set(this.roots.map((r) => r.symbol));
    const all = new Set([...this.outer.symbols(), ...this.roots.flatMap((r) => r.symbols())]);
    return [...all].filter((s) => !rootSymbols.has(s)).sort(compareSymbols);
  }

  /** Never the zero function: its outer numerator is not zero. */
  isZero(): boolean {
    return this.outer.isZero();
  }

  /** Each root's value at these values. */
  rootValues(values: ReadonlyMap<string, number>): Map<string, number> {
    return new Map(this.roots.map((r) => [r.symbol, r.value(values)]));
  }

  /** The floating-point value (NaN where a root has no positive value). */
  evaluate(values: ReadonlyMap<string, number>): number {
    return this.outer.evaluate(new Map([...values, ...this.rootValues(values)]));
  }

  /**
   * The apparent order x ∂ln f/∂x at the values, by implicit differentiation: each root ρ of G
   * moves as dρ/dx = −(∂G/∂x)/(∂G/∂ρ). Undefined where the value or a derivative is not finite.
   */
  logDerivative(symbol: string, values: ReadonlyMap<string, number>): number | undefined {
    const x = values.get(symbol);
    if (x === undefined) return undefined;
    const at = new Map([...values, ...this.rootValues(values)]);
    let slope = this.outer.derivative(symbol).evaluate(at);
    for (const root of this.roots) {
      if (!this.outer.symbols().includes(root.symbol)) continue;
      const g = root.polynomial;
      const moves = -g.derivative(symbol).evaluate(at) / g.derivative(root.symbol).evaluate(at);
      slope += this.outer.derivative(root.symbol).evaluate(at) * moves;
    }
    const order = (x * slope) / this.outer.evaluate(at);
    return Number.isFinite(order) ? order : undefined;
  }

  /**
   * The function with a symbol set to zero (a product absent at initial rates), where that leaves
   * a positive root and a finite, non-zero value; undefined where it does not, or where the symbol
   * has fractional or negative powers (the law then presumes it present).
   */
  withZero(symbol: string): AlgebraicFunction | undefined {
    const natural = (p: Polynomial) =>
      p.terms.every((t) => t.monomial.exponent(symbol).isInteger() && t.monomial.exponent(symbol).sign() >= 0);
    const polys = [this.outer.numerator, this.outer.denominator, ...this.roots.map((r) => r.polynomial)];
    if (!polys.every(natural)) return undefined;
    const numerator = this.outer.numerator.substitute(symbol, Polynomial.ZERO);
    const denominator = this.outer.denominator.substitute(symbol, Polynomial.ZERO);
    if (numerator.isZero() || denominator.isZero()) return undefined;
    const roots: PositiveRoot[] = [];
    for (const root of this.roots) {
      const changed = root.substitute(symbol, Polynomial.ZERO);
      if (!(changed instanceof PositiveRoot)) return undefined;
      roots.push(changed);
    }
    return new AlgebraicFunction(RationalFunction.of(numerator, denominator), roots);
  }
}
