/**
 * A pool of worker threads that derive records (node:worker_threads), sized to the machine: each
 * thread takes the next record as soon as it is free, and the outcomes come back in the order
 * of the records, so reports do not depend on which thread finished first. The threads run the
 * compiled worker (lib/derivation-worker.mjs); run from source there is none, and records are
 * derived in the main thread. A thread that fails leaves its record to the main thread.
 */
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { fileURLToPath } from 'node:url';
import { Worker } from 'node:worker_threads';
import {
  receiveOutcome,
  type DerivationJob,
  type DerivationOutcome,
  type Deriver,
  type EncodedOutcome,
} from '../catalogue/index.ts';

/** The compiled worker beside the compiled command, or undefined when running from source. */
function workerScript(): URL | undefined {
  const url = new URL('./derivation-worker.mjs', import.meta.url);
  return url.protocol === 'file:' && existsSync(fileURLToPath(url)) ? url : undefined;
}

/** The number of threads a pool uses by default: one per core the machine offers. */
export function defaultPoolSize(): number {
  return Math.max(1, availableParallelism());
}

/** A deriver running `size` threads, or undefined when threads are not worth it (one) or not available. */
export function threadDeriver(size = defaultPoolSize()): Deriver | undefined {
  const script = workerScript();
  if (size < 2 || !script) return undefined;
  return (jobs, options, done) => runPool(script, Math.min(size, jobs.length), jobs, options, done);
}

function runPool(
  script: URL,
  size: number,
  jobs: readonly DerivationJob[],
  options: object,
  done: () => void,
): Promise<DerivationOutcome[]> {
  const outcomes: DerivationOutcome[] = new Array<DerivationOutcome>(jobs.length);
  let next = 0;
  let settled = 0;
  let exited = 0;
  return new Promise((resolve) => {
    const finishOne = (index: number, outcome: DerivationOutcome) => {
      outcomes[index] = outcome;
      done();
      if (++settled === jobs.length) resolve(outcomes);
    };
    for (let t = 0; t < size; t++) {
      const worker = new Worker(script);
      let current = -1;
      const give = () => {
        if (next >= jobs.length) {
          void worker.terminate();
          return;
        }
        current = next++;
        const job = jobs[current]!;
        worker.postMessage({ index: current, record: job.record, options, series: job.series === true });
      };
      worker.on('message', (answer: { index: number; outcome: EncodedOutcome }) => {
        let outcome: DerivationOutcome;
        try {
          outcome = receiveOutcome(answer.outcome);
        } catch {
          outcome = undefined; // bytes that do not decode: derive it here
        }
        current = -1;
        finishOne(answer.index, outcome);
        give();
      });
      worker.on('error', () => {
        // This thread is gone: its record is derived in the main thread; the others carry on.
        if (current >= 0) finishOne(current, undefined);
        current = -1;
      });
      worker.on('exit', () => {
        if (current >= 0) finishOne(current, undefined);
        current = -1;
        // Records nobody took yet go to the main thread when no thread is left to take them.
        if (++exited === size) while (next < jobs.length) finishOne(next++, undefined);
      });
      give();
    }
  });
}
