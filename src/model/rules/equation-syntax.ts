/**
 * A step equation needs terms separated by ' + ' (with spaces, since charges use + and -), one
 * arrow ('->', '<=>', '→' or '⇌'), and optional whole-number coefficients. The column points at
 * the term or arrow that could not be read.
 */
import type { RuleDefinition } from './rule-definition.ts';

export const equationSyntax = {
  id: 'equation/syntax',
  summary: "a step's equation cannot be read",
} as const satisfies RuleDefinition;
