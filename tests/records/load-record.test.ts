/** The loader's public API: ids, when a record is handed on, files, and placing engine diagnostics. */
import { mkdir, mkdtemp, rm, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { diagnostic } from '../../src/model/diagnostic.ts';
import * as records from '../../src/records/index.ts';
import { findRecordFiles, loadRecordFile, loadRecordSource, placeDiagnostics } from '../../src/records/index.ts';

const valid = 'title: t\nsystem: fixture\nstatus: proposed\nsteps:\n  - equation: A + B -> C\n';

describe('the public API', () => {
  it('exports exactly these values', () => {
    expect(Object.keys(records).sort()).toEqual([
      'MAX_ALIAS_COUNT',
      'MAX_ID_LENGTH',
      'closestName',
      'contentFolderOf',
      'createLocator',
      'createValidator',
      'describeSchemaError',
      'describeSchemaErrors',
      'editDistance',
      'findAliasProblems',
      'findRecordFiles',
      'formatRecordFile',
      'formatRecordText',
      'isPublishable',
      'isRecordId',
      'keyText',
      'loadRecordFile',
      'loadRecordSource',
      'loadSystemFile',
      'loadSystemSource',
      'parseRecordYaml',
      'pathWords',
      'placeDiagnostics',
      'readObservationData',
      'recordFileProblems',
      'recordId',
      'recordIdProblem',
      'recordPath',
      'recordSchema',
      'recordValidator',
      'resolveDataPath',
      'sourceShift',
      'suggestRecordId',
    ]);
  });
});

describe('loadRecordSource', () => {
  it('takes the id from the file name without .yaml or .yml', () => {
    expect(loadRecordSource('content/mechanisms/halide-route.yaml', valid).id).toBe('halide-route');
    expect(loadRecordSource('halide-route.yml', valid).id).toBe('halide-route');
  });

  it('hands on the record when the YAML, the schema and the id are all valid', () => {
    const loaded = loadRecordSource('halide-route.yaml', valid);
    expect(loaded.diagnostics).toEqual([]);
    expect(loaded.record?.steps[0]?.equation).toBe('A + B -> C');
    expect(loaded.source).toBe(valid);
  });

  it('rejects a file name that is not a valid id, at line 1', () => {
    const loaded = loadRecordSource('Halide_Route.yaml', valid);
    expect(loaded.diagnostics).toMatchObject([{ rule: 'record/schema', line: 1, column: 1, actual: 'Halide_Route' }]);
    expect(loaded.diagnostics[0]?.note).toContain('halide-route.yaml');
    expect(loaded.record).toBeUndefined();
  });

  it('does not validate a document with YAML errors (its data would be partial)', () => {
    const loaded = loadRecordSource('broken.yaml', 'title: [unclosed\nsteps: 1\n');
    expect(loaded.diagnostics.map((d) => d.rule)).toEqual(['record/yaml']);
  });

  it('keeps the record when YAML only warns', () => {
    const loaded = loadRecordSource('tagged.yaml', valid.replace('title: t', 'title: !note t'));
    expect(loaded.diagnostics).toMatchObject([{ rule: 'record/yaml', severity: 'warning', line: 1 }]);
    expect(loaded.record?.title).toBe('t');
  });

  it('never throws on odd input', () => {
    for (const source of ['', '---', '...', '[', '"', '&a', '*a', '? ? ?', '\u0000', 'a: !!binary x', '__proto__: 1']) {
      expect(() => loadRecordSource('odd.yaml', source)).not.toThrow();
      expect(loadRecordSource('odd.yaml', source).record).toBeUndefined();
    }
  });
});

describe('placeDiagnostics', () => {
  const source = 'title: t\nsystem: fixture\nstatus: proposed\nsteps:\n  - equation: "A + B -> C"\n    k: 2\n';
  const loaded = loadRecordSource('placed.yaml', source);

  it('sets file, line and column from the path and offset', () => {
    const found = diagnostic('balance/atoms', 'error', 'atoms do not balance', {
      path: ['steps', 0, 'equation'],
      offset: 4,
    });
    expect(placeDiagnostics(loaded, [found])).toEqual([
      { ...found, file: 'placed.yaml', line: 5, column: 20, endLine: 5, endColumn: 27 },
    ]);
  });

  it('falls back to the nearest ancestor for a path that is not written', () => {
    const found = diagnostic('step/units', 'warning', 'no units', { path: ['steps', 0, 'k_rev'] });
    expect(placeDiagnostics(loaded, [found])[0]).toMatchObject({ line: 5, column: 5 });
  });

  it('keeps positions that are already set, and diagnostics without a path get the file only', () => {
    const placed = diagnostic('record/yaml', 'error', 'x', { line: 9, column: 2 });
    const unplaced = diagnostic('route/ambiguous', 'warning', 'y');
    expect(placeDiagnostics(loaded, [placed, unplaced])).toEqual([
      { ...placed, file: 'placed.yaml' },
      { ...unplaced, file: 'placed.yaml' },
    ]);
  });
});

describe('files', () => {
  let dir = '';
  beforeAll(async () => {
    dir = await mkdtemp(join(tmpdir(), 'mechatlas-records-'));
    await mkdir(join(dir, 'nested'));
    for (const name of ['b-route.yaml', 'a-route.yml', 'notes.md', 'nested/c-route.yaml']) {
      await writeFile(join(dir, name), valid);
    }
  });
  afterAll(async () => {
    await rm(dir, { recursive: true, force: true });
  });

  it('expands a directory to its record files, sorted, not recursing', async () => {
    const found = await findRecordFiles([dir]);
    expect(found).toEqual({
      files: [join(dir, 'a-route.yml'), join(dir, 'b-route.yaml')],
      missing: [],
    });
  });

  it('takes named files as given and returns missing targets', async () => {
    const named = join(dir, 'nested/c-route.yaml');
    const found = await findRecordFiles([named, join(dir, 'absent'), dir]);
    expect(found.files).toEqual([named, join(dir, 'a-route.yml'), join(dir, 'b-route.yaml')]);
    expect(found.missing).toEqual([join(dir, 'absent')]);
  });

  it('loads a file, and turns an unreadable one into a record/yaml diagnostic', async () => {
    const loaded = await loadRecordFile(join(dir, 'b-route.yaml'));
    expect(loaded).toMatchObject({
      id: 'b-route',
      file: join(dir, 'b-route.yaml'),
      diagnostics: [],
    });
    const missing = await loadRecordFile(join(dir, 'absent.yaml'));
    expect(missing).toMatchObject({
      id: 'absent',
      diagnostics: [{ rule: 'record/yaml', severity: 'error' }],
    });
    expect(missing.record).toBeUndefined();
    expect(missing.locate(['steps'])).toBeUndefined();
  });
});
