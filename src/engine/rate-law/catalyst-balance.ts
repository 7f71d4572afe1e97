/**
 * The catalyst balance of the pre-equilibrium method: the total of a conserved catalyst is the
 * sum of its forms, each fixed by the equilibria as [C] × (a monomial), so
 * [C]_T = [C](1 + K_1[S] + …) and the rate gains the saturation denominator. Forms made only
 * after the rate-determining step are negligible and left out.
 */
import { Monomial, Polynomial, RationalFunction } from '../algebra/index.ts';
import { diagnostic, type Diagnostic } from '../diagnostic.ts';
import type { Step } from '../mechanism.ts';
import { Rational } from '../rational.ts';
import type { Conservation, RateLawContext } from './context.ts';
import type { Formatter } from './formatter.ts';
import type { CatalystBalance, TraceLine } from './rate-law.ts';
import { concentration } from './symbols.ts';

type Outcome = { problem: Diagnostic } | { balance?: CatalystBalance; law: RationalFunction; trace: TraceLine[] };

/** Replaces the free catalyst in a pre-equilibrium rate law by its total over the sum of its forms. */
export function catalystBalance(
  conservation: Conservation,
  law: RationalFunction,
  value: ReadonlyMap<string, Monomial>,
  context: RateLawContext,
  rds: Step,
  fmt: Formatter,
): Outcome {
  const free = concentration(conservation.catalyst);
  const exponents = law.numerator.terms.map((t) => t.monomial.exponent(free));
  if (exponents.every((e) => e.isZero())) return { law, trace: [] };
  if (!exponents.every((e) => e.equals(Rational.ONE)) || !law.denominator.degreeIn(free).isZero()) {
    return { problem: problem(rds, `the rate is not first order in the free catalyst ${conservation.catalyst}, so its balance has no closed form here`) };
  }
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
      if (!v.exponent(free).equals(Rational.ONE)) {
        return { problem: problem(rds, `${species} is not proportional to the free catalyst ${conservation.catalyst}, so the catalyst balance has no closed form`) };
      }
      forms.push({ species, term: Polynomial.term(weight, v.without(free)) });
    } else if (formedBeforeRds(species, context, rds)) {
      return { problem: problem(rds, `${species} holds part of the catalyst ${conservation.catalyst} but no equilibrium before the rate-determining step fixes its amount`) };
    } else {
      negligible.push(species);
    }
  }
  const denominator = Polynomial.sum(forms.map((f) => f.term));
  const total = conservation.total;
  const numerator = law.numerator.terms.map((t) => Polynomial.term(t.coefficient, t.monomial.without(free).mul(Monomial.of(total))));
  const result = RationalFunction.of(Polynomial.sum(numerator), law.denominator.mul(denominator));
  const formsText = conservation.species.filter((s) => !negligible.includes(s)).map(concentration);
  const trace: TraceLine[] = [
    {
      say: `catalyst balance for ${conservation.catalyst}${negligible.length ? ` (${negligible.join(', ')} formed after the rate-determining step: negligible)` : ''}`,
      text: `${total} = ${formsText.join(' + ')} = ${free}(${fmt.text(denominator)})`,
      latex: `${fmt.style.latex(total)} = ${formsText.map((s) => fmt.style.latex(s)).join(' + ')} = ${fmt.style.latex(free)}\\left(${fmt.latex(denominator)}\\right)`,
    },
    fmt.line('the rate in terms of the total catalyst', ['r', 'r'], result),
  ];
  const fractions = forms.map((f) => ({ species: f.species, fraction: RationalFunction.of(f.term, denominator) }));
  return { balance: { catalyst: conservation.catalyst, total, forms: fractions }, law: result, trace };
}

/** True when some step before the rds (in record order) forms the species. */
function formedBeforeRds(species: string, context: RateLawContext, rds: Step): boolean {
  return context.mechanism.steps.some((s) => s.index < rds.index && (s.change.get(species)?.sign() ?? 0) !== 0);
}

function problem(rds: Step, message: string): Diagnostic {
  return diagnostic('rate/not-eliminable', 'error', message, { path: ['steps', rds.index], note: 'use approximation: steady_state' });
}
