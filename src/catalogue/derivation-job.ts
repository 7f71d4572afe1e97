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

/** What a worker sends back: the encoded derivation, a failure, or that the derivation cannot be sent. */
export type EncodedOutcome =
  { encoded: Uint8Array } | { error: { name: string; message: string } } | { unsendable: true };

/** Derives a record and encodes the derivation (copied into bytes of their own, so they can be transferred). */
export function deriveEncoded(record: MechanismRecord, options: DeriveOptions): EncodedOutcome {
  let derivation: Derivation;
  try {
    derivation = deriveMechanism(record, options);
  } catch (error) {
    const e = error instanceof Error ? error : new Error(String(error));
    return { error: { name: e.name, message: e.message } };
  }
  try {
    return { encoded: new Uint8Array(encodeDerivationValue(derivation)) };
  } catch {
    return { unsendable: true };
  }
}

/** The outcome a worker's answer stands for; undefined when the record must be derived here instead. */
export function receiveOutcome(outcome: EncodedOutcome): DerivationOutcome | undefined {
  if ('error' in outcome)
    return { error: Object.assign(new Error(outcome.error.message), { name: outcome.error.name }) };
  if ('unsendable' in outcome) return undefined;
  return { derivation: decodeDerivationValue(outcome.encoded) as Derivation, encoded: outcome.encoded };
}
