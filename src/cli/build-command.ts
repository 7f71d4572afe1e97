/**
 * `mechatlas build`: builds the catalogue from a folder of records into an output folder.
 * For now the catalogue is its review report (JSON for tools, markdown for people); the site
 * build joins it here.
 */
import { mkdir, writeFile } from 'node:fs/promises';
import { join } from 'node:path';
import { findRecordFiles } from '../records/index.ts';
import { checkRecordFiles } from './check-records.ts';
import { UsageError, type Output } from './output.ts';
import { catalogueReport } from './report/catalogue-report.ts';
import { markdownReport } from './report/markdown.ts';
import { summaryLine } from './report/text.ts';
import { toolVersion } from './version.ts';

/** Writes OUT/report.json and OUT/report.md; a record with errors is reported, not fatal. */
export async function buildCommand(options: { content: string; out: string }, out: Output): Promise<number> {
  const { files, missing } = await findRecordFiles([options.content]);
  if (missing.length > 0) throw new UsageError(`no such folder: ${options.content}`);
  const report = catalogueReport(await checkRecordFiles(files), toolVersion());
  await mkdir(options.out, { recursive: true });
  await writeFile(join(options.out, 'report.json'), JSON.stringify(report, null, 2) + '\n');
  await writeFile(join(options.out, 'report.md'), markdownReport(report));
  out.stdout(`built ${options.out}/report.json and ${options.out}/report.md — ${summaryLine(report)}\n`);
  return 0;
}
