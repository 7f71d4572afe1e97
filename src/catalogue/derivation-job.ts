/**
 * One derivation made for another thread: the record derived and the result encoded as bytes
 * (derivation-codec.ts), or the failure as a name and message. Run by the worker threads of
 * the command's pool; the receiving thread decodes the bytes and may store them in the cache.
 */
import { deriveMechanism, type DeriveOptions } from '../engine/index.ts';
import type { MechanismRecord } from '../model/index.ts';
import { decodeDerivationValue, encodeDerivationValue } from './derivation-codec.ts';
import type { DerivationOutcome } from './check-records.ts';
import type { Derivation } from '../engine/index.ts';
import { plottedSeries } from './plotted-series.ts';

/** What a worker sends back: the encoded derivation, a failure, or that the derivation cannot be sent. */
export type EncodedOutcome =
  { encoded: Uint8Array; series?: Uint8Array } | { error: { name: string; message: string } } | { unsendable: true };

/**
 * Derives a record and encodes the derivation (copied into bytes of their own, so they can be
 * transferred); with `series`, the plotted series too (a series that cannot be made is left to
 * the site's loader).
 */
export function deriveEncoded(record: MechanismRecord, options: DeriveOptions, series = false): EncodedOutcome {
  let derivation: Derivation;
  try {
    derivation = deriveMechanism(record, options);
  } catch (error) {
    const e = error instanceof Error ? error : new Error(String(error));
    return { error: { name: e.name, message: e.message } };
  }
  let encoded: Uint8Array;
  try {
    encoded = new Uint8Array(encodeDerivationValue(derivation));
  } catch {
    return { unsendable: true };
  }
  if (!series) return { encoded };
  try {
    return { encoded, series: new Uint8Array(encodeDerivationValue(plottedSeries(record, derivation))) };
  } catch {
    return { encoded };
  }
}

/** The outcome a worker's answer stands for; undefined when the record must be derived here instead. */
export function receiveOutcome(outcome: EncodedOutcome): DerivationOutcome | undefined {
  if ('error' in outcome)
    return { error: Object.assign(new Error(outcome.error.message), { name: outcome.error.name }) };
  if ('unsendable' in outcome) return undefined;
  const derivation = decodeDerivationValue(outcome.encoded) as Derivation;
  return { derivation, encoded: outcome.encoded, ...(outcome.series && { encodedSeries: outcome.series }) };
}
