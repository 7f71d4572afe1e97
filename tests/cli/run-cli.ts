/**
 * Two ways to run the command: in-process through `main()` (for the logic: fast, no process to
 * start) and as the compiled binary a user runs through npx (for a few end-to-end cases).
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { main } from '../../src/cli/main.ts';

export const ROOT = fileURLToPath(new URL('../../', import.meta.url));
const BIN = fileURLToPath(new URL('../../bin/mechatlas.mjs', import.meta.url));

export interface CliRun {
  code: number;
  stdout: string;
  stderr: string;
}

/** Spawns the compiled `mechatlas` binary with arguments; returns exit code and output. */
export function runCli(args: string[], cwd = ROOT): CliRun {
  const r = spawnSync(process.execPath, [BIN, ...args], { cwd, encoding: 'utf8', timeout: 60_000 });
  return { code: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}

/** Runs `main()` in this process (working folder: the project root) and collects what it writes. */
export async function runMain(args: string[]): Promise<CliRun> {
  let stdout = '';
  let stderr = '';
  const code = await main(args, { stdout: (t) => void (stdout += t), stderr: (t) => void (stderr += t) });
  return { code, stdout, stderr };
}
