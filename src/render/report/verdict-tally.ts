/** Counting observation checks by verdict, kept apart (a check the constants leave open is no pass). */
import type { ObservationJson, RecordReport, VerdictCounts } from '../../model/index.ts';

/** Counts checks by status. */
export function tallyVerdicts(checks: readonly Pick<ObservationJson, 'status'>[]): VerdictCounts {
  const out: VerdictCounts = { pass: 0, fail: 0, not_excluded: 0, unknown: 0 };
  for (const c of checks) if (c.status in out) out[c.status as keyof VerdictCounts] += 1;
  return out;
}

/** The checks of a record's primary (first) rate law, as its diagnostics judge them. */
export function primaryChecks(report: Pick<RecordReport, 'rate_laws' | 'observations'>): ObservationJson[] {
  const method = report.rate_laws?.[0]?.method;
  return (report.observations ?? []).filter((o) => o.method === method);
}
