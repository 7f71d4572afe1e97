/** `mechatlas check` and `new`: in-process through main(), and once end to end through the compiled binary. */
import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { runCli, runMain } from './run-cli.ts';

describe('mechatlas check', () => {
  it('checks the demo catalogue and writes the JSON report (the compiled binary, end to end)', () => {
    const { code, stdout } = runCli(['check', '--format', 'json']);
    const report = JSON.parse(stdout);
    expect(report.tool.name).toBe('mechatlas');
    expect(report.summary.records).toBeGreaterThanOrEqual(10);
    expect(code).toBe(report.summary.errors > 0 ? 1 : 0);
    for (const record of report.records) {
      expect(record).toHaveProperty('id');
      expect(record.file).toMatch(/^content\/mechanisms\/.+\.yaml$/);
      expect(Array.isArray(record.diagnostics)).toBe(true);
    }
  });

  it('reports an unbalanced step with file, line, column and rule, and exits 1', async () => {
    const file = 'tests/fixtures/not-ok/balance-atoms.yaml';
    const { code, stdout } = await runMain(['check', file]);
    expect(code).toBe(1);
    const rows = stdout.trim().split('\n');
    expect(rows[1]).toBe('  tests/fixtures/not-ok/balance-atoms.yaml');
    expect(rows[3]).toMatch(/^ {2}error {4}\[balance\/atoms\] atoms do not balance/);
    expect(rows[4]).toMatch(/^ +at line 7, column \d+$/);
    expect(rows.at(-1)).toBe('1 record has an error that blocks: fix it first (exit status 1).');
  });

  it('checks every record even when some fail', async () => {
    const { code, stdout } = await runMain([
      'check',
      '--format',
      'json',
      'tests/fixtures/not-ok/balance-atoms.yaml',
      'tests/fixtures/ok/termolecular-note.yaml',
    ]);
    const report = JSON.parse(stdout);
    expect(code).toBe(1);
    expect(report.records.map((r: { id: string }) => r.id)).toEqual(['balance-atoms', 'termolecular-note']);
    expect(report.records[1].overall.text).toBe('O + O2 -> O3');
    expect(report.records[1].roles.M).toBe('third_body');
  });

  it('writes SARIF 2.1.0 and markdown', async () => {
    const sarif = JSON.parse(
      (await runMain(['check', '--format', 'sarif', 'tests/fixtures/not-ok/balance-charge.yaml'])).stdout,
    );
    expect(sarif.version).toBe('2.1.0');
    expect(sarif.runs[0].results[0]).toMatchObject({ ruleId: 'balance/charge', level: 'error' });
    expect(sarif.runs[0].results[0].locations[0].physicalLocation.region.startLine).toBe(6);
    const md = (await runMain(['check', '--format', 'markdown', 'tests/fixtures/not-ok/balance-charge.yaml'])).stdout;
    expect(md).toContain('`balance/charge`');
  });

  it('exits 2 on bad usage', async () => {
    expect((await runMain(['check', '--format', 'xml'])).code).toBe(2);
    expect((await runMain(['check', '--no-such-option'])).code).toBe(2);
    expect((await runMain(['check', 'no/such/folder'])).code).toBe(2);
    expect((await runMain(['frobnicate'])).code).toBe(2);
  });

  it('never crashes on a file that is not YAML at all', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'mechatlas-'));
    writeFileSync(join(dir, 'garbage.yaml'), '\u0000\u0001 ::: [unclosed\n\t- {');
    const { code, stdout, stderr } = await runMain(['check', '--format', 'json', dir]);
    expect(stderr).toBe('');
    expect(code).toBe(1);
    expect(JSON.parse(stdout).records[0].diagnostics[0].rule).toBe('record/yaml');
  });
});

describe('mechatlas new', () => {
  it('scaffolds a record that checks clean, and never overwrites', async () => {
    const dir = mkdtempSync(join(tmpdir(), 'mechatlas-'));
    expect((await runMain(['new', 'my-proposal', '--dir', dir])).code).toBe(0);
    const file = join(dir, 'my-proposal.yaml');
    expect(readFileSync(file, 'utf8')).toContain('title:');
    const check = await runMain(['check', file]);
    expect(check.code).toBe(0);
    expect(check.stdout).toBe('Checked 1 record: nothing to report.\n');
    expect((await runMain(['new', 'my-proposal', '--dir', dir])).code).toBe(2);
    expect((await runMain(['new', 'Bad Id', '--dir', dir])).code).toBe(2);
  });
});

describe('the compiled binary', () => {
  it('prints its version without a TypeScript loader', () => {
    const { code, stdout } = runCli(['--version']);
    expect(code).toBe(0);
    expect(stdout.trim()).toMatch(/^\d+\.\d+\.\d+/);
  });
});
