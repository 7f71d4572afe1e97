/** `mechatlas check [DIR|FILE…] [--format text|json|markdown|sarif] [--base GITREF]`. */
import { catalogueCache, checkRecordFiles, findRecordFiles, withSystemFits } from '../catalogue/index.ts';
import { threadDeriver } from './derivation-pool.ts';
import { progressLine } from './progress.ts';
import { catalogueReport } from '../render/index.ts';
import { markdownReport } from '../render/index.ts';
import { sarifReport } from '../render/index.ts';
import { textReport } from '../render/index.ts';
import { reportStatus } from './exit-status.ts';
import { changedSince } from './git-changes.ts';
import { recordsAtBase } from './records-at-base.ts';
import { PathError, UsageError, type Output } from './output.ts';
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
  /** use the derivation cache (default true; `--no-cache` turns it off) */
  cache?: boolean;
  /** threads deriving records not in the cache (default: one per core) */
  workers?: number;
}

/** Runs the check and returns the exit code: 0 no error, 1 an error in any record, 3 mechatlas failed on one. */
export async function checkCommand(options: CheckOptions, out: Output): Promise<number> {
  const render = FORMATS[options.format as keyof typeof FORMATS];
  if (!render)
    throw new UsageError(`unknown format '${options.format}'; use one of ${Object.keys(FORMATS).join(', ')}`);
  const targets = options.targets.length > 0 ? options.targets : [DEFAULT_CATALOGUE];
  const { files, missing } = await findRecordFiles(targets);
  if (missing.length > 0) throw new UsageError(`no such file or folder: ${missing.join(', ')}`);
  if (files.length === 0)
    throw new PathError(`${targets.join(', ')} holds no records (*.yaml or *.yml files); is it the right folder?`);
  const selected = options.base === undefined ? files : changedSince(options.base, files);
  const threshold = options.approximationThreshold;
  if (threshold !== undefined && !(threshold > 0))
    throw new UsageError('--approximation-threshold must be a positive number, e.g. 0.1 for 10 %');
  const progress = progressLine(out, selected.length, {
    json: options.format === 'json' || options.format === 'sarif',
  });
  const cache = catalogueCache({ enabled: options.cache !== false });
  const deriver = threadDeriver(options.workers);
  // Rivals of one system are fitted to each other's data (the records given: with --base, the changed ones).
  const checked = withSystemFits(
    await checkRecordFiles(selected, threshold === undefined ? {} : { approximationThreshold: threshold }, {
      ...(cache && { cache }),
      ...(deriver && { deriver }),
      progress: progress.update,
    }),
  );
  progress.end();
  const report = catalogueReport(checked, toolVersion());
  // The review shows each changed record's chemistry before → after: the base's records are checked too.
  if (options.format === 'markdown' && options.base !== undefined) {
    const atBase = await recordsAtBase(
      options.base,
      selected,
      targets,
      threshold === undefined ? {} : { approximationThreshold: threshold },
    );
    out.stdout(markdownReport(report, { base: { ref: options.base, ...atBase } }));
  } else out.stdout(render(report as never));
  return reportStatus(report.records);
}
