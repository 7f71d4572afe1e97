/**
 * Detailed balance (Wegscheider's condition): reversible steps that together change nothing
 * (a closed cycle, as in a random-order enzyme mechanism) must have equilibrium constants whose
 * product around the cycle is 1. Constants that break it describe no possible equilibrium; the
 * derivations would still run, so it is said plainly.
 */
import { diagnostic, type Diagnostic } from '../../model/index.ts';
import { nullSpace } from '../exact/linear-algebra.ts';
import type { Mechanism } from './mechanism.ts';
import { Rational } from '../exact/rational.ts';
import type { StepConstants } from './step-constants.ts';

/** Relative departure from 1 tolerated for the product around a cycle (rounded constants, common practice). */
const TOLERANCE = 0.01;

/** Checks every independent cycle of reversible steps whose constants are all known. */
export function checkDetailedBalance(mechanism: Mechanism, constants: readonly StepConstants[]): Diagnostic[] {
  const reversible = mechanism.steps.filter((s) => s.reversible);
  if (reversible.length < 2) return [];
  const species = [...mechanism.species.keys()];
  const matrix = species.map((sp) => reversible.map((s) => s.change.get(sp) ?? Rational.ZERO));
  const out: Diagnostic[] = [];
  for (const cycle of nullSpace(matrix, reversible.length)) {
    let logProduct = 0;
    let known = true;
    const parts: string[] = [];
    cycle.forEach((n, i) => {
      if (n.isZero()) return;
      const step = reversible[i]!;
      const c = constants[step.index] ?? {};
      const K = c.K ?? (c.k !== undefined && c.kRev !== undefined ? c.k / c.kRev : undefined);
      if (K === undefined || !(K > 0)) known = false;
      else logProduct += n.toNumber() * Math.log(K);
      parts.push(n.equals(Rational.ONE) ? `K_${step.label}` : `K_${step.label}^${n.toString()}`);
    });
    if (!known || Math.abs(logProduct) <= Math.log(1 + TOLERANCE)) continue;
    const first = reversible[cycle.findIndex((n) => !n.isZero())]!;
    out.push(
      diagnostic(
        'constants/detailed-balance',
        'warning',
        `the steps ${parts.map((p) => p.split('^')[0]!.slice(2)).join(', ')} form a closed cycle, so ${parts.join(' · ')} must be 1 (detailed balance), but it is ${Math.exp(logProduct).toPrecision(3)}`,
        {
          path: ['steps', first.index],
          note: 'no equilibrium satisfies these constants; check the K, k or k_rev of the cycle',
        },
      ),
    );
  }
  return out;
}
