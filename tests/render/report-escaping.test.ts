/**
 * Record text in the text and markdown reports: control characters cannot rewrite a terminal
 * line, and a pull-request comment gets no image, link, math or @-mention from a record. The
 * layouts themselves are pinned elsewhere; only the escaping is tested here.
 */
import { describe, expect, it } from 'vitest';
import type { CatalogueReport } from '../../src/model/index.ts';
import { escapeControlCharacters, markdownReport, textReport } from '../../src/render/index.ts';
import { runMain } from '../cli/run-cli.ts';

function reportWith(message: string, file = 'records/x.yaml'): CatalogueReport {
  return {
    tool: { name: 'mechatlas', version: '0' },
    summary: { records: 1, errors: 1, warnings: 0, notes: 0 },
    records: [
      {
        id: 'x',
        file,
        diagnostics: [{ rule: 'record/schema', severity: 'error', message, file, line: 2, column: 1 }],
      },
    ],
  } as unknown as CatalogueReport;
}

describe('control characters', () => {
  it('are shown as escapes, with bidirectional controls; ordinary text is unchanged', () => {
    expect(escapeControlCharacters('a\u001b[2K\rb\u0007\u202ec\u0085 é ∆ tab\t')).toBe(
      'a\\x1b[2K\\rb\\x07\\u202ec\\x85 é ∆ tab\t',
    );
    expect(escapeControlCharacters('one\ntwo')).toBe('one\\ntwo');
    expect(escapeControlCharacters('one\ntwo', true)).toBe('one\ntwo');
  });

  it('never reach the terminal raw from a text report', () => {
    const text = textReport(reportWith('species X\u001b[2K\rfake is unknown', 'records/\u001b]0;title\u0007.yaml'));
    expect(text).not.toMatch(/[\u0000-\u0008\u000b-\u001f\u007f]/);
    expect(text).toContain('X\\x1b[2K\\rfake');
  });

  it('from a fixture with raw escapes, in every text the CLI prints', async () => {
    const file = 'tests/fixtures/not-ok/record-control-characters.yaml';
    for (const args of [
      ['check', file],
      ['derive', file],
    ]) {
      const run = await runMain(args);
      expect(run.stdout, args[0]).not.toMatch(/\u001b/);
      expect(run.stdout, args[0]).toContain('\\x1b[2K');
    }
  });
});

describe('markdown for a pull-request comment', () => {
  const hostile =
    '![pixel](https://example.invalid/p.png) [link](https://example.invalid) @everyone @org/team $\\href{x}{y}$ <img src=x> www.example.invalid #12 **bold** `code` a|b';
  const md = markdownReport(reportWith(hostile));
  const row = md.split('\n').find((line) => line.includes('pixel'))!;

  it('forms no image, link or emphasis from record text', () => {
    expect(row).not.toMatch(/!\[pixel\]\(/);
    expect(row).not.toMatch(/\[link\]\(/);
    expect(row).toContain('!\\[pixel\\]');
    expect(row).toContain('\\*\\*bold\\*\\*');
    expect(row).toContain('&lt;img src=x&gt;');
    expect(row).toContain('\\$');
  });

  it('puts mentions, addresses and issue numbers in code spans, and keeps the table whole', () => {
    for (const live of [
      '`@everyone`',
      '`@org/team`',
      '`https://example.invalid/p.png)`',
      '`www.example.invalid`',
      '`#12`',
    ])
      expect(row).toContain(live);
    // Six cells: the pipe inside the message is escaped.
    expect(row.split(/(?<!\\)\|/).length).toBe(6);
  });

  it('from the fixture with markdown in a field name', async () => {
    const run = await runMain(['check', '--format', 'markdown', 'tests/fixtures/not-ok/injection-markdown.yaml']);
    expect(run.stdout).not.toMatch(/!\[pixel\]\(/);
    expect(run.stdout).not.toMatch(/(^|[^`])@everyone/m);
  });
});
