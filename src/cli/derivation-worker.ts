/**
 * The worker thread of the derivation pool (derivation-pool.ts): derives each record it is sent
 * and answers with the derivation encoded as bytes (transferred, not copied), or the failure.
 * Compiled to lib/derivation-worker.mjs beside the command.
 */
import { parentPort } from 'node:worker_threads';
import { deriveEncoded } from '../catalogue/index.ts';

parentPort?.on('message', ({ index, record, options }) => {
  const outcome = deriveEncoded(record, options);
  parentPort!.postMessage({ index, outcome }, 'encoded' in outcome ? [outcome.encoded.buffer as ArrayBuffer] : []);
});
