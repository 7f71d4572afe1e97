/**
 * Chain reactions (DESIGN.md item 2): a propagation cycle that regenerates its carriers, entered
 * by initiation steps that make carriers from non-carriers and left by termination steps that
 * destroy them. Unlike a catalyst, whose total every step conserves (a dead-end binding
 * included), the carriers' total is not conserved by the steps: that is what tells a chain from a
 * catalytic cycle. The record may name the carriers (`chain_carrier: true`); otherwise the chain
 * is detected from the routes the search found. A declared intermediate is never thereby a carrier.
 */
import { nullSpace } from '../exact/linear-algebra.ts';
import { extremeRays } from '../exact/positive-kernel.ts';
import { Rational } from '../exact/rational.ts';
import type { RouteStep } from './route-search.ts';

/** The chain a route runs as: its carriers and the steps that start, carry and end it (indices in record order). */
export interface ChainStructure {
  carriers: string[];
  propagation: number[];
  initiation: number[];
  termination: number[];
  /** named by the record (`chain_carrier: true`) or found in the steps */
  source: 'declared' | 'detected';
}

/** How a step, run forwards, meets the carriers: it makes them from none, or destroys them and makes none. */
export function chainEnd(step: RouteStep, carriers: ReadonlySet<string>): 'initiation' | 'termination' | undefined {
  const made = [...step.change].filter(([sp, v]) => v.sign() > 0 && carriers.has(sp)).length;
  const used = [...step.change].filter(([sp, v]) => v.sign() < 0 && carriers.has(sp)).length;
  if (made > 0 && used === 0) return 'initiation';
  if (used > 0 && made === 0) return 'termination';
  return undefined;
}

/** Steps of σ that start or end chains of these carriers: the long-chain convention keeps them off the route. */
export function countChainEnds(
  steps: readonly RouteStep[],
  sigma: readonly bigint[],
  carriers: ReadonlySet<string>,
): number {
  if (carriers.size === 0) return 0;
  return steps.filter((step, i) => sigma[i]! > 0n && chainEnd(step, carriers) !== undefined).length;
}

/**
 * The first candidate route (best first) that is a chain's propagation cycle: each of its steps
 * uses and makes a species that cancels on it, steps off it start and end those carriers, and
 * no conservation relation holds the carriers' total.
 */
export function detectChain(
  steps: readonly RouteStep[],
  candidates: readonly { sigma: readonly bigint[] }[],
  inert: ReadonlySet<string>,
): ChainStructure | undefined {
  for (const candidate of candidates) {
    const used = candidate.sigma.flatMap((s, i) => (s > 0n ? [i] : []));
    const carriers = cancelledOn(steps, candidate.sigma, inert);
    if (carriers.size === 0) continue;
    const carries = (step: RouteStep) =>
      [...step.change].some(([sp, v]) => v.sign() < 0 && carriers.has(sp)) &&
      [...step.change].some(([sp, v]) => v.sign() > 0 && carriers.has(sp));
    if (!used.every((i) => carries(steps[i]!))) continue;
    const ends = endsOff(steps, candidate.sigma, carriers);
    if (ends.initiation.length === 0 || ends.termination.length === 0) continue;
    if (carriersConserved(steps, candidate.sigma, carriers, inert)) continue;
    return { carriers: [...carriers], propagation: used, ...ends, source: 'detected' };
  }
  return undefined;
}

/** The chain of declared carriers along a chosen route. */
export function declaredChain(
  steps: readonly RouteStep[],
  sigma: readonly bigint[],
  carriers: ReadonlySet<string>,
): ChainStructure {
  const propagation = sigma.flatMap((s, i) => (s > 0n ? [i] : []));
  return { carriers: [...carriers], propagation, ...endsOff(steps, sigma, carriers), source: 'declared' };
}

/**
 * Initiation and termination steps off the route; a reversible step may be both (Br2 ⇌ 2 Br•).
 * Initiation may take several steps: a step off the route that makes the radical an initiation
 * step uses up (C2H6 → 2 CH3• before CH3• + C2H6 → CH4 + C2H5•) initiates too.
 */
function endsOff(steps: readonly RouteStep[], sigma: readonly bigint[], carriers: ReadonlySet<string>) {
  const initiation: number[] = [];
  const termination: number[] = [];
  const off = steps.flatMap((_, i) => (sigma[i]! > 0n ? [] : [i]));
  const directions = (step: RouteStep) =>
    step.reversible ? [step, { change: new Map([...step.change].map(([sp, v]) => [sp, v.neg()])) }] : [step];
  for (const i of off) {
    const ends = directions(steps[i]!).map((d) => chainEnd(d, carriers));
    if (ends.includes('initiation')) initiation.push(i);
    if (ends.includes('termination')) termination.push(i);
  }
  const onRoute = new Set(steps.flatMap((s, i) => (sigma[i]! > 0n ? [...s.change.keys()] : [])));
  for (let grew = true; grew;) {
    grew = false;
    const precursors = new Set(
      initiation.flatMap((i) =>
        [...steps[i]!.change]
          .filter(([sp, v]) => v.sign() < 0 && !onRoute.has(sp) && !carriers.has(sp))
          .map(([sp]) => sp),
      ),
    );
    for (const i of off) {
      if (initiation.includes(i)) continue;
      const change = [...steps[i]!.change];
      if (change.some(([sp, v]) => v.sign() > 0 && precursors.has(sp)) && !change.some(([sp]) => carriers.has(sp))) {
        initiation.push(i);
        grew = true;
      }
    }
  }
  return { initiation: initiation.sort((a, b) => a - b), termination };
}

/** Species formed and consumed along σ that net to zero (solvents aside). */
function cancelledOn(steps: readonly RouteStep[], sigma: readonly bigint[], inert: ReadonlySet<string>): Set<string> {
  const net = new Map<string, Rational>();
  const signs = new Map<string, Set<number>>();
  steps.forEach((step, i) => {
    if (sigma[i]! === 0n) return;
    for (const [sp, v] of step.change) {
      net.set(sp, (net.get(sp) ?? Rational.ZERO).add(v.mul(Rational.of(sigma[i]!))));
      signs.set(sp, (signs.get(sp) ?? new Set()).add(v.sign()));
    }
  });
  return new Set(
    [...net].filter(([sp, v]) => v.isZero() && signs.get(sp)!.size === 2 && !inert.has(sp)).map(([sp]) => sp),
  );
}

/**
 * True when some weights w ≥ 0, not zero on the carriers, make Σ w·change vanish for every step,
 * counting the carriers and the species found only off the route (a dead-end complex, a
 * precatalyst): then the carriers are a catalyst's forms, not a chain's.
 */
function carriersConserved(
  steps: readonly RouteStep[],
  sigma: readonly bigint[],
  carriers: ReadonlySet<string>,
  inert: ReadonlySet<string>,
): boolean {
  const onRoute = new Set(steps.flatMap((s, i) => (sigma[i]! > 0n ? [...s.change.keys()] : [])));
  const offOnly = new Set(
    steps.flatMap((s) => [...s.change.keys()]).filter((sp) => !onRoute.has(sp) && !inert.has(sp)),
  );
  const internal = [...carriers, ...offOnly];
  const matrix = steps.map((s) => internal.map((sp) => s.change.get(sp) ?? Rational.ZERO));
  const basis = nullSpace(matrix, internal.length);
  if (basis.length === 0) return false;
  return extremeRays(basis, internal.length).some((w) => w.some((x, j) => x > 0n && carriers.has(internal[j]!)));
}
