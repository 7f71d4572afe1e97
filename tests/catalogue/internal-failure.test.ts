/**
 * A fault of mechatlas on one record (an exception where a diagnostic belongs) becomes an
 * `internal/failure` error on that record; the others are still checked, and the command exits 3.
 * The fault is injected: no record can cause one on purpose, or it would be fixed.
 */
import { describe, expect, it, vi } from 'vitest';

vi.mock('../../src/engine/index.ts', async (importOriginal) => {
  const engine = await importOriginal<typeof import('../../src/engine/index.ts')>();
  return {
    ...engine,
    deriveMechanism: (record: { title: string }, options?: object) => {
      if (record.title.includes('Four molecules')) throw new TypeError('injected fault\nsecond line');
      return engine.deriveMechanism(record as never, options);
    },
  };
});

process.env['MECHATLAS_NO_CACHE'] = '1'; // the fault is injected into deriving: a cached derivation would hide it
const { checkRecordFiles } = await import('../../src/catalogue/index.ts');
const { runMain } = await import('../cli/run-cli.ts');

const FAULTY = 'tests/fixtures/not-ok/molecularity.yaml';
const HEALTHY = 'tests/fixtures/not-ok/balance-charge.yaml';

describe('an internal failure on one record', () => {
  it('is an internal/failure error on that record, and the rest are still checked', async () => {
    const [faulty, healthy] = await checkRecordFiles([FAULTY, HEALTHY]);
    expect(faulty!.diagnostics).toEqual([
      expect.objectContaining({ rule: 'internal/failure', severity: 'error', file: FAULTY, line: 1 }),
    ]);
    const failure = faulty!.diagnostics[0]!;
    expect(failure.message).toContain('TypeError: injected fault');
    expect(failure.message).not.toContain('second line');
    expect(failure.note).toMatch(/report/);
    expect(healthy!.diagnostics.map((d) => d.rule)).toContain('balance/charge');
  });

  it('makes check exit 3, which outranks the findings (exit 1) of the other records', async () => {
    const run = await runMain(['check', FAULTY, HEALTHY]);
    expect(run.code).toBe(3);
    expect(run.stdout).toContain('internal/failure');
    expect(run.stdout).toContain('balance/charge');
    expect((await runMain(['derive', FAULTY])).code).toBe(3);
    expect((await runMain(['export', '--sbml', FAULTY])).code).toBe(3);
  });
});
