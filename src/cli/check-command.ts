/** `mechatlas check [DIR|FILE…] [--format text|json|markdown|sarif] [--base GITREF]`. */
import { execFileSync } from 'node:child_process';
import { relative, resolve } from 'node:path';
import { findRecordFiles } from '../catalogue/index.ts';
import { checkRecordFiles } from '../catalogue/index.ts';
import { catalogueReport } from '../render/index.ts';
import { markdownReport } from '../render/index.ts';
import { sarifReport } from '../render/index.ts';
import { textReport } from '../render/index.ts';
import { UsageError, type Output } from './output.ts';
import { toolVersion } from '../catalogue/index.ts';

const FORMATS = {
  text: textReport,
  json: (r: object) => JSON.stringify(r, null, 2) + '\n',
  markdown: markdownReport,
  sarif: sarifReport,
} as const;
export const DEFAULT_CATALOGUE = 'content/mechanisms';

export interface CheckOptions {
  targets: string[];
  format: string;
  base?: string;
  /** relative error above which an approximation is reported invalid */
  approximationThreshold?: number;
}

/** Runs the check and returns the exit code: 0 no error, 1 an error in any record. */
export async function checkCommand(options: CheckOptions, out: Output): Promise<number> {
  const render = FORMATS[options.format as keyof typeof FORMATS];
  if (!render)
    throw new UsageError(`unknown format '${options.format}'; use one of ${Object.keys(FORMATS).join(', ')}`);
  const targets = options.targets.length > 0 ? options.targets : [DEFAULT_CATALOGUE];
  const { files, missing } = await findRecordFiles(targets);
  if (missing.length > 0) throw new UsageError(`no such file or folder: ${missing.join(', ')}`);
  const selected = options.base === undefined ? files : changedSince(options.base, files);
  const threshold = options.approximationThreshold;
  if (threshold !== undefined && !(threshold > 0))
    throw new UsageError('--approximation-threshold must be a positive number, e.g. 0.1 for 10 %');
  const checked = await checkRecordFiles(
    selected,
    threshold === undefined ? {} : { approximationThreshold: threshold },
  );
  const report = catalogueReport(checked, toolVersion());
  out.stdout(render(report as never));
  return report.summary.errors > 0 ? 1 : 0;
}

/** Keeps the files that differ from GITREF (for a pull-request review of what it changes). */
function changedSince(base: string, files: string[]): string[] {
  let listed: string;
  try {
    listed = execFileSync('git', ['diff', '--name-only', base, '--', ...files], {
      encoding: 'utf8',
      stdio: ['ignore', 'pipe', 'pipe'],
    });
  } catch {
    throw new UsageError(`cannot compare with git ref '${base}'`);
  }
  const root = execFileSync('git', ['rev-parse', '--show-toplevel'], { encoding: 'utf8' }).trim();
  const changed = new Set(
    listed
      .split('\n')
      .filter(Boolean)
      .map((f) => resolve(root, f)),
  );
  return files.filter((f) => changed.has(resolve(f))).map((f) => relative(process.cwd(), resolve(f)) || f);
}
