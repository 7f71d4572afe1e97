/**
 * Diagnostics are values: the engine adds them to a list and never throws on bad chemistry.
 * The engine knows where a problem is only as a path into the record (`['steps', 1, 'k']`);
 * src/records turns that path into a file, line and column.
 */
import type { RuleId } from './rules/index.ts';

export type { RuleId };

/** `info` is a note for the reader (SARIF level `note`); only `error` fails a check. */
export type Severity = 'error' | 'warning' | 'info';

/** A path into the record: object keys and array indices, as in a JSON Pointer. */
export type RecordPath = readonly (string | number)[];

export interface Diagnostic {
  rule: RuleId;
  severity: Severity;
  /** Lower-case sentence a chemist understands, e.g. "atoms do not balance: O 2 → 3". */
  message: string;
  /** Where in the record the problem is; resolved to line and column by the loader. */
  path?: RecordPath;
  /** Character offset inside the string value at `path` (a term inside an equation). */
  offset?: number;
  /** Set by src/records once the path is resolved. */
  file?: string;
  line?: number;
  column?: number;
  endLine?: number;
  endColumn?: number;
  /** A hint on how to fix it. */
  note?: string;
  actual?: unknown;
  expected?: unknown;
}

/** Builds a diagnostic; optional fields are only set when given (exactOptionalPropertyTypes). */
export function diagnostic(
  rule: RuleId,
  severity: Severity,
  message: string,
  extra: Omit<Partial<Diagnostic>, 'rule' | 'severity' | 'message'> = {},
): Diagnostic {
  return { rule, severity, message, ...extra };
}

/** Counts errors, warnings and notes in a list of diagnostics. */
export function countBySeverity(diagnostics: readonly { severity: string }[]): Record<Severity, number> {
  const counts: Record<Severity, number> = { error: 0, warning: 0, info: 0 };
  for (const d of diagnostics) if (d.severity in counts) counts[d.severity as Severity] += 1;
  return counts;
}
