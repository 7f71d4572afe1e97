/**
 * The rivals of one reaction system fitted to the same data: every initial-rate table and time
 * course of any rival, each rival's laws fitted to it (its own fits reused from its derivation),
 * ranked by AICc with Akaike weights and F tests for nested laws; the runs that drive the ranking;
 * and, for the rivals that survive, the measurement that would best tell them apart. A rival the
 * data reject is a fit/rival-rejected finding on its record: an error for a favoured one.
 */
import type { MechanismRecord, Status } from '../model/index.ts';
import { diagnostic, type Diagnostic } from '../model/index.ts';
import type { Derivation } from './derive.ts';
import { fitLaws, timeCourseInput } from './fit-record.ts';
import type { KineticData } from './fitting/kinetic-data.ts';
import { lawFunction } from './fitting/law-function.ts';
import { pointConcentrations } from './fitting/law-fit.ts';
import { initialRatePlot, timeCoursePlot, type FitPlotSeries } from './fitting/plot-series.ts';
import { nextMeasurement, type NextMeasurement, type SurvivingRival } from './fitting/next-measurement.ts';
import { rankRivals, type Candidate, type Ranking } from './fitting/rank-rivals.ts';
import type { LawFitResult } from './fitting/record-fits.ts';
import { fitTimeCourse, type TimeCourseFit } from './fitting/time-course-fit.ts';
import { observationValues } from './rate-law/numeric-values.ts';

/** One rival of a system, as the fits need it. */
export interface SystemRival {
  id: string;
  status: Status;
  record: MechanismRecord;
  derivation: Derivation;
  /** the rival's own data sets, read and checked */
  data: readonly KineticData[];
}

/** One data set of a system with every rival fitted to it. */
export interface SystemDataSet {
  observation: string;
  /** the record whose observation holds the data */
  owner: string;
  data: KineticData;
  fits: { record: string; laws: LawFitResult[]; timeCourse?: TimeCourseFit }[];
  ranking: Ranking;
  /** the runs (1-based rows of the table) that most separate the best rival from the next */
  drivers: number[];
  next?: NextMeasurement;
  /** what the fit plots draw */
  plot?: FitPlotSeries;
}

/** The fits of a system and the findings on each rival's record. */
export interface SystemFits {
  dataSets: SystemDataSet[];
  diagnostics: Map<string, Diagnostic[]>;
}

/** Fits every rival to every shared data set and ranks them. */
export function fitSystem(rivals: readonly SystemRival[]): SystemFits {
  const dataSets: SystemDataSet[] = [];
  const diagnostics = new Map<string, Diagnostic[]>();
  const seen = new Set<string>();
  for (const owner of rivals)
    for (const set of owner.data) {
      if (set.kind === 'temperature_series') continue;
      const key = JSON.stringify(set);
      if (seen.has(key)) continue;
      seen.add(key);
      dataSets.push(fitDataSet(owner, set, rivals));
    }
  if (rivals.length > 1)
    for (const d of dataSets)
      for (const r of d.ranking.rivals) {
        const rival = rivals.find((x) => x.id === r.record)!;
        if (!r.rejected || rival.status === 'withdrawn') continue;
        const best = d.ranking.rivals[0]!;
        const list = diagnostics.get(rival.id) ?? [];
        // A time-course fit that cannot be trusted (its own or the best rival's) cannot reject anyone outright.
        const shaky = [r.record, best.record].filter((id) => unreliableCourse(d, id));
        const caveat = shaky.length > 0 ? ` — but the time-course fit of ${shaky.join(' and ')} is unreliable` : '';
        list.push(
          diagnostic(
            'fit/rival-rejected',
            rival.status === 'favoured' && shaky.length === 0 ? 'error' : 'warning',
            `the data of observation ${d.observation}${d.owner === rival.id ? '' : ` (record ${d.owner})`} reject this proposal: Akaike weight ${r.pairwiseWeight.toPrecision(2)} against ${best.record} (ΔAICc ${r.deltaAicc.toFixed(1)})${caveat}`,
            {
              path: ['status'],
              note:
                rival.status === 'favoured'
                  ? `the data favour ${best.record}; revise this record or its status`
                  : 'mark it disfavoured, or explain in its notes why these data do not apply',
            },
          ),
        );
        diagnostics.set(rival.id, list);
      }
  return { dataSets, diagnostics };
}

/** Whether a rival's fit to a time course (the one ranked: simulation, else closed form) is marked unreliable. */
function unreliableCourse(set: SystemDataSet, record: string): boolean {
  const tc = set.fits.find((f) => f.record === record)?.timeCourse;
  return (tc?.simulation ?? tc?.closedForm)?.unreliable !== undefined;
}

function fitDataSet(owner: SystemRival, set: KineticData, rivals: readonly SystemRival[]): SystemDataSet {
  const index = (owner.record.observations ?? []).findIndex((o) => o.id === set.observation);
  const fits: SystemDataSet['fits'] = [];
  const candidates: Candidate[] = [];
  for (const rival of rivals) {
    const own =
      rival === owner ? rival.derivation.fits?.dataSets.find((d) => d.observation === set.observation) : undefined;
    if (set.kind === 'initial_rates') {
      const laws = own?.laws ?? fitLaws(rival.derivation, owner.record, set, index);
      fits.push({ record: rival.id, laws });
      for (const l of laws)
        if (l.fit)
          candidates.push({
            record: rival.id,
            method: l.method,
            criteria: l.fit.criteria,
            rss: l.fit.fit.rss,
            parameters: l.fit.fit.parameters.length,
            ...(l.signature && { signature: l.signature }),
          });
    } else if (set.kind === 'time_course') {
      const input = own ? undefined : timeCourseInput(rival.derivation, owner.record, set, index);
      const timeCourse = own?.timeCourse ?? (input && fitTimeCourse(input));
      fits.push({ record: rival.id, laws: [], ...(timeCourse && { timeCourse }) });
      const model = timeCourse?.simulation ?? timeCourse?.closedForm;
      if (model)
        candidates.push({
          record: rival.id,
          method: timeCourse?.simulation ? 'simulation' : (rival.derivation.rateLaws?.[0]?.law.method ?? 'law'),
          criteria: model.criteria,
          rss: model.fit.rss,
          parameters: model.fit.parameters.length,
        });
    }
  }
  const n = set.kind === 'initial_rates' ? set.rates.length : (candidates[0]?.criteria.n ?? 0);
  const ranking = rankRivals(candidates, n);
  const out: SystemDataSet = { observation: set.observation, owner: owner.id, data: set, fits, ranking, drivers: [] };
  if (set.kind === 'initial_rates') {
    out.drivers = drivers(set, fits, ranking);
    const laws = fittedLaws(owner, set, index, fits, ranking, rivals);
    // A measurement is suggested only among live rivals: not a withdrawn record, nor one disfavoured for a recorded reason.
    const next = suggest(laws.filter((l) => isLive(rivals.find((r) => r.id === l.record))));
    if (next) out.next = next;
    const orders = owner.derivation.fits?.dataSets.find((d) => d.observation === set.observation)?.orders;
    const plot = initialRatePlot(
      set,
      laws.map((l) => ({ record: l.record, rate: l.bySpecies })),
      orders,
    );
    if (plot) out.plot = plot;
  } else if (set.kind === 'time_course') {
    out.plot = timeCoursePlot(
      set,
      fits.flatMap((f) => {
        const model = f.timeCourse?.simulation ?? f.timeCourse?.closedForm;
        return model ? [{ record: f.record, curves: model.curves }] : [];
      }),
    );
  }
  return out;
}

/** The law fit that represents a rival in the ranking. */
function represented(fits: SystemDataSet['fits'], record: string, method: string): LawFitResult | undefined {
  return fits.find((f) => f.record === record)?.laws.find((l) => l.method === method && l.fit);
}

/** Rows where the runner-up's weighted squared residual most exceeds the best's. */
function drivers(
  set: KineticData & { kind: 'initial_rates' },
  fits: SystemDataSet['fits'],
  ranking: Ranking,
): number[] {
  const [best, second] = ranking.rivals;
  if (!best || !second) return [];
  const a = represented(fits, best.record, best.method)?.fit?.fit;
  const b = represented(fits, second.record, second.method)?.fit?.fit;
  if (!a || !b) return [];
  const u = set.rateUncertainties;
  const gain = a.residuals.map((e, i) => (u ? (set.rates[i]! / u[i]!) ** 2 : 1) * (b.residuals[i]! ** 2 - e * e));
  return gain
    .map((g, i) => [g, i] as const)
    .filter(([g]) => g > 0)
    .sort((x, y) => y[0] - x[0])
    .slice(0, 3)
    .map(([, i]) => i + 1);
}

/** A ranked rival's fitted law as a function of concentrations, by symbol and by species of the table. */
interface FittedLaw {
  record: string;
  rejected: boolean;
  /** the residual standard deviation of its fit (ln r) */
  noise: number;
  bySymbol(c: ReadonlyMap<string, number>): number;
  bySpecies(c: ReadonlyMap<string, number>): number;
  /** every point of the table by symbol, the observation's fixed conditions included */
  points: ReadonlyMap<string, number>[];
}

function fittedLaws(
  owner: SystemRival,
  set: KineticData & { kind: 'initial_rates' },
  index: number,
  fits: SystemDataSet['fits'],
  ranking: Ranking,
  rivals: readonly SystemRival[],
): FittedLaw[] {
  const out: FittedLaw[] = [];
  for (const r of ranking.rivals) {
    const rival = rivals.find((x) => x.id === r.record)!;
    const fitted = represented(fits, r.record, r.method);
    const derived = rival.derivation.rateLaws?.find((l) => l.law.method === r.method);
    const { rateLawContext, orderSymbols } = rival.derivation;
    if (!fitted?.fit || !derived?.normalised || !rateLawContext || !orderSymbols) continue;
    const fn = lawFunction(derived.normalised);
    const values = new Map(
      derived.normalised.constants.flatMap((c) => (c.value !== undefined ? [[c.name, c.value]] : [])),
    );
    fitted.constants.forEach((c, j) => values.set(c.name, fitted.fit!.fit.parameters[j]!.value));
    const observation = owner.record.observations?.[index] ?? { id: set.observation };
    const fixed = observationValues(observation, index, rateLawContext).values;
    const symbolOf = (species: string) => orderSymbols.find((s) => s.species === species)?.symbol;
    for (const s of set.species) fixed.delete(symbolOf(s) ?? '');
    const bySymbol = (c: ReadonlyMap<string, number>) =>
      fn.symbols.every((s) => c.has(s))
        ? fn.rate(
            fn.constants.map((n) => values.get(n) ?? 0),
            c,
          )
        : NaN;
    out.push({
      record: r.record,
      rejected: r.rejected,
      noise: fitted.fit.fit.residualStandardDeviation,
      bySymbol,
      bySpecies: (c) => {
        const symbols = new Map(fixed);
        for (const [species, v] of c) symbols.set(symbolOf(species) ?? species, v);
        return bySymbol(symbols);
      },
      points: pointConcentrations(set, fixed, symbolOf),
    });
  }
  return out;
}

/** Whether a rival is still argued for: not withdrawn, and not disfavoured for a recorded reason. */
function isLive(rival: SystemRival | undefined): boolean {
  if (!rival) return false;
  return rival.status !== 'withdrawn' && !(rival.status === 'disfavoured' && rival.record.status_reason !== undefined);
}

/** The next measurement for the surviving rivals of an initial-rate table. */
function suggest(laws: readonly FittedLaw[]): NextMeasurement | undefined {
  const surviving = laws.filter((l) => !l.rejected);
  const noise = surviving[0]?.noise ?? NaN;
  const allPoints = surviving.flatMap((l) => l.points);
  const spans = new Map<string, [number, number]>();
  const logs = new Map<string, number[]>();
  for (const p of allPoints)
    for (const [s, v] of p) {
      if (!(v > 0)) continue;
      const [lo, hi] = spans.get(s) ?? [v, v];
      spans.set(s, [Math.min(lo, v), Math.max(hi, v)]);
      logs.set(s, [...(logs.get(s) ?? []), Math.log(v)]);
    }
  const middle = new Map([...logs].map(([s, l]) => [s, Math.exp(l.reduce((a, b) => a + b, 0) / l.length)]));
  return nextMeasurement(
    surviving.map((l): SurvivingRival => ({ record: l.record, rate: l.bySymbol })),
    middle,
    spans,
    noise,
  );
}
