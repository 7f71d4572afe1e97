/**
 * A record's chemistry before and after a change, side by side: its status, overall equation,
 * rate laws and the verdicts on its observed orders. `before` is the record at the base
 * revision, `null` for a record the change adds, and absent when nothing is compared.
 */
import type { ObservationJson, RecordReport } from '../../model/index.ts';
import { methodShort, orderText, verdictMark } from '../words/index.ts';
import { primaryChecks } from './verdict-tally.ts';

/** One thing compared: what it is, its value on each side (absent: none), and whether it changed. */
export interface ComparedFact {
  what: string;
  before?: string;
  after?: string;
  changed: boolean;
}

/** One observed order compared: the observation and species, the value measured, the verdict on each side. */
export interface ComparedVerdict {
  observation: string;
  species: string;
  observed: string;
  before?: string;
  after?: string;
  changed: boolean;
}

/** The overall equation with its catalysts, as the report writes it. */
function overallWords(r: RecordReport): string | undefined {
  if (!r.overall) return undefined;
  const catalysts = r.overall.catalysts.length > 0 ? ` (catalysts: ${r.overall.catalysts.join(', ')})` : '';
  return `${r.overall.text}${catalysts}`;
}

/** Each rate law by method: its text, or a word where it was solved only numerically. */
function lawsByMethod(r: RecordReport | null | undefined): Map<string, string> {
  return new Map((r?.rate_laws ?? []).map((law) => [law.method, law.text ?? 'solved numerically only']));
}

/** The status, overall equation and each rate law, on both sides. */
export function comparedFacts(after: RecordReport, before?: RecordReport | null): ComparedFact[] {
  const fact = (what: string, a: string | undefined, b: string | undefined): ComparedFact => ({
    what,
    ...(b !== undefined && { before: b }),
    ...(a !== undefined && { after: a }),
    changed: before !== undefined && a !== b,
  });
  const out = [
    fact('status', after.status, before?.status),
    fact('overall equation', overallWords(after), before ? overallWords(before) : undefined),
  ];
  const [lawsAfter, lawsBefore] = [lawsByMethod(after), lawsByMethod(before)];
  for (const method of new Set([...lawsAfter.keys(), ...lawsBefore.keys()]))
    out.push(fact(`rate law (${methodShort(method)})`, lawsAfter.get(method), lawsBefore.get(method)));
  return out;
}

/** A verdict in words with its prediction: "✓ consistent (1)", "~ not excluded (0 to 1)". */
export function verdictWords(check: ObservationJson): string {
  const mark = verdictMark(check.status);
  const predicted = check.range
    ? `${orderText(check.range[0])} to ${orderText(check.range[1])}`
    : check.predicted !== undefined
      ? orderText(check.predicted)
      : undefined;
  return `${mark.symbol} ${mark.word}${predicted !== undefined ? ` (${predicted})` : ''}`;
}

/** The verdicts of the primary rate law on each observed order, on both sides, in the order the record gives them. */
export function comparedVerdicts(after: RecordReport, before?: RecordReport | null): ComparedVerdict[] {
  const key = (c: ObservationJson) => `${c.id}\u0000${c.species}`;
  const afterChecks = new Map(primaryChecks(after).map((c) => [key(c), c]));
  const beforeChecks = new Map((before ? primaryChecks(before) : []).map((c) => [key(c), c]));
  return [...new Set([...afterChecks.keys(), ...beforeChecks.keys()])].map((k) => {
    const [a, b] = [afterChecks.get(k), beforeChecks.get(k)];
    const c = (a ?? b)!;
    const [va, vb] = [a && verdictWords(a), b && verdictWords(b)];
    return {
      observation: c.id,
      species: c.species,
      observed: `${orderText(c.observed)} ± ${orderText(c.tolerance)}`,
      ...(vb !== undefined && { before: vb }),
      ...(va !== undefined && { after: va }),
      changed: before !== undefined && va !== vb,
    };
  });
}
