/**
 * A reaction system's page data: its rival proposals side by side, every observation of any
 * rival judged against every rival (as the engine judged them), which rivals survive, and for
 * each surviving pair the species whose predicted order differs most — the measurement that
 * would best tell them apart.
 */
import type { ObservationJson } from '../cli/report/record-report.ts';
import type { RecordView } from './record-view.ts';

export interface RivalColumn {
  id: string;
  title: string;
  status?: string;
  overallText?: string;
  overallLatex?: string;
  /** the primary rate law */
  rateLatex?: string;
  method?: string;
  survives: boolean;
  errors: number;
}

export interface MatrixRow {
  observation: string;
  species: string;
  observed: number;
  tolerance: number;
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

export interface SystemView {
  system: string;
  rivals: RivalColumn[];
  /** true when the rivals do not all describe the same overall equation */
  overallDiffers: boolean;
  matrix: MatrixRow[];
  discriminators: Discriminator[];
}

/** Builds the comparison; `judged` holds each rival's checks against the observations of all rivals. */
export function systemView(system: string, rivals: RecordView[], judged: ReadonlyMap<string, ObservationJson[]> = new Map()): SystemView {
  const columns = rivals.map((r): RivalColumn => {
    const law = r.report.rate_laws?.[0];
    const c: RivalColumn = { id: r.id, title: r.title, survives: false, errors: r.errors };
    if (r.status) c.status = r.status;
    if (r.report.overall) c.overallText = r.report.overall.text;
    if (r.overallLatex) c.overallLatex = r.overallLatex;
    if (law?.latex) c.rateLatex = law.latex;
    if (law) c.method = law.method;
    return c;
  });
  const rows = new Map<string, MatrixRow>();
  for (const r of rivals) {
    const method = r.report.rate_laws?.[0]?.method;
    for (const o of (judged.get(r.id) ?? r.report.observations ?? []).filter((x) => x.method === method)) {
      const key = `${o.id}\u0000${o.species}`;
      const row = rows.get(key) ?? { observation: o.id, species: o.species, observed: o.observed, tolerance: o.tolerance, cells: {} };
      row.cells[r.id] = { status: o.status, ...(o.predicted !== undefined && { predicted: o.predicted }), ...(o.range && { range: o.range }) };
      rows.set(key, row);
    }
  }
  const matrix = [...rows.values()];
  for (const column of columns) {
    const rival = rivals.find((r) => r.id === column.id)!;
    column.survives = rival.errors === 0 && matrix.every((row) => row.cells[column.id]?.status !== 'fail');
  }
  const texts = new Set(columns.map((c) => c.overallText).filter(Boolean));
  return { system, rivals: columns, overallDiffers: texts.size > 1, matrix, discriminators: discriminators(rivals, columns) };
}

function discriminators(rivals: RecordView[], columns: RivalColumn[]): Discriminator[] {
  const alive = rivals.filter((r) => columns.find((c) => c.id === r.id)?.survives);
  const out: Discriminator[] = [];
  for (let i = 0; i < alive.length; i++) {
    for (let j = i + 1; j < alive.length; j++) {
      const [a, b] = [alive[i]!, alive[j]!];
      const ordersA = a.report.rate_laws?.[0]?.orders ?? {};
      const ordersB = b.report.rate_laws?.[0]?.orders ?? {};
      let best: Discriminator | undefined;
      for (const species of new Set([...Object.keys(ordersA), ...Object.keys(ordersB)])) {
        const oa = range(ordersA[species]);
        const ob = range(ordersB[species]);
        const difference = Math.max(Math.abs(oa[0] - ob[0]), Math.abs(oa[1] - ob[1]));
        if (difference > 0 && (!best || difference > best.difference)) best = { a: a.id, b: b.id, species, orderA: oa, orderB: ob, difference };
      }
      if (best) out.push(best);
    }
  }
  return out;
}

/** Order limits as numbers; a species absent from a rate law has order 0. */
function range(o: { low: number | string; high: number | string } | undefined): [number, number] {
  if (!o) return [0, 0];
  const n = (x: number | string) => (typeof x === 'number' ? x : Number(x.split('/')[0]) / Number(x.split('/')[1] ?? 1));
  return [n(o.low), n(o.high)];
}
