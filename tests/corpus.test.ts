/**
 * The bad-input corpus as a whole (tests/fixtures/not-ok/): large enough, every rule a record can
 * break shown by a fixture, and checking it changes no byte of any input. Each fixture's own
 * expectation is tested in tests/records/fixtures.test.ts (record/…) and tests/engine-fixtures.test.ts.
 */
import { createHash } from 'node:crypto';
import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { checkRecordFiles } from '../src/catalogue/index.ts';
import { RULE_IDS } from '../src/model/index.ts';
import { readExpectations } from './fixture-expectations.ts';

const NOT_OK = 'tests/fixtures/not-ok';
const files = readdirSync(NOT_OK)
  .filter((f) => /\.ya?ml$/.test(f))
  .sort()
  .map((f) => join(NOT_OK, f));

// Rules no fixture can show: notes only (the fixture tests compare errors and warnings), and a
// fault of mechatlas itself (tested by injecting one, in tests/catalogue/internal-failure.test.ts),
// and a finding on rivals of one system, which needs two records (tests/catalogue/system-fits.test.ts).
const WITHOUT_FIXTURE = new Set(['rate/nonlinear', 'internal/failure', 'fit/rival-rejected']);

describe('the bad-input corpus', () => {
  it('holds at least 80 inputs, each stating its expected rule and line', () => {
    expect(files.length).toBeGreaterThanOrEqual(80);
    for (const file of files) expect(readExpectations(readFileSync(file, 'latin1')).length, file).toBeGreaterThan(0);
  });

  it('shows every rule a record can break', () => {
    const shown = new Set(files.flatMap((f) => readExpectations(readFileSync(f, 'latin1')).map((e) => e.rule)));
    expect(RULE_IDS.filter((id) => !shown.has(id) && !WITHOUT_FIXTURE.has(id))).toEqual([]);
  });

  it('is checked without changing a byte of any input', { timeout: 120_000 }, async () => {
    const digest = () => files.map((f) => createHash('sha256').update(readFileSync(f)).digest('hex'));
    const before = digest();
    const checked = await checkRecordFiles(files);
    expect(checked).toHaveLength(files.length);
    expect(checked.flatMap((c) => c.diagnostics).filter((d) => d.rule.startsWith('internal/'))).toEqual([]);
    expect(digest()).toEqual(before);
  });
});
