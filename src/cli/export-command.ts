/** `mechatlas export --sbml ID|FILE [--out FILE]`: the record's mass-action model as SBML Level 3. */
import { existsSync } from 'node:fs';
import { writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { sbmlDocument } from '../render/index.ts';
import { checkRecordFile } from '../catalogue/index.ts';
import { DEFAULT_CATALOGUE } from './check-command.ts';
import { UsageError, type Output } from './output.ts';

/** Writes the SBML to stdout or a file; exit 1 when the record cannot be derived. */
export async function exportCommand(target: string, outFile: string | undefined, out: Output): Promise<number> {
  const file = existsSync(target) ? target : join(DEFAULT_CATALOGUE, `${target}.yaml`);
  if (!existsSync(file)) throw new UsageError(`no record '${target}' (looked for ${file})`);
  const checked = await checkRecordFile(file);
  const record = checked.loaded.record;
  const derivation = checked.derivation;
  if (!record || !derivation?.mechanism) {
    out.stderr(`${file}: the record has errors; run mechatlas check ${file}\n`);
    return 1;
  }
  const sbml = sbmlDocument(checked.id, record, derivation.mechanism, derivation.constants ?? new Map());
  if (outFile) {
    await writeFile(outFile, sbml);
    out.stdout(`wrote ${outFile}\n`);
  } else {
    out.stdout(sbml);
  }
  return 0;
}
