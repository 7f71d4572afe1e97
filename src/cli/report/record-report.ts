/**
 * The JSON report of one record (DESIGN.md "Contracts"): snake_case keys, additive only.
 * Pure: built from a loaded record and its derivation; the CLI and the site both use it.
 */
import type { Diagnostic } from '../../engine/diagnostic.ts';
import type { Derivation } from '../../engine/derive.ts';
import type { Rational } from '../../engine/rational.ts';

export interface DiagnosticJson {
  rule: string;
  severity: string;
  message: string;
  file?: string;
  line?: number;
  column?: number;
  end_line?: number;
  end_column?: number;
  note?: string;
}

export interface RecordReport {
  id: string;
  file: string;
  title?: string;
  system?: string;
  status?: string;
  overall?: { reactants: Record<string, number | string>; products: Record<string, number | string>; catalysts: string[]; text: string };
  stoichiometric_numbers?: number[];
  stoichiometric_numbers_source?: 'given' | 'derived';
  roles?: Record<string, string>;
  buffered?: string[];
  diagnostics: DiagnosticJson[];
}

export interface RecordInput {
  id: string;
  file: string;
  record?: { title: string; system: string; status: string };
  derivation?: Derivation;
  /** every diagnostic of the record, placed (file, line, column) */
  diagnostics: readonly Diagnostic[];
}

/** Builds the report object of one record. */
export function recordReport(input: RecordInput): RecordReport {
  const { record, derivation } = input;
  const out: RecordReport = { id: input.id, file: input.file, diagnostics: input.diagnostics.map(diagnosticJson) };
  if (record) Object.assign(out, { title: record.title, system: record.system, status: record.status });
  if (derivation?.overall) {
    const { overall } = derivation;
    out.overall = { reactants: coefficients(overall.reactants), products: coefficients(overall.products), catalysts: overall.catalysts, text: overall.text };
  }
  if (derivation?.stoichiometricNumbers) {
    out.stoichiometric_numbers = derivation.stoichiometricNumbers;
    if (derivation.routeSource) out.stoichiometric_numbers_source = derivation.routeSource;
  }
  if (derivation?.roles) out.roles = Object.fromEntries(derivation.roles);
  if (derivation && derivation.buffered.length > 0) out.buffered = derivation.buffered;
  // Keep the documented key order: diagnostics last.
  const { diagnostics, ...rest } = out;
  return { ...rest, diagnostics };
}

/** A diagnostic in the report's snake_case shape. */
export function diagnosticJson(d: Diagnostic): DiagnosticJson {
  const out: DiagnosticJson = { rule: d.rule, severity: d.severity, message: d.message };
  if (d.file !== undefined) out.file = d.file;
  if (d.line !== undefined) out.line = d.line;
  if (d.column !== undefined) out.column = d.column;
  if (d.endLine !== undefined) out.end_line = d.endLine;
  if (d.endColumn !== undefined) out.end_column = d.endColumn;
  if (d.note !== undefined) out.note = d.note;
  return out;
}

function coefficients(m: ReadonlyMap<string, Rational>): Record<string, number | string> {
  return Object.fromEntries([...m].map(([sp, c]) => [sp, c.toJSON()]));
}
