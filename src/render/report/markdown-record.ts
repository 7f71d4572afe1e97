/**
 * One record in the pull-request review: a collapsible section whose summary line says how the
 * record stands, holding a section per concern — its chemistry before → after, the verdicts on
 * its observed orders, its findings. A new concern adds a function to MARKDOWN_SECTIONS.
 */
import type { RecordReport } from '../../model/index.ts';
import { severityCount, severityWord, SEVERITIES } from '../words/index.ts';
import { byPosition, positionWords } from './finding-text.ts';
import { cell, codeSpan, inlineHtml } from './markdown-text.ts';
import { comparedFacts, comparedVerdicts } from './record-comparison.ts';

/**
 * One concern of a record's section: markdown lines, or none. `before` is the record at the base
 * revision, `null` for a new record, absent when the review compares with nothing.
 */
export type MarkdownSection = (after: RecordReport, before?: RecordReport | null) => string[];

/** A severity as a mark and a word, so it never rests on colour or symbol alone. */
export const SEVERITY_MARK: Readonly<Record<string, string>> = { error: '✗', warning: '⚠', info: 'ℹ' };

/** The heading cells of a before → after table: one column when nothing is compared. */
function sides(before: RecordReport | null | undefined): string[] {
  return before === undefined ? ['this revision'] : ['before', 'after'];
}

/** A value in a code span, a dash for none; in bold where it changed. */
function valueCell(value: string | undefined, changed = false): string {
  if (value === undefined) return '—';
  return changed ? `**${codeSpan(value)}**` : codeSpan(value);
}

/** The status, the overall equation and each rate law, before → after. */
export const chemistrySection: MarkdownSection = (after, before) => {
  const head = sides(before);
  const rows = comparedFacts(after, before).map((f) => {
    const what = f.changed ? `**${f.what}** ✎` : f.what;
    const values = before === undefined ? [valueCell(f.after)] : [valueCell(f.before), valueCell(f.after, f.changed)];
    return `| ${[what, ...values].join(' | ')} |`;
  });
  return [`| | ${head.join(' | ')} |`, `|---|${head.map(() => '---|').join('')}`, ...rows];
};

/** The verdict of the primary rate law on each observed order, before → after. */
export const verdictsSection: MarkdownSection = (after, before) => {
  const compared = comparedVerdicts(after, before);
  if (compared.length === 0) return [];
  const head = sides(before);
  const rows = compared.map((v) => {
    const what = `${codeSpan(v.observation)}, order in ${codeSpan(v.species)}${v.changed ? ' ✎' : ''}`;
    const verdicts =
      before === undefined
        ? [v.after ?? '—']
        : [v.before ?? '—', v.changed ? `**${v.after ?? '—'}**` : (v.after ?? '—')];
    return `| ${[what, v.observed, ...verdicts].join(' | ')} |`;
  });
  return [
    `| observed order | measured | ${head.join(' | ')} |`,
    `|---|---|${head.map(() => '---|').join('')}`,
    ...rows,
  ];
};

/** Each finding: its severity, rule, message with how to fix it, and where it is. */
export const findingsSection: MarkdownSection = (after) => {
  if (after.diagnostics.length === 0) return ['No findings.'];
  const rows = [...after.diagnostics].sort(byPosition).map((d) => {
    const severity = `${SEVERITY_MARK[d.severity] ?? ''} ${severityWord(d.severity)}`.trim();
    const fix = d.note ? `<br>_how to fix:_ ${cell(d.note)}` : '';
    return `| ${severity} | ${codeSpan(d.rule)} | ${cell(d.message)}${fix} | ${cell(positionWords(d, after.file))} |`;
  });
  return ['| | rule | finding | where |', '|---|---|---|---|', ...rows];
};

/** The sections of a record, in order. */
export const MARKDOWN_SECTIONS: readonly MarkdownSection[] = [chemistrySection, verdictsSection, findingsSection];

/** How the record stands, for its summary line: "✗ 1 error, 2 notes", "✓ no findings". */
function standing(r: RecordReport): string {
  const counts = SEVERITIES.map((s) => [s, r.diagnostics.filter((d) => d.severity === s).length] as const).filter(
    ([, n]) => n > 0,
  );
  if (counts.length === 0) return '✓ no findings';
  return `${SEVERITY_MARK[counts[0]![0]]} ${counts.map(([s, n]) => severityCount(n, s)).join(', ')}`;
}

/** The record's collapsible section: its title, file and standing in the summary, then its sections. */
export function recordSection(
  after: RecordReport,
  before?: RecordReport | null,
  sections: readonly MarkdownSection[] = MARKDOWN_SECTIONS,
): string[] {
  const added = before === null ? ' · new record' : '';
  const summary = `${standing(after)} · <b>${inlineHtml(after.title ?? after.id)}</b> · <code>${inlineHtml(after.file)}</code>${added}`;
  const body = sections.map((s) => s(after, before)).filter((lines) => lines.length > 0);
  return ['<details>', `<summary>${summary}</summary>`, ...body.flatMap((lines) => ['', ...lines]), '', '</details>'];
}

/** A record the change removes: its section holds what it said at the base. */
export function removedSection(before: RecordReport): string[] {
  const rows = comparedFacts(before).map((f) => `| ${f.what} | ${valueCell(f.after)} | — |`);
  const summary = `− removed · <b>${inlineHtml(before.title ?? before.id)}</b> · <code>${inlineHtml(before.file)}</code>`;
  return [
    '<details>',
    `<summary>${summary}</summary>`,
    '',
    '| | before | after |',
    '|---|---|---|',
    ...rows,
    '',
    '</details>',
  ];
}
