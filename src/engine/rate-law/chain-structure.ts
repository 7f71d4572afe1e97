/**
 * The structure of a chain reaction, read from the route it is given: the chain carriers are the
 * internal species (outside any conserved pool) that take part in the steps on the route; each
 * one-way step then changes the number of carriers by Δ. Propagation (Δ = 0) passes a carrier on,
 * initiation (Δ > 0) makes carriers from stable species, termination (Δ < 0) destroys them. The
 * reverse of a reversible initiation is a termination.
 */
import type { Step } from '../mechanism/mechanism.ts';
import { Rational } from '../exact/rational.ts';
import type { RateLawContext } from './context.ts';

export type Direction = 'forward' | 'reverse';

/** One one-way step and the change in the number of carriers it makes. */
export interface ChainStep {
  step: Step;
  direction: Direction;
  delta: Rational;
}

export interface ChainStructure {
  carriers: string[];
  propagation: ChainStep[];
  initiation: ChainStep[];
  termination: ChainStep[];
}

/** The chain structure, or why the mechanism is not a chain in the route it is given. */
export function chainStructure(context: RateLawContext): ChainStructure | { problem: string } {
  const { mechanism, sigma } = context;
  const pooled = new Set(context.conservations.flatMap((c) => c.species));
  const onRoute = mechanism.steps.filter((s) => (sigma[s.index] ?? 0) > 0);
  const carriers = context.internal.filter((sp) => !pooled.has(sp) && onRoute.some((s) => involves(s, sp)));
  if (carriers.length === 0)
    return {
      problem:
        'no intermediate outside a conserved catalyst takes part in the steps on the route, so nothing carries a chain',
    };
  const oneWay: ChainStep[] = mechanism.steps.flatMap((step) => {
    const delta = carriers.reduce((sum, c) => sum.add(step.change.get(c) ?? Rational.ZERO), Rational.ZERO);
    const forward: ChainStep = { step, direction: 'forward', delta };
    return step.reversible ? [forward, { step, direction: 'reverse', delta: delta.neg() }] : [forward];
  });
  const unbalanced = onRoute.filter((s) => !oneWay.find((c) => c.step === s)!.delta.isZero());
  if (unbalanced.length > 0)
    return {
      problem: `step ${unbalanced.map((s) => s.label).join(', ')} on the route changes the number of carriers (${carriers.join(', ')}), so it does not propagate a chain`,
    };
  const structure: ChainStructure = {
    carriers,
    propagation: oneWay.filter((c) => c.delta.isZero()),
    initiation: oneWay.filter((c) => c.delta.sign() > 0),
    termination: oneWay.filter((c) => c.delta.sign() < 0),
  };
  if (structure.initiation.length === 0)
    return { problem: 'no step makes chain carriers from stable species (no initiation)' };
  if (structure.termination.length === 0) return { problem: 'no step destroys chain carriers (no termination)' };
  return structure;
}

/** One-way steps in words, e.g. `step 1`, `steps 4, 5 (reverse)`. */
export function chainStepLabels(steps: readonly ChainStep[]): string {
  const labels = steps.map((c) => (c.direction === 'reverse' ? `${c.step.label} (reverse)` : c.step.label));
  return `${labels.length === 1 ? 'step' : 'steps'} ${labels.join(', ')}`;
}

function involves(step: Step, species: string): boolean {
  return [...step.reactants, ...step.products].some((t) => t.species === species);
}
