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
import { closedFormSteadyState } from './steady-state-closed-form.ts';
import { budgetNote, nonlinearNote } from './steady-state-notes.ts';
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
