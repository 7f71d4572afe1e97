/**
 * The schema message formatter. Positions and structured fields are pinned; of the wording only
 * the parts a reader acts on (the suggested name, the allowed values) are checked.
 */
import { describe, expect, it } from 'vitest';
import {
  createValidator,
  describeSchemaErrors,
  loadRecordSource,
  pathWords,
  recordPath,
} from '../../src/records/index.ts';
import type { SchemaProblem } from '../../src/records/index.ts';

const validate = createValidator();

function problems(data: unknown): SchemaProblem[] {
  return validate(data) ? [] : describeSchemaErrors(validate.errors ?? [], data);
}

const base = { title: 't', system: 'fixture', status: 'proposed', steps: [{ equation: 'A -> B' }] };

describe('describeSchemaErrors', () => {
  it('accepts a minimal record', () => {
    expect(problems(base)).toEqual([]);
  });

  it('points an unknown field at its key and suggests the closest known field', () => {
    const [problem, ...rest] = problems({ ...base, steps: [{ equation: 'A -> B', rsd: true }] });
    expect(rest).toEqual([]);
    expect(problem).toMatchObject({
      path: ['steps', 0, 'rsd'],
      at: 'key',
      actual: 'rsd',
      expected: 'rds',
    });
    expect(problem?.message).toContain("'rds'");
  });

  it('lists the known fields when no name is close', () => {
    const [problem] = problems({ ...base, colour: 'red' });
    expect(problem).toMatchObject({ path: ['colour'], at: 'key' });
    expect(problem?.expected).toEqual(expect.arrayContaining(['title', 'steps', 'notes']));
    expect(problem?.message).not.toContain('did you mean');
  });

  it('points a missing required field at the mapping that lacks it', () => {
    const [problem] = problems({ ...base, steps: [{ equation: 'A -> B' }, { label: 'two' }] });
    expect(problem).toMatchObject({ path: ['steps', 1], at: 'value', expected: 'equation' });
  });

  it('names the allowed values of an enum and suggests a near miss', () => {
    const [problem] = problems({ ...base, status: 'favored' });
    expect(problem).toMatchObject({ path: ['status'], actual: 'favored' });
    expect(problem?.expected).toEqual(['proposed', 'favoured', 'disfavoured', 'withdrawn']);
    expect(problem?.message).toContain('proposed, favoured, disfavoured, withdrawn');
    expect(problem?.message).toContain("'favoured'");
  });

  it('gives one problem for a stoichiometric number that is both negative and fractional', () => {
    const found = problems({ ...base, steps: [{ equation: 'A -> B', times: -1.5 }] });
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ path: ['steps', 0, 'times'], actual: -1.5 });
  });

  it('says the same thing for a negative and for a fractional stoichiometric number', () => {
    const negative = problems({ ...base, steps: [{ equation: 'A -> B', times: -1 }] });
    const fraction = problems({ ...base, steps: [{ equation: 'A -> B', times: 0.5 }] });
    expect(negative[0]?.message).toBe(fraction[0]?.message);
  });

  it('folds the branches of "at least one of doi, url, citation" into one problem', () => {
    const found = problems({ ...base, references: [{ note: 'no source given' }] });
    expect(found).toHaveLength(1);
    expect(found[0]).toMatchObject({ path: ['references', 0], at: 'value' });
    expect(found[0]?.message).toMatch(/doi.*url.*citation/);
  });

  it('reports a bad species symbol at the key, once', () => {
    const found = problems({ ...base, species: { 'H2 O': { name: 'water' } } });
    expect(found).toEqual([expect.objectContaining({ path: ['species', 'H2 O'], at: 'key' })]);
  });

  it('reports a repeated list item at the repeat', () => {
    const [problem] = problems({ ...base, tags: ['a', 'b', 'a'] });
    expect(problem).toMatchObject({ path: ['tags', 2] });
  });

  it.each([
    ['a wrong type', { tags: 'aqueous' }, ['tags'], 'array'],
    [
      'a quantity that is neither text nor a number',
      { steps: [{ equation: 'A -> B', k: true }] },
      ['steps', 0, 'k'],
      ['string', 'number'],
    ],
    ['a flag written yes', { steps: [{ equation: 'A -> B', rds: 'yes' }] }, ['steps', 0, 'rds'], 'boolean'],
  ])('reports %s with the expected type', (_name, change, path, type) => {
    const [problem] = problems({ ...base, ...change });
    expect(problem).toMatchObject({ path, at: 'value', expected: type });
  });

  it.each([
    ['a system that is not a slug', { system: 'Peroxide Route' }, ['system']],
    ['an observation id that is not a slug', { observations: [{ id: 'Run 1' }] }, ['observations', 0, 'id']],
    [
      'a DOI with its resolver prefix',
      { references: [{ doi: 'https://doi.org/10.1000/x' }] },
      ['references', 0, 'doi'],
    ],
    ['an impossible date', { added: '2026-02-30' }, ['added']],
    ['an empty title', { title: '' }, ['title']],
    ['an empty list of steps', { steps: [] }, ['steps']],
    ['a step label with spaces', { steps: [{ equation: 'A -> B', label: 'step one' }] }, ['steps', 0, 'label']],
    ['an InChI without its prefix', { species: { A: { inchi: '1S/H2O/h1H2' } } }, ['species', 'A', 'inchi']],
  ])('reports %s at the value', (_name, change, path) => {
    expect(problems({ ...base, ...change })).toEqual([expect.objectContaining({ path, at: 'value' })]);
  });

  it('reports a document that is not a mapping at the root', () => {
    expect(problems(['a', 'b'])).toEqual([expect.objectContaining({ path: [], expected: 'object' })]);
    expect(problems(null)).toEqual([expect.objectContaining({ path: [], expected: 'object' })]);
  });

  it('writes every message as a lower-case phrase that starts with the path', () => {
    const found = problems({ ...base, status: 'x', tags: 'y', steps: [{ rsd: 1, times: -1 }] });
    for (const problem of found) expect(problem.message.startsWith(pathWords(problem.path.slice(0, 2)))).toBe(true);
  });
});

describe('recordPath', () => {
  it('decodes a JSON Pointer, with list indices as numbers', () => {
    const data = { steps: [{ k: 1 }], 'a/b': { '~x': 1 } };
    expect(recordPath('/steps/0/k', data)).toEqual(['steps', 0, 'k']);
    expect(recordPath('/a~1b/~0x', data)).toEqual(['a/b', '~x']);
    expect(recordPath('', data)).toEqual([]);
  });
});

describe('schema diagnostics from loadRecordSource', () => {
  it('carry rule, severity, path and position', () => {
    const source = 'title: t\nsystem: fixture\nstatus: maybe\nsteps:\n  - equation: A -> B\n';
    const loaded = loadRecordSource('fixture.yaml', source);
    expect(loaded.diagnostics).toEqual([
      expect.objectContaining({
        rule: 'record/schema',
        severity: 'error',
        path: ['status'],
        file: 'fixture.yaml',
        line: 3,
        column: 9,
      }),
    ]);
    expect(loaded.record).toBeUndefined();
  });

  it('come in source order, not schema order', () => {
    const source = 'title: t\nsystem: Bad\nstatus: maybe\nsteps:\n  - equation: A -> B\n    rsd: 1\n';
    const lines = loadRecordSource('fixture.yaml', source).diagnostics.map((d) => d.line);
    expect(lines).toEqual([2, 3, 6]);
  });
});
