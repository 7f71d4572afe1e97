/** Reading observation data: headers, CSV cell positions, the content folder, units and the engine's conversion. */
import { mkdirSync, mkdtempSync, symlinkSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { readKineticData } from '../../src/engine/index.ts';
import { loadRecordSource, readObservationData, resolveDataPath } from '../../src/records/index.ts';
import { readDataHeader } from '../../src/records/read-data-header.ts';
import { parseDataCsv } from '../../src/records/parse-data-csv.ts';

const record = (data: string) =>
  loadRecordSource(
    'content/mechanisms/data-case.yaml',
    `title: data case\nsystem: data-case\nstatus: proposed\nnotation: labels\nsteps:\n  - equation: A + B -> P\nobservations:\n  - id: run-1\n    data:\n${data}`,
  );

describe('data column headers', () => {
  it('read "name / unit", "name (unit)" and "name [unit]"; a bare name has no unit', () => {
    expect(readDataHeader('H2O2 / mM')).toEqual({ name: 'H2O2', unit: 'mM' });
    expect(readDataHeader('rate (µM s^-1)')).toEqual({ name: 'rate', unit: 'µM s^-1' });
    expect(readDataHeader('t [min]')).toEqual({ name: 't', unit: 'min' });
    expect(readDataHeader('u(rate)')).toEqual({ name: 'u(rate)' });
    expect(readDataHeader('[Co(NH3)6]3+ / mM')).toEqual({ name: '[Co(NH3)6]3+', unit: 'mM' });
    expect(readDataHeader('rate in M/s')).toHaveProperty('problem');
    expect(readDataHeader('  ')).toHaveProperty('problem');
  });
});

describe('CSV cells and their places', () => {
  it('gives each cell its line and column, past comments, blank lines, a byte-order mark and quotes', () => {
    const text = '\uFEFF# invented\nA / µM, rate / M s^-1\n\n 1.5 ,"2,0"\nµ,3\n';
    const { rows, diagnostics } = parseDataCsv('x.csv', new TextEncoder().encode(text));
    expect(diagnostics).toEqual([]);
    const places = rows.map((row) => row.map((c) => [c.text, c.at.line, c.at.column]));
    expect(places).toEqual([
      [
        ['A / µM', 2, 1],
        ['rate / M s^-1', 2, 9],
      ],
      [
        ['1.5', 4, 2],
        ['2,0', 4, 7],
      ],
      [
        ['µ', 5, 1],
        ['3', 5, 3],
      ],
    ]);
  });
});

describe('the content folder', () => {
  const root = mkdtempSync(join(tmpdir(), 'mechatlas-data-'));
  mkdirSync(join(root, 'content', 'mechanisms'), { recursive: true });
  mkdirSync(join(root, 'content', 'data'));
  writeFileSync(join(root, 'content', 'data', 'ok.csv'), 'A / M, rate / M s^-1\n');
  writeFileSync(join(root, 'secret.csv'), 'x\n');
  symlinkSync(join(root, 'secret.csv'), join(root, 'content', 'data', 'link.csv'));
  const recordFile = join(root, 'content', 'mechanisms', 'r.yaml');

  it('accepts a path beside the records, relative to the record file', async () => {
    expect(await resolveDataPath(recordFile, '../data/ok.csv')).toEqual({
      path: join(root, 'content', 'data', 'ok.csv'),
    });
  });

  it('refuses absolute paths, paths that climb out, and links that lead out', async () => {
    expect(await resolveDataPath(recordFile, join(root, 'content', 'data', 'ok.csv'))).toHaveProperty('problem');
    expect(await resolveDataPath(recordFile, '../../secret.csv')).toHaveProperty('problem');
    expect(await resolveDataPath(recordFile, '../data/link.csv')).toHaveProperty('problem');
  });
});

describe('inline tables', () => {
  it('take units from the units map, and an uncertainty takes its column’s unit', async () => {
    const loaded = record(
      '      kind: initial_rates\n      units: { A: mM, B: mM, rate: µM s^-1 }\n      columns: [A, B, rate, u(rate)]\n      rows:\n        - [1, 1, 0.5, 0.02]\n        - [2, 1, 1.0, 0.03]\n        - [1, 2, 1.0, 0.03]\n',
    );
    const { tables, diagnostics } = await readObservationData(loaded);
    expect(diagnostics).toEqual([]);
    expect(tables[0]!.columns.map((c) => [c.name, c.unit])).toEqual([
      ['A', 'mM'],
      ['B', 'mM'],
      ['rate', 'µM s^-1'],
      ['u(rate)', 'µM s^-1'],
    ]);
    const { data } = readKineticData(tables[0]!, ['A', 'B', 'P']);
    expect(data).toMatchObject({
      kind: 'initial_rates',
      species: ['A', 'B'],
      concentrations: [
        [1e-3, 1e-3],
        [2e-3, 1e-3],
        [1e-3, 2e-3],
      ],
    });
    expect((data as { rates: number[] }).rates[0]).toBeCloseTo(5e-7, 18);
    expect((data as { rateUncertainties: number[] }).rateUncertainties[0]).toBeCloseTo(2e-8, 18);
  });

  it('report a unit given twice differently, and a table given both inline and as a file', async () => {
    const twice = await readObservationData(
      record(
        '      kind: initial_rates\n      units: { A: M }\n      columns: [A / mM, B / mM, rate / M s^-1]\n      rows:\n        - [1, 1, 1]\n        - [2, 1, 2]\n',
      ),
    );
    expect(twice.diagnostics.map((d) => [d.rule, d.line])).toEqual([['data/units', 11]]);
    const both = await readObservationData(
      record('      kind: initial_rates\n      file: x.csv\n      columns: [A / M]\n      rows: [[1]]\n'),
    );
    expect(both.diagnostics.map((d) => [d.rule, d.line])).toEqual([['data/columns', 10]]);
  });
});

describe('the engine reads data in canonical units', () => {
  it('converts °C to K and reads the order of k from its unit', async () => {
    const loaded = record(
      '      kind: temperature_series\n      columns: [T / °C, k / cm^3 molecule^-1 s^-1]\n      rows:\n        - [25, 1.0e-12]\n        - [35, 2.0e-12]\n        - [45, 3.9e-12]\n',
    );
    const { tables } = await readObservationData(loaded);
    const { data, diagnostics } = readKineticData(tables[0]!, ['A', 'B', 'P']);
    expect(diagnostics).toEqual([]);
    expect(data).toMatchObject({ kind: 'temperature_series', order: 2, constant: 'k_obs' });
    const series = data as { T: number[]; k: number[] };
    expect(series.T[0]).toBeCloseTo(298.15, 10);
    // 1e-12 cm^3 molecule^-1 s^-1 = 1e-12 × 1e-3 dm^3 × N_A mol^-1 = 6.02214076e8 M^-1 s^-1.
    expect(series.k[0]).toBeCloseTo(6.02214076e8, 0);
  });

  it('reports a column that names no species of the mechanism, and a temperature below absolute zero', async () => {
    const unknown = await readObservationData(
      record(
        '      kind: initial_rates\n      columns: [A / mM, X / mM, rate / M s^-1]\n      rows:\n        - [1, 1, 1]\n        - [2, 2, 3]\n',
      ),
    );
    expect(readKineticData(unknown.tables[0]!, ['A', 'B', 'P']).diagnostics.map((d) => d.rule)).toEqual([
      'data/columns',
    ]);
    const cold = await readObservationData(
      record(
        '      kind: temperature_series\n      columns: [T / °C, k / s^-1]\n      rows:\n        - [-300, 1]\n        - [20, 2]\n        - [30, 3]\n',
      ),
    );
    expect(readKineticData(cold.tables[0]!, ['A']).diagnostics.map((d) => [d.rule, d.line])).toEqual([
      ['data/range', 13],
    ]);
  });

  it('keeps a time course’s empty cells as not measured', async () => {
    const loaded = record(
      '      kind: time_course\n      columns: [t / min, A / mM, P / mM]\n      rows:\n        - [0, 10, 0]\n        - [5, 7, null]\n        - [10, 5, 5]\n',
    );
    const { tables, diagnostics } = await readObservationData(loaded);
    expect(diagnostics).toEqual([]);
    const { data } = readKineticData(tables[0]!, ['A', 'B', 'P']);
    expect(data).toMatchObject({ kind: 'time_course', times: [0, 300, 600], species: ['A', 'P'] });
    expect((data as { concentrations: (number | undefined)[][] }).concentrations[1]).toEqual([0.007, undefined]);
  });
});
