/** The markdown reporter, for a pull-request comment: a summary, then each record's findings. */
import type { CatalogueReport } from '../../model/index.ts';
import { escapeControlCharacters } from './control-characters.ts';
import { byPosition, summaryLine } from './text.ts';
import { fitsSectionMarkdown } from './fits-section.ts';

const MARK: Record<string, string> = { error: '✗ error', warning: '⚠ warning', info: 'ℹ note' };

/** Renders the report as GitHub-flavoured markdown. */
export function markdownReport(report: CatalogueReport): string {
  const out = ['## mechatlas review', '', summaryLine(report), ''];
  out.push('| record | system | status | overall equation | errors | warnings |', '|---|---|---|---|---|---|');
  for (const r of report.records) {
    const n = (s: string) => r.diagnostics.filter((d) => d.severity === s).length;
    out.push(
      `| ${cell(r.id)} | ${cell(r.system ?? '')} | ${cell(r.status ?? '')} | ${cell(r.overall?.text ?? '—')} | ${n('error')} | ${n('warning')} |`,
    );
  }
  for (const r of report.records) {
    const findings = [...r.diagnostics].sort(byPosition);
    if (findings.length === 0) continue;
    out.push('', `### ${cell(r.id)}`, '', '| where | severity | message | rule |', '|---|---|---|---|');
    for (const d of findings) {
      out.push(
        `| ${codeSpan(`${d.file ?? r.file}:${d.line ?? 1}:${d.column ?? 1}`)} | ${MARK[d.severity] ?? d.severity} | ${cell(d.message)}${d.note ? `<br>_how to fix:_ ${cell(d.note)}` : ''} | ${codeSpan(d.rule)} |`,
      );
    }
  }
  out.push(...fitsSectionMarkdown(report, cell));
  out.push(
    '',
    '_Derived rate laws are models. Decisions on scale-up, thermal hazards or exposure rest with calorimetry, local codes and licensed practice._',
  );
  return out.join('\n') + '\n';
}

// What GitHub would turn into a notification or a link: @-mentions, web addresses, issue numbers.
const LIVE = /(@[A-Za-z0-9][\w./-]*|(?:https?|ftp|mailto|file|data|javascript):\S*|www\.\S+|#\d+)/i;

/**
 * Record text made inert for a table cell of a pull-request comment: markdown punctuation and
 * HTML escaped (no image, link or emphasis is formed), mentions and addresses put in code spans
 * (no one is notified, nothing is fetched), control characters shown, all on one line.
 */
function cell(text: string): string {
  const line = escapeControlCharacters(text.replace(/\r?\n/g, ' '));
  return line
    .split(LIVE)
    .map((part, i) => (i % 2 === 1 ? codeSpan(part) : escapeMarkdown(part)))
    .join('');
}

/** A backslash before the marks that form links, images, emphasis, math and cells; HTML's characters as entities. */
function escapeMarkdown(text: string): string {
  return text
    .replace(/[\\`*_[\]~|$]/g, (c) => `\\${c}`)
    .replace(/&/g, '&amp;')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;');
}

/** A code span that holds any text: a fence longer than its longest run of backticks, pipes escaped for the table. */
function codeSpan(text: string): string {
  const line = escapeControlCharacters(text.replace(/\r?\n/g, ' '));
  const longest = Math.max(0, ...[...line.matchAll(/`+/g)].map((m) => m[0].length));
  const fence = '`'.repeat(longest + 1);
  const pad = line.startsWith('`') || line.endsWith('`') ? ' ' : '';
  return `${fence}${pad}${line.replace(/\|/g, '\\|')}${pad}${fence}`;
}
