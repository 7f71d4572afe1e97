/**
 * Reaction-system records (content/systems/<system>.yaml): a title, the overall change and a
 * description for the page that compares a system's rivals. Read like mechanism records — YAML
 * with positions, then schemas/system.schema.json — so a mistake is a `record/yaml` or
 * `record/schema` diagnostic at its line and column, never a crash.
 */
import { Ajv2020 } from 'ajv/dist/2020.js';
import type { ValidateFunction } from 'ajv';
import { basename } from 'node:path';
import schema from '../../schemas/system.schema.json' with { type: 'json' };
import { diagnostic, type Diagnostic } from '../model/index.ts';
import { parseRecordYaml } from './parse-record-yaml.ts';
import { readRecordText } from './read-record-text.ts';
import { describeSchemaErrors } from './schema-messages.ts';

/** What a system record says (schemas/system.schema.json). */
export interface SystemRecord {
  title: string;
  overall?: string;
  description?: string;
}

/** One system file as read: the system it names (its file name), and the record when valid. */
export interface LoadedSystemRecord {
  system: string;
  file: string;
  record?: SystemRecord;
  diagnostics: Diagnostic[];
}

let validator: ValidateFunction<SystemRecord> | undefined;

function validate(): ValidateFunction<SystemRecord> {
  validator ??= new Ajv2020({ allErrors: true, strict: true, verbose: true }).compile<SystemRecord>(schema);
  return validator;
}

/** Loads a system record from its text; pure. The system's slug is the file's base name. */
export function loadSystemSource(file: string, source: string): LoadedSystemRecord {
  const system = basename(file).replace(/\.ya?ml$/i, '');
  const parsed = parseRecordYaml(source);
  const diagnostics: Diagnostic[] = parsed.diagnostics.map((d) => ({ ...d, file }));
  if ('data' in parsed) {
    const check = validate();
    if (!check(parsed.data)) {
      for (const problem of describeSchemaErrors(check.errors ?? [], parsed.data)) {
        const at = problem.at === 'key' ? parsed.locator.locateKey(problem.path) : parsed.locator.locate(problem.path);
        diagnostics.push(diagnostic('record/schema', 'error', problem.message, { path: problem.path, file, ...at }));
      }
    }
  }
  diagnostics.sort((a, b) => (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0));
  if (diagnostics.some((d) => d.severity === 'error') || !('data' in parsed)) return { system, file, diagnostics };
  return { system, file, record: parsed.data as SystemRecord, diagnostics };
}

/** Reads and loads a system record file (a regular UTF-8 file of a sane size). */
export async function loadSystemFile(path: string): Promise<LoadedSystemRecord> {
  const read = await readRecordText(path);
  const system = basename(path).replace(/\.ya?ml$/i, '');
  if ('problem' in read) return { system, file: path, diagnostics: [read.problem] };
  return loadSystemSource(path, read.text);
}
