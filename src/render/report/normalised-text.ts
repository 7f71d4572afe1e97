/**
 * A rate law in its named apparent constants, for a person at a terminal: the normalised form and
 * each constant with its definition, unit and value; then, for a standard shape, the trade's form
 * (k_cat, K_M, K_i …) the same way.
 */
import type { ApparentConstant, DerivedRateLaw } from '../../engine/index.ts';
import { lawShapeWords, plainNumber } from '../words/index.ts';

/** The lines of the normalised form; none where the law has none or it reads as the grouped form already. */
export function normalisedLines(derived: DerivedRateLaw): string[] {
  const n = derived.normalised;
  if (!n) return [];
  const lines: string[] = [];
  const grouped = derived.presented?.grouped;
  if (!grouped || grouped.text !== n.text) {
    lines.push('  normalised (each denominator from 1, terms collected by concentration):', `    r = ${n.text}`);
    lines.push(...n.constants.map(constantLine));
  }
  if (n.trade) {
    lines.push(`  in the trade's constants (${lawShapeWords(n.trade.shape)}):`, `    r = ${n.trade.text}`);
    lines.push(...n.trade.constants.map(constantLine));
  }
  return lines;
}

/** `k_obs = K_1*k_2 = 1e5 M^-1 s^-1   (observed rate constant …)`. */
export function constantLine(c: ApparentConstant): string {
  const relation = c.relationText !== undefined ? `${c.relationText} = ` : '';
  return `      ${c.name} = ${relation}${c.definitionText}${valueText(c.value, c.unitText)}   (${c.meaning})`;
}

/** ` = 1.2e-3 M^-1 s^-1` with a value, `  [M^-1 s^-1]` with only a unit. */
export function valueText(value: number | undefined, unit: string): string {
  if (value !== undefined) return ` = ${plainNumber(value)}${unit ? ` ${unit}` : ''}`;
  return unit ? `  [${unit}]` : '  [dimensionless]';
}
