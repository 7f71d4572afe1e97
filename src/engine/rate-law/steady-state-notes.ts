/** Why a steady state falls back to numbers: the located, named reasons behind rate/nonlinear and rate/symbolic-budget. */
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { WorkBudget } from '../exact/index.ts';
import type { RateLawContext } from './context.ts';
import type { NoClosedForm } from './steady-state-closed-form.ts';
import type { SteadyStateSystem } from './steady-state-system.ts';
import { symbolMeaning } from './symbols.ts';

/**
 * Why a nonlinear steady state has no closed form, located at the first step that brings two
 * internal species together, naming the species, the steps and the constants a numeric solution needs.
 */
export function nonlinearNote(
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

/** The work budget of the exact steady state is spent. */
export function budgetNote(system: SteadyStateSystem, budget: WorkBudget): Diagnostic {
  return diagnostic(
    'rate/symbolic-budget',
    'warning',
    `the exact steady state of ${system.species.length} internal species needs more than ${budget.limit.toLocaleString('en-US')} weighted term products of symbolic work, so no closed-form law is given: the steady state is solved numerically at each observation that gives constants and concentrations`,
    {
      path: ['steps'],
      note: 'split the mechanism, give the rate-determining step (approximation: rds), or give constants for numeric orders',
    },
  );
}
