/**
 * Which species a rate law eliminates (internal: intermediates and conserved catalysts) and which
 * stay as concentrations (external: reactants, products, buffered species, free inhibitors,
 * third bodies, solvents), with the conservation relations among the internal ones: the left null
 * space of their stoichiometric matrix (e.g. [E]_T = [E] + [ES] + [EI]).
 */
import type { Role } from '../../model/index.ts';
import { nullSpace, primitiveIntegerVector, rank } from '../exact/linear-algebra.ts';
import type { Mechanism } from '../mechanism/mechanism.ts';
import { extremeRays } from '../exact/positive-kernel.ts';
import { Rational } from '../exact/rational.ts';
import { totalConcentration } from './symbols.ts';

export interface Conservation {
  species: string[];
  weights: Rational[];
  /** the catalyst whose total this relation fixes (its free form is eliminated last) */
  catalyst: string;
  total: string;
}

export interface RateLawContext {
  mechanism: Mechanism;
  sigma: readonly number[];
  roles: ReadonlyMap<string, Role>;
  /** position of each step along the route (a cycle starts where its catalyst is taken up) */
  order: readonly number[];
  internal: string[];
  solvents: string[];
  conservations: Conservation[];
}

/** Classifies the species of a mechanism for rate-law derivation. */
export function rateLawContext(
  mechanism: Mechanism,
  sigma: readonly number[],
  roles: ReadonlyMap<string, Role>,
  offRoute: ReadonlySet<string>,
  order: readonly number[] = mechanism.steps.map((s) => s.index),
): RateLawContext {
  const species = [...mechanism.species.values()].filter((s) => !s.buffered && !s.solvent && !s.thirdBody);
  const internal = species
    .filter(
      (s) => roles.get(s.symbol) === 'intermediate' || (roles.get(s.symbol) === 'catalyst' && !offRoute.has(s.symbol)),
    )
    .map((s) => s.symbol);
  // A net-zero species consumed first off the route is either a free inhibitor in excess, or a
  // reservoir form of the catalyst (a resting dimer): it is internal when it shares the catalyst's balance.
  for (const candidate of species.filter((s) => roles.get(s.symbol) === 'catalyst' && offRoute.has(s.symbol))) {
    const trial = [...internal, candidate.symbol];
    const relations = conservationRelations(mechanism, trial, roles);
    const joinsCatalyst = relations.some(
      (r) =>
        r.species.includes(candidate.symbol) &&
        r.species.some((sp) => roles.get(sp) === 'catalyst' && !offRoute.has(sp)),
    );
    if (joinsCatalyst) internal.push(candidate.symbol);
  }
  const solvents = [...mechanism.species.values()].filter((s) => s.solvent).map((s) => s.symbol);
  return {
    mechanism,
    sigma,
    roles,
    order,
    internal,
    solvents,
    conservations: conservationRelations(mechanism, internal, roles),
  };
}

function conservationRelations(
  mechanism: Mechanism,
  internal: string[],
  roles: ReadonlyMap<string, Role>,
): Conservation[] {
  if (internal.length === 0) return [];
  // w · N = 0 for the internal rows of the stoichiometric matrix N: one equation per step.
  const rows = mechanism.steps.map((step) => internal.map((sp) => step.change.get(sp) ?? Rational.ZERO));
  const basis = nullSpace(rows, internal.length);
  if (basis.length === 0) return [];
  const integerRays = basis.length === 1 ? [primitiveIntegerVector(basis[0]!)] : extremeRays(basis, internal.length);
  const rays = integerRays.map((r) => r.map((x) => Rational.of(x)));
  const chosen: Rational[][] = [];
  for (const ray of rays) {
    const oriented = ray.every((x) => x.sign() <= 0) ? ray.map((x) => x.neg()) : ray;
    if (oriented.some((x) => x.sign() < 0)) continue;
    if (rank([...chosen, oriented], internal.length) > chosen.length) chosen.push(oriented);
  }
  const named = new Set<string>();
  // Relations with a catalyst form first, the largest first: the catalyst's name goes to its own
  // pool (all its forms), and a smaller pool it shares (a released ligand) is named after another member.
  const size = (w: Rational[]) => w.filter((x) => !x.isZero()).length;
  const ordered = [...chosen].sort((a, b) => Number(hasCatalyst(b)) - Number(hasCatalyst(a)) || size(b) - size(a));
  function hasCatalyst(w: Rational[]): boolean {
    return internal.some((sp, i) => !w[i]!.isZero() && roles.get(sp) === 'catalyst');
  }
  return ordered.map((w) => {
    const species = internal.filter((_, i) => !w[i]!.isZero());
    const weights = w.filter((x) => !x.isZero());
    // Name the total after the catalyst form that runs the cycle (weight 1), not a reservoir dimer;
    // two pools (the metal, a released ligand) never share a name.
    const candidates = [
      ...species.filter((sp, i) => roles.get(sp) === 'catalyst' && weights[i]!.equals(Rational.ONE)),
      ...species.filter((sp) => roles.get(sp) === 'catalyst'),
      ...species,
    ];
    const catalyst = candidates.find((sp) => !named.has(sp)) ?? species[0]!;
    named.add(catalyst);
    return { species, weights, catalyst, total: totalConcentration(catalyst) };
  });
}
