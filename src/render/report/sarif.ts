/** The SARIF 2.1.0 reporter (OASIS), for code-scanning views in pull requests. */
import { RULE_IDS } from '../../model/index.ts';
import type { CatalogueReport } from '../../model/index.ts';

const LEVEL: Record<string, string> = { error: 'error', warning: 'warning', info: 'note' };

/** Renders the report as a SARIF log (lines and columns 1-based). */
export function sarifReport(report: CatalogueReport): string {
  const results = report.records.flatMap((r) =>
    r.diagnostics.map((d) => ({
      ruleId: d.rule,
      level: LEVEL[d.severity] ?? 'note',
      message: { text: d.note ? `${d.message} (${d.note})` : d.message },
      locations: [
        {
          physicalLocation: {
            artifactLocation: { uri: d.file ?? r.file },
            region: {
              startLine: d.line ?? 1,
              startColumn: d.column ?? 1,
              ...(d.end_line && { endLine: d.end_line }),
              ...(d.end_column && { endColumn: d.end_column }),
            },
          },
        },
      ],
    })),
  );
  const log = {
    version: '2.1.0',
    $schema: 'https://json.schemastore.org/sarif-2.1.0.json',
    runs: [
      {
        tool: { driver: { name: 'mechatlas', version: report.tool.version, rules: RULE_IDS.map((id) => ({ id })) } },
        results,
      },
    ],
  };
  return JSON.stringify(log, null, 2) + '\n';
}
