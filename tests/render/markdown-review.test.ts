/**
 * The markdown review for a pull request: a first line that reads in a notification, one
 * collapsible section per record with its chemistry before → after, what blocks first, and record
 * text kept inert in the raw HTML of a section's summary line.
 */
import { describe, expect, it } from 'vitest';
import type { ObservationJson, RecordReport } from '../../src/model/index.ts';
import { markdownReport, reportOf } from '../../src/render/index.ts';

const check = (species: string, status: string, predicted: number): ObservationJson => ({
  id: 'rates-1',
  species,
  method: 'rds',
  observed: 1,
  tolerance: 0.1,
  basis: 'conditions',
  status,
  predicted,
});

const before: RecordReport = {
  id: 'route',
  file: 'records/route.yaml',
  title: 'Binding first',
  status: 'proposed',
  overall: { reactants: { A: 1, B: 1 }, products: { P: 1 }, catalysts: ['Cat'], text: 'A + B -> P' },
  rate_laws: [{ method: 'rds', text: 'k_2*[Cat]_T*[A]*[B]', orders: {}, derivation: [] }],
  observations: [check('A', 'pass', 1), check('B', 'pass', 1)],
  diagnostics: [],
};
const after: RecordReport = {
  ...before,
  status: 'favoured',
  rate_laws: [{ method: 'rds', text: 'K_1*k_2*[Cat]_T*[A]*[B] / (1 + K_1*[B])', orders: {}, derivation: [] }],
  observations: [check('A', 'pass', 1), check('B', 'fail', 0.5)],
  diagnostics: [
    { rule: 'observation/order', severity: 'warning', message: 'order in B is 1 ± 0.1', line: 9, column: 3 },
  ],
};
const broken: RecordReport = {
  id: 'broken',
  file: 'records/broken.yaml',
  diagnostics: [
    { rule: 'balance/atoms', severity: 'error', message: 'atoms do not balance', line: 7, column: 5, note: 'add O' },
  ],
};

describe('markdown review', () => {
  it('opens with one line saying whether anything blocks, then what else there is', () => {
    const first = markdownReport(reportOf([after, broken], '0')).split('\n')[0];
    expect(first).toBe(
      '**mechatlas review** — ✗ 2 records checked: 1 record has an error that blocks; 1 warning in 1 record; observed orders: 1 consistent, 1 contradicted',
    );
    expect(markdownReport(reportOf([before], '0')).split('\n')[0]).toMatch(
      /^\*\*mechatlas review\*\* — ✓ .*nothing blocks/,
    );
  });

  it('gives each record a collapsible section, what blocks first', () => {
    const md = markdownReport(reportOf([after, broken], '0'));
    const summaries = md.split('\n').filter((l) => l.startsWith('<summary>'));
    expect(summaries).toEqual([
      '<summary>✗ 1 error · <b>broken</b> · <code>records/broken.yaml</code></summary>',
      '<summary>⚠ 1 warning · <b>Binding first</b> · <code>records/route.yaml</code></summary>',
    ]);
    expect(md.match(/<details>/g)).toHaveLength(2);
    expect(md.match(/<\/details>/g)).toHaveLength(2);
    expect(md).toContain(
      '| ✗ error | `balance/atoms` | atoms do not balance<br>_how to fix:_ add O | line 7, column 5 |',
    );
  });

  it('shows the chemistry before → after against the base, marking what changed', () => {
    const base = { ref: 'origin/main', records: new Map([[after.file, before]]) };
    const md = markdownReport(reportOf([after], '0'), { base });
    expect(md).toContain('Compared with `origin/main`: 1 record changed.');
    expect(md).toContain('| **status** ✎ | `proposed` | **`favoured`** |');
    expect(md).toContain('| overall equation | `A + B -> P (catalysts: Cat)` | `A + B -> P (catalysts: Cat)` |');
    expect(md).toContain(
      '| **rate law (pre-equilibrium)** ✎ | `k_2*[Cat]_T*[A]*[B]` | **`K_1*k_2*[Cat]_T*[A]*[B] / (1 + K_1*[B])`** |',
    );
    expect(md).toContain('| `rates-1`, order in `A` | 1 ± 0.1 | ✓ consistent (1) | ✓ consistent (1) |');
    expect(md).toContain('| `rates-1`, order in `B` ✎ | 1 ± 0.1 | ✓ consistent (1) | **✗ contradicted (0.5)** |');
  });

  it('marks a record the change adds, with nothing before', () => {
    const base = { ref: 'main', records: new Map<string, RecordReport | null>([[after.file, null]]) };
    const md = markdownReport(reportOf([after], '0'), { base });
    expect(md).toContain('1 record changed, 1 of them new.');
    expect(md).toContain('· new record</summary>');
    expect(md).toContain('| **status** ✎ | — | **`favoured`** |');
  });

  it('shows a record the change removes, as it stood at the base', () => {
    const base = { ref: 'main', records: new Map<string, RecordReport | null>(), removed: [before] };
    const md = markdownReport(reportOf([], '0'), { base });
    expect(md).toContain('Compared with `main`: 0 records changed; 1 record removed.');
    expect(md).toContain('<summary>− removed · <b>Binding first</b> · <code>records/route.yaml</code></summary>');
    expect(md).toContain('| overall equation | `A + B -> P (catalysts: Cat)` | — |');
  });

  it('without a base, shows this revision alone', () => {
    const md = markdownReport(reportOf([after], '0'));
    expect(md).toContain('| | this revision |');
    expect(md).not.toContain('✎');
  });

  it('keeps a hostile title inert in the raw HTML of the summary line', () => {
    const hostile = {
      ...before,
      title: 'T <img src=x onerror=alert(1)> @everyone https://example.invalid/x #12 $\\href{x}{y}$ "q"',
    };
    const summary = markdownReport(reportOf([hostile], '0'))
      .split('\n')
      .find((l) => l.startsWith('<summary>'))!;
    expect(summary).not.toMatch(/<img/);
    expect(summary).toContain('&#60;img src=x onerror=alert(1)&#62;');
    for (const live of ['<code>@everyone</code>', '<code>https://example.invalid/x</code>', '<code>#12</code>'])
      expect(summary).toContain(live);
    expect(summary).not.toContain('$');
    expect(summary).toContain('&#34;q&#34;');
    // Only our own tags remain: summary, b and code.
    expect(summary.match(/<\/?([a-z]+)/g)!.every((t) => /^<\/?(summary|b|code)$/.test(t))).toBe(true);
  });

  it('puts a newline or control character in a title on one visible line', () => {
    const md = markdownReport(reportOf([{ ...before, title: 'a\n</summary></details>\u001b[2K' }], '0'));
    expect(md).not.toMatch(/\u001b/);
    expect(md.match(/<\/details>/g)).toHaveLength(1);
  });
});
