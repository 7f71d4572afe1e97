/** Every record fixture states its expected diagnostics in its header; the loader must match exactly. */
import { readdirSync, readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { loadRecordFile } from '../../src/records/index.ts';
import { readExpectations } from '../fixture-expectations.ts';

const notOkDir = fileURLToPath(new URL('../fixtures/not-ok/', import.meta.url));
const okDir = fileURLToPath(new URL('../fixtures/ok/', import.meta.url));
const yamlFiles = (dir: string, prefix = ''): string[] =>
  readdirSync(dir)
    .filter((name) => name.startsWith(prefix) && /\.ya?ml$/.test(name))
    .sort();

interface Found {
  rule: string;
  line: number | undefined;
}

const byPosition = (a: Found, b: Found): number => (a.line ?? 0) - (b.line ?? 0) || a.rule.localeCompare(b.rule);

describe('not-ok record fixtures', () => {
  const names = yamlFiles(notOkDir, 'record-');

  it('cover the record problems the loader must catch', () => {
    expect(names.length).toBeGreaterThanOrEqual(40);
  });

  it.each(names)('%s', { timeout: 10_000 }, async (name) => {
    const loaded = await loadRecordFile(`${notOkDir}${name}`);
    // Read as Latin-1: the header is ASCII even in a fixture whose later bytes are not UTF-8.
    const expected = readExpectations(readFileSync(`${notOkDir}${name}`, 'latin1'));
    expect(expected.length).toBeGreaterThan(0);
    const actual = loaded.diagnostics
      .filter((d) => d.rule.startsWith('record/'))
      .map((d): Found => ({ rule: d.rule, line: d.line }));
    expect(actual.sort(byPosition)).toEqual([...expected].sort(byPosition));
    expect(loaded.record).toBeUndefined();
    for (const d of loaded.diagnostics) expect(d.file).toBe(`${notOkDir}${name}`);
  });
});

describe('ok fixtures', () => {
  it.each(yamlFiles(okDir))('%s loads without record diagnostics', async (name) => {
    const loaded = await loadRecordFile(`${okDir}${name}`);
    expect(loaded.diagnostics.filter((d) => d.rule.startsWith('record/'))).toEqual([]);
    expect(loaded.record).toBeDefined();
  });

  it('include a record in label notation', () => {
    const sources = yamlFiles(okDir, 'record-').map((n) => readFileSync(`${okDir}${n}`, 'utf8'));
    expect(sources.some((s) => /^notation: labels$/m.test(s))).toBe(true);
  });
});
