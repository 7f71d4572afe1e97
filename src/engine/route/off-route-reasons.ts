/**
 * Why each step off the route (σ = 0) is there, said once per step: it starts or ends chains,
 * it is a dead-end or side reaction that no route step needs, it is a separate reaction sharing
 * no species with the route (a warning: probably not meant), or the best route through it ranks
 * lower, and by which criterion.
 */
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import type { Mechanism, Step } from '../mechanism/mechanism.ts';
import type { ChainStructure } from './chain-structure.ts';
import { whyNotPreferred } from './route-preference.ts';
import type { Candidate } from './route-search.ts';

/** One diagnostic per derived off-route step. */
export function offRouteReasons(
  mechanism: Mechanism,
  sigma: readonly number[],
  ranked: readonly Candidate[],
  chain: ChainStructure | undefined,
): Diagnostic[] {
  const onRoute = new Set(mechanism.steps.flatMap((s) => (sigma[s.index]! > 0 ? [...s.change.keys()] : [])));
  const netZero = netZeroOnRoute(mechanism, sigma);
  const chosen = ranked.find((c) => c.sigma.every((x, i) => Number(x) === sigma[i]));
  return mechanism.steps.flatMap((step) => {
    if (sigma[step.index] !== 0 || step.times !== undefined) return [];
    const where = { path: ['steps', step.index] };
    const shared = [...step.change.keys()].filter((sp) => onRoute.has(sp));
    if (step.change.size > 0 && shared.length === 0) {
      return [
        diagnostic(
          'route/ambiguous',
          'warning',
          `${stepName(step)} shares no species with the route: it describes a separate reaction and is left off (σ = 0)`,
          { ...where, note: 'give times on each step to include it' },
        ),
      ];
    }
    return [diagnostic('route/off-route', 'info', `${stepName(step)} is off the route (σ = 0): ${reason()}`, where)];

    function reason(): string {
      const starts = chain?.initiation.includes(step.index);
      const ends = chain?.termination.includes(step.index);
      const carriers = chain?.carriers.filter((sp) => step.change.has(sp)).join(', ');
      if (starts && ends)
        return `it starts and ends chains of ${carriers}, which stay off the route (long-chain convention)`;
      if (starts && !carriers) {
        const made = [...step.change].filter(([, v]) => v.sign() > 0).map(([sp]) => sp);
        return `it starts chains, making ${made.join(', ')}, from which the next initiation step makes carriers; initiation stays off the route (long-chain convention)`;
      }
      if (starts)
        return `it starts chains, making ${carriers} from non-carriers; initiation stays off the route (long-chain convention)`;
      if (ends)
        return `it ends chains, destroying ${carriers}; termination stays off the route (long-chain convention)`;
      const side = [...step.change.keys()].filter((sp) => !onRoute.has(sp));
      const given = (sp: string) =>
        mechanism.steps.some((o) => turns(o, sp, 1)) && mechanism.steps.some((o) => turns(o, sp, -1));
      if (side.length > 0 && side.every(given) && (step.reversible || shared.every((sp) => netZero.has(sp)))) {
        const formed = [...step.change].filter(([, v]) => v.sign() > 0).map(([sp]) => sp);
        const used = [...step.change].filter(([, v]) => v.sign() < 0).map(([sp]) => sp);
        return `a dead-end ${step.reversible ? 'equilibrium' : 'reaction'} forming ${formed.join(' + ')} from ${used.join(' + ')}; no step on the route uses ${side.join(', ')}, so it changes nothing in one turnover`;
      }
      if (side.length > 0)
        return `a side reaction: it makes or uses ${side.join(', ')}, which no step on the route does`;
      const reversed = mechanism.steps.find(
        (o) =>
          sigma[o.index]! > 0 &&
          o.change.size === step.change.size &&
          [...o.change].every(([sp, v]) => step.change.get(sp)?.equals(v.neg())),
      );
      if (reversed)
        return `it runs ${stepName(reversed)} backwards, and a step with its reverse changes nothing; it acts on the rate, not on the overall equation`;
      const through = ranked.find((c) => c.sigma[step.index]! > 0n);
      if (!through) return 'no route through it lets the intermediates cancel';
      const why = chosen ? whyNotPreferred(chosen, through) : 'it ranks lower';
      return `the best route through it, σ = [${through.sigma.join(', ')}], is not preferred: ${why}`;
    }
  });
}

/** True when the step makes (sign 1) or uses up (sign −1) the species, backwards too where it is reversible. */
function turns(step: Step, sp: string, sign: 1 | -1): boolean {
  const v = step.change.get(sp)?.sign() ?? 0;
  return v === sign || (step.reversible && v === -sign);
}

/** "step 3", or "step 3 (init)" where the step has a label of its own. */
export function stepName(step: Step): string {
  const n = String(step.index + 1);
  return step.label === n ? `step ${n}` : `step ${n} (${step.label})`;
}

function netZeroOnRoute(mechanism: Mechanism, sigma: readonly number[]): Set<string> {
  const net = new Map<string, number>();
  const seen = new Set<string>();
  for (const step of mechanism.steps) {
    if (!(sigma[step.index]! > 0)) continue;
    for (const [sp, v] of step.change) {
      seen.add(sp);
      net.set(sp, (net.get(sp) ?? 0) + v.toNumber() * sigma[step.index]!);
    }
  }
  return new Set([...seen].filter((sp) => Math.abs(net.get(sp)!) < 1e-12));
}
