/**
 * Property-based fuzzing (fast-check) of what reaches mechatlas from outside: random YAML
 * documents and random bytes through the loader, and random mechanisms outside what the schema
 * allows (huge or negative numbers, hostile symbols, broken quantities) straight into the engine,
 * then every writer. Nothing throws; every failure is a diagnostic with a rule and a message.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { stringify } from 'yaml';
import { deriveMechanism } from '../../src/engine/index.ts';
import type { MechanismRecord } from '../../src/model/index.ts';
import { RULE_IDS } from '../../src/model/index.ts';
import { decodeUtf8 } from '../../src/records/read-record-text.ts';
import { loadRecordSource, placeDiagnostics } from '../../src/records/index.ts';
import { catalogueReport, markdownReport, sarifReport, sbmlDocument, textReport } from '../../src/render/index.ts';

const KNOWN = new Set<string>(RULE_IDS);

function expectDiagnostics(diagnostics: readonly { rule: string; message: string; severity: string }[]): void {
  for (const d of diagnostics) {
    expect(KNOWN.has(d.rule), d.rule).toBe(true);
    expect(d.message.length).toBeGreaterThan(0);
    expect(['error', 'warning', 'info']).toContain(d.severity);
  }
}

/** Loads, derives and writes one record source with every writer; returns nothing, throws nothing. */
function throughEverything(source: string): void {
  const loaded = loadRecordSource('fuzz.yaml', source);
  expectDiagnostics(loaded.diagnostics);
  for (const d of loaded.diagnostics) expect(d.line, d.message).toBeGreaterThanOrEqual(1);
  if (loaded.diagnostics.some((d) => d.severity === 'error')) expect(loaded.record).toBeUndefined();
  const derivation = loaded.record ? deriveMechanism(loaded.record, { simulate: false }) : undefined;
  if (derivation) expectDiagnostics(derivation.diagnostics);
  const diagnostics = placeDiagnostics(loaded, [...loaded.diagnostics, ...(derivation?.diagnostics ?? [])]);
  const checked = {
    id: loaded.id,
    file: loaded.file,
    loaded,
    diagnostics,
    ...(loaded.record && { record: loaded.record }),
    ...(derivation && { derivation }),
  };
  const report = catalogueReport([checked], '0');
  for (const write of [textReport, markdownReport, sarifReport]) expect(typeof write(report)).toBe('string');
  if (loaded.record && derivation?.mechanism)
    sbmlDocument('fuzz', loaded.record, derivation.mechanism, derivation.constants ?? new Map());
}

// Keys a record has, and some it should not: random documents still reach the schema's corners.
const key = fc.constantFrom(
  'title',
  'system',
  'status',
  'notation',
  'steps',
  'species',
  'equation',
  'k',
  'k_rev',
  'K',
  'times',
  'rds',
  'observations',
  'id',
  'concentrations',
  'orders',
  'notes',
  'references',
  'doi',
  'constructor',
  '__proto__',
  'toString',
);
const leaf = fc.oneof(
  fc.string({ maxLength: 12 }),
  fc.constantFrom('A -> B', 'A <=> 2 B', '1 s^-1', '-1 M', 'labels', 'proposed', 'x-y', '1e999', 'NaN'),
  fc.integer(),
  fc.double(),
  fc.boolean(),
  fc.constant(null),
);
const yamlValue = fc.letrec((tie) => ({
  value: fc.oneof({ depthSize: 'small' }, leaf, tie('list'), tie('map')),
  list: fc.array(tie('value'), { maxLength: 4 }),
  map: fc.dictionary(key, tie('value'), { maxKeys: 5 }),
})).map;

describe('the loader, fuzzed', () => {
  it('reads any YAML document into diagnostics or a record, never an exception', () => {
    fc.assert(
      fc.property(yamlValue, (value) => throughEverything(stringify(value))),
      { numRuns: 300 },
    );
  }, 60_000);

  it('decodes any bytes to text or one positioned record/file error', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 200 }), (bytes) => {
        const decoded = decodeUtf8(Buffer.from(bytes), 'bytes.yaml');
        if ('text' in decoded) return throughEverything(decoded.text);
        expect(decoded.problem).toMatchObject({ rule: 'record/file', severity: 'error' });
        expect(decoded.problem.line).toBeGreaterThanOrEqual(1);
        expect(decoded.problem.column).toBeGreaterThanOrEqual(1);
      }),
      { numRuns: 300 },
    );
  });
});

// Symbols as an attacker or a slip would write them.
const symbol = fc.oneof(
  fc.constantFrom(
    'A',
    'B',
    'E',
    'ES',
    'P',
    'H2O',
    'Fe3+',
    'constructor',
    '__proto__',
    'toString',
    'А',
    'A\u200b',
    'X\u001b[2K',
  ),
  fc.constantFrom('((((((((((H))))))))))', '[Co(NH3)6]3+', 'x'.repeat(120), 'Q', 'M'),
);
const coefficient = fc.oneof(
  fc.constant(''),
  fc.constantFrom('2 ', '3 ', '1000 ', '1001 ', '9007199254740993 ', '1000000000 ', '0 ', '1/2 '),
);
const equation = fc
  .tuple(
    fc.array(fc.tuple(coefficient, symbol), { minLength: 1, maxLength: 3 }),
    fc.constantFrom('->', '<=>', '=', '-> ->'),
    fc.array(fc.tuple(coefficient, symbol), { minLength: 0, maxLength: 3 }),
  )
  .map(([l, arrow, r]) => `${l.map(([c, s]) => c + s).join(' + ')} ${arrow} ${r.map(([c, s]) => c + s).join(' + ')}`);
const quantity = fc.oneof(
  fc.constantFrom('1 s^-1', '-1 s^-1', '0', '1e999 M^-1 s^-1', 'NaN s^-1', '2 M', '-0.1 M', '5 furlongs', ''),
  fc.double(),
  fc.integer(),
);
const unvalidated = fc.record({
  notation: fc.constantFrom('labels', 'formulas'),
  approximation: fc.constantFrom('auto', 'rds', 'steady_state', 'both'),
  steps: fc.array(
    fc.record(
      {
        equation,
        label: fc.constantFrom('1', 'm1', 'a', 'a-b', ''),
        rds: fc.boolean(),
        times: fc.oneof(fc.integer({ min: -5, max: 5 }), fc.constantFrom(1001, 2 ** 53 + 2, 1e300, 0.5, Number.NaN)),
        k: quantity,
        k_rev: quantity,
        K: quantity,
      },
      { requiredKeys: ['equation'] },
    ),
    { minLength: 1, maxLength: 4 },
  ),
  species: fc.dictionary(
    symbol,
    fc.record(
      {
        role: fc.constantFrom('catalyst', 'intermediate', 'reactant'),
        formula: fc.constantFrom('H2O', null),
        buffered: fc.boolean(),
      },
      { requiredKeys: [] },
    ),
    { maxKeys: 3 },
  ),
  observations: fc.array(
    fc.record({
      id: fc.constant('run-1'),
      T: quantity,
      concentrations: fc.dictionary(symbol, quantity, { maxKeys: 3 }),
      orders: fc.dictionary(symbol, fc.oneof(quantity, fc.constantFrom('1', '0.5 ± 0.1', 'first')), { maxKeys: 2 }),
    }),
    { maxLength: 2 },
  ),
});

describe('the engine, fuzzed with records the schema would reject', () => {
  it('derives any of them to values and diagnostics, never an exception', () => {
    fc.assert(
      fc.property(unvalidated, (r) => {
        const record = { title: 'fuzz', system: 'fuzz', status: 'proposed', ...r } as unknown as MechanismRecord;
        const derivation = deriveMechanism(record, { simulate: false });
        expectDiagnostics(derivation.diagnostics);
        if (derivation.mechanism) sbmlDocument('fuzz', record, derivation.mechanism, derivation.constants ?? new Map());
      }),
      { numRuns: 300 },
    );
  }, 120_000);
});
