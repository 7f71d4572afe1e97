/**
 * The steady-state (Bodenstein) approximation: d[X]/dt = 0 for every internal species, with each
 * conservation relation (a catalyst total) replacing one dependent equation. Where every step is
 * at most first order in internal species the system is linear and is solved exactly by one
 * fraction-free Bareiss elimination (for catalytic cycles this is the King–Altman result).
 * Otherwise the equations are kept for a numeric solution. The symbolic work has a budget
 * (STEADY_STATE_WORK term products): when it is spent the law falls back to numbers, and says so.
 */
import { STEADY_STATE_WORK, WorkBudget } from '../exact/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { RateLawContext } from './context.ts';
import type { Formatter } from './formatter.ts';
import type { RateLaw } from './rate-law.ts';
import { closedFormSteadyState, type NoClosedForm } from './steady-state-closed-form.ts';
import { solveLinearSteadyState } from './steady-state-linear.ts';
import { symbolMeaning } from './symbols.ts';
import { nonlinearSteps, steadyStateSystem, type SteadyStateSystem } from './steady-state-system.ts';

/** Derives the steady-state rate law exactly, or sets up the nonlinear system for a numeric one. */
export function steadyStateRateLaw(
  context: RateLawContext,
  fmt: Formatter,
  budget: WorkBudget = new WorkBudget(STEADY_STATE_WORK),
): { law?: RateLaw; diagnostics: Diagnostic[] } {
  const system = steadyStateSystem(context, fmt);
  if (!system)
    return {
      diagnostics: [
        diagnostic(
          'rate/nonlinear',
          'warning',
          'the route has no product or reactant whose formation gives the overall rate',
          { path: ['steps'] },
        ),
      ],
    };
  const offending = nonlinearSteps(context);
  if (offending.length > 0) {
    const closed = closedFormSteadyState(system, context, fmt, budget);
    if ('kind' in closed) {
      const note =
        closed.kind === 'budget' ? budgetNote(system, budget) : nonlinearNote(context, system, offending, closed);
      return numericOnly(system, fmt, note);
    }
    const law: RateLaw = {
      method: 'steady_state',
      absorbed: [],
      catalystBalances: closed.catalystBalances,
      trace: [...system.trace, ...closed.trace],
    };
    if (closed.expression) law.expression = closed.expression;
    if (closed.algebraic) law.algebraic = closed.algebraic;
    return { law, diagnostics: [] };
  }
  const solved = solveLinearSteadyState(system, context, fmt, budget);
  if (solved === 'budget') return numericOnly(system, fmt, budgetNote(system, budget));
  if (solved === 'singular') {
    return {
      diagnostics: [
        diagnostic(
          'rate/nonlinear',
          'warning',
          'the steady-state equations do not fix the internal species (a singular system)',
          { path: ['steps'] },
        ),
      ],
    };
  }
  const law: RateLaw = {
    method: 'steady_state',
    expression: solved.expression,
    absorbed: [],
    catalystBalances: solved.catalystBalances,
    trace: [...system.trace, ...solved.trace],
  };
  return { law, diagnostics: [] };
}

/** The law kept as equations for a numeric solution at each observation, with the reason. */
function numericOnly(
  system: SteadyStateSystem,
  fmt: Formatter,
  note: Diagnostic,
): { law: RateLaw; diagnostics: Diagnostic[] } {
  const trace = [...system.trace];
  trace.push(fmt.line(`rate of the overall reaction from ${system.rate.species}`, ['r', 'r'], system.rate.polynomial));
  const law: RateLaw = {
    method: 'steady_state',
    nonlinear: { unknowns: system.unknowns, equations: system.equations, rate: system.rate.polynomial },
    absorbed: [],
    catalystBalances: [],
    trace,
  };
  return { law, diagnostics: [note] };
}

/**
 * Why a nonlinear steady state has no closed form, located at the first step that brings two
 * internal species together, naming the species, the steps and the constants a numeric solution needs.
 */
function nonlinearNote(
  context: RateLawContext,
  system: SteadyStateSystem,
  offending: number[],
  why: Exclude<NoClosedForm, { kind: 'budget' }>,
): Diagnostic {
  const steps = context.mechanism.steps;
  const first = steps[offending[0]!]!;
  const named = offending.map((i) => `step ${steps[i]!.label} (${steps[i]!.text})`).join(', ');
  const constants = [
    ...new Set(system.equations.flatMap((e) => e.symbols()).filter((s) => symbolMeaning(s)?.kind === 'constant')),
  ];
  return diagnostic(
    'rate/nonlinear',
    'warning',
    `the steady state of ${system.species.join(', ')} is not linear: ${named} ${offending.length > 1 ? 'bring' : 'brings'} two of them together; ${reason(why)}. It is solved numerically at each observation that gives the constants (${constants.join(', ')}) and concentrations`,
    {
      path: ['steps', first.index],
      note: 'give the rate constants for numeric orders, or ask for the long-chain approximation (approximation: long_chain) where this is a chain',
    },
  );
}

function reason(why: Exclude<NoClosedForm, { kind: 'budget' }>): string {
  switch (why.kind) {
    case 'root':
      if (why.problem.kind === 'degree')
        return `elimination leaves a polynomial of degree ${why.problem.degree} in ${why.unknown}, which has no closed-form root here`;
      if (why.problem.kind === 'sign')
        return `elimination leaves an equation in ${why.unknown} whose positive root is not unique (${why.problem.reason})`;
      return `elimination leaves no equation that fixes ${why.unknown}`;
    case 'resultant':
      return `no intermediate enters any remaining balance to the first power; eliminating by resultants leaves ${why.unknowns.map((u, i) => `degree ${why.degrees[i]} in ${u}`).join(', ')}, and the others then follow from nonlinear equations`;
    case 'zero':
      return `a balance holds for these species only if ${why.unknowns.join(', ')} ${why.unknowns.length > 1 ? 'are' : 'is'} zero, so there is no positive steady state`;
    case 'underdetermined':
      return `the balances do not fix ${why.unknowns.join(', ')} (they are dependent)`;
    case 'inconsistent':
      return 'the balances hold together only for special values of the constants';
  }
}

function budgetNote(system: SteadyStateSystem, budget: WorkBudget): Diagnostic {
  return diagnostic(
    'rate/symbolic-budget',
    'warning',
    `the exact steady state of ${system.species.length} internal species needs more than ${budget.limit.toLocaleString('en-US')} term products of symbolic work, so no closed-form law is given: the steady state is solved numerically at each observation that gives constants and concentrations`,
    {
      path: ['steps'],
      note: 'split the mechanism, give the rate-determining step (approximation: rds), or give constants for numeric orders',
    },
  );
}
