/**
 * Presentation helpers for the catalogue, species, system and checks pages: counting, grouping,
 * sorting and wording of what the engine already returned. No chemistry is computed here.
 */
import type { DiagnosticJson, ObservationJson } from '../model/index.ts';
import { roleRank, roleWords, SEVERITIES } from '../render/index.ts';
import type { RecordView } from './record-view.ts';
import type { SpeciesOccurrence } from './site-catalogue.ts';

export interface RoleCount {
  role: string;
  count: number;
}

/** How often a species takes each role across the mechanisms it occurs in. */
export function roleCounts(occurrences: readonly SpeciesOccurrence[]): RoleCount[] {
  const counts = new Map<string, number>();
  for (const o of occurrences) counts.set(roleWords(o.role), (counts.get(roleWords(o.role)) ?? 0) + 1);
  return [...counts]
    .map(([role, count]) => ({ role, count }))
    .sort((a, b) => roleRank(a.role) - roleRank(b.role) || a.role.localeCompare(b.role));
}

/** "catalyst in 3, intermediate in 1" (plus "buffered in 1" where the species is held constant). */
export function roleSummary(occurrences: readonly SpeciesOccurrence[]): string {
  const parts = roleCounts(occurrences).map(({ role, count }) => `${role} in ${count}`);
  const buffered = occurrences.filter((o) => o.buffered).length;
  if (buffered > 0) parts.push(`buffered in ${buffered}`);
  return parts.join(', ');
}

/** The newest records first by their `added` date; records without a date are left out. */
export function recentRecords(records: readonly RecordView[], count = 5): RecordView[] {
  return records
    .filter((r) => r.added)
    .sort((a, b) => (b.added ?? '').localeCompare(a.added ?? '') || a.id.localeCompare(b.id))
    .slice(0, count);
}

export interface Contradiction {
  record: RecordView;
  observation: ObservationJson;
}

export interface PlacedDiagnostic {
  record: RecordView;
  diagnostic: DiagnosticJson;
}

export interface OpenProblems {
  /** records with at least one error */
  withErrors: RecordView[];
  /** observations a record's own rate law contradicts (status fail) */
  contradictions: Contradiction[];
  /** the engine's warnings that an approximation does not hold at an observation's conditions */
  approximations: PlacedDiagnostic[];
}

/** What needs a reviewer's attention, as the engine reported it. */
export function openProblems(records: readonly RecordView[]): OpenProblems {
  return {
    withErrors: records.filter((r) => r.errors > 0),
    contradictions: records.flatMap((record) =>
      (record.report.observations ?? [])
        .filter((o) => o.status === 'fail')
        .map((observation) => ({ record, observation })),
    ),
    approximations: records.flatMap((record) =>
      record.report.diagnostics
        .filter((d) => d.rule.startsWith('approximation/'))
        .map((diagnostic) => ({ record, diagnostic })),
    ),
  };
}

export interface RuleGroup {
  rule: string;
  anchor: string;
  items: PlacedDiagnostic[];
}

export interface SeverityGroup {
  severity: string;
  anchor: string;
  count: number;
  rules: RuleGroup[];
}

/** Every diagnostic of the catalogue, by severity and then by rule, each list in file/line/column order. */
export function groupDiagnostics(records: readonly RecordView[]): SeverityGroup[] {
  const all = records
    .flatMap((record) => record.report.diagnostics.map((diagnostic) => ({ record, diagnostic })))
    .sort(
      (a, b) =>
        (a.diagnostic.file ?? a.record.file).localeCompare(b.diagnostic.file ?? b.record.file) ||
        (a.diagnostic.line ?? 0) - (b.diagnostic.line ?? 0) ||
        (a.diagnostic.column ?? 0) - (b.diagnostic.column ?? 0),
    );
  const severities = [...new Set([...SEVERITIES, ...all.map((d) => d.diagnostic.severity)])];
  return severities.map((severity) => {
    const here = all.filter((d) => d.diagnostic.severity === severity);
    const rules = [...new Set(here.map((d) => d.diagnostic.rule))].sort();
    return {
      severity,
      anchor: anchorId(severity),
      count: here.length,
      rules: rules.map((rule) => ({
        rule,
        anchor: anchorId(`${severity}-${rule}`),
        items: here.filter((d) => d.diagnostic.rule === rule),
      })),
    };
  });
}

/** Every rule with its count per severity, for the checks page's index by rule. */
export function ruleIndex(
  groups: readonly SeverityGroup[],
): { rule: string; entries: { severity: string; anchor: string; count: number }[] }[] {
  const rules = [...new Set(groups.flatMap((g) => g.rules.map((r) => r.rule)))].sort();
  return rules.map((rule) => ({
    rule,
    entries: groups.flatMap((g) =>
      g.rules
        .filter((r) => r.rule === rule)
        .map((r) => ({ severity: g.severity, anchor: r.anchor, count: r.items.length })),
    ),
  }));
}

/** A fragment id made of safe characters (`warning-observation/order` → `warning-observation-order`). */
export function anchorId(text: string): string {
  return text
    .toLowerCase()
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '');
}

/** `file:line:column` as a reader expects it, with the record's file as the catalogue names it (relative). */
export function placeText(record: { file: string }, d: DiagnosticJson): string {
  return [record.file, d.line, d.line !== undefined ? d.column : undefined].filter((x) => x !== undefined).join(':');
}
