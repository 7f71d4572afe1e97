/**
 * `mechatlas fmt` in memory: every value and every comment survives, fields come in the schema's
 * order, numbers and dates stay as written, formatting twice equals formatting once, and a file
 * that does not read as YAML is never given a text. Data and comments are compared through
 * yaml's own parser and lexer, not through the formatter's code.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { Document, isScalar, Lexer, parse, visit, type YAMLMap } from 'yaml';
import { formatRecordText } from '../../src/records/index.ts';

const folders = ['content/mechanisms', 'tests/fixtures/ok', 'tests/fixtures/not-ok'];
const files = folders.flatMap((dir) =>
  readdirSync(dir)
    .filter((f) => /\.ya?ml$/.test(f))
    .map((f) => join(dir, f)),
);

/** Every comment of a YAML text, as the lexer sees it (wherever the document attaches it). */
function comments(text: string): string[] {
  return [...new Lexer().lex(text)]
    .filter((token) => token.startsWith('#'))
    .map((c) => c.trim())
    .sort();
}

/** The data of a YAML text, or undefined where it does not parse. */
function data(text: string): unknown {
  try {
    return parse(text, { uniqueKeys: true });
  } catch {
    return undefined;
  }
}

describe('fmt keeps every value and comment', () => {
  it.each(files)('%s', (file) => {
    const source = readFileSync(file, 'utf8');
    const { text, diagnostics } = formatRecordText(source, file);
    if (text === undefined) {
      // Only a file that does not parse (or reads past what a record may hold) is refused, with a position.
      expect(diagnostics.length).toBeGreaterThan(0);
      for (const d of diagnostics)
        expect(d).toMatchObject({ file, line: expect.any(Number), column: expect.any(Number) });
      expect(diagnostics.some((d) => d.rule === 'internal/failure')).toBe(false);
      return;
    }
    expect(data(text)).toEqual(data(source));
    expect(comments(text)).toEqual(comments(source));
    expect(formatRecordText(text, file).text).toBe(text);
  });

  it('formats every demo record', () => {
    for (const file of files.filter((f) => f.startsWith('content/')))
      expect(formatRecordText(readFileSync(file, 'utf8')).text, file).toBeDefined();
  });
});

describe('fmt layout', () => {
  const messy = [
    '# A record written in a hurry',
    'steps:',
    '    -   k: 1.0e-3 s^-1   # measured',
    '        equation: "A -> B"',
    'status: proposed',
    '# the system groups rivals',
    'system: "demo"',
    "title: 'Quoted: needs it'",
    'added: 2026-01-22',
    'species:',
    '  B: {role: product, name: "b"}',
    '  A: {name: a}',
    'tags: [ one,two ]',
    'observations:',
    '  - orders: {A: 1.0 ± 0.1}',
    '    T: 298.150',
    '    id: o1',
    '',
  ].join('\n');
  const { text } = formatRecordText(messy);

  it('puts fields in the schema’s order, keeping the author’s order of species', () => {
    expect(text).toBeDefined();
    const keys = text!
      .split('\n')
      .filter((l) => /^[a-z]/.test(l))
      .map((l) => l.split(':')[0]);
    expect(keys).toEqual(['title', 'system', 'status', 'tags', 'added', 'species', 'steps', 'observations']);
    expect(text).toMatch(/ {2}B: .*\n {2}A: /);
    expect(text).toContain('  - equation: A -> B\n    k: 1.0e-3 s^-1 # measured\n');
    expect(text).toContain('  - id: o1\n    T: 298.150\n    orders: { A: 1.0 ± 0.1 }\n');
  });

  it('keeps comments with what they describe, and quotes only where YAML needs it', () => {
    expect(text!.startsWith('# A record written in a hurry\ntitle:')).toBe(true);
    expect(text).toContain('# the system groups rivals\nsystem: demo\n');
    expect(text).toContain('title: "Quoted: needs it"');
    expect(text).toContain('B: { name: b, role: product }');
    expect(text).toContain('tags: [one, two]');
    expect(text).toContain('added: 2026-01-22');
    expect(data(text!)).toEqual(data(messy));
  });

  it('keeps a string that reads as a number or a boolean in quotes', () => {
    const out = formatRecordText('title: "1.0"\nsystem: "true"\nstatus: "null"\n').text!;
    expect(data(out)).toEqual({ title: '1.0', system: 'true', status: 'null' });
  });

  it('gives no text for a file that does not parse, and says where', () => {
    const result = formatRecordText('title: x\nsteps:\n  - equation: "A -> B\n', 'r.yaml');
    expect(result.text).toBeUndefined();
    expect(result.diagnostics[0]).toMatchObject({ rule: 'record/yaml', file: 'r.yaml', line: 3 });
  });

  it('leaves a file that is not a mapping, and one with aliases in their order', () => {
    expect(formatRecordText('').text).toBe('');
    const aliased = 'steps: &s [{ equation: A -> B }]\ntitle: *s\n';
    const out = formatRecordText(aliased).text!;
    expect(data(out)).toEqual(data(aliased));
    expect(out.indexOf('steps')).toBeLessThan(out.indexOf('title'));
  });
});

describe('fmt on generated records (property)', () => {
  // Strings that tempt a formatter: YAML indicators, numbers and booleans as text, unicode, spaces.
  const tricky = fc.oneof(
    fc.string({ maxLength: 12 }),
    fc.constantFrom(
      '1.0',
      '0x1F',
      'true',
      'null',
      '~',
      '- a',
      ': b',
      '#c',
      'a # b',
      "it's",
      '"q"',
      ' lead',
      'Fe3+',
      'k₁',
    ),
  );
  const value = fc.oneof(tricky, fc.integer(), fc.double({ noNaN: true, noDefaultInfinity: true }), fc.boolean());
  const step = fc.record(
    { k: value, equation: tricky, rds: fc.boolean(), note: tricky, label: tricky },
    { requiredKeys: ['equation'] },
  );
  const record = fc.record(
    {
      notes: tricky,
      steps: fc.array(step, { maxLength: 3 }),
      title: tricky,
      species: fc.dictionary(fc.string({ minLength: 1, maxLength: 4 }), fc.record({ role: tricky, name: tricky }), {
        maxKeys: 3,
      }),
      tags: fc.array(tricky, { maxLength: 3 }),
      status: tricky,
      system: tricky,
    },
    { requiredKeys: [] },
  );
  const layout = fc.record({
    defaultStringType: fc.constantFrom('PLAIN', 'QUOTE_DOUBLE', 'QUOTE_SINGLE') as fc.Arbitrary<'PLAIN'>,
    indent: fc.integer({ min: 2, max: 4 }),
    flow: fc.boolean(),
  });

  it('keeps the data and the comments, and is idempotent', () => {
    fc.assert(
      fc.property(record, layout, fc.array(fc.boolean(), { maxLength: 8 }), (r, options, commented) => {
        // Written through yaml itself: nested collections in flow or block style, comments above some fields.
        const doc = new Document(r);
        if (options.flow)
          visit(doc, {
            Collection(_key, node, path) {
              if (path.length > 1) node.flow = true;
            },
          });
        (doc.contents as YAMLMap).items.forEach((pair, i) => {
          if (commented[i] && isScalar(pair.key)) pair.key.commentBefore = ` about ${String(pair.key.value)}`;
        });
        const source = doc.toString({ defaultStringType: options.defaultStringType, indent: options.indent });
        const { text } = formatRecordText(source);
        expect(text).toBeDefined();
        expect(data(text!)).toEqual(data(source));
        expect(comments(text!)).toEqual(comments(source));
        expect(formatRecordText(text!).text).toBe(text);
      }),
      { numRuns: 150 },
    );
  });
});
