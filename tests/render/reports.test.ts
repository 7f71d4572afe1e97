/**
 * The text, markdown and SARIF reports: the how-to-fix note travels with every diagnostic, steps
 * and fields are counted from 1, and the summary counts each verdict apart.
 */
import { describe, expect, it } from 'vitest';
import { pathWords } from '../../src/model/index.ts';
import type { ObservationJson, RecordReport } from '../../src/model/index.ts';
import { markdownReport, reportOf, sarifReport, textReport } from '../../src/render/index.ts';

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

  it('text: the note under its diagnostic, the verdicts counted apart in the summary line', () => {
    const lines = textReport(report).trimEnd().split('\n');
    expect(lines[0]).toBe('content/mechanisms/r1.yaml:7:5  error  I cannot be eliminated  rate/not-eliminable');
    expect(lines[1]).toBe('    how to fix: write step 1 as reversible (<=>)');
    expect(lines.at(-1)).toBe(
      '1 record checked: 1 error, 0 warnings, 0 notes; observed orders: 1 consistent, 2 not excluded, 1 no prediction',
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
