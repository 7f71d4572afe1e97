/**
 * The worker thread of the derivation pool (derivation-pool.ts): derives each record it is sent
 * and answers with the derivation encoded as bytes (transferred, not copied), or the failure.
 * Compiled to lib/derivation-worker.mjs beside the command.
 */
import { parentPort } from 'node:worker_threads';
import { deriveEncoded } from '../catalogue/index.ts';

parentPort?.on('message', ({ index, record, options, series }) => {
  const outcome = deriveEncoded(record, options, series);
  const transfer = 'encoded' in outcome ? [outcome.encoded, outcome.series].filter((b) => b !== undefined) : [];
  parentPort!.postMessage(
    { index, outcome },
    transfer.map((b) => b.buffer as ArrayBuffer),
  );
});
