/** `mechatlas export --sbml ID|FILE [--out FILE]`: the record's mass-action model as SBML Level 3. */
import { existsSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { escapeControlCharacters, sbmlDocument } from '../render/index.ts';
import { checkRecordFile } from '../catalogue/index.ts';
import { DEFAULT_CATALOGUE } from './check-command.ts';
import { EXIT, hasInternalFailure } from './exit-status.ts';
import { describeFileSystemError } from './file-system-error.ts';
import { PathError, UsageError, type Output } from './output.ts';

/** Writes the SBML to stdout or a file; exit 1 when the record cannot be derived, 3 when mechatlas failed on it. */
export async function exportCommand(target: string, outFile: string | undefined, out: Output): Promise<number> {
  const file = existsSync(target) ? target : join(DEFAULT_CATALOGUE, `${target}.yaml`);
  if (!existsSync(file)) throw new UsageError(`no record '${target}' (looked for ${file})`);
  const checked = await checkRecordFile(file);
  const record = checked.loaded.record;
  const derivation = checked.derivation;
  if (!record || !derivation?.mechanism) {
    out.stderr(escapeControlCharacters(`${file}: the record has errors; run mechatlas check ${file}`) + '\n');
    return hasInternalFailure(checked.diagnostics) ? EXIT.internal : EXIT.findings;
  }
  const sbml = sbmlDocument(checked.id, record, derivation.mechanism, derivation.constants ?? new Map());
  if (outFile) {
    try {
      await writeFile(outFile, sbml);
    } catch (error) {
      throw new PathError(describeFileSystemError(error, 'write') ?? `cannot write ${outFile}`);
    }
    out.stdout(`wrote ${outFile}\n`);
  } else {
    out.stdout(sbml);
  }
  return EXIT.clean;
}
