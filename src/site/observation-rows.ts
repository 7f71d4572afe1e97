/** The checks of several rate laws gathered into one row per observation and species, for the mechanism page. */
import type { ObservationJson } from '../model/index.ts';

export interface ObservationRow {
  observation: string;
  species: string;
  observed: number;
  tolerance: number;
  /** per method, the check */
  checks: Record<string, ObservationJson>;
}

/** The checks of every rate law, one row per observation and species, in the report's order. */
export function observationRows(checks: readonly ObservationJson[]): ObservationRow[] {
  const rows = new Map<string, ObservationRow>();
  for (const c of checks) {
    const key = JSON.stringify([c.id, c.species]);
    const row = rows.get(key) ?? {
      observation: c.id,
      species: c.species,
      observed: c.observed,
      tolerance: c.tolerance,
      checks: {},
    };
    row.checks[c.method] = c;
    rows.set(key, row);
  }
  return [...rows.values()];
}
