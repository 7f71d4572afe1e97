/** A person's view of the derived rate laws: each derivation step, the orders, the observations. */
import type { Derivation, DerivedRateLaw } from '../../engine/index.ts';
import { methodName } from '../words/index.ts';

/** Renders every rate law of a derivation as plain text lines. */
export function rateLawLines(derivation: Derivation): string[] {
  const lines: string[] = [];
  for (const derived of derivation.rateLaws ?? []) {
    lines.push('', `Rate law — ${methodName(derived.law.method)}:`);
    for (const step of derived.law.trace) lines.push(`  · ${step.say}:`, `      ${step.text}`);
    for (const step of derived.presented?.trace ?? []) lines.push(`  · ${step.say}:`, `      ${step.text}`);
    if (derived.presented) {
      lines.push(`  r = ${derived.presented.text}`);
      if (derived.presented.grouped)
        lines.push(
          `    = ${derived.presented.grouped.text}   with ${derived.presented.grouped.name} = ${derived.presented.grouped.valueText}`,
        );
    } else if (derived.algebraic) {
      lines.push(`  r = ${derived.algebraic.text}`);
    } else {
      lines.push('  no closed form: the steady state is solved numerically at each observation with constants');
    }
    lines.push(...orderLines(derived), ...restingLines(derived));
  }
  const checks = derivation.observations ?? [];
  if (checks.length > 0) {
    lines.push('', 'Observations:');
    for (const c of checks) {
      const predicted =
        c.predicted !== undefined
          ? `predicted ${c.predicted}${c.basis === 'conditions' ? ' at its conditions' : ''}`
          : c.range
            ? `predicted between ${c.range[0]} and ${c.range[1]} (consistent for some constants if inside)`
            : 'no prediction';
      lines.push(
        `  ${c.status.padEnd(7)} ${c.observation}  order in ${c.species} ${c.observed} ± ${c.tolerance}; ${predicted}  [${c.method}]`,
      );
    }
  }
  return lines;
}

function orderLines(derived: DerivedRateLaw): string[] {
  if (derived.orders.size === 0) return [];
  const rows = [...derived.orders].map(([sp, o]) =>
    o.low.equals(o.high) ? `${sp} ${o.low}` : `${sp} ${o.low} → ${o.high}`,
  );
  return [`  orders (low → high concentration): ${rows.join('; ')}`];
}

function restingLines(derived: DerivedRateLaw): string[] {
  return derived.restingStates.map(
    (r) =>
      `  resting state at ${r.observation}: ${r.species === r.catalyst ? `free ${r.species}` : r.species} holds ${(r.fraction * 100).toFixed(0)} % of all ${r.catalyst}`,
  );
}
