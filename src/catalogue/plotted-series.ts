/**
 * The concentration series a record's page plots (the first observation that can be simulated),
 * as the cache stores it: `{ series }`, or `{}` where there is none, so that "none" is stored too.
 */
import { firstObservationSeries, simulationBasis, type ConcentrationSeries, type Derivation } from '../engine/index.ts';
import type { MechanismRecord } from '../model/index.ts';

/** What the cache's `series` part holds. */
export interface StoredSeries {
  series?: ConcentrationSeries;
}

/** Simulates the plotted series of a derived record. */
export function plottedSeries(record: MechanismRecord | undefined, derivation: Derivation | undefined): StoredSeries {
  const basis = derivation && simulationBasis(derivation);
  const series =
    record && basis
      ? firstObservationSeries(record.observations ?? [], basis, derivation.constants ?? new Map())
      : undefined;
  return series === undefined ? {} : { series };
}
