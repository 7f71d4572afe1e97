/** The content folder a command serves or builds: it must exist and hold at least one record file. */
import { existsSync, statSync } from 'node:fs';
import { resolve } from 'node:path';
import { findRecordFiles } from '../catalogue/index.ts';
import { PathError, UsageError } from './output.ts';

/** The folder as an absolute path with its record files; a usage or path error otherwise. */
export async function contentFolder(given: string): Promise<{ content: string; files: string[] }> {
  const content = resolve(given);
  if (!existsSync(content) || !statSync(content).isDirectory()) throw new UsageError(`no such folder: ${given}`);
  const { files } = await findRecordFiles([content]);
  if (files.length === 0)
    throw new PathError(`${given} holds no records (*.yaml or *.yml files); is it the right folder?`);
  return { content, files };
}
