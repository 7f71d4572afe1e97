/**
 * The rate-determining-step approximation with fast pre-equilibria (DESIGN.md item 4):
 * rate = k_rds Π[reactants of the rds]^ν / σ_rds, every intermediate eliminated through the
 * reversible steps before the rds (and dead-end equilibria off the route) taken at equilibrium.
 * Steps after the rds do not enter; species formed only after it are negligible. A conserved
 * catalyst's (or surface site's) total is the sum of its pre-equilibrium forms, which gives the
 * saturation denominator, to the power the rds holds the free form (balance-catalysts.ts).
 */
import { Monomial, Polynomial, RationalFunction } from '../exact/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Step } from '../mechanism/mechanism.ts';
import { Rational } from '../exact/rational.ts';
import type { RateLawContext } from './context.ts';
import type { Formatter } from './formatter.ts';
import { solveLogLinear, type LogLinearRow } from './log-linear-solve.ts';
import { forwardRate } from './mass-action.ts';
import { balanceCatalysts } from './balance-catalysts.ts';
import type { RateLaw, TraceLine } from './rate-law.ts';
import { concentration, equilibriumConstant } from './symbols.ts';

/** Derives the rate law by the rds method, or explains why it cannot. */
export function eliminateByPreEquilibria(
  context: RateLawContext,
  rds: Step,
  fmt: Formatter,
): { law?: RateLaw; diagnostics: Diagnostic[] } {
  const { mechanism, sigma } = context;
  const trace: TraceLine[] = [];
  const sigmaRds = sigma[rds.index] ?? 0;
  const freeCatalysts = new Set(context.conservations.map((c) => c.catalyst));
  const unknowns = context.internal.filter((sp) => !freeCatalysts.has(sp));
  // "Before the rds" is along the route, not down the page: a cycle may be written from any step.
  const before = (s: Step) => (context.order[s.index] ?? Infinity) < (context.order[rds.index] ?? Infinity);
  const equilibria = mechanism.steps.filter(
    (s) => s !== rds && s.reversible && (before(s) || (sigma[s.index] ?? 0) === 0),
  );

  let rate = Polynomial.term(Rational.of(1, sigmaRds), Monomial.ONE).mul(forwardRate(rds));
  trace.push(
    fmt.line(
      `rate of the overall reaction: the rate of the rate-determining step ${rds.label} divided by its σ = ${sigmaRds}`,
      ['r', 'r'],
      rate,
    ),
  );

  const rows: LogLinearRow[] = equilibria.map((step) => {
    const rhs = Monomial.fromFactors([
      [equilibriumConstant(step.label), Rational.ONE],
      ...[...step.change]
        .filter(([sp]) => !unknowns.includes(sp))
        .map(([sp, nu]): [string, Rational] => [concentration(sp), nu.neg()]),
    ]);
    return { exponents: unknowns.map((sp) => step.change.get(sp) ?? Rational.ZERO), rhs };
  });
  for (const step of equilibria) trace.push(equilibriumLine(step, fmt));
  const solved = solveLogLinear(rows, unknowns.length);
  const value = new Map<string, Monomial>();
  unknowns.forEach((sp, i) => solved[i] && value.set(sp, solved[i]!));

  const stuck = rds.reactants.map((t) => t.species).filter((sp) => unknowns.includes(sp) && !value.has(sp));
  if (stuck.length > 0)
    return {
      diagnostics: [
        notEliminable(
          rds,
          stuck,
          equilibria,
          unknowns.filter((sp) => !value.has(sp)),
          mechanism.steps.filter((s) => s !== rds && !s.reversible && before(s)),
        ),
      ],
    };
  rate = substitute(rate, value);
  for (const sp of rds.reactants.map((t) => t.species).filter((s) => value.has(s))) {
    trace.push(
      fmt.line(
        `${sp} from the equilibria`,
        [concentration(sp), fmt.style.latex(concentration(sp))],
        Polynomial.term(Rational.ONE, value.get(sp)!),
      ),
    );
  }
  if (value.size > 0) trace.push(fmt.line('substituted', ['r', 'r'], rate));

  const outcome = balanceCatalysts(context, rate, value, rds, fmt);
  if ('problem' in outcome) return { diagnostics: [outcome.problem] };
  trace.push(...outcome.trace);
  if ('nonlinear' in outcome)
    return {
      law: { method: 'rds', nonlinear: outcome.nonlinear, absorbed: [], catalystBalances: [], trace },
      diagnostics: [outcome.note],
    };
  const { law, balances, factored } = outcome;
  return {
    law: {
      method: 'rds',
      expression: law,
      absorbed: [],
      catalystBalances: balances,
      trace,
      ...(factored && { factored }),
    },
    diagnostics: [],
  };
}

/** Replaces eliminated concentrations by their equilibrium monomials. */
export function substitute(p: Polynomial, value: ReadonlyMap<string, Monomial>): Polynomial {
  return Polynomial.fromTerms(
    p.terms.map((t) => {
      let m = t.monomial;
      for (const [sp, v] of value) {
        const e = m.exponent(concentration(sp));
        if (!e.isZero()) m = m.without(concentration(sp)).mul(v.pow(e));
      }
      return { coefficient: t.coefficient, monomial: m };
    }),
  );
}

function equilibriumLine(step: Step, fmt: Formatter): TraceLine {
  const side = (terms: Step['reactants']) =>
    Monomial.fromFactors(terms.map((t): [string, Rational] => [concentration(t.species), t.coefficient]));
  const quotient = RationalFunction.of(
    Polynomial.term(Rational.ONE, side(step.products)),
    Polynomial.term(Rational.ONE, side(step.reactants)),
  );
  const K = equilibriumConstant(step.label);
  return fmt.line(`step ${step.label} at equilibrium`, [K, fmt.style.latex(K)], quotient);
}

/**
 * Why intermediates cannot be eliminated. Where a one-way step before the rds forms one, the
 * diagnostic points at that step: it is the one that would have to be a reversible pre-equilibrium.
 */
function notEliminable(
  rds: Step,
  stuck: string[],
  equilibria: Step[],
  undetermined: string[],
  oneWayBefore: Step[],
): Diagnostic {
  const culprit = oneWayBefore.find((s) => stuck.some((sp) => (s.change.get(sp)?.sign() ?? 0) > 0));
  if (culprit) {
    const made = stuck.filter((sp) => (culprit.change.get(sp)?.sign() ?? 0) > 0);
    return diagnostic(
      'rate/not-eliminable',
      'error',
      `${made.join(', ')} cannot be eliminated: step ${culprit.label} (${culprit.text}) forms ${made.length > 1 ? 'them' : 'it'} one-way before the rate-determining step ${rds.label}, so it cannot stand as a pre-equilibrium`,
      {
        path: ['steps', culprit.index],
        note: `write step ${culprit.label} as reversible (<=>) if it is a fast pre-equilibrium, or use approximation: steady_state`,
      },
    );
  }
  const reasons = stuck.map((sp) => {
    const holding = equilibria.filter((s) => s.change.has(sp));
    if (holding.length === 0) return `no reversible step before the rate-determining step ${rds.label} forms ${sp}`;
    const others = [...new Set(holding.flatMap((s) => [...s.change.keys()]))].filter(
      (x) => x !== sp && undetermined.includes(x),
    );
    const steps = holding.map((s) => s.label).join(', ');
    return others.length > 0
      ? `the equilibrium of step ${steps} ties ${sp} to ${others.join(', ')}, which no other equilibrium or measured concentration fixes`
      : `the equilibria of steps ${steps} do not fix ${sp} on their own`;
  });
  return diagnostic('rate/not-eliminable', 'error', `${stuck.join(', ')} cannot be eliminated: ${reasons.join('; ')}`, {
    path: ['steps', rds.index],
    note: 'use approximation: steady_state; make the step that forms it reversible; or declare a co-product held constant (buffered: true)',
  });
}
