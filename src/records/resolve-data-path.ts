/**
 * Where an observation's data file is. The path is relative to the record file and must stay
 * inside the content folder: the folder above the one holding the record (`content/` for
 * `content/mechanisms/x.yaml`, where data files live in `content/data/`). The content folder is
 * found from the record's own place, not from the folder named on the command line, so a record
 * reads the same files whether it is checked alone or with its whole folder. Symbolic links are
 * followed before the check, so a link cannot lead out either.
 */
import { realpath } from 'node:fs/promises';
import { dirname, isAbsolute, join, normalize, relative, resolve } from 'node:path';

/** The content folder of a record file: the folder above the one holding it. */
export function contentFolderOf(recordFile: string): string {
  return dirname(dirname(resolve(recordFile)));
}

function inside(folder: string, path: string): boolean {
  const rel = relative(folder, path);
  return rel !== '' && !rel.startsWith('..') && !isAbsolute(rel);
}

/**
 * The data file's path as the diagnostics name it (joined to the record file's folder), or why it
 * may not be read. A file that does not exist is not a problem here (reading it reports that).
 */
export async function resolveDataPath(
  recordFile: string,
  reference: string,
): Promise<{ path: string } | { problem: string }> {
  const content = contentFolderOf(recordFile);
  if (isAbsolute(reference) || /^[A-Za-z]:[\\/]/.test(reference))
    return { problem: `the data file must be given relative to the record, not as the absolute path '${reference}'` };
  const path = normalize(join(dirname(recordFile), reference));
  const outside = `the data file '${reference}' lies outside the content folder ${content}; keep data files beside the records, e.g. in ../data/`;
  if (!inside(content, resolve(path))) return { problem: outside };
  try {
    const [realContent, realFile] = await Promise.all([realpath(content), realpath(path)]);
    if (!inside(realContent, realFile)) return { problem: `${outside} (it is a link to ${realFile})` };
  } catch {
    // Missing: reported when the file is read.
  }
  return { path };
}
