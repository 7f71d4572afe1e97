/** `mechatlas derive FILE`: one record's derivation, step by step, for a person. */
import { access } from 'node:fs/promises';
import { checkRecordFile } from '../catalogue/index.ts';
import { UsageError, type Output } from './output.ts';
import { catalogueReport } from '../render/index.ts';
import { derivationText } from '../render/index.ts';
import { textReport } from '../render/index.ts';
import { toolVersion } from '../catalogue/index.ts';

/** Prints the derivation and the record's diagnostics; exit 1 when it has errors. */
export async function deriveCommand(file: string, out: Output): Promise<number> {
  try {
    await access(file);
  } catch {
    throw new UsageError(`no such file: ${file}`);
  }
  const checked = await checkRecordFile(file);
  out.stdout(derivationText(checked));
  const report = catalogueReport([checked], toolVersion());
  out.stdout('\n' + textReport(report));
  return report.summary.errors > 0 ? 1 : 0;
}
