/**
 * Progress of a long check or build on a terminal: one line, rewritten in place at most ten
 * times a second, "checked 120 of 1000 records (12 s)", cleared at the end. Shown only when the
 * command writes to a terminal (stderr is a TTY), not in CI, not for `--format json`, and only
 * for more than a few dozen records; otherwise the progress is silent.
 */
import type { Output } from './output.ts';
import { processOutput } from './output.ts';

/** More records than this show progress. */
export const PROGRESS_THRESHOLD = 36;

/** A progress reporter and the function that clears its line. */
export interface Progress {
  update(done: number, total: number): void;
  end(): void;
}

const silent: Progress = { update: () => undefined, end: () => undefined };

/** Progress for `total` records written to `out`, or a silent one where it must not show. */
export function progressLine(out: Output, total: number, options: { json?: boolean; verb?: string } = {}): Progress {
  const terminal = out === processOutput && process.stderr.isTTY === true;
  const ci = process.env['CI'] !== undefined && process.env['CI'] !== '' && process.env['CI'] !== 'false';
  if (!terminal || ci || options.json || total <= PROGRESS_THRESHOLD) return silent;
  const started = Date.now();
  let shown = 0;
  let written = false;
  return {
    update(done, of) {
      const now = Date.now();
      if (done < of && now - shown < 100) return;
      shown = now;
      written = true;
      const seconds = ((now - started) / 1000).toFixed(0);
      out.stderr(`\r\x1b[K${options.verb ?? 'checked'} ${done} of ${of} records (${seconds} s)`);
    },
    end() {
      if (written) out.stderr('\r\x1b[K');
    },
  };
}
