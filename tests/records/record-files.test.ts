/**
 * Record files that are not what they seem: a named pipe (reading it would block forever), a
 * folder named like a record, a file larger than a record ever is, an editor's lock file, and
 * files in one folder that give one id. Each is a diagnostic at once; none blocks or is skipped
 * in silence.
 */
import { execFileSync } from 'node:child_process';
import { mkdirSync, mkdtempSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { findRecordFiles, loadRecordFile, recordFileProblems } from '../../src/records/index.ts';
import { MAX_RECORD_BYTES } from '../../src/records/read-record-text.ts';
import { runMain } from '../cli/run-cli.ts';

const valid = 'title: t\nsystem: fixture\nstatus: proposed\nnotation: labels\nsteps:\n  - equation: A -> B\n';

describe('record files', () => {
  const dir = mkdtempSync(join(tmpdir(), 'mechatlas-files-'));

  it('reports a named pipe without waiting for a writer', { timeout: 10_000 }, async () => {
    const pipe = join(dir, 'pipe.yaml');
    execFileSync('mkfifo', [pipe]);
    const loaded = await loadRecordFile(pipe);
    expect(loaded.diagnostics).toEqual([
      expect.objectContaining({
        rule: 'record/file',
        severity: 'error',
        message: 'this is a named pipe, not a record file',
      }),
    ]);
    // Listed from its folder too, so a check of the folder says so rather than skipping it.
    expect((await findRecordFiles([dir])).files).toContain(pipe);
    const run = await runMain(['check', dir]);
    expect(run.code).toBe(1);
    expect(run.stdout).toContain('record/file');
  });

  it('reports a folder named like a record', async () => {
    mkdirSync(join(dir, 'folder.yaml'));
    const loaded = await loadRecordFile(join(dir, 'folder.yaml'));
    expect(loaded.diagnostics[0]).toMatchObject({
      rule: 'record/file',
      message: 'this is a folder, not a record file',
    });
  });

  it('reads no more than the size cap of a file larger than a record is', async () => {
    const big = join(dir, 'big.yaml');
    writeFileSync(big, valid + `notes: |\n${'  filler\n'.repeat(MAX_RECORD_BYTES / 8)}`);
    const loaded = await loadRecordFile(big);
    expect(loaded.record).toBeUndefined();
    expect(loaded.diagnostics[0]).toMatchObject({ rule: 'record/file', line: 1 });
    expect(loaded.diagnostics[0]!.message).toMatch(/at most 1,048,576/);
    expect(loaded.source).toBe('');
  });

  it('follows a link to a record, and leaves out an editor lock file', async () => {
    const linked = mkdtempSync(join(tmpdir(), 'mechatlas-links-'));
    writeFileSync(join(linked, 'target.txt'), valid);
    symlinkSync(join(linked, 'target.txt'), join(linked, 'linked.yaml'));
    symlinkSync('user@host.1234', join(linked, '.#linked.yaml'));
    expect((await findRecordFiles([linked])).files).toEqual([join(linked, 'linked.yaml')]);
    expect((await loadRecordFile(join(linked, 'linked.yaml'))).record).toBeDefined();
  });

  it('names both files that give one id, and lets neither through', async () => {
    const twins = mkdtempSync(join(tmpdir(), 'mechatlas-twins-'));
    for (const name of ['same.yaml', 'same.yml', 'same.YAML', 'other.yaml']) writeFileSync(join(twins, name), valid);
    const loaded = await loadRecordFile(join(twins, 'same.yml'));
    expect(loaded.record).toBeUndefined();
    expect(loaded.diagnostics).toEqual([
      expect.objectContaining({
        rule: 'record/duplicate-id',
        message: expect.stringMatching(/^same\.yml and same\.YAML and same\.yaml both/),
      }),
    ]);
    expect(await recordFileProblems(join(twins, 'other.yaml'))).toEqual([]);
  });
});
