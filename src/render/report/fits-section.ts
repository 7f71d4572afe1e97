/**
 * The fits section of the text and markdown reports: one line per data set of the records
 * reported (each data set once, however many rivals carry it) saying which rival the data favour
 * and by how much, with the suggested next measurement. In a pull request a changed fit is then a
 * reviewable line of the comment.
 */
import type { CatalogueReport, DataSetFitsJson } from '../../model/index.ts';
import { numberText } from '../words/index.ts';
import { favouredSentence } from './fits-text.ts';

/** Each data set of the report once, with what it says. */
export function fitsSummary(report: CatalogueReport): { set: DataSetFitsJson; sentence: string; next?: string }[] {
  const seen = new Set<string>();
  const out: { set: DataSetFitsJson; sentence: string; next?: string }[] = [];
  for (const r of report.records)
    for (const set of r.fits?.data_sets ?? []) {
      const key = `${set.record}\u0000${set.observation}`;
      const sentence = favouredSentence(set);
      if (seen.has(key) || !sentence) continue;
      seen.add(key);
      const n = set.next_measurement;
      const next = n
        ? `to tell ${n.rivals[0]} from ${n.rivals[1]}, measure at ${n.symbol} = ${numberText(n.concentration_m, 2)} M (${numberText(n.separation_sigma, 2)} σ apart there)`
        : undefined;
      out.push({ set, sentence, ...(next && { next }) });
    }
  return out;
}

/** Lines for the text report (empty when nothing was fitted). */
export function fitsSectionText(report: CatalogueReport): string[] {
  // A data set with one rival only says that it was fitted: the step-by-step `fit` command shows it.
  const found = fitsSummary(report).filter((f) => f.set.rivals.filter((r) => r.weight !== undefined).length > 1);
  if (found.length === 0) return [];
  return ['fits:', ...found.flatMap((f) => [`  ${f.sentence}`, ...(f.next ? [`    ${f.next}`] : [])])];
}

/** Lines for the markdown report: a heading and a table (cells escaped by `cell`). */
export function fitsSectionMarkdown(report: CatalogueReport, cell: (text: string) => string): string[] {
  const found = fitsSummary(report);
  if (found.length === 0) return [];
  const out = [
    '',
    '### fits',
    '',
    '| data set | rival | method | AICc | ΔAICc | weight |',
    '|---|---|---|---|---|---|',
  ];
  for (const { set } of found)
    for (const r of set.rivals.filter((x) => x.weight !== undefined))
      out.push(
        `| ${cell(set.observation)} | ${cell(r.record)} | ${cell(r.method)} | ${numberText(r.aicc ?? NaN, 4)} | ${numberText(r.delta_aicc ?? NaN, 2)} | ${r.weight!.toPrecision(2)}${r.rejected ? ' (rejected)' : ''} |`,
      );
  const rivals = found.filter((f) => f.set.rivals.filter((r) => r.weight !== undefined).length > 1);
  out.push('', ...rivals.flatMap((f) => [`- ${cell(f.sentence)}${f.next ? `; ${cell(f.next)}` : ''}`]));
  return out;
}
