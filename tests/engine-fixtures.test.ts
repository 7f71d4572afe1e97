/**
 * Rule fixtures that double as documentation: every not-ok record names the rule and line it
 * must produce (`# expect: rule line N`), notes (info) included where it names their rule; every
 * ok record checks without errors.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { dirname, relative, resolve } from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkRecordFile } from '../src/catalogue/check-records.ts';
import { readExpectations } from './fixture-expectations.ts';

const dir = (kind: string) => `tests/fixtures/${kind}`;
const yamlFiles = (kind: string) => readdirSync(dir(kind)).filter((f) => /\.ya?ml$/.test(f));

describe('not-ok fixtures produce their expected rule and line', () => {
  // Each input of the bad-input corpus must finish well within 10 s (the test's own limit).
  for (const name of yamlFiles('not-ok').filter((f) => !f.startsWith('record-'))) {
    it(name.length > 60 ? `${name.slice(0, 40)}…(${name.length} characters)` : name, { timeout: 10_000 }, async () => {
      const file = `${dir('not-ok')}/${name}`;
      const expected = readExpectations(readFileSync(file, 'utf8'));
      expect(expected.length).toBeGreaterThan(0);
      const { diagnostics } = await checkRecordFile(file);
      // A diagnostic in another file (a CSV beside the record) is named relative to the fixture.
      const elsewhere = (f: string | undefined) =>
        f === undefined || resolve(f) === resolve(file) ? {} : { file: relative(dirname(file), f) };
      // Notes (info) count only where the fixture expects that rule: a fixture may document a note.
      const noted = new Set(expected.map((e) => e.rule));
      const found = diagnostics
        .filter((d) => d.severity !== 'info' || noted.has(d.rule))
        .map((d) => ({ rule: d.rule, line: d.line, ...elsewhere(d.file) }));
      expect(found).toEqual(expect.arrayContaining(expected));
      expect(found).toHaveLength(expected.length);
    });
  }
});

describe('ok fixtures check without errors', () => {
  for (const name of yamlFiles('ok')) {
    it(name, async () => {
      const { diagnostics } = await checkRecordFile(`${dir('ok')}/${name}`);
      expect(diagnostics.filter((d) => d.severity === 'error')).toEqual([]);
    });
  }
});
