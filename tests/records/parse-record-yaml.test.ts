/** YAML problems become record/yaml diagnostics with positions; nothing throws. */
import { describe, expect, it } from 'vitest';
import { parseRecordYaml } from '../../src/records/index.ts';

const yamlProblems = (source: string) =>
  parseRecordYaml(source).diagnostics.map((d) => ({
    rule: d.rule,
    severity: d.severity,
    line: d.line,
    column: d.column,
  }));

describe('parseRecordYaml', () => {
  it('reads plain data and keeps ISO dates as text', () => {
    const parsed = parseRecordYaml('added: 2026-03-01\nk: 1.1e-2\nrds: yes\n');
    expect(parsed.data).toEqual({ added: '2026-03-01', k: 0.011, rds: 'yes' });
    expect(parsed.diagnostics).toEqual([]);
  });

  it('reports a duplicate key at the second occurrence', () => {
    expect(yamlProblems('a: 1\nb: 2\na: 3\n')).toEqual([
      { rule: 'record/yaml', severity: 'error', line: 3, column: 1 },
    ]);
  });

  it('treats keys that read the same once loaded as duplicates', () => {
    expect(yamlProblems("1: a\n'1': b\n")).toMatchObject([{ rule: 'record/yaml', line: 2 }]);
  });

  it('reports a tab used for indentation', () => {
    expect(yamlProblems('a:\n\t- 1\n')).toMatchObject([{ rule: 'record/yaml', severity: 'error', line: 2 }]);
  });

  it('reports more than one document', () => {
    expect(yamlProblems('a: 1\n---\nb: 2\n')).toMatchObject([{ rule: 'record/yaml', line: 2 }]);
  });

  it('reports one error per line when one mistake sets off several', () => {
    expect(yamlProblems('a: 1\n  b: 2\n')).toHaveLength(1);
  });

  it('warns about an unknown tag but still reads the value', () => {
    const parsed = parseRecordYaml('a: !chem H2O\n');
    expect(parsed.diagnostics).toMatchObject([{ rule: 'record/yaml', severity: 'warning', line: 1, column: 4 }]);
    expect(parsed.data).toEqual({ a: 'H2O' });
  });

  it('reports an alias without an anchor instead of throwing', () => {
    const parsed = parseRecordYaml('a: 1\nb: *missing\n');
    expect(parsed.diagnostics).toMatchObject([{ rule: 'record/yaml', line: 2, column: 4, actual: '*missing' }]);
    expect(parsed).not.toHaveProperty('data');
  });

  it('reports an alias inside the value it names (circular data)', () => {
    const parsed = parseRecordYaml('a: &x [1, *x]\n');
    expect(parsed.diagnostics).toMatchObject([{ rule: 'record/yaml', line: 1, column: 11 }]);
    expect(parsed).not.toHaveProperty('data');
  });

  it('accepts a few ordinary aliases', () => {
    const parsed = parseRecordYaml('T: &room 298.15 K\nb: { T: *room }\n');
    expect(parsed.diagnostics).toEqual([]);
    expect(parsed.data).toEqual({ T: '298.15 K', b: { T: '298.15 K' } });
  });

  it('stops an alias bomb and points at the first alias', () => {
    const row = (alias: string) => `[${Array(10).fill(alias).join(', ')}]`;
    const source = `a: &a ${row('x')}\nb: &b ${row('*a')}\nc: &c ${row('*b')}\nd: ${row('*c')}\n`;
    const parsed = parseRecordYaml(source);
    expect(parsed.diagnostics).toMatchObject([{ rule: 'record/yaml', severity: 'error', line: 2, column: 8 }]);
    expect(parsed).not.toHaveProperty('data');
  });

  it('reads an empty file as null data without diagnostics (the schema reports it)', () => {
    const parsed = parseRecordYaml('# nothing here\n');
    expect(parsed.diagnostics).toEqual([]);
    expect(parsed.data).toBeNull();
  });
});
