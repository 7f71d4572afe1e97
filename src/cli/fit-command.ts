/** `mechatlas fit FILE`: one record's data fitted, step by step, with the rivals of its system found beside it. */
import { access } from 'node:fs/promises';
import { checkWithRivals, toolVersion } from '../catalogue/index.ts';
import { catalogueReport, escapeControlCharacters, fitsText, textReport } from '../render/index.ts';
import { reportStatus } from './exit-status.ts';
import { UsageError, type Output } from './output.ts';

/** Prints the record's fits and its diagnostics; exit 1 when it has errors, 3 when mechatlas failed on it. */
export async function fitCommand(file: string, out: Output): Promise<number> {
  try {
    await access(file);
  } catch {
    throw new UsageError(`no such file: ${file}`);
  }
  const [checked, ...rivals] = await checkWithRivals(file);
  const report = catalogueReport([checked!], toolVersion());
  const record = report.records[0]!;
  const head = `${record.id}${record.system ? ` (system ${record.system}, ${rivals.length} rival${rivals.length === 1 ? '' : 's'} beside it)` : ''}`;
  const body = record.fits ? fitsText(record.fits) : 'no data to fit: give an observation a data table (data:)\n';
  // The record's own text reaches the terminal only with its control characters shown.
  out.stdout(escapeControlCharacters(`${head}\n\n${body}`, true));
  out.stdout('\n' + textReport(report));
  return reportStatus(report.records);
}
