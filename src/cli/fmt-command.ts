/**
 * `mechatlas fmt [DIR|FILE…] [--check]`: puts records in one layout (fields in the schema's
 * order, two-space indentation, quotes only where YAML needs them), keeping every value and
 * comment. A file that does not read as YAML is reported where it fails and left as it is.
 * With --check nothing is written: the files that would change are listed, and the exit status
 * is 1 when there are any (for CI).
 */
import { lstat, rename, rm, writeFile } from 'node:fs/promises';
import { findRecordFiles, formatRecordFile } from '../catalogue/index.ts';
import { escapeControlCharacters as printable, findingLines, plural } from '../render/index.ts';
import { DEFAULT_CATALOGUE } from './check-command.ts';
import { EXIT, hasInternalFailure } from './exit-status.ts';
import { PathError, UsageError, type Output } from './output.ts';

export interface FmtOptions {
  targets: string[];
  /** list the files that would change; write nothing */
  check: boolean;
}

/** Formats the records (or, with --check, lists those that would change) and returns the exit status. */
export async function fmtCommand(options: FmtOptions, out: Output): Promise<number> {
  const targets = options.targets.length > 0 ? options.targets : [DEFAULT_CATALOGUE];
  const { files, missing } = await findRecordFiles(targets);
  if (missing.length > 0) throw new UsageError(`no such file or folder: ${missing.join(', ')}`);
  if (files.length === 0)
    throw new PathError(`${targets.join(', ')} holds no records (*.yaml or *.yml files); is it the right folder?`);
  const changed: string[] = [];
  const failed: string[] = [];
  const diagnostics = [];
  for (const file of files) {
    const result = await formatRecordFile(file);
    if (result.text === undefined) {
      failed.push(file);
      diagnostics.push(...result.diagnostics);
      out.stdout(
        `${printable(file)} is left as it is:\n${result.diagnostics.flatMap((d) => findingLines(d, file)).join('\n')}\n`,
      );
      continue;
    }
    if (result.text === result.source) continue;
    changed.push(file);
    if (options.check) out.stdout(`would change: ${printable(file)}\n`);
    else {
      await replaceFile(file, result.text);
      out.stdout(`formatted: ${printable(file)}\n`);
    }
  }
  out.stdout(`${summary(files.length, changed.length, failed.length, options.check)}\n`);
  if (hasInternalFailure(diagnostics)) return EXIT.internal;
  return failed.length > 0 || (options.check && changed.length > 0) ? EXIT.findings : EXIT.clean;
}

/** "13 records: 2 formatted, 11 already in layout" and the like. */
function summary(total: number, changed: number, failed: number, check: boolean): string {
  const parts = [
    changed > 0 ? `${changed} ${check ? 'would change (run mechatlas fmt to format them)' : 'formatted'}` : '',
    total - changed - failed > 0 ? `${total - changed - failed} already in layout` : '',
    failed > 0 ? `${failed} left as ${failed === 1 ? 'it is' : 'they are'} (see above)` : '',
  ].filter(Boolean);
  return `${plural(total, 'record')}: ${parts.join(', ')}`;
}

/**
 * Writes the formatted text beside the file and renames it over the file, so an interruption
 * leaves the old text or the new, never half of one; a link is written through instead.
 */
async function replaceFile(file: string, text: string): Promise<void> {
  if ((await lstat(file)).isSymbolicLink()) return writeFile(file, text);
  const staged = `${file}.mechatlas-fmt-${process.pid}`;
  try {
    await writeFile(staged, text, { flag: 'wx' });
    await rename(staged, file);
  } catch (error) {
    await rm(staged, { force: true });
    throw error;
  }
}
