/**
 * Every conserved catalyst or site pool of a pre-equilibrium law in turn: each balance in closed
 * form where it has one (catalyst-balance.ts), the law kept in factors so a squared site balance
 * stays a square. Where one has none — a form holds the catalyst twice (a dimer), the rate holds
 * a fractional power of it, or one form holds two pools (an adsorbate bridging two kinds of site)
 * — all the balances together are kept as polynomial equations in the free forms, solved
 * numerically at each observation with constants.
 */
import { Monomial, Polynomial, RationalFunction } from '../exact/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Step } from '../mechanism/mechanism.ts';
import { closedBalance, poolForms, poolWord } from './catalyst-balance.ts';
import type { RateLawContext } from './context.ts';
import type { Formatter } from './formatter.ts';
import type { CatalystBalance, FactoredLaw, NonlinearSystem, TraceLine } from './rate-law.ts';
import { concentration } from './symbols.ts';

/** The balances' outcome: a closed-form law, a system for a numeric solution, or a located problem. */
export type BalancesOutcome =
  | { problem: Diagnostic }
  | { law: RationalFunction; balances: CatalystBalance[]; factored?: FactoredLaw; trace: TraceLine[] }
  | { nonlinear: NonlinearSystem; trace: TraceLine[]; note: Diagnostic };

/** Applies every pool's balance to the rate (a polynomial in free forms and concentrations). */
export function balanceCatalysts(
  context: RateLawContext,
  rate: Polynomial,
  value: ReadonlyMap<string, Monomial>,
  rds: Step,
  fmt: Formatter,
): BalancesOutcome {
  const pools = [];
  for (const conservation of context.conservations) {
    const pool = poolForms(conservation, value, context, rds);
    if ('problem' in pool) return pool;
    pools.push({ conservation, pool });
  }
  const balances: CatalystBalance[] = [];
  const factors: FactoredLaw['factors'] = [];
  const trace: TraceLine[] = [];
  let numerator = rate;
  let law = RationalFunction.of(rate);
  for (const { conservation, pool } of pools) {
    const free = concentration(conservation.catalyst);
    if (!law.symbols().includes(free)) continue;
    const closed = closedBalance(conservation, law, pool, context, rds, fmt);
    if (!closed) return numericBalances(pools, rate, rds, fmt, context);
    law = closed.law;
    factors.push(closed.factor);
    numerator = withTotal(numerator, free, conservation.total, closed.factor.power);
    balances.push(closed.balance);
    trace.push(...closed.trace);
  }
  // A form shared by two pools leaves one free form in the other's balance.
  if (pools.some(({ conservation }) => law.symbols().includes(concentration(conservation.catalyst))))
    return numericBalances(pools, rate, rds, fmt, context);
  return { law, balances, ...(factors.length > 0 && { factored: { numerator, factors } }), trace };
}

/** The free form of a pool, to the power n, replaced by its total to the same power. */
function withTotal(p: Polynomial, free: string, total: string, n: number): Polynomial {
  return Polynomial.fromTerms(
    p.terms.map((t) => ({
      coefficient: t.coefficient,
      monomial: t.monomial.without(free).mul(Monomial.of(total, t.monomial.exponent(free).isZero() ? 0 : n)),
    })),
  );
}

/** Each pool's balance Σ forms − total = 0, with the rate, for a numeric solution in the free forms. */
function numericBalances(
  pools: {
    conservation: RateLawContext['conservations'][number];
    pool: { forms: { species: string; term: Polynomial }[]; negligible: string[] };
  }[],
  rate: Polynomial,
  rds: Step,
  fmt: Formatter,
  context: RateLawContext,
): BalancesOutcome {
  const unknowns = pools.map(({ conservation }) => concentration(conservation.catalyst));
  const sums = pools.map(({ pool }) => Polynomial.sum(pool.forms.map((f) => f.term)));
  const equations = sums.map((sum, i) => sum.sub(Polynomial.symbol(pools[i]!.conservation.total)));
  const several = pools.length > 1;
  const trace = pools.map(({ conservation, pool }, i) => {
    const word = poolWord(conservation, context);
    const negligible = pool.negligible.length ? ` (${pool.negligible.join(', ')} negligible)` : '';
    const why = several ? 'the balances share a form' : `not linear in the free ${word}`;
    return {
      say: `${word} balance for ${conservation.catalyst}${negligible}: ${why}, so it is solved numerically at each observation`,
      text: `${conservation.total} = ${fmt.text(sums[i]!)}`,
      latex: `${fmt.style.latex(conservation.total)} = ${fmt.latex(sums[i]!)}`,
    };
  });
  const names = pools.map(({ conservation }) => conservation.catalyst).join(' and ');
  const note = diagnostic(
    'rate/nonlinear',
    'info',
    several
      ? `the balances of ${names} are not linear in their free forms, so the rate is solved numerically at each observation with constants`
      : `the balance of ${names} is not linear in its free form, so the rate is solved numerically at each observation with constants`,
    { path: ['steps', rds.index] },
  );
  return { nonlinear: { unknowns, equations, rate }, trace, note };
}
