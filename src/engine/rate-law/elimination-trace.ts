/**
 * The derivation lines of an elimination, as a kineticist would write them: the ratio a balance
 * fixes once a common factor is divided out, each intermediate solved from a balance, the
 * equation left for the last one, and its positive root.
 */
import {
  AlgebraicFunction,
  Monomial,
  Polynomial,
  RationalFunction,
  type PositiveRoot,
  type Triangulation,
} from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import type { Formatter } from './formatter.ts';
import type { TraceLine } from './rate-law.ts';
import type { SteadyStateSystem } from './steady-state-system.ts';

/** What equation i of the system is: a species' steady state, or the conservation that replaced it. */
export function equationName(system: SteadyStateSystem, i: number): string {
  const named = system.names?.[i];
  if (named) return named;
  const replaced = !system.equations[i]!.equals(system.balances[i]!);
  return replaced
    ? `the conservation that replaces the balance of ${system.species[i]}`
    : `the steady state of ${system.species[i]}`;
}

/** Lines for the ratio and linear eliminations, in the order they were made. */
export function eliminationTrace(system: SteadyStateSystem, tri: Triangulation, fmt: Formatter): TraceLine[] {
  const lines: TraceLine[] = [];
  for (const step of tri.steps) {
    if (step.kind === 'ratio') {
      const factor = Polynomial.term(Rational.ONE, step.factor);
      lines.push({
        say: `every term of ${equationName(system, step.equation)} carries ${fmt.text(factor)}, which is not zero: divided out, it fixes a ratio`,
        text: `${fmt.text(step.result)} = 0`,
        latex: `${fmt.latex(step.result)} = 0`,
      });
    } else if (step.kind === 'linear') {
      lines.push(
        fmt.line(
          `from ${equationName(system, step.equation)}`,
          [step.symbol, fmt.style.latex(step.symbol)],
          RationalFunction.of(step.numerator, step.denominator),
        ),
      );
    }
  }
  return lines;
}

/** For each last intermediate: the equation elimination leaves, and its positive root. */
export function describeRoots(
  tri: Triangulation,
  roots: ReadonlyMap<string, { root: PositiveRoot; scale: Monomial }>,
  fmt: Formatter,
): TraceLine[] {
  const lines: TraceLine[] = [];
  for (const final of tri.finals) {
    const x = final.symbol;
    lines.push({
      say: `the equation elimination leaves for ${x}`,
      text: `${fmt.text(final.polynomial)} = 0`,
      latex: `${fmt.latex(final.polynomial)} = 0`,
    });
    const found = roots.get(x);
    if (!found) continue;
    const { root, scale } = found;
    const exact = root.exactMonomial();
    const say = `its positive root (${root.kind === 'quadratic' ? 'a quadratic' : 'a binomial'})`;
    if (exact) {
      lines.push(fmt.line(say, [x, fmt.style.latex(x)], Polynomial.term(exact.coefficient, exact.monomial.mul(scale))));
      continue;
    }
    const value = new AlgebraicFunction(
      RationalFunction.of(Polynomial.term(Rational.ONE, scale.mul(Monomial.of(root.symbol)))),
      [root],
    );
    lines.push({
      say,
      text: `${x} = ${fmt.algebraicText(value)}`,
      latex: `${fmt.style.latex(x)} = ${fmt.algebraicLatex(value)}`,
    });
  }
  return lines;
}
