/**
 * A reaction system's page data: its rival proposals side by side, every observation of any
 * rival judged against every rival (as the engine judged them), which rivals survive (every check
 * a pass or not excluded; a check with no prediction leaves a rival undecided), and for
 * each surviving pair of live rivals the species whose predicted order differs most — the
 * measurement that would best tell them apart. A withdrawn rival, and a disfavoured one whose
 * record says why, is set apart: it is listed, but no measurement is suggested to rule it out.
 */
import type { DiagnosticJson, ObservationJson, VerdictCounts } from '../model/index.ts';
import { tallyVerdicts } from '../render/index.ts';
import type { RecordView } from './record-view.ts';
import type { SystemFitView } from './fit-view.ts';

export interface RivalColumn {
  id: string;
  /** a short column header: the id without the prefix every rival's id shares */
  short: string;
  title: string;
  status?: string;
  /** the record's one-line reason for its status */
  statusReason?: string;
  /**
   * live: still argued for (proposed, favoured, or disfavoured without a recorded reason);
   * set apart: withdrawn, or disfavoured with a reason — listed, but not among the contenders
   */
  contention: 'live' | 'set_apart';
  overallText?: string;
  overallLatex?: string;
  /** the primary rate law */
  rateLatex?: string;
  method?: string;
  /** the primary rate law has no closed form (solved numerically at each observation) */
  numericOnly?: boolean;
  /** 1-based index of this rival's overall change among the distinct ones in the system */
  overallVariant?: number;
  /** no errors, and every observation passes or is not excluded (standing 'survives') */
  survives: boolean;
  /**
   * survives: no errors, and every check passes or is not excluded; ruled_out: errors, or an
   * observation contradicts it; undecided: nothing contradicts it, but some check has no prediction
   */
  standing: 'survives' | 'ruled_out' | 'undecided';
  /** its checks against every observation of the system, counted by verdict */
  tally: VerdictCounts;
  errors: number;
}

export interface MatrixRow {
  observation: string;
  species: string;
  observed: number;
  tolerance: number;
  /** ids of the rivals whose own record holds this observation */
  recordedBy: string[];
  /** per rival id: status and prediction */
  cells: Record<string, { status: string; predicted?: number; range?: [number, number] }>;
}

export interface Discriminator {
  a: string;
  b: string;
  species: string;
  orderA: [number, number];
  orderB: [number, number];
  difference: number;
}

/** What the system record adds to a system's page. */
export interface SystemRecordView {
  /** the record's file, relative to where the catalogue was built */
  file: string;
  title?: string;
  /** the overall change as written (equation notation) */
  overall?: string;
  description?: string;
  diagnostics: DiagnosticJson[];
}

export interface SystemView {
  system: string;
  /** the system's own record (title, overall change, description), where content/systems has one */
  record?: SystemRecordView;
  rivals: RivalColumn[];
  /** symbol → species page slug, for the species the rivals write (their system's labels or shared formulas) */
  speciesSlugs: Record<string, string>;
  /** true when the rivals do not all describe the same overall equation */
  overallDiffers: boolean;
  matrix: MatrixRow[];
  discriminators: Discriminator[];
  /** each data set of the system with every rival fitted (fit-view.ts) */
  fits?: SystemFitView[];
}

/** Builds the comparison; `judged` holds each rival's checks against the observations of all rivals. */
export function systemView(
  system: string,
  rivals: RecordView[],
  judged: ReadonlyMap<string, ObservationJson[]> = new Map(),
): SystemView {
  const shorts = shortLabels(rivals.map((r) => r.id));
  const variants: string[] = [];
  const columns = rivals.map((r, i): RivalColumn => {
    const law = r.report.rate_laws?.[0];
    const c: RivalColumn = {
      id: r.id,
      short: shorts[i]!,
      title: r.title,
      survives: false,
      standing: 'undecided',
      tally: tallyVerdicts([]),
      errors: r.errors,
      contention: setApart(r) ? 'set_apart' : 'live',
    };
    if (r.status) c.status = r.status;
    if (r.statusReason) c.statusReason = r.statusReason;
    if (r.report.overall) c.overallText = r.report.overall.text;
    if (r.overallLatex) c.overallLatex = r.overallLatex;
    if (law?.latex) c.rateLatex = law.latex;
    if (law) c.method = law.method;
    if (law?.numeric_only) c.numericOnly = true;
    if (r.report.overall) {
      const key = overallKey(r.report.overall);
      if (!variants.includes(key)) variants.push(key);
      c.overallVariant = variants.indexOf(key) + 1;
    }
    return c;
  });
  const rows = new Map<string, MatrixRow>();
  for (const r of rivals) {
    const method = r.report.rate_laws?.[0]?.method;
    for (const o of (judged.get(r.id) ?? r.report.observations ?? []).filter((x) => x.method === method)) {
      const key = `${o.id}\u0000${o.species}`;
      const recordedBy = rivals
        .filter((x) => (x.report.observations ?? []).some((own) => own.id === o.id && own.species === o.species))
        .map((x) => x.id);
      const row = rows.get(key) ?? {
        observation: o.id,
        species: o.species,
        observed: o.observed,
        tolerance: o.tolerance,
        recordedBy,
        cells: {},
      };
      row.cells[r.id] = {
        status: o.status,
        ...(o.predicted !== undefined && { predicted: o.predicted }),
        ...(o.range && { range: o.range }),
      };
      rows.set(key, row);
    }
  }
  const matrix = [...rows.values()];
  for (const column of columns) {
    const rival = rivals.find((r) => r.id === column.id)!;
    // A row this rival has no check for counts as no prediction: it cannot survive on silence.
    column.tally = tallyVerdicts(matrix.map((row) => row.cells[column.id] ?? { status: 'unknown' }));
    column.standing =
      rival.errors > 0 || column.tally.fail > 0 ? 'ruled_out' : column.tally.unknown > 0 ? 'undecided' : 'survives';
    column.survives = column.standing === 'survives';
  }
  const speciesSlugs: Record<string, string> = {};
  for (const r of rivals)
    for (const [symbol, slug] of Object.entries(r.speciesSlugs ?? {})) speciesSlugs[symbol] ??= slug;
  return {
    system,
    rivals: columns,
    speciesSlugs,
    overallDiffers: variants.length > 1,
    matrix,
    discriminators: discriminators(rivals, columns),
  };
}

/** Withdrawn, or disfavoured with a recorded reason: listed apart from the live rivals. */
function setApart(r: RecordView): boolean {
  return r.status === 'withdrawn' || (r.status === 'disfavoured' && r.statusReason !== undefined);
}

/**
 * The overall change as a key independent of the order the terms are written in (`B + A -> P`
 * is the same change as `A + B -> P`); catalysts over the arrow are not part of the change.
 */
function overallKey(overall: {
  reactants: Record<string, number | string>;
  products: Record<string, number | string>;
}): string {
  const side = (m: Record<string, number | string>) =>
    Object.entries(m)
      .map(([s, c]) => `${String(c)} ${s}`)
      .sort()
      .join(' + ');
  return `${side(overall.reactants)} -> ${side(overall.products)}`;
}

/** Column headers for ids: each id without the hyphen-separated prefix all of them share. */
export function shortLabels(ids: readonly string[]): string[] {
  if (ids.length < 2) return [...ids];
  const parts = ids.map((id) => id.split('-'));
  let shared = 0;
  while (parts.every((p) => p.length > shared + 1 && p[shared] === parts[0]![shared])) shared++;
  const shorts = parts.map((p) => p.slice(shared).join('-'));
  return new Set(shorts).size === shorts.length ? shorts : [...ids];
}

function discriminators(rivals: RecordView[], columns: RivalColumn[]): Discriminator[] {
  const alive = rivals.filter((r) => {
    const column = columns.find((c) => c.id === r.id);
    return column?.survives && column.contention === 'live';
  });
  const out: Discriminator[] = [];
  for (let i = 0; i < alive.length; i++) {
    for (let j = i + 1; j < alive.length; j++) {
      const [a, b] = [alive[i]!, alive[j]!];
      const ordersA = a.report.rate_laws?.[0]?.orders ?? {};
      const ordersB = b.report.rate_laws?.[0]?.orders ?? {};
      let best: Discriminator | undefined;
      for (const species of new Set([...Object.keys(ordersA), ...Object.keys(ordersB)])) {
        const oa = range(Object.hasOwn(ordersA, species) ? ordersA[species] : undefined);
        const ob = range(Object.hasOwn(ordersB, species) ? ordersB[species] : undefined);
        const difference = Math.max(Math.abs(oa[0] - ob[0]), Math.abs(oa[1] - ob[1]));
        if (difference > 0 && (!best || difference > best.difference))
          best = { a: a.id, b: b.id, species, orderA: oa, orderB: ob, difference };
      }
      if (best) out.push(best);
    }
  }
  return out;
}

/** Order limits as numbers; a species absent from a rate law has order 0. */
function range(o: { low: number | string; high: number | string } | undefined): [number, number] {
  if (!o) return [0, 0];
  const n = (x: number | string) =>
    typeof x === 'number' ? x : Number(x.split('/')[0]) / Number(x.split('/')[1] ?? 1);
  return [n(o.low), n(o.high)];
}
