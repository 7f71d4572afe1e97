/** `check --base GITREF` reviews only the records a change touches (for pull requests). */
import { execFileSync } from 'node:child_process';
import { cpSync, mkdtempSync, writeFileSync, readFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli } from './run-cli.ts';

describe('mechatlas check --base', () => {
  it('checks only the records changed since the given commit', () => {
    const repo = mkdtempSync(join(tmpdir(), 'mechatlas-git-'));
    const git = (...args: string[]) => execFileSync('git', args, { cwd: repo, stdio: 'pipe' });
    git('init', '-q');
    git('config', 'user.email', 'test@example.invalid');
    git('config', 'user.name', 'test');
    cpSync(join(ROOT, 'tests', 'fixtures', 'ok'), join(repo, 'records'), { recursive: true });
    git('add', '.');
    git('commit', '-q', '-m', 'records');
    const changed = join(repo, 'records', 'termolecular-note.yaml');
    writeFileSync(changed, readFileSync(changed, 'utf8').replace('title: ', 'title: Revised — '));
    const { code, stdout } = runCli(['check', '--format', 'json', '--base', 'HEAD', join(repo, 'records')], repo);
    expect(code).toBe(0);
    expect(JSON.parse(stdout).records.map((r: { id: string }) => r.id)).toEqual(['termolecular-note']);
    expect(runCli(['check', '--base', 'no-such-ref', join(repo, 'records')], repo).code).toBe(2);
  });

  it('with --format markdown, shows each changed record before → after, a new record as new, a removed one as removed', () => {
    const repo = mkdtempSync(join(tmpdir(), 'mechatlas-git-'));
    const git = (...args: string[]) => execFileSync('git', args, { cwd: repo, stdio: 'pipe' });
    git('init', '-q');
    git('config', 'user.email', 'test@example.invalid');
    git('config', 'user.name', 'test');
    cpSync(join(ROOT, 'tests', 'fixtures', 'ok'), join(repo, 'records'), { recursive: true });
    git('add', '.');
    git('commit', '-q', '-m', 'records');
    // Only the status changes; the chemistry stays as it was.
    const changed = join(repo, 'records', 'termolecular-note.yaml');
    const text = readFileSync(changed, 'utf8');
    expect(text).toContain('O + O2 + M -> O3 + M');
    writeFileSync(changed, text.replace('status: proposed', 'status: favoured'));
    writeFileSync(
      join(repo, 'records', 'added.yaml'),
      'title: Added\nsystem: s\nstatus: proposed\nnotation: labels\nsteps:\n  - equation: A -> B\n',
    );
    git('rm', '-q', join('records', 'record-minimal.yaml'));
    git('add', '.');
    const { code, stdout } = runCli(['check', '--format', 'markdown', '--base', 'HEAD', join(repo, 'records')], repo);
    expect(code).toBe(0);
    expect(stdout.split('\n')[0]).toMatch(/^\*\*mechatlas review\*\* — ✓ 2 changed records checked: nothing blocks/);
    expect(stdout).toContain('Compared with `HEAD`: 2 records changed, 1 of them new; 1 record removed.');
    expect(stdout).toMatch(/<summary>− removed · <b>.*<\/b> · <code>.*record-minimal\.yaml<\/code><\/summary>/);
    expect(stdout).toContain('| **status** ✎ | `proposed` | **`favoured`** |');
    expect(stdout).toContain('| overall equation | `O + O2 -> O3` | `O + O2 -> O3` |');
    expect(stdout).toMatch(/<summary>.*<b>Added<\/b>.*· new record<\/summary>/);
  });
});
