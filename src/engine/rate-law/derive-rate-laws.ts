/**
 * The rate-law stage of a derivation (DESIGN.md items 4–6): choose the methods, derive each law,
 * read off the orders, judge the observations, and confirm inhibitors by their negative order.
 */
import type { Approximation, Role } from '../../model/index.ts';
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import { kineticRoles, type Route } from '../route/route.ts';
import { rateLawContext, type RateLawContext } from './context.ts';
import { formatterFor, type Formatter } from './formatter.ts';
import { normaliseLaw } from './normalise-law.ts';
import type { NormalisedLaw } from './normalised-law.ts';
import { hasPositiveNumerator, orderLimitsOf, orderSymbols, withAbsent, type RateExpression } from './orders.ts';
import { presentAlgebraicLaw, type PresentedAlgebraicLaw } from './present-algebraic.ts';
import { RationalFunction } from '../exact/index.ts';
import { eliminateByPreEquilibria } from './pre-equilibrium.ts';
import { presentLaw, type PresentedLaw } from './present.ts';
import type { OrderRange, RateLaw, RateLawMethod } from './rate-law.ts';
import type { RestingState } from './resting-state.ts';
import { longChainRateLaw } from './long-chain.ts';
import { steadyStateRateLaw } from './steady-state.ts';
import { concentration } from './symbols.ts';

export interface DerivedRateLaw {
  law: RateLaw;
  /** absent for a law with radicals, and for a nonlinear steady state solved numerically */
  presented?: PresentedLaw;
  /** the law in named apparent constants (k_obs, K_X; k_cat, K_M … for an enzyme-like shape) */
  normalised?: NormalisedLaw;
  /** a law with radicals (a nonlinear steady state in closed form), written out */
  algebraic?: PresentedAlgebraicLaw;
  orders: Map<string, OrderRange>;
  /** the dominant catalyst form at each observation's conditions, where constants allow */
  restingStates: (RestingState & { observation: string })[];
}

export interface RateLawStage {
  context: RateLawContext;
  rateLaws: DerivedRateLaw[];
  /** each species with an order and the concentration symbol it has in the laws */
  symbols: { species: string; symbol: string }[];
  /** the route's roles, with binders off the route that slow the rate confirmed as inhibitors */
  roles: Map<string, Role>;
  diagnostics: Diagnostic[];
}

/**
 * Derives the rate laws the record's `approximation` asks for along the route, with their limiting
 * orders; `constants` (by symbol, M and s) give the apparent constants their values.
 */
export function deriveRateLaws(
  approximation: Approximation,
  mechanism: Mechanism,
  route: Route,
  constants?: ReadonlyMap<string, number>,
): RateLawStage {
  const { sigma, offRoute } = route;
  // Off-route species enter the kinetics as what they behave like (a dead-end form is eliminated).
  const roles = kineticRoles(route);
  const diagnostics: Diagnostic[] = [];
  const context = rateLawContext(mechanism, sigma, roles, offRoute, route.order);
  const fmt = formatterFor(mechanism);
  const rdsSteps = mechanism.steps.filter((s) => s.rds);
  for (const extra of rdsSteps.slice(1)) {
    diagnostics.push(
      diagnostic('step/rds', 'error', `step ${extra.label} is a second rate-determining step; mark at most one`, {
        path: ['steps', extra.index, 'rds'],
      }),
    );
  }
  const rds = rdsSteps[0];
  if (rds && (sigma[rds.index] ?? 0) === 0) {
    diagnostics.push(
      diagnostic(
        'step/rds',
        'error',
        `the rate-determining step ${rds.label} is off the route (σ = 0), so it cannot set the overall rate`,
        { path: ['steps', rds.index, 'rds'] },
      ),
    );
  }
  const methods = chooseMethods(approximation, rds !== undefined);
  if (methods.includes('rds') && !rds) {
    diagnostics.push(
      diagnostic('step/rds', 'error', 'approximation: rds needs one step marked rds: true', {
        path: ['approximation'],
      }),
    );
  }
  const symbols = orderSymbols(context);
  const rateLaws: DerivedRateLaw[] = [];
  const finish = (law: RateLaw): DerivedRateLaw => {
    law.pools = context.conservations.map((c) => ({
      total: c.total,
      species: c.species,
      weights: c.weights.map((w) => w.toNumber()),
    }));
    if (law.algebraic) {
      const algebraic = presentAlgebraicLaw(law.algebraic, fmt);
      law.absorbed = context.solvents.filter((s) => law.algebraic!.symbols().includes(concentration(s)));
      return { law, algebraic, orders: reportedOrders(law.algebraic, symbols, roles), restingStates: [] };
    }
    if (!law.expression) return { law, orders: new Map(), restingStates: [] };
    const presented = presentLaw(law.expression, context.solvents, fmt, constants);
    law.absorbed = context.solvents.filter((s) => law.expression!.symbols().includes(concentration(s)));
    const orders = reportedOrders(presented.expression, symbols, roles);
    const normalised = normalisedForm(law, context, fmt, constants);
    return { law, presented, ...(normalised && { normalised }), orders, restingStates: [] };
  };
  for (const method of methods) {
    if (method === 'rds' && (!rds || (sigma[rds.index] ?? 0) === 0)) continue;
    const result =
      method === 'rds'
        ? eliminateByPreEquilibria(context, rds!, fmt)
        : method === 'long_chain'
          ? longChainRateLaw(context, fmt, true)
          : steadyStateRateLaw(context, fmt);
    diagnostics.push(...result.diagnostics);
    if (result.law) rateLaws.push(finish(result.law));
  }
  // A chain also gets its long-chain law, where that says something the exact steady state does not.
  const exact = rateLaws.find((r) => r.law.method === 'steady_state');
  if (exact && approximation !== 'long_chain') {
    const offered = longChainRateLaw(context, fmt, false).law;
    if (offered && sameLaw(offered, exact.law)) {
      exact.law.trace.push({
        say: 'the long-chain approximation (initiation = termination, propagation alone for the carriers) gives this same law',
        text: 'r_long-chain = r',
        latex: 'r_{\\text{long chain}} = r',
      });
    } else if (offered && (offered.expression || offered.algebraic)) {
      rateLaws.push(finish(offered));
    }
  }
  return { context, rateLaws, symbols, roles: confirmInhibitors(route.roles, offRoute, rateLaws[0]), diagnostics };
}

/**
 * The order limits a record reports. With every species present they are the limits of the law as
 * written (the retardation by a product of a pre-equilibrium shows). Where the law is a difference
 * (a reversible overall reaction), those limits describe |r| near equilibrium, not initial rates:
 * then the orders of reactants and catalysts are taken with the products absent, and each
 * product's with the others absent.
 * Each observation takes out its own absent species (check-observations.ts).
 */
function reportedOrders(
  expression: RateExpression,
  symbols: readonly { species: string; symbol: string }[],
  roles: ReadonlyMap<string, Role>,
): Map<string, OrderRange> {
  const orders = orderLimitsOf(expression, symbols);
  if (hasPositiveNumerator(expression)) return orders;
  const products = symbols.filter((s) => roles.get(s.species) === 'product').map((s) => s.symbol);
  const initial = withAbsent(expression, products);
  for (const [species, range] of orderLimitsOf(
    initial,
    symbols.filter((s) => !products.includes(s.symbol)),
  ))
    orders.set(species, range);
  // A product's own order is read with the other products absent: its inhibition of the initial rate.
  for (const product of symbols.filter((s) => products.includes(s.symbol))) {
    const alone = withAbsent(
      expression,
      products.filter((p) => p !== product.symbol),
    );
    const range = orderLimitsOf(alone, [product]).get(product.species);
    if (range) orders.set(product.species, range);
  }
  return orders;
}

/** The normalised form of an exact rational law; other forms of law are left as they are. */
function normalisedForm(
  law: RateLaw,
  context: RateLawContext,
  fmt: Formatter,
  values?: ReadonlyMap<string, number>,
): NormalisedLaw | undefined {
  if (!(law.expression instanceof RationalFunction)) return undefined;
  const options = {
    ...(law.factored && { factored: law.factored }),
    constantSymbols: new Set(context.solvents.map(concentration)),
    stepLabels: context.mechanism.steps.map((s) => s.label),
    ...(values && { values }),
  };
  return normaliseLaw(law.expression, options, fmt);
}

function chooseMethods(approximation: string, hasRds: boolean): RateLawMethod[] {
  if (approximation === 'rds') return ['rds'];
  if (approximation === 'long_chain') return ['long_chain'];
  if (approximation === 'steady_state') return ['steady_state'];
  if (approximation === 'both') return hasRds ? ['rds', 'steady_state'] : ['steady_state'];
  return hasRds ? ['rds'] : ['steady_state'];
}

/** Two exact laws that are the same function (a law with radicals: the same outer function and roots). */
function sameLaw(a: RateLaw, b: RateLaw): boolean {
  if (a.expression && b.expression) return a.expression.equals(b.expression);
  if (a.algebraic && b.algebraic) {
    const [x, y] = [a.algebraic, b.algebraic];
    return (
      x.outer.equals(y.outer) &&
      x.roots.length === y.roots.length &&
      x.roots.every((r, i) => r.symbol === y.roots[i]!.symbol && r.polynomial.equals(y.roots[i]!.polynomial))
    );
  }
  return false;
}

/** A net-zero binder off the route with a negative order in the rate law is an inhibitor. */
function confirmInhibitors(
  roles: ReadonlyMap<string, Role>,
  offRoute: ReadonlySet<string>,
  primary: DerivedRateLaw | undefined,
): Map<string, Role> {
  const out = new Map(roles);
  if (!primary) return out;
  for (const sp of offRoute) {
    const order = primary.orders.get(sp);
    if (order && (order.low.sign() < 0 || order.high.sign() < 0)) out.set(sp, 'inhibitor');
  }
  return out;
}

/** The exact law of a derived rate law, rational or with radicals; undefined where it is numeric only. */
export function lawExpression(derived: DerivedRateLaw): RateExpression | undefined {
  return derived.presented?.expression ?? derived.algebraic?.expression;
}
