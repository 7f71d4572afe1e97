/** A person's view of the derived rate laws: each derivation step, the orders, the observations. */
import type { Derivation, DerivedRateLaw } from '../../engine/index.ts';
import { methodName, predictionText, verdictMark } from '../words/index.ts';
import { observationJson } from './record-report.ts';
import { normalisedLines, valueText } from './normalised-text.ts';

/** Renders every rate law of a derivation as plain text lines. */
export function rateLawLines(derivation: Derivation): string[] {
  const lines: string[] = [];
  for (const derived of derivation.rateLaws ?? []) {
    lines.push('', `Rate law — ${methodName(derived.law.method)}:`);
    for (const step of derived.law.trace) lines.push(`  · ${step.say}:`, `      ${step.text}`);
    for (const step of derived.presented?.trace ?? []) lines.push(`  · ${step.say}:`, `      ${step.text}`);
    if (derived.presented) {
      lines.push(`  r = ${derived.presented.text}`);
      const g = derived.presented.grouped;
      if (g) lines.push(`    = ${g.text}   with ${g.name} = ${g.valueText}${valueText(g.value, g.unitText)}`);
      lines.push(...normalisedLines(derived));
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
      const mark = verdictMark(c.status);
      lines.push(
        `  ${mark.symbol} ${mark.word.padEnd(13)} ${c.observation}  order in ${c.species} ${c.observed} ± ${c.tolerance}; ${predictionText(observationJson(c))}  [${c.method}]`,
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
