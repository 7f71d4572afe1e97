/**
 * Closed forms for a nonlinear steady state (chain carriers recombining, a catalyst dimer):
 * exact elimination (exact/triangulate.ts) reduces the equations to one polynomial in each last
 * intermediate, every other intermediate following rationally from it. A binomial gives a
 * radical (half orders of recombination-terminated chains, 3/2 for the acetaldehyde chain), a
 * quadratic its positive root; the law is then a rational function where the roots are exact
 * monomials, and a law with radicals (AlgebraicFunction) otherwise. Anything else is reported
 * with its reason, for the numeric fallback.
 */
import {
  AlgebraicFunction,
  Monomial,
  Polynomial,
  PositiveRoot,
  RationalFunction,
  pseudoRemainder,
  scaleRoot,
  substituteRational,
  triangulate,
  type RootProblem,
  type Triangulation,
  type WorkBudget,
} from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import { definiteSign } from '../exact/index.ts';
import type { RateLawContext } from './context.ts';
import type { Formatter } from './formatter.ts';
import { describeRoots, eliminationTrace } from './elimination-trace.ts';
import type { CatalystBalance, TraceLine } from './rate-law.ts';
import type { SteadyStateSystem } from './steady-state-system.ts';
import { symbolMeaning } from './symbols.ts';

/** An exact nonlinear steady state: a rational law, or a law with radicals. */
export interface ClosedForm {
  expression?: RationalFunction;
  algebraic?: AlgebraicFunction;
  catalystBalances: CatalystBalance[];
  trace: TraceLine[];
}

/** Why there is no closed form, in terms the diagnostic can name. */
export type NoClosedForm =
  | { kind: 'budget' }
  | { kind: 'root'; unknown: string; problem: RootProblem }
  | { kind: 'resultant'; unknowns: string[]; degrees: number[] }
  | { kind: 'zero'; unknowns: string[]; equation: number }
  | { kind: 'underdetermined'; unknowns: string[] }
  | { kind: 'inconsistent'; equation: number };

/** Solves the steady state by elimination, or says why there is no closed form. */
export function closedFormSteadyState(
  system: SteadyStateSystem,
  context: RateLawContext,
  fmt: Formatter,
  budget: WorkBudget,
): ClosedForm | NoClosedForm {
  const rateUses = new Set(system.unknowns.filter((x) => !system.rate.polynomial.degreeIn(x).isZero()));
  const tri = triangulate(system.equations, system.unknowns, budget, rateUses);
  if ('kind' in tri) {
    if (tri.kind === 'zero') return { kind: 'zero', unknowns: tri.symbols, equation: tri.equation };
    if (tri.kind === 'underdetermined') return { kind: 'underdetermined', unknowns: tri.symbols };
    return tri;
  }
  if (tri.resultants) {
    return {
      kind: 'resultant',
      unknowns: tri.finals.map((f) => f.symbol),
      degrees: tri.finals.map((f) => f.polynomial.degreeIn(f.symbol).toNumber()),
    };
  }
  const values = new Map<string, RationalFunction>();
  const roots: PositiveRoot[] = [];
  const rootFor = new Map<string, { root: PositiveRoot; scale: Monomial }>();
  for (const final of tri.finals) {
    const rho = `ρ_${roots.length + 1}`;
    const scaled = scaleRoot(final.polynomial, final.symbol, rho, isVariable);
    const polynomial = scaled?.polynomial ?? final.polynomial.substitute(final.symbol, Polynomial.symbol(rho));
    const root = PositiveRoot.of(rho, polynomial);
    if (!(root instanceof PositiveRoot)) return { kind: 'root', unknown: final.symbol, problem: root };
    const scale = scaled?.scale ?? Monomial.ONE;
    const exact = root.exactMonomial();
    if (exact) {
      values.set(final.symbol, RationalFunction.of(Polynomial.term(exact.coefficient, exact.monomial.mul(scale))));
    } else {
      roots.push(root);
      values.set(final.symbol, RationalFunction.of(Polynomial.term(Rational.ONE, scale.mul(Monomial.of(rho)))));
    }
    rootFor.set(final.symbol, { root, scale });
  }
  const solved = backSubstitute(tri, values, budget);
  if (!solved) return { kind: 'budget' };
  const rate = substituteAll(RationalFunction.of(system.rate.polynomial), solved, budget);
  if (!rate) return { kind: 'budget' };
  const trace = [...eliminationTrace(system, tri, fmt), ...describeRoots(tri, rootFor, fmt)];
  if (roots.length === 0) {
    trace.push(fmt.line(`rate of the overall reaction from ${system.rate.species}`, ['r', 'r'], rate));
    return { expression: rate, catalystBalances: balances(context, system, solved, fmt), trace };
  }
  const algebraic = new AlgebraicFunction(reduced(rate, roots), roots);
  trace.push({
    say: `rate of the overall reaction from ${system.rate.species}`,
    text: `r = ${fmt.algebraicText(algebraic)}`,
    latex: `r = ${fmt.algebraicLatex(algebraic)}`,
  });
  return { algebraic, catalystBalances: [], trace };
}

/** Constants are parameters; concentrations and totals are the variables whose powers are drawn out of roots. */
const isVariable = (symbol: string) => symbolMeaning(symbol)?.kind !== 'constant';

/** Each eliminated unknown as a rational function of the constants, the concentrations and the roots. */
function backSubstitute(
  tri: Triangulation,
  finals: ReadonlyMap<string, RationalFunction>,
  budget: WorkBudget,
): Map<string, RationalFunction> | undefined {
  const values = new Map(finals);
  for (const step of [...tri.steps].reverse()) {
    if (step.kind !== 'linear') continue;
    const value = substituteAll(RationalFunction.of(step.numerator, step.denominator), values, budget);
    if (!value) return undefined;
    values.set(step.symbol, value);
  }
  return values;
}

/** f with every symbol that has a value replaced by it. */
function substituteAll(
  f: RationalFunction,
  values: ReadonlyMap<string, RationalFunction>,
  budget: WorkBudget,
): RationalFunction | undefined {
  let out: RationalFunction | undefined = f;
  for (const [symbol, value] of values) {
    if (!out) return undefined;
    if (out.symbols().includes(symbol)) out = substituteRational(out, symbol, value, budget);
  }
  return out;
}

/**
 * The rate as a function of the roots, in the form whose signs settle its orders: as it stands
 * (k_2[I]² stays one positive term), or reduced modulo each root's polynomial where that is what
 * makes numerator and denominator of fixed sign (a difference of propagation rates that cancels
 * on the steady state).
 */
function reduced(rate: RationalFunction, roots: readonly PositiveRoot[]): RationalFunction {
  const fixed = (f: RationalFunction) => definiteSign(f.numerator) !== 0 && definiteSign(f.denominator) !== 0;
  if (fixed(rate)) return rate;
  let out = rate;
  for (const root of roots) {
    const n = pseudoRemainder(out.numerator, root.polynomial, root.symbol);
    const d = pseudoRemainder(out.denominator, root.polynomial, root.symbol);
    if (!n || !d || n.remainder.isZero() || d.remainder.isZero()) return rate;
    const lead = root.polynomial.coefficientIn(root.symbol, root.polynomial.degreeIn(root.symbol));
    out = RationalFunction.of(n.remainder.mul(lead.pow(d.power)), d.remainder.mul(lead.pow(n.power)));
  }
  return fixed(out) ? out : rate;
}

/** The share of each conserved pool held by each form, where the law is rational. */
function balances(
  context: RateLawContext,
  system: SteadyStateSystem,
  values: ReadonlyMap<string, RationalFunction>,
  fmt: Formatter,
): CatalystBalance[] {
  return context.conservations.map((c) => ({
    catalyst: c.catalyst,
    total: c.total,
    forms: c.species.map((sp) => {
      const value = values.get(system.unknowns[system.species.indexOf(sp)]!) ?? RationalFunction.ZERO;
      const fraction = value.div(RationalFunction.of(Polynomial.symbol(c.total)));
      return { species: sp, fraction, text: fmt.text(fraction), latex: fmt.latex(fraction) };
    }),
  }));
}
