/**
 * The mass-action ODEs of a mechanism: every species, every step forward and (if reversible)
 * backward, each rate k Π[reactant]^ν of its own left side. A species on both sides of a step
 * (a third body) counts in the rate and cancels in the net change. Species held constant
 * (buffered, solvent) have no derivative. The Jacobian is analytic.
 */
import type { Mechanism } from '../mechanism/mechanism.ts';
import type { OdeSystem } from '../numeric/ode-system.ts';

export interface RateConstants {
  /** forward constant of each step, in M^(1−n) s^-1 */
  forward: number[];
  /** reverse constant of each step (0 for a one-way step) */
  reverse: number[];
}

interface Side {
  /** species index and its (whole) order */
  factors: [number, number][];
}

export interface MassActionModel {
  species: string[];
  /** the constants and the held species the model was built with (what a run depends on besides y0) */
  rates: RateConstants;
  held: string[];
  system: OdeSystem;
  /** forward and reverse rates of each step at a state */
  stepFluxes(y: Float64Array): { forward: number; reverse: number }[];
}

/** Builds the ODE system; `held` species keep their initial concentration. */
export function massActionModel(
  mechanism: Mechanism,
  constants: RateConstants,
  held: ReadonlySet<string>,
): MassActionModel {
  const species = [...mechanism.species.keys()];
  const index = new Map(species.map((s, i) => [s, i]));
  const side = (terms: { species: string; coefficient: { toNumber(): number } }[]): Side => ({
    factors: terms.map((t) => [index.get(t.species)!, t.coefficient.toNumber()]),
  });
  const steps = mechanism.steps.map((step, i) => ({
    left: side(step.reactants),
    right: side(step.products),
    kf: constants.forward[i] ?? 0,
    kr: step.reversible ? (constants.reverse[i] ?? 0) : 0,
    change: [...step.change]
      .filter(([sp]) => !held.has(sp))
      .map(([sp, v]): [number, number] => [index.get(sp)!, v.toNumber()]),
  }));
  const stepFluxes = (y: Float64Array) =>
    steps.map((s) => ({ forward: s.kf * product(s.left, y), reverse: s.kr * product(s.right, y) }));
  const n = species.length;
  const system: OdeSystem = {
    size: n,
    rhs(_t, y, dydt) {
      dydt.fill(0);
      for (const s of steps) {
        const r = s.kf * product(s.left, y) - s.kr * product(s.right, y);
        for (const [i, v] of s.change) dydt[i]! += v * r;
      }
    },
    jacobian(_t, y, J) {
      J.fill(0);
      for (const s of steps) {
        if (s.kf !== 0) addSideDerivatives(J, n, y, s.kf, s.left, s.change);
        if (s.kr !== 0) addSideDerivatives(J, n, y, -s.kr, s.right, s.change);
      }
    },
  };
  return { species, rates: constants, held: species.filter((sp) => held.has(sp)), system, stepFluxes };
}

/** Adds ∂(k Π y^ν)/∂y_j × ν_i (the change of species i) for every species j of the side: no allocation per call. */
function addSideDerivatives(
  J: Float64Array,
  n: number,
  y: Float64Array,
  k: number,
  side: Side,
  change: [number, number][],
): void {
  for (let f = 0; f < side.factors.length; f++) {
    const [j, order] = side.factors[f]!;
    const d = k * order * product(side, y, j);
    if (d === 0) continue;
    for (let c = 0; c < change.length; c++) {
      const [i, v] = change[c]!;
      J[i * n + j]! += v * d;
    }
  }
}

/** Π y^ν over a side; with `differentiate`, the factor of that species is replaced by y^(ν−1). */
function product(side: Side, y: Float64Array, differentiate = -1): number {
  let p = 1;
  for (const [i, order] of side.factors) {
    const c = Math.max(y[i]!, 0);
    p *= i === differentiate ? (order === 1 ? 1 : Math.pow(c, order - 1)) : order === 1 ? c : Math.pow(c, order);
  }
  return p;
}
