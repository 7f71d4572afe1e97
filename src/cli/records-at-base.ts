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

/** The changed records at the base, and the records the change removes, checked as they stood at the base. */
export interface BaseRecords {
  /** each changed file's record at the base, under the file's present name; `null` where the base does not hold it */
  records: Map<string, RecordReport | null>;
  /** the records under `targets` that the base holds and the working tree no longer does */
  removed: RecordReport[];
}

/** Each changed file's record at REF, and the records removed since REF under the folders and files checked. */
export async function recordsAtBase(
  ref: string,
  files: readonly string[],
  targets: readonly string[],
  options: Parameters<typeof checkRecordFile>[1] = {},
): Promise<BaseRecords> {
  const commit = verifiedCommit(ref);
  const root = git(['rev-parse', '--show-toplevel']).trim();
  const removedFiles = git(['diff', '--name-only', '--diff-filter=D', '--end-of-options', commit, '--', ...targets])
    .split('\n')
    .filter((f) => /\.ya?ml$/i.test(f))
    .map((f) => relative(process.cwd(), resolve(root, f)));
  const scratch = await mkdtemp(join(tmpdir(), 'mechatlas-base-'));
  try {
    // A folder per record keeps two records of one name in different folders apart.
    let n = 0;
    const atBase = async (file: string): Promise<RecordReport | null> => {
      const text = textAtCommit(commit, root, file);
      if (text === undefined) return null;
      const copy = join(scratch, String(n++), relative(root, resolve(file)));
      await mkdir(dirname(copy), { recursive: true });
      await writeFile(copy, text);
      const checked = await checkRecordFile(copy, options);
      const report = recordReport({ ...checked, file });
      return { ...report, diagnostics: report.diagnostics.map((d) => (d.file === copy ? { ...d, file } : d)) };
    };
    const records = new Map<string, RecordReport | null>();
    for (const file of files) records.set(file, await atBase(file));
    const removed: RecordReport[] = [];
    for (const file of removedFiles) {
      const report = await atBase(file);
      if (report) removed.push(report);
    }
    return { records, removed };
  } finally {
    await rm(scratch, { recursive: true, force: true });
  }
}
