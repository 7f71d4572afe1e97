/** `mechatlas derive FILE`: one record's derivation, step by step, for a person. */
import { access } from 'node:fs/promises';
import { catalogueCache, checkRecordFile } from '../catalogue/index.ts';
import { reportStatus } from './exit-status.ts';
import { UsageError, type Output } from './output.ts';
import { catalogueReport } from '../render/index.ts';
import { derivationText } from '../render/index.ts';
import { escapeControlCharacters } from '../render/index.ts';
import { textReport } from '../render/index.ts';
import { toolVersion } from '../catalogue/index.ts';

/** Prints the derivation and the record's diagnostics; exit 1 when it has errors, 3 when mechatlas failed on it. */
export async function deriveCommand(file: string, out: Output, options: { cache?: boolean } = {}): Promise<number> {
  try {
    await access(file);
  } catch {
    throw new UsageError(`no such file: ${file}`);
  }
  const cache = catalogueCache({ enabled: options.cache !== false });
  const checked = await checkRecordFile(file, {}, cache ? { cache } : {});
  // The record's own text (titles, symbols) reaches the terminal only with its control characters shown.
  out.stdout(escapeControlCharacters(derivationText(checked), true));
  const report = catalogueReport([checked], toolVersion());
  out.stdout('\n' + textReport(report));
  return reportStatus(report.records);
}
