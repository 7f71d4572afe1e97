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
});
