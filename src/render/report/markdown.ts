/** The markdown reporter, for a pull-request comment: a summary, then each record's findings. */
import type { CatalogueReport } from '../../model/index.ts';
import { byPosition, summaryLine } from './text.ts';

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
        `| \`${d.file ?? r.file}:${d.line ?? 1}:${d.column ?? 1}\` | ${MARK[d.severity] ?? d.severity} | ${cell(d.message)}${d.note ? `<br>_how to fix:_ ${cell(d.note)}` : ''} | \`${d.rule}\` |`,
      );
    }
  }
  out.push(
    '',
    '_Derived rate laws are models. Decisions on scale-up, thermal hazards or exposure rest with calorimetry, local codes and licensed practice._',
  );
  return out.join('\n') + '\n';
}

/** Escapes text for a table cell: pipes, newlines and inline HTML. */
function cell(text: string): string {
  return text
    .replace(/\\/g, '\\\\')
    .replace(/\|/g, '\\|')
    .replace(/</g, '&lt;')
    .replace(/>/g, '&gt;')
    .replace(/\r?\n/g, ' ');
}
