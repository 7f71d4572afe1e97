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
import type { CatalystBalance, TraceLine } from './rate-law.ts';
import { concentration } from './symbols.ts';

/** The forms of one pool, each as weight × its equilibrium value (free form included), and the forms left out. */
export type PoolForms =
  { forms: { species: string; term: Polynomial }[]; negligible: string[] } | { problem: Diagnostic };

/** Every form of a pool from the equilibria; a form made before the rds with no equilibrium is a problem. */
export function poolForms(
  conservation: Conservation,
  value: ReadonlyMap<string, Monomial>,
  context: RateLawContext,
  rds: Step,
): PoolForms {
  const forms: { species: string; term: Polynomial }[] = [];
  const negligible: string[] = [];
  for (const [i, species] of conservation.species.entries()) {
    const weight = conservation.weights[i]!;
    const v = species === conservation.catalyst ? Monomial.of(concentration(species)) : value.get(species);
    if (v) forms.push({ species, term: Polynomial.term(weight, v) });
    else if (formedBeforeRds(species, context, rds))
      return {
        problem: diagnostic(
          'rate/not-eliminable',
          'error',
          `${species} holds part of the ${poolWord(conservation, context)} ${conservation.catalyst} but no equilibrium before the rate-determining step fixes its amount`,
          { path: ['steps', rds.index], note: 'use approximation: steady_state' },
        ),
      };
    else negligible.push(species);
  }
  return { forms, negligible };
}

/** What one closed-form balance did: the law with the free form replaced, and the factor it put below. */
export interface ClosedBalance {
  balance: CatalystBalance;
  law: RationalFunction;
  /** the sum of forms per free form, to the power n of the free form in the rate */
  factor: { base: Polynomial; power: number };
  trace: TraceLine[];
}

/**
 * Replaces the free catalyst in a pre-equilibrium rate law by its total over the sum of its forms,
 * where every form is proportional to the free one and the rate holds it to a whole power; else
 * undefined (the balance is then solved numerically).
 */
export function closedBalance(
  conservation: Conservation,
  law: RationalFunction,
  pool: { forms: { species: string; term: Polynomial }[]; negligible: string[] },
  context: RateLawContext,
  rds: Step,
  fmt: Formatter,
): ClosedBalance | undefined {
  const free = concentration(conservation.catalyst);
  const perFree = Polynomial.sum(pool.forms.map((f) => f.term)).mulTerm(Rational.ONE, Monomial.of(free, -1));
  const exponents = law.numerator.terms.map((t) => t.monomial.exponent(free));
  const power = exponents[0]!;
  const proportional = perFree.degreeIn(free).isZero() && perFree.lowDegreeIn(free).isZero();
  const wholePower = power.isInteger() && power.sign() > 0 && exponents.every((e) => e.equals(power));
  const freeBelow = !law.denominator.degreeIn(free).isZero() || !law.denominator.lowDegreeIn(free).isZero();
  if (!proportional || !wholePower || freeBelow) return undefined;
  const n = Number(power.num);
  const total = conservation.total;
  const numerator = law.numerator.terms.map((t) =>
    Polynomial.term(t.coefficient, t.monomial.without(free).mul(Monomial.of(total, n))),
  );
  const result = RationalFunction.of(Polynomial.sum(numerator), law.denominator.mul(perFree.pow(n)));
  const formsText = pool.forms.map((f) => concentration(f.species));
  const word = poolWord(conservation, context);
  const trace: TraceLine[] = [
    {
      say: `${word} balance for ${conservation.catalyst}${pool.negligible.length ? ` (${pool.negligible.join(', ')} formed after the rate-determining step: negligible)` : ''}`,
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
  trace.push(fmt.line(`the rate in terms of the total ${word === 'site' ? 'sites' : 'catalyst'}`, ['r', 'r'], result));
  const fractions = pool.forms.map((f) => {
    const fraction = RationalFunction.of(f.term.mulTerm(Rational.ONE, Monomial.of(free, -1)), perFree);
    return { species: f.species, fraction, text: fmt.text(fraction), latex: fmt.latex(fraction) };
  });
  return {
    balance: { catalyst: conservation.catalyst, total, forms: fractions },
    law: result,
    factor: { base: perFree, power: n },
    trace,
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
