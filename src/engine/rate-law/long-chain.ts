/**
 * The long-chain approximation, a stated approximation on top of the steady state (Bodenstein's
 * treatment of chain reactions): when each carrier passes the chain on many times before it is
 * destroyed, initiation and termination are negligible in each carrier's own balance, so
 *   - the propagation balances alone fix the ratios of the carriers,
 *   - the sum of all carrier balances, in which propagation cancels, says initiation rate =
 *     termination rate, which fixes their scale,
 *   - the rate of the overall reaction is that of propagation.
 * Intermediates that are not carriers keep their exact balances. The equations are solved by the
 * same exact elimination as the steady state.
 */
import { Polynomial, STEADY_STATE_WORK, WorkBudget, type Monomial } from '../exact/index.ts';
import { Rational } from '../exact/rational.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { chainStepLabels, chainStructure, type ChainStep, type ChainStructure } from './chain-structure.ts';
import type { RateLawContext } from './context.ts';
import type { Formatter } from './formatter.ts';
import { forwardRate, reverseRate } from './mass-action.ts';
import { overallRatePolynomial } from './overall-rate.ts';
import type { RateLaw, TraceLine } from './rate-law.ts';
import { closedFormSteadyState } from './steady-state-closed-form.ts';
import { solveLinearSteadyState } from './steady-state-linear.ts';
import { balanceLine, steadyStateSystem, type SteadyStateSystem } from './steady-state-system.ts';

/** The long-chain law, or why there is none; `requested` makes a missing chain a warning rather than silence. */
export function longChainRateLaw(
  context: RateLawContext,
  fmt: Formatter,
  requested: boolean,
  budget: WorkBudget = new WorkBudget(STEADY_STATE_WORK),
): { law?: RateLaw; diagnostics: Diagnostic[] } {
  const structure = chainStructure(context);
  if ('problem' in structure) {
    const note = diagnostic(
      'rate/not-a-chain',
      'warning',
      `approximation: long_chain needs a chain reaction: ${structure.problem}`,
      {
        path: ['approximation'],
        note: 'use approximation: steady_state, or write the initiation and termination steps of the chain',
      },
    );
    return { diagnostics: requested ? [note] : [] };
  }
  const system = longChainSystem(context, structure, fmt);
  if (!system) return { diagnostics: [] };
  const linear = system.equations.every((e) => e.terms.every((t) => unknownDegree(t.monomial, system.unknowns) <= 1));
  const solved = linear
    ? solveLinearSteadyState(system, context, fmt, budget)
    : closedFormSteadyState(system, context, fmt, budget);
  if (typeof solved === 'string' || 'kind' in solved) {
    const trace = [
      ...system.trace,
      fmt.line(`rate of propagation, from ${system.rate.species}`, ['r', 'r'], system.rate.polynomial),
    ];
    const law: RateLaw = {
      method: 'long_chain',
      nonlinear: { unknowns: system.unknowns, equations: system.equations, rate: system.rate.polynomial },
      absorbed: [],
      catalystBalances: [],
      trace,
    };
    const spent = solved === 'budget' || (typeof solved !== 'string' && solved.kind === 'budget');
    const note = diagnostic(
      spent ? 'rate/symbolic-budget' : 'rate/nonlinear',
      'info',
      `the long-chain equations ${spent ? 'need more symbolic work than the budget allows' : 'have no closed form here'}: they are solved numerically at each observation that gives the constants`,
      { path: ['steps', structure.termination[0]!.step.index] },
    );
    return { law, diagnostics: [note] };
  }
  const law: RateLaw = {
    method: 'long_chain',
    absorbed: [],
    catalystBalances: solved.catalystBalances,
    trace: [...system.trace, ...solved.trace],
  };
  if ('expression' in solved && solved.expression) law.expression = solved.expression;
  if ('algebraic' in solved && solved.algebraic) law.algebraic = solved.algebraic;
  return { law, diagnostics: [] };
}

/** The steady-state equations with each carrier's balance cut to propagation, one replaced by initiation = termination. */
function longChainSystem(
  context: RateLawContext,
  chain: ChainStructure,
  fmt: Formatter,
): SteadyStateSystem | undefined {
  const full = steadyStateSystem(context, fmt);
  const propagating = new Set(chain.propagation.map(key));
  const rate = overallRatePolynomial(context, (step, direction) => propagating.has(`${step.index}:${direction}`));
  if (!full || !rate) return undefined;
  // The carrier made by initiation gives up its balance to the chain-length balance.
  const made = chain.carriers.find((c) => chain.initiation.some((i) => signed(i, c) > 0)) ?? chain.carriers[0]!;
  const equations = [...full.equations];
  const names: string[] = full.species.map(() => '');
  const trace: TraceLine[] = [
    {
      say: `long-chain approximation: the carriers ${chain.carriers.join(', ')} are made in ${chainStepLabels(chain.initiation)} and destroyed in ${chainStepLabels(chain.termination)}, far more slowly than ${chainStepLabels(chain.propagation.filter((p) => touchesCarrier(p, chain)))} pass them on; so initiation = termination`,
      ...chainLengthLine(chain, fmt),
    },
  ];
  for (const carrier of chain.carriers) {
    const i = full.species.indexOf(carrier);
    if (carrier === made) {
      equations[i] = sumOver([...chain.initiation, ...chain.termination], (c) => c.delta);
      names[i] = 'initiation = termination';
      continue;
    }
    equations[i] = sumOver(chain.propagation, (c) => c.step.change.get(carrier)!.mul(sense(c)), carrier);
    names[i] = `the propagation balance of ${carrier}`;
    trace.push(
      balanceLine(
        `propagation balance of ${carrier} (initiation and termination left out)`,
        carrier,
        equations[i]!,
        fmt,
      ),
    );
  }
  trace.push(...full.trace.filter((line) => !chain.carriers.some((c) => line.say === `steady state for ${c}`)));
  return { ...full, equations, rate, trace, names };
}

/** Σ weight·rate over one-way steps (only those that change `species`, when given). */
function sumOver(steps: readonly ChainStep[], weight: (c: ChainStep) => Rational, species?: string): Polynomial {
  return Polynomial.sum(
    steps
      .filter((c) => species === undefined || c.step.change.has(species))
      .map((c) => (c.direction === 'forward' ? forwardRate(c.step) : reverseRate(c.step)).scale(weight(c))),
  );
}

/** Initiation = termination as one line: carriers made per unit time on the left, destroyed on the right. */
function chainLengthLine(chain: ChainStructure, fmt: Formatter): { text: string; latex: string } {
  const made = sumOver(chain.initiation, (c) => c.delta);
  const destroyed = sumOver(chain.termination, (c) => c.delta.neg());
  return { text: `${fmt.text(made)} = ${fmt.text(destroyed)}`, latex: `${fmt.latex(made)} = ${fmt.latex(destroyed)}` };
}

/** +1 for a forward step, −1 for the reverse of one (which undoes its change). */
function sense(c: ChainStep): Rational {
  return c.direction === 'forward' ? Rational.ONE : Rational.ONE.neg();
}

/** The change in a carrier a one-way step makes (the reverse of a step undoes its change). */
function signed(c: ChainStep, carrier: string): number {
  return (c.step.change.get(carrier)?.sign() ?? 0) * (c.direction === 'forward' ? 1 : -1);
}

function touchesCarrier(c: ChainStep, chain: ChainStructure): boolean {
  return chain.carriers.some((carrier) => c.step.change.has(carrier));
}

function key(c: ChainStep): string {
  return `${c.step.index}:${c.direction}`;
}

function unknownDegree(m: Monomial, unknowns: readonly string[]): number {
  return unknowns.reduce((n, u) => n + m.exponent(u).toNumber(), 0);
}
