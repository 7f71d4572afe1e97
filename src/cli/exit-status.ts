/**
 * The exit status of every command, so CI can tell findings from a crash: 0 clean, 1 errors
 * found in the records, 2 bad usage (including a path that cannot be used), 3 an internal
 * failure of mechatlas itself.
 */
export const EXIT = { clean: 0, findings: 1, usage: 2, internal: 3 } as const;

/** True when some diagnostic is an internal failure (`internal/…`), which outranks findings. */
export function hasInternalFailure(diagnostics: readonly { rule: string }[]): boolean {
  return diagnostics.some((d) => d.rule.startsWith('internal/'));
}

/** The exit status of a report: 3 when mechatlas failed on a record, 1 when a record has errors, else 0. */
export function reportStatus(
  records: readonly { diagnostics: readonly { rule: string; severity: string }[] }[],
): number {
  const all = records.flatMap((r) => r.diagnostics);
  if (hasInternalFailure(all)) return EXIT.internal;
  return all.some((d) => d.severity === 'error') ? EXIT.findings : EXIT.clean;
}
