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
import { solveLinearSteadyState } from './steady-state-linear.ts';
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
  if (offending.length > 0) return numericOnly(system, fmt, nonlinearNote(context, offending));
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

function nonlinearNote(context: RateLawContext, steps: number[]): Diagnostic {
  return diagnostic(
    'rate/nonlinear',
    'info',
    'a step brings two intermediates or catalyst forms together (a recombination, say), so the steady-state equations are not linear: they are solved numerically at each observation that gives constants and concentrations, with no closed-form law',
    { path: ['steps', steps[0] ?? 0] },
  );
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
