/**
 * Which files a check covers: directories expand to their record files, named files are taken as
 * given. Targets that do not exist are returned, not thrown, so the CLI can report bad usage.
 * Every entry named like a record is listed, not only regular files: a link is followed, and a
 * pipe or device is reported by the loader rather than skipped in silence.
 */
import { readdir, stat } from 'node:fs/promises';
import { join } from 'node:path';

const RECORD_FILE = /\.ya?ml$/i;

async function kindOf(target: string): Promise<'file' | 'directory' | 'missing'> {
  try {
    const info = await stat(target);
    return info.isDirectory() ? 'directory' : 'file';
  } catch {
    return 'missing';
  }
}

/** Expands directories to their *.yaml and *.yml files (sorted, not recursive); files as given. */
export async function findRecordFiles(targets: readonly string[]): Promise<{ files: string[]; missing: string[] }> {
  const files: string[] = [];
  const missing: string[] = [];
  for (const target of targets) {
    const kind = await kindOf(target);
    if (kind === 'missing') missing.push(target);
    else if (kind === 'file') files.push(target);
    else {
      const entries = await readdir(target, { withFileTypes: true });
      const names = entries
        // `.#x.yaml` is an editor's lock (a dangling link while the file is open), not a record.
        .filter((entry) => !entry.isDirectory() && RECORD_FILE.test(entry.name) && !entry.name.startsWith('.#'))
        .map((entry) => entry.name)
        // Plain code-unit order, not locale order: the same list on every machine.
        .sort((a, b) => (a < b ? -1 : a > b ? 1 : 0));
      files.push(...names.map((name) => join(target, name)));
    }
  }
  // A file named twice (directly and through its directory) is checked once.
  return { files: [...new Set(files)], missing };
}
