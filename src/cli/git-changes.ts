/**
 * `check --base GITREF`: which record files differ from a commit. The ref comes from a command
 * line that CI may fill from a pull request, so git is never handed it as an option: it is
 * resolved with `rev-parse --verify --end-of-options REF^{commit}`, and only the resulting commit
 * id goes to `git diff`, after `--end-of-options`, with the files after `--`.
 */
import { execFileSync } from 'node:child_process';
import { relative, resolve } from 'node:path';
import { UsageError } from './output.ts';

function git(args: string[]): string {
  return execFileSync('git', args, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'] });
}

/** The commit id REF names, or a usage error when it names none. */
export function verifiedCommit(ref: string): string {
  let id = '';
  try {
    id = git(['rev-parse', '--verify', '--quiet', '--end-of-options', `${ref}^{commit}`]).trim();
  } catch {
    // handled below: git said no, or is not there
  }
  if (!/^[0-9a-f]{40}([0-9a-f]{24})?$/.test(id))
    throw new UsageError(`cannot compare with git ref '${ref}': no such commit`);
  return id;
}

/** Keeps the files that differ from the commit REF names (for a pull-request review of what it changes). */
export function changedSince(ref: string, files: readonly string[]): string[] {
  const commit = verifiedCommit(ref);
  let listed: string;
  let root: string;
  try {
    listed = git(['diff', '--name-only', '--end-of-options', commit, '--', ...files]);
    root = git(['rev-parse', '--show-toplevel']).trim();
  } catch {
    throw new UsageError(`cannot compare with git ref '${ref}' here (is this folder in the repository?)`);
  }
  const changed = new Set(
    listed
      .split('\n')
      .filter(Boolean)
      .map((f) => resolve(root, f)),
  );
  return files.filter((f) => changed.has(resolve(f))).map((f) => relative(process.cwd(), resolve(f)) || f);
}
