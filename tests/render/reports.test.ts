/**
 * The text, markdown and SARIF reports: the how-to-fix note travels with every diagnostic, steps
 * and fields are counted from 1, and the summary counts each verdict apart.
 */
import { describe, expect, it } from 'vitest';
import { pathWords } from '../../src/model/index.ts';
import type { ObservationJson, RecordReport } from '../../src/model/index.ts';
import {
  diagnosticRow,
  markdownReport,
  reportOf,
  sarifReport,
  summaryLine,
  textReport,
} from '../../src/render/index.ts';

const check = (status: string, method = 'steady_state'): ObservationJson => ({
  id: 'o1',
  species: 'S',
  method,
  observed: 1,
  tolerance: 0.1,
  basis: 'limits',
  status,
});

const record: RecordReport = {
  id: 'r1',
  file: 'content/mechanisms/r1.yaml',
  rate_laws: [{ method: 'steady_state', orders: {}, derivation: [] }],
  observations: [check('pass'), check('not_excluded'), check('not_excluded'), check('unknown'), check('fail', 'rds')],
  diagnostics: [
    {
      rule: 'rate/not-eliminable',
      severity: 'error',
      message: 'I cannot be eliminated',
      line: 7,
      column: 5,
      note: 'write step 1 as reversible (<=>)',
    },
  ],
};
const report = reportOf([record], '0.0.0');

describe('reports', () => {
  it('counts the primary law’s verdicts apart in the JSON summary', () => {
    expect(report.summary.observations).toEqual({ pass: 1, fail: 0, not_excluded: 2, unknown: 1 });
  });

  it('text: findings under the record’s title and file, the rule before the message, the note beneath', () => {
    const titled = reportOf([{ ...record, title: 'A titled record' }], '0.0.0');
    expect(textReport(titled).trimEnd().split('\n')).toEqual([
      '■ A titled record',
      '  content/mechanisms/r1.yaml',
      '',
      '  error    [rate/not-eliminable] I cannot be eliminated',
      '           at line 7, column 5',
      '           how to fix: write step 1 as reversible (<=>)',
      '',
      'Checked 1 record.',
      '1 record has an error that blocks: fix it first (exit status 1).',
      'Observed orders against the derived laws: 1 consistent, 2 not excluded, 1 no prediction.',
    ]);
  });

  it('text: the id stands for a missing title; a finding in a data file names that file', () => {
    const inData = { ...record.diagnostics[0]!, file: 'content/mechanisms/r1-rates.csv', line: 3, column: 2 };
    const text = textReport(reportOf([{ ...record, diagnostics: [inData] }], '0.0.0'));
    expect(text.split('\n').slice(0, 2)).toEqual(['■ r1', '  content/mechanisms/r1.yaml']);
    expect(text).toContain('at line 3, column 2 of content/mechanisms/r1-rates.csv');
  });

  it('text: the third severity is a note everywhere, and clean records are only counted', () => {
    const note = { rule: 'route/off-route', severity: 'info', message: 'step 3 is off the route', line: 4, column: 5 };
    const warning = { ...note, rule: 'observation/order', severity: 'warning', message: 'order in A' };
    const records: RecordReport[] = [
      { id: 'a', file: 'a.yaml', diagnostics: [note, note] },
      { id: 'b', file: 'b.yaml', diagnostics: [warning] },
      { id: 'c', file: 'c.yaml', diagnostics: [] },
    ];
    const text = textReport(reportOf(records, '0.0.0'));
    expect(text).toContain('  note     [route/off-route] step 3 is off the route');
    expect(text).not.toMatch(/\binfo\b/);
    expect(text).not.toContain('■ c');
    expect(text.trimEnd().split('\n').slice(-4)).toEqual([
      'Checked 3 records; 1 has nothing to report.',
      'Nothing blocks: no record has an error.',
      '1 warning in 1 record deserves a look.',
      '2 notes in 1 record are for information.',
    ]);
    expect(summaryLine(reportOf(records, '0.0.0'))).toBe(
      '3 records checked: nothing blocks; 1 warning in 1 record, 2 notes in 1 record',
    );
  });

  it('text: a catalogue with no findings says so in one line', () => {
    expect(textReport(reportOf([{ id: 'c', file: 'c.yaml', diagnostics: [] }], '0.0.0'))).toBe(
      'Checked 1 record: nothing to report.\n',
    );
  });

  it('one line per finding where it stands alone', () => {
    expect(diagnosticRow({ ...record.diagnostics[0]!, file: 'r1.yaml' })).toBe(
      'r1.yaml, line 7, column 5: error [rate/not-eliminable] I cannot be eliminated',
    );
  });

  it('markdown: the note in the message cell', () => {
    expect(markdownReport(report)).toContain(
      '| I cannot be eliminated<br>_how to fix:_ write step 1 as reversible (&lt;=&gt;) |',
    );
  });

  it('SARIF: the note in the message', () => {
    const log = JSON.parse(sarifReport(report));
    expect(log.runs[0].results[0].message.text).toBe('I cannot be eliminated (write step 1 as reversible (<=>))');
  });
});

describe('pathWords', () => {
  it('counts list items from 1 and names the record as a whole', () => {
    expect(pathWords([])).toBe('the record');
    expect(pathWords(['steps', 0, 'k'])).toBe('step 1, k');
    expect(pathWords(['steps', 2])).toBe('step 3');
    expect(pathWords(['steps', 1, 'energy', 'barrier'])).toBe('step 2, energy barrier');
    expect(pathWords(['observations', 0, 'orders', 'S'])).toBe('observation 1, orders S');
    expect(pathWords(['species', 'H+', 'role'])).toBe('species H+, role');
    expect(pathWords(['title'])).toBe('title');
  });
});
