/**
 * `check --base GITREF --format markdown`: each changed record as it stood at the base revision,
 * checked the same way, so the review can show its chemistry before → after. The record's text
 * at the base is read with `git show <commit>:<path>` (the commit id comes from verifiedCommit,
 * never the ref as typed) and checked from a temporary copy under the same file name, so its id
 * is the same; the copy is removed after. A record the base does not hold is new (`null`).
 */
import { execFileSync } from 'node:child_process';
import { mkdtemp, mkdir, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { dirname, join, relative, resolve, sep } from 'node:path';
import { checkRecordFile } from '../catalogue/index.ts';
import type { RecordReport } from '../model/index.ts';
import { recordReport } from '../render/index.ts';
import { verifiedCommit } from './git-changes.ts';

/** A record at the base larger than this is not read (the loader refuses records over 1 MiB anyway). */
const MAX_BASE_BYTES = 2 * 1024 * 1024;

function git(args: string[]): string {
  return execFileSync('git', args, { encoding: 'utf8', stdio: ['ignore', 'pipe', 'pipe'], maxBuffer: MAX_BASE_BYTES });
}

/** The text of `file` at `commit`, or undefined when the commit does not hold it (or it is too large). */
function textAtCommit(commit: string, root: string, file: string): string | undefined {
  const path = relative(root, resolve(file)).split(sep).join('/');
  try {
    return git(['show', `${commit}:${path}`]);
  } catch {
    return undefined;
  }
}

/** Each file's record at REF, checked and reported under the file's present name; `null` where REF does not hold it. */
export async function recordsAtBase(
  ref: string,
  files: readonly string[],
  options: Parameters<typeof checkRecordFile>[1] = {},
): Promise<Map<string, RecordReport | null>> {
  const out = new Map<string, RecordReport | null>();
  if (files.length === 0) return out;
  const commit = verifiedCommit(ref);
  const root = git(['rev-parse', '--show-toplevel']).trim();
  const scratch = await mkdtemp(join(tmpdir(), 'mechatlas-base-'));
  try {
    for (const [i, file] of files.entries()) {
      const text = textAtCommit(commit, root, file);
      if (text === undefined) {
        out.set(file, null);
        continue;
      }
      // A folder per record keeps two records of one name in different folders apart.
      const copy = join(scratch, String(i), relative(root, resolve(file)));
      await mkdir(dirname(copy), { recursive: true });
      await writeFile(copy, text);
      const checked = await checkRecordFile(copy, options);
      const report = recordReport({ ...checked, file });
      const named = report.diagnostics.map((d) => (d.file === copy ? { ...d, file } : d));
      out.set(file, { ...report, diagnostics: named });
    }
  } finally {
    await rm(scratch, { recursive: true, force: true });
  }
  return out;
}
