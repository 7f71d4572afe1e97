/**
 * The steady-state equations of a mechanism (Bodenstein): d[X]/dt = 0 for every internal species,
 * each conservation relation (a catalyst total) replacing the balance of its last member, and the
 * rate of the overall reaction as a polynomial in constants and concentrations.
 */
import { Monomial, Polynomial } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import type { RateLawContext } from './context.ts';
import type { Formatter } from './formatter.ts';
import { netRate } from './mass-action.ts';
import { overallRatePolynomial } from './overall-rate.ts';
import type { TraceLine } from './rate-law.ts';
import { concentration } from './symbols.ts';

export interface SteadyStateSystem {
  /** the internal species, and their concentration symbols (the unknowns), in the same order */
  species: string[];
  unknowns: string[];
  /** for each unknown in turn: its balance, or a conservation relation minus its total */
  equations: Polynomial[];
  /** the steady-state balance of each internal species (before conservation replaces any) */
  balances: Polynomial[];
  /** the rate of the overall reaction and the species it is read from */
  rate: { species: string; polynomial: Polynomial };
  trace: TraceLine[];
  /** what each equation is, where it is not a species' balance or its conservation (the long-chain system) */
  names?: string[];
}

/** Sets up the steady-state equations; undefined when no species gives the overall rate. */
export function steadyStateSystem(context: RateLawContext, fmt: Formatter): SteadyStateSystem | undefined {
  const { mechanism, internal } = context;
  const unknowns = internal.map(concentration);
  const balances = internal.map((sp) =>
    Polynomial.sum(mechanism.steps.map((step) => netRate(step).scale(step.change.get(sp) ?? Rational.ZERO))),
  );
  const trace: TraceLine[] = internal.map((sp, i) => balanceLine(`steady state for ${sp}`, sp, balances[i]!, fmt));
  const equations = [...balances];
  for (const c of context.conservations) {
    // The relation makes one balance dependent: replace the equation of its last species.
    const replaced = internal.indexOf(c.species.at(-1)!);
    const sum = Polynomial.sum(
      c.species.map((sp, j) => Polynomial.term(c.weights[j]!, Monomial.of(concentration(sp)))),
    );
    equations[replaced] = sum.sub(Polynomial.symbol(c.total));
    trace.push({
      say: `conservation of ${c.catalyst} (replaces the balance of ${c.species.at(-1)})`,
      text: `${c.total} = ${fmt.text(sum)}`,
      latex: `${fmt.style.latex(c.total)} = ${fmt.latex(sum)}`,
    });
  }
  const rate = overallRatePolynomial(context);
  if (!rate) return undefined;
  return { species: [...internal], unknowns, equations, balances, rate, trace };
}

/** A trace line d[X]/dt = … = 0. */
export function balanceLine(say: string, species: string, balance: Polynomial, fmt: Formatter): TraceLine {
  const symbol = concentration(species);
  return {
    say,
    text: `d${symbol}/dt = ${fmt.text(balance)} = 0`,
    latex: `\\frac{d${fmt.style.latex(symbol)}}{dt} = ${fmt.latex(balance)} = 0`,
  };
}

/** The steps whose rate brings two internal species together (or one squared): they make the system nonlinear. */
export function nonlinearSteps(context: RateLawContext): number[] {
  const internal = new Set(context.internal);
  const order = (terms: { species: string; coefficient: Rational }[]) =>
    terms.filter((t) => internal.has(t.species)).reduce((n, t) => n + t.coefficient.toNumber(), 0);
  return context.mechanism.steps
    .filter((s) => order(s.reactants) > 1 || (s.reversible && order(s.products) > 1))
    .map((s) => s.index);
}
