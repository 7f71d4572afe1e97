/**
 * The catalyst (or site) balance of the pre-equilibrium method: the total of a conserved catalyst
 * is the sum of its forms, each fixed by the equilibria as [C] × (a monomial), so
 * [C]_T = [C](1 + K_1[S] + …). The rate-determining step holds the free form to some power n —
 * 1 for a catalyst that meets one substrate, 2 for two adsorbed species reacting on neighbouring
 * sites (Langmuir–Hinshelwood) — so the rate gains the saturation denominator to the power n.
 * Forms made only after the rate-determining step are negligible and left out.
 */
import { Monomial, Polynomial, RationalFunction } from '../exact/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Step } from '../mechanism/mechanism.ts';
import { isVacantSite } from '../notation/formula-sites.ts';
import { Rational } from '../exact/rational.ts';
import type { Conservation, RateLawContext } from './context.ts';
import type { Formatter } from './formatter.ts';
import type { CatalystBalance, NonlinearSystem, TraceLine } from './rate-law.ts';
import { concentration } from './symbols.ts';

/** What one balance did: the law with the free form replaced, and the saturation factor it introduced. */
export type BalanceOutcome =
  | { problem: Diagnostic }
  | {
      balance?: CatalystBalance;
      law: RationalFunction;
      /** the free form's power n and the sum of forms per free form: the law gained (sum)^n below */
      factor?: { base: Polynomial; power: number };
      trace: TraceLine[];
    }
  | { nonlinear: NonlinearSystem; trace: TraceLine[] };

/** Replaces the free catalyst in a pre-equilibrium rate law by its total over the sum of its forms. */
export function catalystBalance(
  conservation: Conservation,
  law: RationalFunction,
  value: ReadonlyMap<string, Monomial>,
  context: RateLawContext,
  rds: Step,
  fmt: Formatter,
): BalanceOutcome {
  const free = concentration(conservation.catalyst);
  const exponents = law.numerator.terms.map((t) => t.monomial.exponent(free));
  if (exponents.every((e) => e.isZero()) && law.denominator.degreeIn(free).isZero()) return { law, trace: [] };
  const forms: { species: string; term: Polynomial }[] = [];
  const negligible: string[] = [];
  for (const [i, species] of conservation.species.entries()) {
    const weight = conservation.weights[i]!;
    if (species === conservation.catalyst) {
      forms.push({ species, term: Polynomial.constant(weight) });
      continue;
    }
    const v = value.get(species);
    if (v) {
      forms.push({ species, term: Polynomial.term(weight, v.div(Monomial.of(free))) });
    } else if (formedBeforeRds(species, context, rds)) {
      return {
        problem: problem(
          rds,
          `${species} holds part of the ${poolWord(conservation, context)} ${conservation.catalyst} but no equilibrium before the rate-determining step fixes its amount`,
        ),
      };
    } else {
      negligible.push(species);
    }
  }
  const perFree = Polynomial.sum(forms.map((f) => f.term));
  const power = exponents[0]!;
  const linearForms = perFree.degreeIn(free).isZero() && perFree.lowDegreeIn(free).isZero();
  const closedForm =
    linearForms &&
    power.isInteger() &&
    power.sign() > 0 &&
    exponents.every((e) => e.equals(power)) &&
    law.denominator.degreeIn(free).isZero() &&
    law.denominator.lowDegreeIn(free).isZero();
  if (!closedForm) return nonlinearBalance(conservation, law, perFree, negligible, context, rds, fmt);
  const n = Number(power.num);
  const total = conservation.total;
  const numerator = law.numerator.terms.map((t) =>
    Polynomial.term(t.coefficient, t.monomial.without(free).mul(Monomial.of(total, n))),
  );
  const result = RationalFunction.of(Polynomial.sum(numerator), law.denominator.mul(perFree.pow(n)));
  const formsText = conservation.species.filter((s) => !negligible.includes(s)).map(concentration);
  const trace: TraceLine[] = [
    {
      say: `${poolWord(conservation, context)} balance for ${conservation.catalyst}${negligible.length ? ` (${negligible.join(', ')} formed after the rate-determining step: negligible)` : ''}`,
      text: `${total} = ${formsText.join(' + ')} = ${free}(${fmt.text(perFree)})`,
      latex: `${fmt.style.latex(total)} = ${formsText.map((s) => fmt.style.latex(s)).join(' + ')} = ${fmt.style.latex(free)}\\left(${fmt.latex(perFree)}\\right)`,
    },
  ];
  if (n > 1)
    trace.push({
      say: `the rate-determining step ${rds.label} holds the free ${conservation.catalyst} to the power ${n}, so the balance enters to the power ${n}`,
      text: `${free}^${n} = ${total}^${n} / (${fmt.text(perFree)})^${n}`,
      latex: `${fmt.style.latex(free)}^{${n}} = \\frac{${fmt.style.latex(total)}^{${n}}}{\\left(${fmt.latex(perFree)}\\right)^{${n}}}`,
    });
  const word = poolWord(conservation, context) === 'site' ? 'sites' : 'catalyst';
  trace.push(fmt.line(`the rate in terms of the total ${word}`, ['r', 'r'], result));
  const fractions = forms.map((f) => {
    const fraction = RationalFunction.of(f.term, perFree);
    return { species: f.species, fraction, text: fmt.text(fraction), latex: fmt.latex(fraction) };
  });
  return {
    balance: { catalyst: conservation.catalyst, total, forms: fractions },
    law: result,
    factor: { base: perFree, power: n },
    trace,
  };
}

/**
 * A form not proportional to the free catalyst (a dimer holds it squared), or a rate with a
 * fractional power of it, makes the balance a polynomial equation in [C] with no rational closed
 * form: kept for a numeric solution at each observation.
 */
function nonlinearBalance(
  conservation: Conservation,
  law: RationalFunction,
  perFree: Polynomial,
  negligible: string[],
  context: RateLawContext,
  rds: Step,
  fmt: Formatter,
): BalanceOutcome {
  const free = concentration(conservation.catalyst);
  const den = law.denominator.terms;
  if (den.length !== 1 || !law.denominator.degreeIn(free).isZero() || !law.denominator.lowDegreeIn(free).isZero())
    return {
      problem: problem(
        rds,
        `the forms of ${conservation.catalyst} also hold another conserved catalyst or site, so their balances are coupled and have no closed form here`,
      ),
    };
  const rate = law.numerator.mulTerm(den[0]!.coefficient.inverse(), den[0]!.monomial.pow(-1));
  const balance = perFree.mulTerm(Rational.ONE, Monomial.of(free)).sub(Polynomial.symbol(conservation.total));
  return {
    nonlinear: { unknowns: [free], equations: [balance], rate },
    trace: [
      {
        say: `${poolWord(conservation, context)} balance for ${conservation.catalyst}${negligible.length ? ` (${negligible.join(', ')} negligible)` : ''}: not linear in the free form, so it is solved numerically at each observation`,
        text: `${conservation.total} = ${fmt.text(perFree.mulTerm(Rational.ONE, Monomial.of(free)))}`,
        latex: `${fmt.style.latex(conservation.total)} = ${fmt.latex(perFree.mulTerm(Rational.ONE, Monomial.of(free)))}`,
      },
    ],
  };
}

/** "site" for a pool of surface sites (its free form is a vacant site), "catalyst" otherwise. */
export function poolWord(conservation: Conservation, context: RateLawContext): 'site' | 'catalyst' {
  return isVacantSite(context.mechanism.species.get(conservation.catalyst)?.composition) ? 'site' : 'catalyst';
}

/** True when some step before the rds along the route forms the species. */
function formedBeforeRds(species: string, context: RateLawContext, rds: Step): boolean {
  const rank = (index: number) => context.order[index] ?? Infinity;
  return context.mechanism.steps.some(
    (s) => rank(s.index) < rank(rds.index) && (s.change.get(species)?.sign() ?? 0) !== 0,
  );
}

function problem(rds: Step, message: string): Diagnostic {
  return diagnostic('rate/not-eliminable', 'error', message, {
    path: ['steps', rds.index],
    note: 'use approximation: steady_state',
  });
}
