/**
 * Every way a command ends, with its documented exit status (README, "Exit status"): 0 clean,
 * 1 errors found, 2 bad usage or a path that cannot be used, 3 an internal failure (see
 * tests/catalogue/internal-failure.test.ts). Failures are one line on stderr, never a stack trace.
 */
import { execFileSync } from 'node:child_process';
import { cpSync, mkdirSync, mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { ROOT, runCli, runMain, type CliRun } from './run-cli.ts';

const OK = 'tests/fixtures/ok/record-minimal.yaml';
const BAD = 'tests/fixtures/not-ok/balance-atoms.yaml';
const temp = () => mkdtempSync(join(tmpdir(), 'mechatlas-exit-'));

/** A failure said in one line (the usage text may follow a usage error), with no stack trace. */
function expectOneLine(run: CliRun): void {
  expect(run.stderr.split('\n')[0]).toMatch(/^mechatlas: \S/);
  expect(run.stderr).not.toMatch(/^\s+at /m);
}

describe('exit status 0: clean', () => {
  it.each([
    ['check a clean record', ['check', OK]],
    ['help', ['--help']],
    ['version', ['--version']],
    ['derive a clean record', ['derive', OK]],
    ['export a clean record', ['export', '--sbml', OK]],
  ])('%s', async (_what, args) => {
    expect((await runMain(args)).code).toBe(0);
  });
});

describe('exit status 1: errors found', () => {
  it.each([
    ['check', ['check', BAD]],
    ['derive', ['derive', BAD]],
    ['export of a record that cannot be derived', ['export', '--sbml', 'tests/fixtures/not-ok/equation-syntax.yaml']],
  ])('%s', async (_what, args) => {
    expect((await runMain(args)).code).toBe(1);
  });
});

describe('exit status 2: bad usage, or a path that cannot be used', () => {
  const dir = temp();
  const aFile = join(dir, 'a-file.txt');
  writeFileSync(aFile, 'not a folder\n');
  mkdirSync(join(dir, 'empty'));
  it.each([
    ['no command', []],
    ['an unknown command', ['frobnicate']],
    ['an unknown option', ['check', '--no-such-option']],
    ['an unknown format', ['check', '--format', 'xml', OK]],
    ['a missing folder', ['check', 'no/such/folder']],
    ['a folder without records', ['check', join(dir, 'empty')]],
    ['a threshold that is no number', ['check', '--approximation-threshold', 'x', OK]],
    ['derive of a missing file', ['derive', 'no/such.yaml']],
    ['derive of two files', ['derive', OK, OK]],
    ['new with an id that cannot be one', ['new', 'Bad Id', '--dir', dir]],
    ['new with an id too long', ['new', 'a'.repeat(101), '--dir', dir]],
    ['new --dir on a file', ['new', 'fine-id', '--dir', aFile]],
    ['new --dir below a file', ['new', 'fine-id', '--dir', join(aFile, 'sub')]],
    ['export without a format', ['export', OK]],
    ['export of no record', ['export', '--sbml', 'no-such-record']],
    ['export --out into a missing folder', ['export', '--sbml', OK, '--out', join(dir, 'missing', 'x.xml')]],
    ['export --out onto a folder', ['export', '--sbml', OK, '--out', dir]],
    ['export --out below a file', ['export', '--sbml', OK, '--out', join(aFile, 'x.xml')]],
    ['build from a missing folder', ['build', '--content', 'no/such/folder', '--out', join(dir, 'site')]],
    ['build from a folder without records', ['build', '--content', join(dir, 'empty'), '--out', join(dir, 'site')]],
    ['build into the content folder', ['build', '--content', 'tests/fixtures/ok', '--out', 'tests/fixtures/ok']],
    ['build into the working folder', ['build', '--content', 'tests/fixtures/ok', '--out', '.']],
    ['build into a folder above it', ['build', '--content', 'tests/fixtures/ok', '--out', '..']],
    ['build into the root', ['build', '--content', 'tests/fixtures/ok', '--out', '/']],
    ['build into a file', ['build', '--content', 'tests/fixtures/ok', '--out', aFile]],
    ['build into a folder it did not make', ['build', '--content', 'tests/fixtures/ok', '--out', dir]],
    ['build with a positional argument', ['build', 'extra']],
  ])('%s', async (_what, args) => {
    const run = await runMain(args);
    expect(run.code).toBe(2);
    if (args.length > 0) expectOneLine(run);
  });

  it('says a file-system problem in one line that names the path', async () => {
    const run = await runMain(['export', '--sbml', OK, '--out', join(dir, 'missing', 'x.xml')]);
    expect(run.stderr).toBe(
      `mechatlas: cannot write ${join(dir, 'missing', 'x.xml')}: no such file or folder (ENOENT)\n`,
    );
  });
});

describe('check --base', () => {
  it('never hands git the ref as an option: --output=<record> overwrites nothing and is bad usage', () => {
    const repo = temp();
    const git = (...args: string[]) => execFileSync('git', args, { cwd: repo, stdio: 'pipe' });
    git('init', '-q');
    git('config', 'user.email', 'test@example.invalid');
    git('config', 'user.name', 'test');
    cpSync(join(ROOT, 'tests', 'fixtures', 'ok'), join(repo, 'records'), { recursive: true });
    git('add', '.');
    git('commit', '-q', '-m', 'records');
    const victim = join(repo, 'records', 'record-minimal.yaml');
    const before = readFileSync(victim);
    for (const ref of [`--output=${victim}`, '--output=records/record-minimal.yaml', '-p', '--exec=touch x']) {
      const run = runCli(['check', `--base=${ref}`, 'records'], repo);
      expect(run.code, ref).toBe(2);
      expect(readFileSync(victim), ref).toEqual(before);
    }
    expect(runCli(['check', '--base', 'HEAD', 'records'], repo).code).toBe(0);
  });
});

describe('the compiled binary', () => {
  it('ends with a one-line message and status 2 on a file-system error, never a stack trace', () => {
    const run = runCli(['new', 'fine-id', '--dir', join(ROOT, 'package.json')]);
    expect(run.code).toBe(2);
    expectOneLine(run);
  });
});
