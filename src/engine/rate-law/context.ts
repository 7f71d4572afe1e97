/**
 * Which species a rate law eliminates (internal: intermediates and conserved catalysts) and which
 * stay as concentrations (external: reactants, products, buffered species, free inhibitors,
 * third bodies, solvents), with the conservation relations among the internal ones: the left null
 * space of their stoichiometric matrix (e.g. [E]_T = [E] + [ES] + [EI]).
 */
import type { Role } from '../../records/mechanism-record.ts';
import { nullSpace, primitiveIntegerVector, rank } from '../linear-algebra.ts';
import type { Mechanism } from '../mechanism.ts';
import { extremeRays } from '../positive-kernel.ts';
import { Rational } from '../rational.ts';
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
  internal: string[];
  solvents: string[];
  conservations: Conservation[];
}

/** Classifies the species of a mechanism for rate-law derivation. */
export function rateLawContext(mechanism: Mechanism, sigma: readonly number[], roles: ReadonlyMap<string, Role>, offRoute: ReadonlySet<string>): RateLawContext {
  const internal = [...mechanism.species.values()]
    .filter((s) => {
      const role = roles.get(s.symbol);
      if (s.buffered || s.solvent || s.thirdBody) return false;
      // A net-zero species consumed first off the route (a free inhibitor) is in excess, not conserved.
      if (role === 'catalyst') return !offRoute.has(s.symbol);
      return role === 'intermediate';
    })
    .map((s) => s.symbol);
  const solvents = [...mechanism.species.values()].filter((s) => s.solvent).map((s) => s.symbol);
  return { mechanism, sigma, roles, internal, solvents, conservations: conservationRelations(mechanism, internal, roles) };
}

function conservationRelations(mechanism: Mechanism, internal: string[], roles: ReadonlyMap<string, Role>): Conservation[] {
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
  return chosen.map((w) => {
    const species = internal.filter((_, i) => !w[i]!.isZero());
    const weights = w.filter((x) => !x.isZero());
    const catalyst = species.find((sp) => roles.get(sp) === 'catalyst') ?? species[0]!;
    return { species, weights, catalyst, total: totalConcentration(catalyst) };
  });
}
