/**
 * One finding (a diagnostic) as a chemist reads it in a terminal: the rule in brackets before the
 * message, where it is beneath, then how to fix it. Record text is printed with its control
 * characters shown, so what is printed is what the record says.
 */
import type { DiagnosticJson } from '../../model/index.ts';
import { severityWord } from '../words/index.ts';
import { escapeControlCharacters as printable } from './control-characters.ts';

/** The width of the severity column: the longest displayed word ("warning"). */
const SEVERITY_WIDTH = 7;

/** "line 27, column 18", with the file named where it is not the record's own (a data file). */
export function positionWords(d: DiagnosticJson, recordFile?: string): string {
  const at = `line ${d.line ?? 1}, column ${d.column ?? 1}`;
  return d.file !== undefined && d.file !== recordFile ? `${at} of ${printable(d.file)}` : at;
}

/**
 * A finding under its record's heading:
 * `warning  [observation/order] order in A is …` / `at line 27, column 18` / `how to fix: …`.
 */
export function findingLines(d: DiagnosticJson, recordFile: string | undefined, indent = '  '): string[] {
  const word = severityWord(d.severity);
  const hang = indent + ' '.repeat(Math.max(SEVERITY_WIDTH, word.length) + 2);
  return [
    `${indent}${word.padEnd(SEVERITY_WIDTH)}  [${printable(d.rule)}] ${printable(d.message)}`,
    `${hang}at ${positionWords(d, recordFile)}`,
    ...(d.note ? [`${hang}how to fix: ${printable(d.note)}`] : []),
  ];
}

/**
 * A finding on one line, where it stands alone (the build's messages on standard error):
 * `content/mechanisms/x.yaml, line 7, column 5: error [balance/atoms] step 1 is not balanced`.
 */
export function diagnosticRow(d: DiagnosticJson): string {
  const where = `${printable(d.file ?? '')}, line ${d.line ?? 1}, column ${d.column ?? 1}`;
  return `${where}: ${severityWord(d.severity)} [${printable(d.rule)}] ${printable(d.message)}`;
}

/** Orders diagnostics by file, then line, then column. */
export function byPosition(a: DiagnosticJson, b: DiagnosticJson): number {
  return (
    (a.file ?? '').localeCompare(b.file ?? '') || (a.line ?? 0) - (b.line ?? 0) || (a.column ?? 0) - (b.column ?? 0)
  );
}
