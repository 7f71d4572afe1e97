/** Spawns the real `mechatlas` binary, as a user would through npx. */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

export const ROOT = fileURLToPath(new URL('../..', import.meta.url));
const BIN = fileURLToPath(new URL('../../bin/mechatlas.mjs', import.meta.url));

/** Runs the CLI with arguments from the project root; returns exit code and output. */
export function runCli(args: string[], cwd = ROOT): { code: number; stdout: string; stderr: string } {
  const r = spawnSync(process.execPath, [BIN, ...args], { cwd, encoding: 'utf8', timeout: 60_000 });
  return { code: r.status ?? -1, stdout: r.stdout, stderr: r.stderr };
}
