/**
 * What the fit plots of one data set draw, computed here so the writers only draw: for an
 * initial-rate table, the runs that vary its most-varied species with the others at their most
 * common values (the saturation curve a chemist plots), each rival's fitted rate along that line,
 * every run's residual of ln r for each rival, and the power-law order line with the band of its
 * slope's 95 % interval; for a time course, the measured concentrations and each rival's curves.
 */
import type { OrderFit } from './initial-rate-orders.ts';
import type { InitialRateData, TimeCourseData } from './kinetic-data.ts';

/** Points and curves of one data set's plots (canonical units: M, M s^-1, s). */
export interface FitPlotSeries {
  kind: 'initial_rates' | 'time_course';
  /** the x quantity: a species symbol (initial rates) or t */
  x: string;
  /** y quantity: rate, or the measured species */
  y: string[];
  /** measured points: x, y, and which y (species index) */
  observed: { x: number; y: number; series: number }[];
  /** each rival's fitted curve, per y series */
  curves: { record: string; series: number; points: [number, number][] }[];
  /** each rival's residuals at every measured point (ln r for rates; M for concentrations) */
  residuals: { record: string; points: [number, number][] }[];
  /** the power-law order of species x: slope, its 95 % half-width, and the line's ln r at ln x̄ */
  orderLine?: { slope: number; halfWidth: number; lnXMiddle: number; lnRMiddle: number; range: [number, number] };
  /** the others' concentrations on the plotted line */
  heldAt?: Record<string, number>;
}

/** A rival's fitted rate at a point of the table, as a function of the concentrations by species. */
export type FittedRate = (concentrations: ReadonlyMap<string, number>) => number;

const CURVE_POINTS = 60;

/** The plots of an initial-rate table; `rivals` gives each ranked rival's fitted rate. */
export function initialRatePlot(
  set: InitialRateData,
  rivals: readonly { record: string; rate: FittedRate }[],
  orders: OrderFit | undefined,
): FitPlotSeries | undefined {
  const spans = set.species.map((_, j) => {
    const column = set.concentrations.map((row) => row[j]!);
    return Math.max(...column) / Math.min(...column);
  });
  const main = spans.indexOf(Math.max(...spans));
  if (main < 0 || !(spans[main]! > 1)) return undefined;
  const modal = set.species.map((_, j) => mode(set.concentrations.map((row) => row[j]!)));
  const onLine = set.concentrations
    .map((row, i) => i)
    .filter((i) => set.species.every((_, j) => j === main || same(set.concentrations[i]![j]!, modal[j]!)));
  const x = (i: number) => set.concentrations[i]![main]!;
  const xs = onLine.map(x);
  const [lo, hi] = [Math.min(...xs) / 1.5, Math.max(...xs) * 1.5];
  const at = (c: number) => new Map(set.species.map((s, j) => [s, j === main ? c : modal[j]!]));
  const grid = Array.from({ length: CURVE_POINTS }, (_, g) => lo * Math.pow(hi / lo, g / (CURVE_POINTS - 1)));
  const pointAt = (i: number) => new Map(set.species.map((s, j) => [s, set.concentrations[i]![j]!]));
  const out: FitPlotSeries = {
    kind: 'initial_rates',
    x: set.species[main]!,
    y: ['rate'],
    observed: onLine.map((i) => ({ x: x(i), y: set.rates[i]!, series: 0 })),
    curves: rivals.map((r) => ({
      record: r.record,
      series: 0,
      points: grid.map((c) => [c, r.rate(at(c))] as [number, number]).filter(([, v]) => v > 0 && Number.isFinite(v)),
    })),
    residuals: rivals.map((r) => ({
      record: r.record,
      points: set.rates.map((v, i) => [x(i), Math.log(v) - Math.log(r.rate(pointAt(i)))] as [number, number]),
    })),
    heldAt: Object.fromEntries(set.species.flatMap((s, j) => (j === main ? [] : [[s, modal[j]!]]))),
  };
  const q = orders?.orders.find((o) => o.name === set.species[main]);
  if (orders && q && Number.isFinite(q.value)) {
    const lnK = orders.lnApparentConstant.value;
    const others = orders.orders
      .filter((o) => o !== q)
      .reduce((sum, o) => sum + o.value * Math.log(modal[set.species.indexOf(o.name)]!), 0);
    const lnXMiddle = xs.reduce((s, v) => s + Math.log(v), 0) / xs.length;
    out.orderLine = {
      slope: q.value,
      halfWidth: q.interval[1] - q.value,
      lnXMiddle,
      lnRMiddle: lnK + others + q.value * lnXMiddle,
      range: [lo, hi],
    };
  }
  return out;
}

/** The plots of a time course: measured points and each rival's curves at the measured times. */
export function timeCoursePlot(
  set: TimeCourseData,
  rivals: readonly { record: string; curves: number[][] }[],
): FitPlotSeries {
  const observed = set.concentrations.flatMap((row, i) =>
    row.flatMap((c, j) => (c === undefined ? [] : [{ x: set.times[i]!, y: c, series: j }])),
  );
  return {
    kind: 'time_course',
    x: 't',
    y: [...set.species],
    observed,
    curves: rivals.flatMap((r) =>
      set.species.map((_, j) => ({
        record: r.record,
        series: j,
        points: set.times
          .map((t, i) => [t, r.curves[j]?.[i] ?? NaN] as [number, number])
          .filter(([, v]) => Number.isFinite(v)),
      })),
    ),
    residuals: rivals.map((r) => ({
      record: r.record,
      points: observed.map((p) => {
        const i = set.times.indexOf(p.x);
        return [p.x, p.y - (r.curves[p.series]?.[i] ?? NaN)] as [number, number];
      }),
    })),
  };
}

function same(a: number, b: number): boolean {
  return Math.abs(a - b) <= 1e-9 * Math.max(Math.abs(a), Math.abs(b));
}

/** The most common value (the survey value the other species were held at). */
function mode(values: readonly number[]): number {
  let best = values[0]!;
  let count = 0;
  for (const v of values) {
    const n = values.filter((w) => same(v, w)).length;
    if (n > count) [best, count] = [v, n];
  }
  return best;
}
